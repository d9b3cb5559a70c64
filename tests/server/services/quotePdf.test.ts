import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { computeDesign } from '../../../server/services/design';
import {
  DEMO_PRICE_BOOK,
  priceQuote,
  summarizeDesign,
  type QuoteSnapshot,
} from '../../../server/services/pricing';
import { renderQuotePdf } from '../../../server/services/quotePdf';
import { DESIGN_CAUTIONS } from '../../../shared/engine/design';
import { FINK_24 } from '../../support/factories';
import { requirePdftotext, pdfText } from '../routes/quotes/helpers';
import { keep } from '../routes/shopPaper/helpers';

/** A snapshot of `n` FINK_24 lines (invented demo names and prices). */
function snapshot(n: number, units: 'imperial' | 'metric'): QuoteSnapshot {
  const design = computeDesign(FINK_24);
  const lines = Array.from({ length: n }, (_, i) => ({
    mark: `T${i + 1}`,
    description: design.description,
    quantity: 2,
    plies: 1,
    design: design.result,
  }));
  return {
    currency: 'USD',
    units,
    plant: { name: 'Demo Truss Plant', address: '1 Mill Road, Demo Town' },
    customer: { id: 1, name: 'Demo Builder', email: 'demo@builders.test', terms: 'deposit' },
    job: { id: 1, name: 'Demo job', address: '2 Site Street' },
    order: { id: 1, number: '2026-0099' },
    price: priceQuote(lines, DEMO_PRICE_BOOK, 'deposit'),
    designs: lines.map((l) =>
      summarizeDesign({
        ...l,
        maxCsi: design.maxCsi,
        reviewState: 'pending',
        engineVersion: design.engineVersion,
        designInput: design.input as unknown as Record<string, unknown>,
      }),
    ),
    terms: DEMO_PRICE_BOOK.terms,
    cautions: [...DESIGN_CAUTIONS],
    demoPrices: true,
  };
}

const render = (s: QuoteSnapshot) =>
  renderQuotePdf({
    reference: '2026-0099-Q1',
    validUntil: '2026-12-31',
    createdAt: new Date('2026-12-01T12:00:00Z'),
    snapshot: s as unknown as Record<string, unknown>,
  });

const poppler = (bin: string, pdf: Buffer, args: string[] = []) => {
  const file = join(mkdtempSync(join(tmpdir(), 'quote-')), 'q.pdf');
  writeFileSync(file, pdf);
  return spawnSync(bin, [...args, file], { encoding: 'utf8' }).stdout;
};

describe('the quote PDF', () => {
  it('runs a long quote over pages with the table header, totals and page numbers', async () => {
    const s = snapshot(40, 'imperial');
    const pdf = await render(s);
    requirePdftotext();
    const text = pdfText(pdf);
    const pages = text.split('\f').filter((p) => p.trim());
    expect(pages.length).toBeGreaterThan(2);
    pages.forEach((p, i) => expect(p).toContain(`Page ${i + 1} of ${pages.length}`));
    expect(text.match(/LINE TOTAL/g)!.length).toBeGreaterThanOrEqual(2); // header repeated
    for (let i = 1; i <= 40; i++) expect(text).toMatch(new RegExp(`\\bT${i}\\s+Fink`));
    expect(text).toContain(
      '$' + s.price.total.toLocaleString('en-US', { minimumFractionDigits: 2 }),
    );
    expect(text).toContain('Truss drawings');
    expect(text).toContain(`Span 24'-0"`);
  });

  it('is US Letter for imperial plants and A4 for metric, with only Inter embedded', async () => {
    requirePdftotext();
    // pdfinfo reports points: Letter 612 × 792, A4 595.28 × 841.89 (ISO 216, common practice).
    const letter = poppler('pdfinfo', await render(snapshot(2, 'imperial')));
    expect(letter).toMatch(/Page size:\s+612 x 792/);
    const a4 = poppler('pdfinfo', await render(snapshot(2, 'metric')));
    expect(a4).toMatch(/Page size:\s+595\.28 x 841\.89/);
    const fonts = poppler('pdffonts', await render(snapshot(2, 'imperial')));
    const names = fonts.split('\n').slice(2).filter(Boolean);
    expect(names.length).toBeGreaterThan(0);
    for (const row of names) expect(row).toMatch(/Inter/);
  });

  it('states each truss design loads, spacing, overhangs and heel, the plant contacts and an acceptance block', async () => {
    requirePdftotext();
    const s = snapshot(2, 'imperial');
    s.plant = { ...s.plant, phone: '(555) 010-0100', email: 'desk@plant.test' };
    const mono = computeDesign({
      ...FINK_24,
      profile: 'mono',
      span: 168,
      overhang: 18,
      loads: { ...FINK_24.loads, windUplift: 12, snow: { pg: 30 } },
    });
    s.designs.push(
      summarizeDesign({
        mark: 'M1',
        description: mono.description,
        maxCsi: mono.maxCsi,
        reviewState: 'approved',
        engineVersion: mono.engineVersion,
        designInput: mono.input as unknown as Record<string, unknown>,
        design: mono.result,
      }),
    );
    const pdf = await render(s);
    const text = pdfText(pdf);
    expect(text).toContain('(555) 010-0100');
    expect(text).toContain('desk@plant.test');
    expect(text).toContain('Design loads and criteria');
    expect(text).toContain('Confirm them with the building designer before accepting');
    // FINK_24: 20/10/0/10 psf at 24 in. o.c., 1 ft overhangs both ends, pointed (0) heel.
    expect(text).toMatch(
      /T1\s+20 psf\s+10 psf\s+0 psf\s+10 psf\s+None\s+None\s+24 in\. o\.c\.\s+1'-0" each end\s+0'-0"/,
    );
    // The mono: snow and net uplift, overhang at the low end only.
    expect(text).toMatch(
      /M1\s+20 psf\s+10 psf\s+0 psf\s+10 psf\s+pg 30 psf\s+uplift 12 psf\s+24 in\. o\.c\.\s+1'-6" left, none right/,
    );
    expect(text).toMatch(/Snow: Ground snow pg 30 psf/);
    expect(text).toMatch(/1'-0" overhang/);
    expect(text).toMatch(/1'-6" overhang/);
    expect(text).toContain('Acceptance');
    expect(text).toMatch(/Signing accepts quote 2026-0099-Q1/);
    expect(text).toMatch(/Signature\s+Printed name\s+Date/);
    keep('quote-criteria.pdf', pdf);
  });
});
