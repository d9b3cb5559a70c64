import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type request from 'supertest';
import { createJob, createLine, createOrder, FINK_24 } from '../../../support/factories';
import type { Customer } from '../../../../server/models';

/** supertest: collect a binary body (PDF) into a Buffer. */
export const binary = (res: request.Response, done: (e: Error | null, b: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};

/** A 36 ft 6/12 double Fink girder request (common practice residential loads). */
export const GIRDER_36 = { ...FINK_24, profile: 'doubleFink', span: 432, pitch: 6 } as const;

/**
 * An order of the customer with every design approved: 3 × T1 (24 ft Fink, 1 ply) and
 * 2 × G1 (36 ft double Fink, 2 plies).
 */
export async function approvedOrder(customer: Customer) {
  const order = await createOrder({ job: await createJob({ customer }) });
  await createLine({ order, mark: 'T1', quantity: 3, reviewState: 'approved' });
  await createLine({
    order,
    mark: 'G1',
    quantity: 2,
    plies: 2,
    design: GIRDER_36,
    reviewState: 'approved',
  });
  return order;
}

const scratch = () => mkdtempSync(join(tmpdir(), 'shop-paper-'));

/** Poppler's pdftotext with the layout kept. */
export function pdfText(pdf: Buffer) {
  const file = join(scratch(), 'doc.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
}

/** Pages of a PDF in order: pdftotext's form feed separates them. */
export const pdfPages = (pdf: Buffer) => pdfText(pdf).split('\f').slice(0, -1);

/** Every page of a PDF as PNG bytes (poppler's pdftoppm at `dpi`), in page order. */
export function pdfPngs(pdf: Buffer, dpi = 150): Buffer[] {
  const dir = scratch();
  writeFileSync(join(dir, 'doc.pdf'), pdf);
  execFileSync('pdftoppm', ['-png', '-r', String(dpi), join(dir, 'doc.pdf'), join(dir, 'page')]);
  return readdirSync(dir)
    .filter((f) => f.endsWith('.png'))
    .sort()
    .map((f) => readFileSync(join(dir, f)));
}

/** Keep a printed document under test-results/shop-paper/ to look at. */
export function keep(name: string, bytes: Buffer) {
  const dir = join('test-results', 'shop-paper');
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, name), bytes);
}
