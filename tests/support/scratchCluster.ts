import bcrypt from 'bcryptjs';
import pg from 'pg';
import type { Sequelize } from 'sequelize';
import { connect } from '../../server/db/sequelize';
import { migrator } from '../../server/db/migrator';
import { Plant, User } from '../../server/models';
import type { Role } from '../../shared/api/roles';
import {
  ensureCluster,
  ensureDatabase,
  startCluster,
  stopCluster,
  type Cluster,
} from '../../scripts/pg';
import { TEST_PASSWORD } from './factories';

/**
 * A PostgreSQL cluster of one test file's own (port TEST_PG_PORT + offset), for tests that stop,
 * restart or back up a server — the shared test cluster stays untouched. The file's models are
 * bound to it, so such a file never uses the shared factories.
 */
export async function scratchCluster(name: string, offset: number) {
  const port = Number(process.env.TEST_PG_PORT ?? 54339) + offset;
  const cluster: Cluster = ensureCluster(`.data/test-${name}`, port, `spanwise_${name}`);
  startCluster(cluster);
  await ensureDatabase(cluster, { fresh: true });
  const sequelize: Sequelize = connect(cluster.url);
  await migrator(sequelize).up();
  return {
    cluster,
    sequelize,
    start: () => startCluster(cluster),
    stop: () => stopCluster(cluster),
    /** A direct connection of the test's own, outside the app's pools. */
    admin: async () => {
      const c = new pg.Client({ connectionString: cluster.url });
      c.on('error', () => undefined);
      await c.connect();
      return c;
    },
    /** A plant and one active user on it (the factories' password). */
    user: async (role: Role = 'sales') => {
      const plant = await Plant.create({ name: `Plant ${name}`, units: 'imperial', address: null });
      return User.create({
        plantId: plant.id,
        customerId: null,
        email: `${role}-${Date.now()}@${name}.test`,
        name: `${role} of ${name}`,
        role,
        passwordHash: await bcrypt.hash(TEST_PASSWORD, 4),
        active: true,
        lastSignInAt: null,
      });
    },
    close: async () => {
      await sequelize.close().catch(() => undefined);
      stopCluster(cluster);
    },
  };
}
