import type { ShopDrawing } from '../../../shared/api/shopPaper';
import { paragraph, paragraphHeight, textAt } from '../quotePdf/text';
import { COLORS, type Doc } from '../quotePdf/theme';
import { pageFooters, shopPage, shopPdf } from '../shopPaper/pdf';
import { cautionsBox, pdfTable } from '../shopPaper/pdfTable';
import { drawGeometry } from './drawing';

const M = 32;

/** One sheet: title block, the truss drawing, piece and plate lists, bracing and cautions. */
function sheet(doc: Doc, s: ShopDrawing) {
  const { w, bottom, newPage } = shopPage(doc, M, 8);
  textAt(doc, s.mark, M, M - 4, { font: 'bold', size: 22 });
  doc.font('bold').fontSize(22);
  const mw = doc.widthOfString(s.mark) + 12;
  textAt(
    doc,
    `${s.description} · ${s.quantity} truss${s.quantity === 1 ? '' : 'es'} · ${s.plies} ${s.plies === 1 ? 'ply' : 'plies'}`,
    M + mw,
    M + 1,
    { font: 'medium', size: 10.5 },
  );
  textAt(
    doc,
    `Span ${s.span} · Pitch ${s.pitch} · Rise ${s.rise} · Heel ${s.heelHeight}`,
    M + mw,
    M + 15,
    { size: 8.5, color: COLORS.muted },
  );
  textAt(doc, `Shop drawing · Order ${s.order.number}`, M, M - 2, {
    font: 'bold',
    size: 10,
    width: w,
    align: 'right',
  });
  textAt(doc, `${s.order.job.name} · ${s.order.builder.name}`, M, M + 12, {
    size: 8.5,
    color: COLORS.muted,
    width: w,
    align: 'right',
  });

  const braces = s.bracing.map((b) => b.replace(/\.$/, ''));
  const notes = [
    braces.length ? `Bracing: ${braces.join('; ')}.` : 'No web bracing required by the design.',
    `Dimensions to panel points, centre lines, feet-inches-sixteenths; piece lengths long point as cut. Engine ${s.engineVersion}.`,
    s.demoPlates ? 'Demo plate catalog: its design values are invented.' : '',
    ...(s.plyFastening ?? []).map((t) => `Ply fastening: ${t}`),
  ].filter(Boolean);
  const text = notes.join('  ');
  // Long bracing and ply-fastening notes take room from the drawing, so the sheet stays one page.
  const extra = Math.max(0, paragraphHeight(doc, text, w, { size: 7.5 }) - 22);
  const drawH = (doc.page.height - 2 * M) * 0.42 - extra;
  doc
    .rect(M, M + 32, w, drawH)
    .lineWidth(0.5)
    .strokeColor(COLORS.rule)
    .stroke();
  drawGeometry(doc, s.geometry, { x: M + 12, y: M + 40, w: w - 24, h: drawH - 16 });

  const y0 = M + 32 + drawH + 10;
  const left = w * 0.42;
  const yPieces = pdfTable(
    doc,
    M,
    y0,
    [
      { title: 'Piece', width: 40 },
      { title: 'Lumber', width: left - 40 - 80 - 36 },
      { title: 'Length', width: 80, align: 'right' },
      { title: 'Qty', width: 36, align: 'right' },
    ],
    s.pieces.map((p) => [p.mark, p.lumber, p.length, String(p.count)]),
    bottom,
    newPage,
    7.5,
  );
  const x2 = M + left + 14;
  const yPlates = pdfTable(
    doc,
    x2,
    y0,
    [
      { title: 'Joint', width: 32 },
      { title: 'Plate', width: 54 },
      { title: 'Ga.', width: 24, align: 'right' },
      { title: 'Faces', width: 32, align: 'right' },
      { title: 'Axis', width: 36, align: 'right' },
      { title: 'Position', width: w - left - 14 - 178 },
    ],
    s.plates.map((p) => [
      p.joint,
      p.plate,
      String(p.gauge),
      String(p.faces),
      p.angleDeg === null ? '—' : `${p.angleDeg.toFixed(1)}°`,
      p.position,
    ]),
    bottom,
    newPage,
    7.5,
  );
  // Cautions under the plate list, beside the (usually longer) piece list.
  const yCautions = cautionsBox(doc, s.cautions, x2, yPlates, w - left - 14, bottom, newPage, true);
  const y = doc.bufferedPageRange().count > 1 ? yCautions : Math.max(yPieces, yCautions);
  paragraph(doc, text, M, y, w, { size: 7.5 });
}

/** Shop drawings as a PDF: one US Letter landscape sheet per truss mark. */
export function renderShopDrawingsPdf(sheets: ShopDrawing[]): Promise<Buffer> {
  const first = sheets[0];
  const { doc, done } = shopPdf({
    size: 'LETTER',
    layout: 'landscape',
    margin: M,
    title: `Shop drawings ${first.order.number}`,
    author: first.order.plant,
  });
  sheets.forEach((s, i) => {
    if (i > 0) doc.addPage();
    sheet(doc, s);
  });
  pageFooters(doc, `${first.order.plant} · Shop drawings · Order ${first.order.number}`, M);
  doc.end();
  return done;
}
