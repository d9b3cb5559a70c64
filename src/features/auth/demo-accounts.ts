import type { Role } from '../../../shared/api/roles';

/** Password of every demo account (seeded only when the server runs in demo mode). */
export const DEMO_PASSWORD = 'spanwise-demo';

/** The seeded demo accounts, one per role, listed on the sign-in page in demo mode. */
export const DEMO_ACCOUNTS: ReadonlyArray<{ role: Role; email: string }> = [
  { role: 'admin', email: 'admin@demo.spanwise.test' },
  { role: 'sales', email: 'sales@demo.spanwise.test' },
  { role: 'engineer', email: 'engineer@demo.spanwise.test' },
  { role: 'foreman', email: 'foreman@demo.spanwise.test' },
  { role: 'builder', email: 'builder@demo.spanwise.test' },
];
