/** Where the app's database is: DATABASE_URL, or the project's own cluster under .data/. */
import {
  ensureCluster,
  ensureDatabase,
  ensurePostgresBinaries,
  startCluster,
  stopCluster,
  type Cluster,
} from './pg';

export const APP_PG_PORT = Number(process.env.APP_PG_PORT ?? 54329);
// Overridable so two checkouts on one machine can run their suites side by side.
export const TEST_PG_PORT = Number(process.env.TEST_PG_PORT ?? 54339);

export interface Database {
  url: string;
  cluster: Cluster | null;
  stop: () => void;
}

/** Start (creating the first time) the cluster in `dir`, or use DATABASE_URL and start nothing. */
export async function provideDatabase(opts: {
  dir: string;
  port: number;
  name: string;
  fresh?: boolean;
  useEnv?: boolean;
}): Promise<Database> {
  if (opts.useEnv !== false && process.env.DATABASE_URL) {
    return { url: process.env.DATABASE_URL, cluster: null, stop: () => undefined };
  }
  ensurePostgresBinaries();
  const cluster = ensureCluster(opts.dir, opts.port, opts.name);
  const started = startCluster(cluster);
  await ensureDatabase(cluster, { fresh: opts.fresh });
  // Stop only a cluster this process started; one already running belongs to someone else.
  return { url: cluster.url, cluster, stop: () => (started ? stopCluster(cluster) : undefined) };
}

/** The app's own cluster folder (used when DATABASE_URL is not set). */
export const APP_PG_DIR = '.data/postgres';

/** The app's database exactly as `npm start` finds it: DATABASE_URL, else the project cluster. */
export const provideAppDatabase = () =>
  provideDatabase({ dir: APP_PG_DIR, port: APP_PG_PORT, name: 'spanwise' });
