/**
 * The Debian packages the test suite needs besides PostgreSQL: provisioned the way `npm start`
 * provisions PostgreSQL — installed with apt-get as root, otherwise the exact command is printed
 * and the run stops (the checks against CalculiX and the browser tests never pass by skipping).
 */
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { delimiter, join } from 'node:path';

/** Binary → the Debian package that provides it. */
export const TEST_TOOLS: [binary: string, pkg: string][] = [
  ['chromium', 'chromium'],
  ['ccx', 'calculix-ccx'],
  ['pdftotext', 'poppler-utils'],
];

const onPath = (binary: string) =>
  ['/usr/bin', ...(process.env.PATH ?? '').split(delimiter)].some(
    (d) => d && existsSync(join(d, binary)),
  );

/** The packages whose binaries are missing here. */
export const missingTestTools = () =>
  TEST_TOOLS.filter(([binary]) => !onPath(binary)).map(([, pkg]) => pkg);

export function ensureTestTools() {
  const missing = missingTestTools();
  if (missing.length === 0) return;
  const command = `apt-get install -y ${missing.join(' ')}`;
  if (process.getuid?.() !== 0) {
    console.error(
      `The tests need Debian packages that are missing: ${missing.join(', ')}.\n` +
        `Install them with:  sudo ${command}`,
    );
    process.exit(1);
  }
  console.log(`Installing Debian packages ${missing.join(', ')} (needed by the tests)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  execFileSync('apt-get', ['install', '-y', '-qq', ...missing], { stdio: 'inherit', env });
  const still = missingTestTools();
  if (still.length) throw new Error(`Still missing after apt-get: ${still.join(', ')}`);
}
