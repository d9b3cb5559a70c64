import type { DeliveryTicket } from '../../../shared/api/shopPaper';
import { paragraph, textAt } from '../quotePdf/text';
import { COLORS, type Doc } from '../quotePdf/theme';
import { pageFooters, shopPage, shopPdf } from '../shopPaper/pdf';
import { cautionsBox, pdfTable } from '../shopPaper/pdfTable';

const M = 44;

/** A labelled block of text (site, builder); returns the y below it. */
function block(doc: Doc, label: string, lines: string[], x: number, y: number, w: number) {
  textAt(doc, label, x, y, { font: 'medium', size: 8, color: COLORS.muted });
  return paragraph(doc, lines.join('\n'), x, y + 12, w, { size: 10, color: COLORS.text });
}

/** Received by / date lines at the foot of the ticket. */
function signatures(doc: Doc, y: number, w: number) {
  const col = (w - 24) / 3;
  const labels = ['Received by (print name)', 'Signature', 'Date and time'];
  labels.forEach((label, i) => {
    const x = M + i * (col + 12);
    doc
      .moveTo(x, y + 28)
      .lineTo(x + col, y + 28)
      .lineWidth(0.8)
      .strokeColor(COLORS.text)
      .stroke();
    textAt(doc, label, x, y + 33, { size: 8, color: COLORS.muted });
  });
  return y + 50;
}

/**
 * The delivery ticket on US Letter: order, job site and builder; bundles with marks and counts;
 * totals; what the driver and the receiver sign; the cautions.
 */
export function renderDeliveryTicketPdf(t: DeliveryTicket): Promise<Buffer> {
  const { doc, done } = shopPdf({
    size: 'LETTER',
    margin: M,
    title: `Delivery ticket ${t.order.number}`,
    author: t.order.plant,
  });
  const { w, bottom, newPage } = shopPage(doc, M, 10);
  textAt(doc, 'Delivery ticket', M, M, { font: 'bold', size: 18 });
  textAt(doc, `Order ${t.order.number}`, M, M + 3, {
    font: 'bold',
    size: 12,
    width: w,
    align: 'right',
  });
  textAt(doc, t.order.plant, M, M + 26, { size: 9.5, color: COLORS.muted });
  const half = (w - 24) / 2;
  const y1 = block(
    doc,
    'Deliver to (job site)',
    [t.order.job.name, t.order.job.address],
    M,
    M + 50,
    half,
  );
  const y2 = block(doc, 'Builder', [t.order.builder.name], M + half + 24, M + 50, half);
  let y = Math.max(y1, y2) + 14;

  textAt(doc, `Bundles — ${t.bundles.length}`, M, y, { font: 'bold', size: 11 });
  y = pdfTable(
    doc,
    M,
    y + 16,
    [
      { title: 'Bundle', width: 50, align: 'right' },
      { title: 'Mark', width: 50 },
      { title: 'Truss', width: w - 360 },
      { title: 'Trusses', width: 90 },
      { title: 'Count', width: 50, align: 'right' },
      { title: 'Weight', width: 70, align: 'right' },
      { title: 'Loaded', width: 50 },
    ],
    t.bundles.map((b) => [
      String(b.number),
      b.mark,
      b.description,
      b.trusses,
      String(b.count),
      b.weight.text,
      '',
    ]),
    bottom,
    newPage,
    9,
  );
  textAt(doc, `Marks and counts`, M, y + 4, { font: 'bold', size: 11 });
  y = pdfTable(
    doc,
    M,
    y + 20,
    [
      { title: 'Mark', width: 60 },
      { title: 'Truss', width: w - 140 },
      { title: 'Count', width: 80, align: 'right' },
    ],
    [
      ...t.marks.map((m) => [m.mark, m.description, String(m.count)]),
      ['', `Total (${t.totalWeight.text})`, String(t.totalTrusses)],
    ],
    bottom,
    newPage,
    9,
  );
  y = paragraph(doc, t.bundleRule, M, y, w, { size: 8 }) + 8;
  y = cautionsBox(doc, t.cautions, M, y, w, bottom, newPage);
  if (y + 80 > bottom) y = newPage();
  textAt(doc, 'Received in good order (count checked against this ticket)', M, y + 6, {
    font: 'bold',
    size: 10,
  });
  signatures(doc, y + 16, w);
  pageFooters(doc, `${t.order.plant} · Delivery ticket · Order ${t.order.number}`, M);
  doc.end();
  return done;
}
