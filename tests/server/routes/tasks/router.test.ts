import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
} from '../../../support/factories';
import { signedIn } from '../../../support/session';
import type { Role } from '../../../../shared/api/roles';
import { tasksSchema } from '../../../../shared/api/tasks';
import { Order, StoredFile, type Job, type Plant, type User } from '../../../../server/models';

const app = testApp();
const STAFF: Role[] = ['admin', 'sales', 'engineer', 'foreman'];
const users = {} as Record<Role, User>;
let plant: Plant;
let job: Job;
let marks: Record<string, number>;

const plan = (j: Job, uploadedBy: number | null, name: string) =>
  StoredFile.create({
    plantId: j.plantId,
    customerId: j.customerId,
    jobId: j.id,
    originalName: name,
    storedName: `${randomUUID()}.pdf`,
    contentType: 'application/pdf',
    size: 1234,
    uploadedBy,
  });

beforeAll(async () => {
  plant = await createPlant();
  const customer = await createCustomer({ plant, name: 'Tasks Builder Co' });
  for (const role of STAFF) users[role] = await createUser({ role, plant });
  users.builder = await createUser({ role: 'builder', plant, customer });
  job = await createJob({ customer, name: 'Tasks job' });
  const order = await createOrder({ job });
  const waiting = await createLine({ order, mark: 'W1' });
  const back = await createLine({ order, mark: 'B1', reviewState: 'returned' });
  await back.update({ reviewComment: 'Use 2x6 top chords', reviewedAt: new Date() });
  const stale = await createLine({ order, mark: 'S1', reviewState: 'approved' });
  await stale.update({ loadsOutOfDate: true, outOfDateReason: 'TCLL 20 → 30 psf' });
  marks = { W1: waiting.id, B1: back.id, S1: stale.id };
  const released = await createOrder({ job });
  await createLine({ order: released, mark: 'R1', reviewState: 'approved' });
  await released.update({ status: 'released' });
  // A cancelled order's lines wait for nobody.
  const cancelled = await createOrder({ job });
  await createLine({ order: cancelled, mark: 'X1', reviewState: 'returned' });
  await cancelled.update({ status: 'cancelled' });
  await plan(job, users.builder.id, 'roof-plan-rev-b.pdf');
  await plan(job, users.sales.id, 'sales-own-upload.pdf');

  // Another plant's work never shows.
  const theirs = await createLine({ reviewState: 'returned' });
  const theirOrder = await Order.findByPk(theirs.orderId, { include: ['job'] });
  await plan(theirOrder!.job!, null, 'other-plant.pdf');
  await theirOrder!.update({ status: 'released' });
});

const tasksOf = async (role: Role) => {
  const s = await signedIn(app, users[role].email);
  const res = await s.get('/api/tasks').expect(200);
  return tasksSchema.parse(res.body);
};

describe('GET /api/tasks', () => {
  it('sales: lines sent back, lines out of date and new plans (not their own upload)', async () => {
    const t = await tasksOf('sales');
    expect(Object.keys(t).sort()).toEqual(['newPlans', 'outOfDate', 'sentBack']);
    expect(t.sentBack!.items.map((i) => i.mark)).toEqual(['B1']);
    expect(t.sentBack!.items[0]).toMatchObject({
      lineId: marks.B1,
      note: 'Use 2x6 top chords',
      job: { name: 'Tasks job' },
      customer: { name: 'Tasks Builder Co' },
    });
    expect(t.outOfDate!.items.map((i) => [i.mark, i.note])).toEqual([['S1', 'TCLL 20 → 30 psf']]);
    expect(t.newPlans!.items.map((i) => i.name)).toEqual(['roof-plan-rev-b.pdf']);
    expect(t.newPlans!.items[0]!.uploadedBy).toBe(users.builder.name);
  });

  it('design reviewer: designs waiting for review and new plans', async () => {
    const t = await tasksOf('engineer');
    expect(Object.keys(t).sort()).toEqual(['newPlans', 'waitingReview']);
    expect(t.waitingReview!.items.map((i) => i.mark)).toEqual(['W1']);
    expect(t.waitingReview!.total).toBe(1);
    expect(t.newPlans!.items.map((i) => i.name).sort()).toEqual([
      'roof-plan-rev-b.pdf',
      'sales-own-upload.pdf',
    ]);
  });

  it('foreman: orders released to the shop', async () => {
    const t = await tasksOf('foreman');
    expect(Object.keys(t)).toEqual(['releasedToShop']);
    expect(t.releasedToShop!.items).toHaveLength(1);
    expect(t.releasedToShop!.items[0]).toMatchObject({ status: 'released', job: { id: job.id } });
  });

  it('plant manager: every list, scoped to the plant', async () => {
    const t = await tasksOf('admin');
    expect(Object.keys(t).sort()).toEqual([
      'newPlans',
      'outOfDate',
      'releasedToShop',
      'sentBack',
      'waitingReview',
    ]);
    expect(t.sentBack!.total).toBe(1);
    expect(t.releasedToShop!.total).toBe(1);
    expect(t.newPlans!.items.map((i) => i.name)).not.toContain('other-plant.pdf');
  });

  it('a builder is refused (their home is the portal); signed out is 401', async () => {
    const s = await signedIn(app, users.builder.email);
    await s.get('/api/tasks').expect(403);
    const { default: request } = await import('supertest');
    await request(app).get('/api/tasks').expect(401);
  });
});
