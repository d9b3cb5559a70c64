import { execFile } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import type { Sequelize } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { connect } from '../../../server/db/sequelize';
import { migrator } from '../../../server/db/migrator';
import { AuditEvent } from '../../../server/models';
import { testDatabaseUrl, testSequelize } from '../../support/db';
import { createCustomer, createLine, createOrder, createUser } from '../../support/factories';

/**
 * `npm run db:backup` / `db:restore` as a person runs them (the real scripts, pg_dump and
 * pg_restore), on a scratch database of the test cluster: the shared test database stays untouched.
 */
const SCRATCH = 'spanwise_backup';
const scratchUrl = (() => {
  const u = new URL(testDatabaseUrl());
  u.pathname = `/${SCRATCH}`;
  return u.toString();
})();
const dir = mkdtempSync(join(tmpdir(), 'spanwise-backup-'));
const TABLES = ['plants', 'customers', 'users', 'jobs', 'orders', 'order_lines', 'audit_events'];

let sequelize: Sequelize | null = null;
let ids: { customer: number; line: number; builder: string; audit: number };

/** Run `tsx scripts/<name>.ts` against the scratch database (DATABASE_URL, as a deployment would). */
function script(name: 'backup' | 'restore', args: string[], url = scratchUrl) {
  return new Promise<{ code: number; out: string }>((resolve) => {
    execFile(
      process.execPath,
      ['--import', 'tsx', `scripts/${name}.ts`, ...args],
      { env: { ...process.env, DATABASE_URL: url } },
      (e, stdout, stderr) =>
        resolve({ code: e ? Number(e.code ?? 1) : 0, out: `${stdout}${stderr}` }),
    );
  });
}

/** A short-lived direct connection (closed before each restore: restore refuses open ones). */
async function query<T extends pg.QueryResultRow>(sql: string, params: unknown[] = []) {
  const c = new pg.Client({ connectionString: scratchUrl });
  await c.connect();
  try {
    return (await c.query<T>(sql, params)).rows;
  } finally {
    await c.end();
  }
}

async function counts() {
  const out: Record<string, number> = {};
  for (const t of TABLES)
    out[t] = (await query<{ n: number }>(`SELECT count(*)::int AS n FROM ${t}`))[0].n;
  return out;
}

const snapshot = async () => ({
  counts: await counts(),
  customer: (await query('SELECT name FROM customers WHERE id = $1', [ids.customer]))[0],
  line: (await query('SELECT mark, quantity FROM order_lines WHERE id = $1', [ids.line]))[0],
  builder: (await query('SELECT role, active FROM users WHERE email = $1', [ids.builder]))[0],
  audit: (await query('SELECT action, data FROM audit_events WHERE id = $1', [ids.audit]))[0],
});

/** Sales changes and deletes things after the backup. */
async function damage() {
  await query(`UPDATE customers SET name = 'Renamed after the backup' WHERE id = $1`, [
    ids.customer,
  ]);
  await query('DELETE FROM order_lines WHERE id = $1', [ids.line]);
  await query('DELETE FROM users WHERE email = $1', [ids.builder]);
  await query('DELETE FROM audit_events WHERE id = $1', [ids.audit]);
}

beforeAll(async () => {
  const admin = new pg.Client({ connectionString: testDatabaseUrl() });
  await admin.connect();
  await admin.query(`DROP DATABASE IF EXISTS ${SCRATCH} WITH (FORCE)`);
  await admin.query(`CREATE DATABASE ${SCRATCH}`);
  await admin.end();
  // The factories bind the models to the shared test database on first use: do that first, then
  // bind them to the scratch database for the rest of this file.
  testSequelize();
  sequelize = connect(scratchUrl);
  await migrator(sequelize).up();

  const customer = await createCustomer();
  const order = await createOrder({ customer });
  const line = await createLine({ order, mark: 'T1', quantity: 6 });
  await createLine({ order });
  const builder = await createUser({ role: 'builder', customer });
  const event = await AuditEvent.create({
    plantId: order.plantId,
    actorId: builder.id,
    action: 'order.created',
    subjectType: 'order',
    subjectId: order.id,
    data: { number: order.number },
  });
  ids = { customer: order.customerId, line: line.id, builder: builder.email, audit: event.id };
  await sequelize.close();
  sequelize = null;
}, 120_000);

