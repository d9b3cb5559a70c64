import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../../support/db';
import { createCustomer, createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import type { Role } from '../../../../shared/api/roles';
import { OrderLine, type Order, type User } from '../../../../server/models';
import { approvedOrder, binary } from './helpers';

const ROLES: Role[] = ['admin', 'sales', 'engineer', 'foreman', 'builder'];
const app = testApp();
const users = {} as Record<Role, User>;
let ours: Order; // the builder user's company, every design approved
let theirs: Order; // another plant's
let lineId: number;

beforeAll(async () => {
  const plant = await createPlant();
  const customer = await createCustomer({ plant });
  for (const role of ROLES) users[role] = await createUser({ role, plant, customer });
  ours = await approvedOrder(customer);
  theirs = await approvedOrder(await createCustomer({ plant: await createPlant() }));
  lineId = (await OrderLine.findOne({ where: { orderId: ours.id } }))!.id;
});

const paths = (o: Order, line = lineId) => {
  const base = `/api/orders/${o.id}/shop-paper`;
  return [
    base,
    `${base}/plates`,
    `${base}/plates.csv`,
    `${base}/plates.pdf`,
    `${base}/tags`,
    `${base}/tags.pdf?layout=sheet`,
    `${base}/tags.pdf?layout=label`,
    `${base}/delivery`,
    `${base}/delivery.pdf`,
    `${base}/drawings.pdf`,
    `${base}/lines/${line}`,
    `${base}/lines/${line}/pdf`,
  ];
};

const get = (s: Awaited<ReturnType<typeof signedIn>>, path: string) =>
  s.agent.get(path).buffer(true).parse(binary);
const errorCode = (res: request.Response) =>
  JSON.parse((res.body as Buffer).toString()).error.code as string;

describe('shop paper: who sees what', () => {
  for (const role of ROLES) {
    const allowed = ['admin', 'sales', 'foreman'].includes(role);
    it(`${role} → every shop paper route → ${allowed ? 200 : 403}`, async () => {
      const s = await signedIn(app, users[role].email);
      for (const path of paths(ours)) {
        const res = await get(s, path);
        expect(res.status, path).toBe(allowed ? 200 : 403);
        if (!allowed) expect(errorCode(res)).toBe('forbidden');
      }
    });
  }

  it("another plant's order answers 404 for every role", async () => {
    const theirLine = (await OrderLine.findOne({ where: { orderId: theirs.id } }))!.id;
    for (const role of ROLES) {
      const s = await signedIn(app, users[role].email);
      for (const path of paths(theirs, theirLine)) {
        const res = await get(s, path);
        expect(res.status, `${role} ${path}`).toBe(404);
      }
    }
  });

  it('signed out, every route answers 401', async () => {
    for (const path of paths(ours)) expect((await request(app).get(path)).status, path).toBe(401);
  });
});
