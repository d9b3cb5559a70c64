import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../../support/db';
import { createCustomer, createJob, createPlant, createUser } from '../../../support/factories';
import { agentFor, signedIn } from '../../../support/session';
import type { Role } from '../../../../shared/api/roles';
import type { Job, User } from '../../../../server/models';
import { pngBytes, upload, useTempUploadDir } from './fixtures';

useTempUploadDir();
const app = testApp();
const ROLES: Role[] = ['admin', 'sales', 'engineer', 'foreman', 'builder'];
type S = Awaited<ReturnType<typeof signedIn>>;

// Ours: the builder's company. Other: another company of the same plant. Theirs: another plant.
let ours: Job;
let other: Job;
let theirs: Job;
const users = {} as Record<Role, User>;
let desk: S; // sales of our plant: uploads the files the other roles act on
let theirDesk: S;

const uploadBy = async (s: S, job: Job) =>
  (await upload(s, job.id, pngBytes(), 'plan.png').expect(201)).body.id as number;

beforeAll(async () => {
  const plant = await createPlant();
  const customer = await createCustomer({ plant });
  ours = await createJob({ customer });
  other = await createJob({ plant });
  theirs = await createJob();
  for (const role of ROLES) users[role] = await createUser({ role, plant, customer });
  desk = await signedIn(app, users.sales.email);
  const theirSales = await createUser({ role: 'sales', plant: { id: theirs.plantId } as never });
  theirDesk = await signedIn(app, theirSales.email);
});

type Call = (s: S, job: Job, fileId: number) => request.Test;
const calls: Record<string, Call> = {
  'GET /api/jobs/:id/files': (s, job) => s.get(`/api/jobs/${job.id}/files`),
  'POST /api/jobs/:id/files': (s, job) => upload(s, job.id, pngBytes(), 'p.png'),
  'GET /api/files/:id': (s, _job, id) => s.get(`/api/files/${id}`),
  'DELETE /api/files/:id': (s, _job, id) => s.delete(`/api/files/${id}`),
};

// The desk and builders upload; a builder deletes only their own (below); reviewer and foreman read.
const expected: Record<string, Record<Role, number>> = {
  'GET /api/jobs/:id/files': { admin: 200, sales: 200, engineer: 200, foreman: 200, builder: 200 },
  'POST /api/jobs/:id/files': { admin: 201, sales: 201, engineer: 403, foreman: 403, builder: 201 },
  'GET /api/files/:id': { admin: 200, sales: 200, engineer: 200, foreman: 200, builder: 200 },
  'DELETE /api/files/:id': { admin: 204, sales: 204, engineer: 403, foreman: 403, builder: 403 },
};

describe('plan files role matrix', () => {
  for (const [route, byRole] of Object.entries(expected)) {
    for (const role of ROLES) {
      it(`${role} → ${route} (a file the desk uploaded) → ${byRole[role]}`, async () => {
        const fileId = await uploadBy(desk, ours);
        const s = await signedIn(app, users[role].email);
        const res = await calls[route](s, ours, fileId);
        expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(byRole[role]);
        if (res.status === 403) expect(res.body.error.code).toBe('forbidden');
      });
    }
  }

  it('a builder deletes their own upload, and the list says so', async () => {
    const s = await signedIn(app, users.builder.email);
    const own = await uploadBy(s, ours);
    const deskFile = await uploadBy(desk, ours);
    const list = await s.get(`/api/jobs/${ours.id}/files`).expect(200);
    const canDelete = new Map(
      (list.body as { id: number; canDelete: boolean }[]).map((f) => [f.id, f.canDelete]),
    );
    expect(canDelete.get(own)).toBe(true);
    expect(canDelete.get(deskFile)).toBe(false);
    await s.delete(`/api/files/${own}`).expect(204);
  });

  it("another plant's job or file answers 404 for every role", async () => {
    const fileId = await uploadBy(theirDesk, theirs);
    for (const role of ROLES) {
      const s = await signedIn(app, users[role].email);
      for (const [route, call] of Object.entries(calls)) {
        const res = await call(s, theirs, fileId);
        expect(res.status, `${role} ${route}: ${JSON.stringify(res.body)}`).toBe(404);
      }
    }
  });

  it("another company's job or file answers 404 to a builder (staff see it)", async () => {
    const fileId = await uploadBy(desk, other);
    const s = await signedIn(app, users.builder.email);
    for (const [route, call] of Object.entries(calls)) {
      const res = await call(s, other, fileId);
      expect(res.status, `${route}: ${JSON.stringify(res.body)}`).toBe(404);
    }
    const staff = await signedIn(app, users.foreman.email);
    await staff.get(`/api/files/${fileId}`).expect(200);
  });

  it('signed out, every route answers 401', async () => {
    const fileId = await uploadBy(desk, ours);
    expect((await request(app).get(`/api/jobs/${ours.id}/files`)).status).toBe(401);
    expect((await request(app).get(`/api/files/${fileId}`)).status).toBe(401);
    // Writes need the session's CSRF token first; with it and no sign-in they answer 401.
    const anon = await agentFor(app);
    expect((await upload(anon, ours.id, pngBytes(), 'p.png')).status).toBe(401);
    expect((await anon.delete(`/api/files/${fileId}`)).status).toBe(401);
  });

  it('a junk id answers 404, not 500', async () => {
    await desk.get('/api/files/abc').expect(404);
    await desk.get('/api/jobs/0/files').expect(404);
  });
});
