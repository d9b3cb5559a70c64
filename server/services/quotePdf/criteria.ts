import type { QuoteSnapshot } from '../pricing';
import { pdfTable } from '../shopPaper/pdfTable';
import { contentBottom, paragraph, paragraphHeight, rule, textAt } from './text';
import { COLORS, MARGIN, type Doc } from './theme';

const contentWidth = (doc: Doc) => doc.page.width - 2 * MARGIN.side;

/**
 * Each truss's design loads, spacing, overhangs and heel in one table, with the request to
 * confirm them: the plant designs for these loads, and only the building designer knows the
 * building's. Quotes made before the criteria were kept print nothing here.
 */
export function designCriteria(doc: Doc, s: QuoteSnapshot, y: number, newPage: () => number) {
  const rows = s.designs.flatMap((d) => {
    const c = d.criteria;
    if (!c) return [];
    const load = (label: string) => c.loads.find((r) => r[0] === label)?.[1] ?? '—';
    return [
      [d.mark, load('TCLL'), load('TCDL'), load('BCLL'), load('BCDL'), c.snow, c.wind].concat([
        c.spacing,
        c.overhangs,
        c.heel,
      ]),
    ];
  });
  if (rows.length === 0) return y;
  const w = contentWidth(doc);
  const intro =
    'The trusses are designed for the loads below. Confirm them with the building designer before accepting: other loads need a new design and a new quote.';
  let at = y + 60 > contentBottom(doc) ? newPage() : y;
  textAt(doc, 'Design loads and criteria', MARGIN.side, at, { font: 'bold', size: 11 });
  at = paragraph(doc, intro, MARGIN.side, at + 15, w) + 6;
  const fixed = 38 + 4 * 40 + 58 + 96 + 44;
  const rest = (w - fixed) / 2;
  at = pdfTable(
    doc,
    MARGIN.side,
    at,
    [
      { title: 'Mark', width: 38 },
      { title: 'TCLL', width: 40, align: 'right' },
      { title: 'TCDL', width: 40, align: 'right' },
      { title: 'BCLL', width: 40, align: 'right' },
      { title: 'BCDL', width: 40, align: 'right' },
      { title: 'Snow', width: rest },
      { title: 'Wind', width: rest },
      { title: 'Spacing', width: 58 },
      { title: 'Overhangs', width: 96 },
      { title: 'Heel', width: 44 },
    ],
    rows,
    contentBottom(doc),
    newPage,
    7.5,
  );
  // Snow and wind in full, once per distinct wording (most orders share one job's loads).
  const details = new Set(
    s.designs.flatMap((d) =>
      (d.criteria?.loads ?? [])
        .filter(([label, value]) => (label === 'Snow' || label === 'Wind') && value !== 'None')
        .map(([label, value]) => `${label}: ${value}.`),
    ),
  );
  for (const line of details) at = paragraph(doc, line, MARGIN.side, at, w, { size: 7.5 }) + 1;
  return at + 16;
}

/**
 * What accepting means, and lines to sign: the builder accepts here or in the portal. Kept
 * together on one page.
 */
export function acceptance(
  doc: Doc,
  s: QuoteSnapshot,
  reference: string,
  y: number,
  newPage: () => number,
) {
  const w = contentWidth(doc);
  const text =
    `Signing accepts quote ${reference}: the trusses, quantities and prices above, the design loads and criteria as stated, and the terms. ` +
    'It confirms that the loads were checked with the building designer, and authorises the plant to fabricate once the designs are approved' +
    (s.price.depositRate > 0 ? ' and the deposit is received.' : '.') +
    ' Changes after acceptance need a new revision. The quote can also be accepted online in the builder portal.';
  const need = 34 + paragraphHeight(doc, text, w) + 56;
  let at = y + need > contentBottom(doc) ? newPage() : y;
  rule(doc, at, COLORS.text);
  textAt(doc, 'Acceptance', MARGIN.side, at + 10, { font: 'bold', size: 11 });
  at = paragraph(doc, text, MARGIN.side, at + 26, w) + 34;
  const labels = ['Signature', 'Printed name', 'Date'];
  const gap = 18;
  const colW = [(w - 2 * gap) * 0.42, (w - 2 * gap) * 0.38, (w - 2 * gap) * 0.2];
  let x = MARGIN.side;
  labels.forEach((label, i) => {
    doc
      .moveTo(x, at)
      .lineTo(x + colW[i], at)
      .lineWidth(0.6)
      .strokeColor(COLORS.text)
      .stroke();
    textAt(doc, label, x, at + 4, { size: 7.5, color: COLORS.muted });
    x += colW[i] + gap;
  });
  textAt(doc, `For ${s.customer.name}`, MARGIN.side, at + 18, { size: 7.5, color: COLORS.faint });
  return at + 34;
}
