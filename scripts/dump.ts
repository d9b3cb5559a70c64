/**
 * Backup and restore of the app's database with PostgreSQL's own tools: `pg_dump` in custom format,
 * `pg_restore --clean --if-exists --single-transaction` (all of it or, on any error, none of it).
 * The CLIs are `scripts/backup.ts` and `scripts/restore.ts`; this file holds what they share.
 */
import { spawnSync } from 'node:child_process';
import { closeSync, existsSync, openSync, readSync, statSync } from 'node:fs';
import { delimiter, join } from 'node:path';
import pg from 'pg';
import { APP_PG_DIR, APP_PG_PORT, provideAppDatabase, type Database } from './database';
import { PG_BIN } from './pg';

/** A refusal the CLI prints as is (no stack) before exiting non-zero. */
export class DumpError extends Error {}

/** `pg_dump`/`pg_restore` from PostgreSQL 15's folder (PG_BIN), else the first one on PATH. */
export function pgClientTool(name: 'pg_dump' | 'pg_restore') {
  const dirs = [PG_BIN, ...(process.env.PATH ?? '').split(delimiter)].filter(Boolean);
  const found = dirs.map((d) => join(d, name)).find((p) => existsSync(p));
  if (!found)
    throw new DumpError(
      `${name} was not found (looked in ${PG_BIN} and on PATH).\n` +
        'Install the PostgreSQL client tools:  sudo apt-get install -y postgresql-client',
    );
  return found;
}

/**
 * The connection as libpq options: the URL without its password (so it never shows in `ps`) and
 * the password in PGPASSWORD.
 */
export function libpqConnection(url: string) {
  const u = new URL(url);
  const password = decodeURIComponent(u.password);
  u.password = '';
  return {
    dbname: u.toString(),
    env: { ...process.env, PGPASSWORD: password, PGCONNECT_TIMEOUT: '10' },
  };
}

/** Where the URL points, for messages (no credentials). */
export function describeDatabase(url: string) {
  const u = new URL(url);
  return `${u.hostname}:${u.port || 5432}${u.pathname}`;
}

/**
 * Connect once to prove the database answers; returns how many other client connections it has
 * (a running app holds some). Throws a DumpError saying where it looked when it is not reachable.
 */
export async function probeDatabase(url: string) {
  const client = new pg.Client({ connectionString: url, connectionTimeoutMillis: 5_000 });
  client.on('error', () => undefined);
  try {
    await client.connect();
    const r = await client.query<{ others: number }>(
      `SELECT count(*)::int AS others FROM pg_stat_activity
        WHERE datname = current_database() AND pid <> pg_backend_pid()
          AND backend_type = 'client backend'`,
    );
    return { others: r.rows[0].others };
  } catch (e) {
    throw new DumpError(
      `The app's database at ${describeDatabase(url)} is not reachable: ${(e as Error).message}.\n` +
        'Is PostgreSQL running? (The project cluster is started by `npm start`; with DATABASE_URL, check that server.)',
    );
  } finally {
    await client.end().catch(() => undefined);
  }
}

// Every custom-format archive starts with these five bytes (pg_dump's file header).
const DUMP_MAGIC = 'PGDMP';

/** Refuse a path that is missing or not a custom-format archive pg_restore can read. */
export function checkDumpFile(file: string) {
  if (!existsSync(file) || !statSync(file).isFile())
    throw new DumpError(`Backup file not found: ${file}`);
  const head = Buffer.alloc(DUMP_MAGIC.length);
  const fd = openSync(file, 'r');
  try {
    readSync(fd, head, 0, head.length, 0);
  } finally {
    closeSync(fd);
  }
  const list = () =>
    spawnSync(pgClientTool('pg_restore'), ['--list', file], { encoding: 'utf8', stdio: 'pipe' });
  if (head.toString('latin1') !== DUMP_MAGIC || list().status !== 0)
    throw new DumpError(
      `${file} is not a readable database backup: it should be a pg_dump custom-format archive, as made by \`npm run db:backup\`, and this one is another kind of file or damaged. Nothing was changed.`,
    );
}

/** Run a PostgreSQL client tool; its own error text becomes the refusal. */
function runTool(tool: 'pg_dump' | 'pg_restore', args: string[], env: NodeJS.ProcessEnv) {
  const r = spawnSync(pgClientTool(tool), args, { encoding: 'utf8', stdio: 'pipe', env });
  if (r.status !== 0)
    throw new DumpError(`${tool} failed (exit ${r.status ?? r.signal}):\n${r.stderr.trim()}`);
}

/** `pg_dump --format=custom` of the whole database into `file`. */
export function dumpDatabase(url: string, file: string) {
  const { dbname, env } = libpqConnection(url);
  runTool('pg_dump', ['--format=custom', '--no-password', `--file=${file}`, dbname], env);
}

/**
 * Replace the database's contents with the archive's, in one transaction: on any error
 * PostgreSQL rolls all of it back and the database is as it was. Owners and grants are left out,
 * so a backup restores under another role (e.g. a hosted server's DATABASE_URL user).
 */
export function restoreDatabase(url: string, file: string) {
  const { dbname, env } = libpqConnection(url);
  runTool(
    'pg_restore',
    [
      '--clean',
      '--if-exists',
      '--single-transaction',
      '--exit-on-error',
      '--no-owner',
      '--no-privileges',
      '--no-password',
      `--dbname=${dbname}`,
      file,
    ],
    env,
  );
}

/** A byte count as people read it (1024-byte units, like file managers). */
export function formatBytes(bytes: number) {
  if (bytes < 1024) return `${bytes} B`;
  const kb = bytes / 1024;
  return kb < 1024 ? `${kb.toFixed(1)} KB` : `${(kb / 1024).toFixed(1)} MB`;
}

/**
 * Run a backup/restore step against the app's database (as `npm start` finds it), then stop the
 * project cluster again if this run started it. Refusals print their message and give exit code 1.
 * `mustExist`: refuse rather than create an empty project cluster (nothing to back up).
 * `check`: refusals that need no database, made before anything starts.
 */
export async function runOnAppDatabase(
  work: (url: string) => Promise<void>,
  opts: { mustExist: boolean; check?: () => void },
) {
  let db: Database | null = null;
  try {
    opts.check?.(); // refusals that need no database come before starting one
    if (!process.env.DATABASE_URL && opts.mustExist && !existsSync(join(APP_PG_DIR, 'PG_VERSION')))
      throw new DumpError(
        `There is no database yet: ${APP_PG_DIR} does not exist (run \`npm start\` once) and DATABASE_URL is not set.`,
      );
    db = await provideAppDatabase().catch((e: Error) => {
      throw new DumpError(
        `Could not start the project's PostgreSQL (${APP_PG_DIR}, port ${APP_PG_PORT}): ${e.message}`,
      );
    });
    await work(db.url);
    return 0;
  } catch (e) {
    if (!(e instanceof DumpError)) throw e;
    console.error(e.message);
    return 1;
  } finally {
    db?.stop();
  }
}
