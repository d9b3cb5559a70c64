import type { QuoteSnapshot } from '../pricing';
import { TERMS, depositDueLabel, formatTermsDate } from '../../../shared/api/terms';
import { formatDate, formatMoney, formatNumber, formatPercent } from './format';
import { contentBottom, paragraph, paragraphHeight, rule, textAt } from './text';
import { COLORS, MARGIN, type Doc } from './theme';

/** What the printed quote shows besides its snapshot. */
export interface PrintMeta {
  reference: string;
  validUntil: string;
  createdAt: Date;
}

const contentWidth = (doc: Doc) => doc.page.width - 2 * MARGIN.side;

/** Plant on the left; the quote's reference and dates on the right. Returns the y below. */
export function header(doc: Doc, s: QuoteSnapshot, meta: PrintMeta) {
  const x = MARGIN.side;
  const w = contentWidth(doc);
  const y = MARGIN.top;
  textAt(doc, s.plant.name, x, y, { font: 'bold', size: 16, width: w * 0.55 });
  let left = y + 22;
  const contact = [s.plant.phone, s.plant.email].filter(Boolean).join('  ·  ');
  const lines = (s.plant.address ?? '').split(/\n|,\s*(?=[^,]*$)/).filter(Boolean);
  for (const line of [...lines, ...(contact ? [contact] : [])]) {
    textAt(doc, line.trim(), x, left, { size: 9, color: COLORS.muted, width: w * 0.55 });
    left += 12;
  }
  const right = { x: x + w * 0.55, width: w * 0.45, align: 'right' as const };
  textAt(doc, 'QUOTE', right.x, y + 1, { ...right, font: 'medium', size: 8, color: COLORS.accent });
  textAt(doc, meta.reference, right.x, y + 12, { ...right, font: 'bold', size: 15 });
  const dates: [string, string][] = [
    ['Date', formatDate(meta.createdAt)],
    [TERMS.validUntil, formatTermsDate(meta.validUntil)],
  ];
  let ry = y + 33;
  for (const [label, value] of dates) {
    textAt(doc, value, right.x, ry, { ...right, font: 'medium', size: 9 });
    doc.font('medium').fontSize(9);
    const vw = doc.widthOfString(value);
    textAt(doc, label, right.x, ry, {
      width: right.width - vw - 8,
      align: 'right',
      size: 9,
      color: COLORS.muted,
    });
    ry += 13;
  }
  const bottom = Math.max(left, ry) + 10;
  rule(doc, bottom, COLORS.text);
  return bottom + 16;
}

/** Builder, job site and order in three columns. Returns the y below. */
export function parties(doc: Doc, s: QuoteSnapshot, y: number) {
  const w = contentWidth(doc);
  const col = (w - 32) / 3;
  const terms =
    s.customer.terms === 'deposit'
      ? `${TERMS.deposit}: ${formatPercent(s.price.depositRate)} ${TERMS.onAcceptance}`
      : TERMS.account;
  const blocks: [string, string, string[]][] = [
    ['Prepared for', s.customer.name, [s.customer.email]],
    ['Job', s.job.name, [s.job.address]],
    ['Order', s.order.number, [terms]],
  ];
  let bottom = y;
  blocks.forEach(([label, title, lines], i) => {
    const x = MARGIN.side + i * (col + 16);
    textAt(doc, label.toUpperCase(), x, y, { font: 'medium', size: 7, color: COLORS.faint });
    textAt(doc, title, x, y + 11, { font: 'bold', size: 10, width: col });
    let ly = y + 26;
    for (const line of lines) {
      ly = paragraph(doc, line, x, ly, col, { size: 8.5 }) + 1;
    }
    bottom = Math.max(bottom, ly);
  });
  return bottom + 18;
}

/** Table columns: label, width (0 = the rest), alignment. */
const COLUMNS: { label: string; w: number; align: 'left' | 'right' }[] = [
  { label: 'Mark', w: 46, align: 'left' },
  { label: 'Description', w: 0, align: 'left' },
  { label: 'Qty', w: 36, align: 'right' },
  { label: 'Plies', w: 36, align: 'right' },
  { label: 'Bd ft each', w: 60, align: 'right' },
  { label: 'Unit price', w: 74, align: 'right' },
  { label: 'Line total', w: 84, align: 'right' },
];
const ROW = 19;
const PAD = 6;

function columnXs(doc: Doc) {
  const fixed = COLUMNS.reduce((s, c) => s + c.w, 0);
  let x = MARGIN.side;
  return COLUMNS.map((c) => {
    const w = c.w || contentWidth(doc) - fixed;
    const col = { x, w };
    x += w;
    return col;
  });
}

