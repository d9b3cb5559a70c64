import { beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { testApp } from '../../../support/db';
import { createCustomer, createJob, createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { AuditEvent, StoredFile, type Job } from '../../../../server/models';
import { MAX_UPLOAD_BYTES } from '../../../../shared/api/pricing';
import {
  binary,
  filesOnDisk,
  jpegBytes,
  pdfBytes,
  pngBytes,
  upload,
  useTempUploadDir,
} from './fixtures';

const dir = useTempUploadDir();
const app = testApp();
type S = Awaited<ReturnType<typeof signedIn>>;

let job: Job;
let sales: S;

beforeAll(async () => {
  const plant = await createPlant();
  const customer = await createCustomer({ plant });
  job = await createJob({ customer });
  sales = await signedIn(app, (await createUser({ role: 'sales', plant })).email);
});

const rowsOf = (jobId: number) => StoredFile.count({ where: { jobId } });

describe('POST /api/jobs/:id/files', () => {
  it('stores a PDF under a random name outside the web root and answers the stored file', async () => {
    const res = await upload(sales, job.id, pdfBytes(), 'Site plan rev B.pdf').expect(201);
    expect(res.body).toMatchObject({
      jobId: job.id,
      name: 'Site plan rev B.pdf',
      contentType: 'application/pdf',
      size: pdfBytes().length,
      canDelete: true,
    });
    expect(res.body.uploadedBy).toEqual(expect.any(String));
    expect(res.body).not.toHaveProperty('storedName');
    const row = await StoredFile.findByPk(res.body.id);
    expect(row!.storedName).toMatch(/^[0-9a-f-]{36}\.pdf$/);
    expect(readFileSync(join(dir, row!.storedName))).toEqual(pdfBytes());
    const events = await AuditEvent.findAll({
      where: { action: 'job.file_uploaded', subjectType: 'job', subjectId: job.id },
    });
    expect(events.map((e) => e.data.fileId)).toContain(row!.id);
  });

  it('accepts a JPEG too', async () => {
    const res = await upload(sales, job.id, jpegBytes(), 'photo.jpeg', 'image/jpeg').expect(201);
    expect(res.body.contentType).toBe('image/jpeg');
    const row = await StoredFile.findByPk(res.body.id);
    expect(row!.storedName).toMatch(/\.jpg$/);
  });

  it('sniffs the type from the bytes: a PNG named .pdf (and sent as PDF) is stored as PNG', async () => {
    const res = await upload(sales, job.id, pngBytes(), 'plan.pdf', 'application/pdf').expect(201);
    expect(res.body.contentType).toBe('image/png');
    expect(res.body.name).toBe('plan.pdf');
    const row = await StoredFile.findByPk(res.body.id);
    expect(row!.storedName).toMatch(/\.png$/);
    const got = await sales.get(`/api/files/${res.body.id}`).buffer(true).parse(binary).expect(200);
    expect(got.headers['content-type']).toBe('image/png');
    // The saved copy gets the real type's extension, so the desktop opens it with an image viewer.
    expect(got.headers['content-disposition']).toBe("attachment; filename*=UTF-8''plan.pdf.png");
  });

  it('refuses a text file named .pdf with 415 and stores nothing', async () => {
    const before = filesOnDisk(dir);
    const rows = await rowsOf(job.id);
    const res = await upload(
      sales,
      job.id,
      Buffer.from('not a plan\n'),
      'plan.pdf',
      'application/pdf',
    );
    expect(res.status).toBe(415);
    expect(res.body.error).toMatchObject({
      code: 'unsupported_type',
      message: 'Upload a PDF, PNG or JPEG plan',
    });
    expect(await rowsOf(job.id)).toBe(rows);
    expect(filesOnDisk(dir)).toEqual(before);
  });

  it('refuses 25 MB + 1 byte with 413 too_large, no row and no file left on disk', async () => {
    const before = filesOnDisk(dir);
    const rows = await rowsOf(job.id);
    const big = Buffer.alloc(MAX_UPLOAD_BYTES + 1);
    pngBytes().copy(big); // a real type, so only the size is wrong
    const res = await upload(sales, job.id, big, 'huge.png', 'image/png');
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_large');
    expect(res.body.error.message).toBe(
      'The plan is larger than 25 MB. Upload a file of at most 25 MB.',
    );
    expect(await rowsOf(job.id)).toBe(rows);
    expect(filesOnDisk(dir)).toEqual(before);
  });

  it('takes exactly 25 MB', async () => {
    const exact = Buffer.alloc(MAX_UPLOAD_BYTES);
    pdfBytes().copy(exact);
    const res = await upload(sales, job.id, exact, 'big.pdf').expect(201);
    expect(res.body.size).toBe(MAX_UPLOAD_BYTES);
    await sales.delete(`/api/files/${res.body.id}`).expect(204);
  });

  it('answers 400 without a file, and for a file in another field', async () => {
    const none = await sales.post(`/api/jobs/${job.id}/files`, {});
    expect(none.status).toBe(400);
    const wrong = await sales.agent
      .post(`/api/jobs/${job.id}/files`)
      .set('X-CSRF-Token', sales.token)
      .attach('plan', pngBytes(), 'p.png');
    expect(wrong.status).toBe(400);
    expect(filesOnDisk(join(dir, 'tmp'))).toEqual([]);
  });

  it('keeps a UTF-8 name, without the folders a client may send', async () => {
    const res = await upload(sales, job.id, pngBytes(), 'C:\\plans\\Dachstuhl Süd.png').expect(201);
    expect(res.body.name).toBe('Dachstuhl Süd.png');
    const got = await sales.get(`/api/files/${res.body.id}`).buffer(true).parse(binary).expect(200);
    // RFC 8187 percent-encoding of the UTF-8 bytes (ü = C3 BC).
    expect(got.headers['content-disposition']).toBe(
      "attachment; filename*=UTF-8''Dachstuhl%20S%C3%BCd.png",
    );
  });
});

describe('GET /api/files/:id and the list', () => {
  it('downloads the very bytes uploaded, as an attachment that must not be sniffed', async () => {
    const bytes = pdfBytes();
    const { body } = await upload(sales, job.id, bytes, 'truss layout.pdf').expect(201);
    const res = await sales.get(`/api/files/${body.id}`).buffer(true).parse(binary).expect(200);
    expect(Buffer.compare(res.body as Buffer, bytes)).toBe(0);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-disposition']).toBe(
      "attachment; filename*=UTF-8''truss%20layout.pdf",
    );
  });

  it('lists the job files newest first with who uploaded them', async () => {
    const { body } = await upload(sales, job.id, pngBytes(), 'newest.png').expect(201);
    const list = await sales.get(`/api/jobs/${job.id}/files`).expect(200);
    expect(list.body[0]).toMatchObject({
      id: body.id,
      name: 'newest.png',
      size: pngBytes().length,
    });
    expect(list.body.every((f: { jobId: number }) => f.jobId === job.id)).toBe(true);
  });
});

describe('DELETE /api/files/:id', () => {
  it('removes the row and the bytes on disk, with an audit event on the job', async () => {
    const { body } = await upload(sales, job.id, pngBytes(), 'gone.png').expect(201);
    const row = await StoredFile.findByPk(body.id);
    const path = join(dir, row!.storedName);
    expect(filesOnDisk(dir)).toContain(path);
    await sales.delete(`/api/files/${body.id}`).expect(204);
    expect(await StoredFile.findByPk(body.id)).toBeNull();
    expect(filesOnDisk(dir)).not.toContain(path);
    const events = await AuditEvent.findAll({
      where: { action: 'job.file_deleted', subjectType: 'job', subjectId: job.id },
    });
    expect(events.map((e) => e.data.fileId)).toContain(body.id);
    await sales.get(`/api/files/${body.id}`).expect(404);
  });
});
