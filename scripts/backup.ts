/**
 * npm run db:backup [-- file]: the app's database (DATABASE_URL or the project cluster) as a
 * pg_dump custom-format archive, by default `backups/spanwise-<UTC timestamp>.dump`.
 */
import { existsSync, mkdirSync, renameSync, rmSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import {
  describeDatabase,
  dumpDatabase,
  DumpError,
  formatBytes,
  probeDatabase,
  runOnAppDatabase,
} from './dump';

// 2026-12-02T13:30:12.345Z → 20261202T133012Z: sorts by time, no characters file systems dislike.
const stamp = new Date().toISOString().replace(/[-:]/g, '').replace(/\.\d+/, '');
const target = process.argv[2] ?? join('backups', `spanwise-${stamp}.dump`);

process.exitCode = await runOnAppDatabase(
  async (url) => {
    if (existsSync(target))
      throw new DumpError(
        `${target} already exists; give another file name (nothing was written).`,
      );
    await probeDatabase(url);
    // Backups hold password hashes and sessions: readable by their owner only, from the start.
    process.umask(0o077);
    mkdirSync(dirname(target), { recursive: true });
    // Written under another name first: a failed or interrupted dump never looks like a backup.
    const partial = `${target}.partial`;
    try {
      dumpDatabase(url, partial);
      renameSync(partial, target);
    } finally {
      rmSync(partial, { force: true });
    }
    console.log(
      `Backup of ${describeDatabase(url)} written to ${target} (${formatBytes(statSync(target).size)}).`,
    );
  },
  { mustExist: true },
);
