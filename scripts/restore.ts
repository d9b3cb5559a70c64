/**
 * npm run db:restore -- <file> [--force]: replace the app's database (DATABASE_URL or the project
 * cluster) with a backup made by `npm run db:backup`, in one transaction — on any error nothing
 * changes. Refuses while other connections are open (the app running) unless --force.
 */
import {
  checkDumpFile,
  describeDatabase,
  DumpError,
  probeDatabase,
  restoreDatabase,
  runOnAppDatabase,
} from './dump';

const args = process.argv.slice(2);
const force = args.includes('--force');
const file = args.find((a) => a !== '--force') ?? '';

process.exitCode = await runOnAppDatabase(
  async (url) => {
    const { others } = await probeDatabase(url);
    if (others > 0 && !force)
      throw new DumpError(
        `${describeDatabase(url)} has ${others} other open connection(s) — is the app running? ` +
          'Stop it (Ctrl-C in `npm start`) and run the restore again, or pass --force. Nothing was changed.',
      );
    try {
      restoreDatabase(url, file);
    } catch (e) {
      if (e instanceof DumpError)
        throw new DumpError(
          `${e.message}\nThe restore ran in one transaction: nothing was changed.`,
        );
      throw e;
    }
    console.log(`Restored ${file} into ${describeDatabase(url)}.`);
  },
  {
    mustExist: false,
    check: () => {
      if (!file) throw new DumpError('Usage: npm run db:restore -- <backup file> [--force]');
      checkDumpFile(file);
    },
  },
);
