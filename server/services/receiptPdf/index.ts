import PDFDocument from 'pdfkit';
import type { QuoteSnapshot } from '../pricing';
import { FONTS } from '../quotePdf/fonts';
import { formatDate, formatMoney } from '../quotePdf/format';
import { paragraph, rule, textAt } from '../quotePdf/text';
import { COLORS, MARGIN } from '../quotePdf/theme';

/** What a receipt prints: the payment, the revision it pays towards, and what is still owed. */
export interface PrintableReceipt {
  receiptNumber: string;
  paidAt: Date;
  amountCents: number;
  currency: string;
  method: string;
  reference: string | null;
  kind: 'deposit' | 'offline' | 'refund';
  quote: { reference: string; total: number; snapshot: Record<string, unknown> };
  /** Everything received on the order so far, this payment included, in cents. */
  paidToDateCents: number;
}

const METHOD: Record<string, string> = {
  card: 'Card (online)',
  cheque: 'Cheque',
  transfer: 'Bank transfer',
  cash: 'Cash',
};

/**
 * A one-page receipt in the quote's type and colours: plant, builder, job, receipt number, amount,
 * method, the revision it pays towards and the balance left. Letter or A4 as the plant's units.
 */
export function renderReceiptPdf(r: PrintableReceipt): Promise<Buffer> {
  const s = r.quote.snapshot as unknown as QuoteSnapshot;
  const doc = new PDFDocument({
    size: s.units === 'imperial' ? 'LETTER' : 'A4',
    margins: { top: MARGIN.top, left: MARGIN.side, right: MARGIN.side, bottom: MARGIN.bottom },
    font: FONTS.regular,
    info: { Title: `Receipt ${r.receiptNumber}`, Author: s.plant.name, Subject: s.job.name },
  });
  for (const [name, path] of Object.entries(FONTS)) doc.registerFont(name, path);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const w = doc.page.width - 2 * MARGIN.side;
  const money = (cents: number) => formatMoney(cents / 100, r.currency);
  const x = MARGIN.side;
  let y = MARGIN.top;
  textAt(doc, s.plant.name, x, y, { font: 'bold', size: 14 });
  if (s.plant.address) textAt(doc, s.plant.address, x, y + 19, { size: 9, color: COLORS.muted });
  textAt(doc, r.kind === 'refund' ? 'Refund receipt' : 'Receipt', x, y, {
    font: 'bold',
    size: 18,
    color: COLORS.accent,
    width: w,
    align: 'right',
  });
  textAt(doc, r.receiptNumber, x, y + 24, { font: 'medium', size: 10, width: w, align: 'right' });
  y += 58;
  rule(doc, y);
  y += 16;
  const rows: [string, string][] = [
    ['Received from', s.customer.name],
    ['Job', `${s.job.name}, ${s.job.address}`],
    ['Order', s.order.number],
    ['Towards quote', r.quote.reference],
    ['Date', formatDate(r.paidAt)],
    ['Method', METHOD[r.method] ?? r.method],
    ...(r.reference ? ([['Reference', r.reference]] as [string, string][]) : []),
  ];
  for (const [k, v] of rows) {
    textAt(doc, k, x, y, { size: 9.5, color: COLORS.muted });
    textAt(doc, v, x + 130, y, { size: 9.5, width: w - 130 });
    y += 18;
  }
  y += 8;
  doc.rect(x, y, w, 44).fill(COLORS.band);
  textAt(doc, r.kind === 'refund' ? 'Amount refunded' : 'Amount received', x + 14, y + 15, {
    font: 'medium',
    size: 11,
  });
  textAt(doc, money(r.amountCents), x, y + 13, {
    font: 'bold',
    size: 15,
    width: w - 14,
    align: 'right',
    tabular: true,
  });
  y += 62;
  const totalCents = Math.round(r.quote.total * 100);
  for (const [k, v] of [
    ['Quote total (incl. delivery and tax)', money(totalCents)],
    ['Received to date', money(r.paidToDateCents)],
    ['Balance', money(totalCents - r.paidToDateCents)],
  ]) {
    textAt(doc, k, x, y, { size: 9.5 });
    textAt(doc, v, x, y, { size: 9.5, width: w, align: 'right', tabular: true });
    y += 17;
  }
  y += 14;
  rule(doc, y);
  y += 12;
  paragraph(doc, s.cautions.join(' '), x, y, w, { size: 7.5, color: COLORS.muted });
  doc.end();
  return done;
}
