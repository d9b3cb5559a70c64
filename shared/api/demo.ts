import type { Role } from './roles';

/** Password of every demo account (seeded only in demo mode; the sign-in page shows it). */
export const DEMO_PASSWORD = 'spanwise-demo';

/** The invented demo plant's accounts: seeded by seeders/demo.ts, listed on the sign-in page. */
export const DEMO_SIGN_INS: readonly { email: string; role: Role; name: string }[] = [
  { email: 'admin@spanwise.test', role: 'admin', name: 'Maren Holt' },
  { email: 'sales@spanwise.test', role: 'sales', name: 'Devin Okafor' },
  { email: 'engineer@spanwise.test', role: 'engineer', name: 'Priya Ramanathan, P.E.' },
  { email: 'foreman@spanwise.test', role: 'foreman', name: 'Walt Brennan' },
  { email: 'builder1@spanwise.test', role: 'builder', name: 'Sam Whitaker' },
  { email: 'builder2@spanwise.test', role: 'builder', name: 'Lena Castillo' },
];