function tableHead(doc: Doc, y: number) {
  const cols = columnXs(doc);
  doc.rect(MARGIN.side, y, contentWidth(doc), ROW).fill(COLORS.band);
  COLUMNS.forEach((c, i) =>
    textAt(doc, c.label.toUpperCase(), cols[i].x + PAD, y + 6.5, {
      font: 'medium',
      size: 7,
      color: COLORS.muted,
      width: cols[i].w - 2 * PAD,
      align: c.align,
    }),
  );
  return y + ROW;
}

/** The priced lines; continues on a new page (header repeated) when it runs out of room. */
export function linesTable(doc: Doc, s: QuoteSnapshot, y: number, newPage: () => number) {
  const cols = columnXs(doc);
  const money = (v: number) => formatMoney(v, s.currency);
  let at = tableHead(doc, y);
  for (const l of s.price.lines) {
    if (at + ROW > contentBottom(doc)) at = tableHead(doc, newPage());
    const cells = [
      l.mark,
      l.description,
      String(l.quantity),
      String(l.plies),
      formatNumber(l.boardFeet, 1, true),
      money(l.unitPrice),
      money(l.lineTotal),
    ];
    cells.forEach((v, i) =>
      textAt(doc, v, cols[i].x + PAD, at + 5.5, {
        font: i === 0 || i === 6 ? 'medium' : 'regular',
        size: 9,
        width: cols[i].w - 2 * PAD,
        align: COLUMNS[i].align,
        tabular: COLUMNS[i].align === 'right',
      }),
    );
    at += ROW;
    rule(doc, at, COLORS.rule);
  }
  return at + 14;
}

/** Subtotal, delivery, tax, total and deposit, right-aligned under the table. */
export function totals(doc: Doc, s: QuoteSnapshot, y: number) {
  const w = 230;
  const x = doc.page.width - MARGIN.side - w;
  const money = (v: number) => formatMoney(v, s.currency);
  const row = (label: string, value: string, at: number, strong = false) => {
    const style = strong ? { font: 'bold' as const, size: 11.5 } : { size: 9 };
    textAt(doc, label, x + PAD, at, { ...style, color: strong ? COLORS.text : COLORS.muted });
    textAt(doc, value, x, at, { ...style, width: w - PAD, align: 'right', tabular: true });
  };
  const p = s.price;
  row('Subtotal', money(p.subtotal), y);
  row('Delivery', money(p.delivery), y + 15);
  row(`Tax (${formatPercent(p.taxRate)})`, money(p.tax), y + 30);
  rule(doc, y + 46, COLORS.text, x, x + w);
  row('Total', money(p.total), y + 53, true);
  const depositLabel = depositDueLabel(p.depositRate, formatPercent);
  doc.rect(x, y + 73, w, 20).fill(COLORS.band);
  textAt(doc, depositLabel, x + PAD, y + 79, { font: 'medium', size: 9, color: COLORS.accent });
  textAt(doc, money(p.depositDue), x, y + 79, {
    font: 'bold',
    size: 9.5,
    color: COLORS.accent,
    width: w - PAD,
    align: 'right',
    tabular: true,
  });
  return y + 110;
}

/** Terms, a demo-price notice when it applies, and the cautions in a shaded box. */
export function notes(doc: Doc, s: QuoteSnapshot, y: number, newPage: () => number) {
  const x = MARGIN.side;
  const w = contentWidth(doc);
  const termsText = [
    s.terms || 'Prices hold until the date shown.',
    s.demoPrices
      ? 'These prices come from the plant’s demo price book (invented values), not a stored one.'
      : '',
  ]
    .filter(Boolean)
    .join(' ');
  const bulletW = w - 34;
  const cautionsH = s.cautions.reduce((h, c) => h + paragraphHeight(doc, c, bulletW) + 2, 0);
  const need = 14 + paragraphHeight(doc, termsText, w) + 40 + cautionsH;
  let at = y + need > contentBottom(doc) ? newPage() : y;
  textAt(doc, 'Terms', x, at, { font: 'bold', size: 9.5 });
  at = paragraph(doc, termsText, x, at + 14, w) + 14;
  const boxH = 30 + cautionsH;
  doc.rect(x, at, w, boxH).fill(COLORS.noteBg);
  doc.rect(x, at, 3, boxH).fill(COLORS.noteRule);
  textAt(doc, 'Before you build', x + 14, at + 9, { font: 'bold', size: 9.5 });
  let by = at + 24;
  for (const c of s.cautions) {
    // A hanging indent: wrapped lines start under the text, not under the bullet.
    textAt(doc, '•', x + 14, by, { size: 8.5 });
    by = paragraph(doc, c, x + 24, by, bulletW, { color: COLORS.text }) + 2;
  }
  return at + boxH + 22;
}
