import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type request from 'supertest';

/** A price book for tests: round numbers so the hand arithmetic stays readable (invented). */
export const TEST_BOOK = {
  currency: 'USD',
  lumber: { defaultPerBoardFoot: 1, byLumber: {} },
  plates: { defaultPerSquareInch: 0.02, byPlate: {} },
  labour: { perTruss: 10, perPiece: 1, perJoint: 2, ratePerHour: 60 },
  deliveryCharge: 150,
  margin: 0.2,
  taxRate: 0.05,
  depositRate: 0.4,
  quoteValidityDays: 30,
  terms: 'Balance due on delivery.',
};

/** supertest: collect a binary body (PDF) into a Buffer. */
export const binary = (res: request.Response, done: (e: Error | null, b: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};

/** Fails when poppler's pdftotext is missing: the PDF checks never pass by being skipped. */
export function requirePdftotext() {
  if (spawnSync('pdftotext', ['-v']).error !== undefined)
    throw new Error(
      'pdftotext is missing: apt-get install -y poppler-utils (npm test installs it as root)',
    );
}

/** The text of a PDF by poppler's pdftotext (layout kept, so table rows stay on one line). */
export function pdfText(pdf: Buffer) {
  const dir = mkdtempSync(join(tmpdir(), 'quote-pdf-'));
  const file = join(dir, 'quote.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
}
