import { describe, expect, it } from 'vitest';
import { Sequelize } from 'sequelize';
import { migrator } from '../../../server/db/migrator';
import { testDatabaseUrl } from '../../support/db';

describe('migrations', () => {
  it('are reversible: down then up leaves the same tables', async () => {
    // A scratch database on the same test server, so the shared one is untouched.
    const url = new URL(testDatabaseUrl());
    const admin = new Sequelize(url.toString(), { logging: false });
    const name = `spanwise_migrate_${process.pid}`;
    await admin.query(`DROP DATABASE IF EXISTS ${name}`);
    await admin.query(`CREATE DATABASE ${name}`);
    url.pathname = `/${name}`;
    const scratch = new Sequelize(url.toString(), { logging: false });
    try {
      const m = migrator(scratch);
      const up = await m.up();
      expect(up.length).toBeGreaterThan(0);
      const tables = async () =>
        (await scratch.getQueryInterface().showAllTables())
          .filter((t) => t !== 'SequelizeMeta')
          .sort();
      const after = await tables();
      expect(after).toEqual(
        expect.arrayContaining(['plants', 'customers', 'users', 'jobs', 'audit_events', 'session']),
      );
      await m.down({ to: 0 });
      expect(await tables()).toEqual([]);
      await m.up();
      expect(await tables()).toEqual(after);
    } finally {
      await scratch.close();
      await admin.query(`DROP DATABASE IF EXISTS ${name}`);
      await admin.close();
    }
  });
});
