import { Sequelize } from 'sequelize';
import pg from 'pg';
import { initModels } from '../models';

// BIGINT counts (e.g. COUNT(*)) come back as numbers, not strings.
pg.types.setTypeParser(20, (v) => Number(v));

/** One Sequelize instance per process, models initialised on it. */
export function connect(url: string, opts: { log?: boolean } = {}) {
  const sequelize = new Sequelize(url, {
    dialect: 'postgres',
    logging: opts.log ? console.log : false,
    // While the database is away a request fails fast (503) instead of waiting a minute for a slot.
    pool: { max: 10, idle: 10_000, acquire: 10_000 },
    dialectOptions: { connectionTimeoutMillis: 5_000 },
  });
  initModels(sequelize);
  return sequelize;
}
