import type { Role } from '../../../shared/api/roles';

/** Password of every demo account (seeded only when the server runs in demo mode). */
export const DEMO_PASSWORD = 'spanwise-demo';

/**
 * The seeded demo accounts, listed on the sign-in page in demo mode. Mirrors seeders/demo.ts
 * (the client cannot import the seeder, which pulls in the database layer).
 */
export const DEMO_ACCOUNTS: ReadonlyArray<{ role: Role; email: string }> = [
  { role: 'admin', email: 'admin@spanwise.test' },
  { role: 'sales', email: 'sales@spanwise.test' },
  { role: 'engineer', email: 'engineer@spanwise.test' },
  { role: 'foreman', email: 'foreman@spanwise.test' },
  { role: 'builder', email: 'builder1@spanwise.test' },
  { role: 'builder', email: 'builder2@spanwise.test' },
];
