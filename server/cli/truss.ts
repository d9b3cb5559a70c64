/**
 * The `truss` command line: `analyze`, `design` or `cut FILE.json` (FILE "-" is stdin).
 * Prints one JSON document on stdout; errors as { "error": … } with exit code 2 (1 for faults).
 */
import { readFileSync } from 'node:fs';
import { analyzeCommand, cutCommand, designCommand, toCliError, type CliError } from './commands';
import { HELP } from './help';

const COMMANDS = { analyze: analyzeCommand, design: designCommand, cut: cutCommand } as const;

const invalid = (message: string, details?: Record<string, unknown>): CliError => ({
  error: { code: 'invalid', message, ...(details && { details }) },
});

/** Reads and parses the input file; returns the JSON or the error body. */
function readJson(file: string): { json: unknown } | CliError {
  let text: string;
  try {
    text = readFileSync(file === '-' ? 0 : file, 'utf8');
  } catch (e) {
    return invalid(
      `Cannot read ${file === '-' ? 'standard input' : file}: ${(e as Error).message}`,
    );
  }
  try {
    return { json: JSON.parse(text) };
  } catch (e) {
    return invalid(
      `${file === '-' ? 'Standard input' : file} is not valid JSON: ${(e as Error).message}`,
    );
  }
}

/** Runs the CLI on its arguments; returns the exit code and the JSON or text to print. */
export async function runCli(args: string[]): Promise<{ code: number; out: string }> {
  const [command, file, ...rest] = args;
  if (!command || command === '--help' || command === '-h' || command === 'help') {
    return { code: 0, out: HELP };
  }
  const print = (value: unknown, code: number) => ({ code, out: JSON.stringify(value, null, 2) });
  if (!(command in COMMANDS)) {
    return print(
      invalid(`Unknown command "${command}": use analyze, design or cut (see --help).`),
      2,
    );
  }
  if (!file || rest.length > 0) {
    return print(invalid(`Usage: truss ${command} FILE.json (one file, or - for stdin).`), 2);
  }
  const read = readJson(file);
  if ('error' in read) return print(read, 2);
  try {
    return print(await COMMANDS[command as keyof typeof COMMANDS](read.json), 0);
  } catch (e) {
    const body = toCliError(e);
    return print(body, body.error.code === 'internal' ? 1 : 2);
  }
}

const { code, out } = await runCli(process.argv.slice(2));
process.stdout.write(`${out}\n`);
process.exitCode = code;