afterAll(async () => {
  await sequelize?.close();
  rmSync(dir, { recursive: true, force: true });
  const admin = new pg.Client({ connectionString: testDatabaseUrl() });
  await admin.connect();
  await admin.query(`DROP DATABASE IF EXISTS ${SCRATCH} WITH (FORCE)`);
  await admin.end();
});

describe('npm run db:backup / db:restore', () => {
  const file = join(dir, 'round-trip.dump');

  it('round trip: what was backed up comes back after changes and deletions', async () => {
    const before = await snapshot();
    expect(before.counts.order_lines).toBe(2);
    expect(before.builder).toEqual({ role: 'builder', active: true });

    const backup = await script('backup', [file]);
    expect(backup.out).toContain(file);
    expect(backup.out).toMatch(/\(\d+(\.\d)? (B|KB|MB)\)/); // its size
    expect(backup.code).toBe(0);
    expect(readFileSync(file).subarray(0, 5).toString()).toBe('PGDMP'); // custom format
    expect(statSync(file).mode & 0o077).toBe(0); // owner only: it holds password hashes

    await damage();
    expect((await counts()).order_lines).toBe(1);

    const restore = await script('restore', [file]);
    expect(restore.out).toContain('Restored');
    expect(restore.code).toBe(0);
    expect(await snapshot()).toEqual(before);
  }, 180_000);

  it('a restore that fails part-way changes nothing (one transaction)', async () => {
    await damage();
    // A view someone added on the live database blocks dropping `customers` — well after the
    // restore has begun dropping constraints and tables.
    await query('CREATE VIEW customer_report AS SELECT id, name FROM customers');
    const changed = await snapshot();

    const r = await script('restore', [file]);
    expect(r.out).toContain('other objects depend on it');
    expect(r.out).toContain('nothing was changed');
    expect(r.code).not.toBe(0);
    expect(await snapshot()).toEqual(changed); // neither restored nor half-dropped
    expect(await query('SELECT count(*)::int AS n FROM customer_report')).toEqual([
      { n: changed.counts.customers },
    ]);

    await query('DROP VIEW customer_report');
    expect((await script('restore', [file])).code).toBe(0); // back to the backup for what follows
  }, 180_000);

  it('refuses clearly, with a non-zero exit and nothing changed', async () => {
    const before = await snapshot();
    const text = join(dir, 'notes.txt');
    writeFileSync(text, 'not a dump\n');
    const truncated = join(dir, 'truncated.dump');
    const whole = readFileSync(file);
    writeFileSync(truncated, whole.subarray(0, Math.floor(whole.length * 0.6)));

    const missing = await script('restore', [join(dir, 'nope.dump')]);
    expect(missing.code).not.toBe(0);
    expect(missing.out).toContain('Backup file not found');

    for (const bad of [text, truncated]) {
      const notDump = await script('restore', [bad]);
      expect(notDump.code).not.toBe(0);
      expect(notDump.out).toContain(`${bad} is not a readable database backup`);
    }

    const noArg = await script('restore', []);
    expect(noArg.code).not.toBe(0);
    expect(noArg.out).toContain('Usage: npm run db:restore');

    const exists = await script('backup', [file]);
    expect(exists.code).not.toBe(0);
    expect(exists.out).toContain('already exists');

    // Nothing listens on port 1 (PostgreSQL never uses a privileged port).
    const away = new URL(scratchUrl);
    away.port = '1';
    for (const name of ['backup', 'restore'] as const) {
      const r = await script(
        name,
        name === 'backup' ? [join(dir, 'x.dump')] : [file],
        away.toString(),
      );
      expect(r.code).not.toBe(0);
      expect(r.out).toContain("The app's database at");
      expect(r.out).toContain('is not reachable');
    }

    // An open connection (the app running) stops a restore before it starts.
    const app = new pg.Client({ connectionString: scratchUrl });
    await app.connect();
    try {
      const busy = await script('restore', [file]);
      expect(busy.code).not.toBe(0);
      expect(busy.out).toContain('other open connection');
    } finally {
      await app.end();
    }
    expect(await snapshot()).toEqual(before);
  }, 240_000);
});
