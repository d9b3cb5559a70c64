import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { dirname, join } from 'node:path';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

export interface MigrationModule {
  up: (ctx: { context: QueryInterface }) => Promise<void>;
  down: (ctx: { context: QueryInterface }) => Promise<void>;
}

/** Reversible schema history in migrations/*.ts, recorded in the table "SequelizeMeta". */
export function migrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: {
      glob: ['migrations/*.ts', { cwd: root }],
      resolve: ({ name, path }) => ({
        name,
        up: async (p) => ((await import(pathToFileURL(path!).href)) as MigrationModule).up(p),
        down: async (p) => ((await import(pathToFileURL(path!).href)) as MigrationModule).down(p),
      }),
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize }),
    logger: undefined,
  });
}
