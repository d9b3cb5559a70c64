import type { Express } from 'express';
import { beforeAll, describe, expect, it } from 'vitest';
import { testApp, testMailer } from '../../support/db';
import {
  createCustomer,
  createJob,
  createPlant,
  createLine,
  createOrder,
  createUser,
} from '../../support/factories';
import { signedIn } from '../../support/session';
import type { Role } from '../../../shared/api/roles';
import type { Order, User } from '../../../server/models';

/**
 * The route groups the other role matrices (role-matrix, orders/roles, quotes/roles, files/roles,
 * shopPaper/roles) leave out: price book, production settings and schedule, the shop floor, the
 * demo inbox, the builder's portal and an order's mail states. Every role, the builder included:
 * the builder is refused every desk and shop route and served its own portal.
 */
const ROLES: Role[] = ['admin', 'sales', 'engineer', 'foreman', 'builder'];

let app: Express;
let order: Order;
const users = {} as Record<Role, User>;

beforeAll(async () => {
  app = testApp({}, undefined, await testMailer()); // with the local mail fake, as `npm start`
  const plant = await createPlant();
  const customer = await createCustomer({ plant });
  const job = await createJob({ customer });
  for (const role of ROLES) users[role] = await createUser({ role, plant, customer });
  order = await createOrder({ job });
  await createLine({ order, reviewState: 'approved' });
});

const only = (status: number, ...roles: Role[]) =>
  Object.fromEntries(ROLES.map((r) => [r, roles.includes(r) ? status : 403])) as Record<
    Role,
    number
  >;

// Paths are functions: the order exists only once beforeAll has run.
const routes: [route: string, path: () => string, expected: Record<Role, number>][] = [
  ['GET /api/price-book', () => '/api/price-book', only(200, 'admin', 'sales')],
  [
    'GET /api/production/settings',
    () => '/api/production/settings',
    only(200, 'admin', 'sales', 'foreman'),
  ],
  ['GET /api/schedule', () => '/api/schedule', only(200, 'admin', 'sales', 'foreman')],
  ['GET /api/floor/today', () => '/api/floor/today', only(200, 'admin', 'foreman')],
  ['GET /api/floor/inspections', () => '/api/floor/inspections', only(200, 'admin', 'foreman')],
  ['GET /api/dev/mail', () => '/api/dev/mail', only(200, 'admin')],
  ['GET /api/orders/:id/mail', () => `/api/orders/${order.id}/mail`, only(200, 'admin', 'sales')],
  ['GET /api/portal/home', () => '/api/portal/home', only(200, 'builder')],
];

describe('role matrix: the remaining route groups', () => {
  for (const [route, path, byRole] of routes) {
    for (const role of ROLES) {
      it(`${role} → ${route} → ${byRole[role]}`, async () => {
        const s = await signedIn(app, users[role].email);
        const res = await s.get(path());
        expect(res.status, JSON.stringify(res.body)).toBe(byRole[role]);
        if (res.status === 403) expect(res.body.error.code).toBe('forbidden');
      });
    }
  }
});
