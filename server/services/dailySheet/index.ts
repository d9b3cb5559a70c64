import PDFDocument from 'pdfkit';
import { DESIGN_CAUTIONS } from '../../../shared/engine/design';
import type { FloorDay } from '../../../shared/api/production';
import { FONTS } from '../quotePdf/fonts';

/** Lumber of one line's design: "2x4 SPF-1/2 × 7" per size and grade. */
export type LumberByLine = Map<number, string[]>;

/**
 * The foreman's daily sheet: per table, the trusses to build that day (order, builder, mark,
 * trusses today of the line's quantity, description, lumber by size and grade), then the cautions.
 * Cut lists, plate picks and tags print from their own documents.
 */
export async function renderDailySheet(day: FloorDay, lumber: LumberByLine): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'LETTER', margin: 48, font: FONTS.regular });
  for (const [name, path] of Object.entries(FONTS)) doc.registerFont(name, path);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  doc.font('bold').fontSize(18).text(`Daily sheet · ${day.date}`);
  doc.moveDown(0.5);
  for (const table of day.tables) {
    doc.font('bold').fontSize(13).text(table.name);
    if (table.lines.length === 0) {
      doc.font('regular').fontSize(10).text('Nothing planned.');
    }
    for (const l of table.lines) {
      doc
        .font('medium')
        .fontSize(11)
        .text(
          `${l.mark} — build ${l.plannedToday} (of ${l.quantity})   ${l.orderNumber} · ${l.customer}`,
        );
      doc.font('regular').fontSize(9.5).text(l.description);
      const wood = lumber.get(l.lineId) ?? [];
      if (wood.length) doc.text(`Lumber: ${wood.join('; ')}`);
      doc.text(
        `Done so far: ${l.counts.cut} cut, ${l.counts.assembled} assembled, ${l.counts.banded} banded`,
      );
      doc.moveDown(0.4);
    }
    doc.moveDown(0.6);
  }
  doc.moveDown(0.5);
  doc.font('bold').fontSize(10).text('Cautions');
  doc.font('regular').fontSize(8.5);
  for (const c of DESIGN_CAUTIONS) doc.text(`• ${c}`);
  doc.end();
  return done;
}
