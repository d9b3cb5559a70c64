import type { ShopDrawingGeometry } from '../../../shared/api/shopPaper';
import type { Doc } from '../quotePdf/theme';

/** A rectangle on the page, in points. */
export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

const INK = '#1f2328';
const WOOD = '#f1e4d3';
const PLATE = '#9aa3ad';
const DIM = '#4a5563';

/**
 * The truss of one sheet drawn to scale inside `box` (y up in the geometry, down on the page):
 * lumber outlines, plates over them, piece marks, joint letters and dimension chains. Returns the
 * page mapping, so a caller can add its own marks in the same place.
 */
export function drawGeometry(doc: Doc, g: ShopDrawingGeometry, box: Box) {
  const { minX, minY, maxX, maxY } = g.bounds;
  const scale = Math.min(box.w / (maxX - minX || 1), box.h / (maxY - minY || 1));
  const ox = box.x + (box.w - (maxX - minX) * scale) / 2;
  const oy = box.y + (box.h + (maxY - minY) * scale) / 2;
  const px = (x: number) => ox + (x - minX) * scale;
  const py = (y: number) => oy - (y - minY) * scale;
  const path = (points: [number, number][]) => {
    points.forEach(([x, y], i) => (i === 0 ? doc.moveTo(px(x), py(y)) : doc.lineTo(px(x), py(y))));
    doc.closePath();
  };

  doc.save().lineJoin('miter');
  for (const o of g.outlines) {
    path(o.points);
    doc.lineWidth(0.6).fillAndStroke(WOOD, INK);
  }
  for (const p of g.plates) {
    path(p.points);
    doc.fillOpacity(0.55).lineWidth(0.5).fillAndStroke(PLATE, INK).fillOpacity(1);
  }
  doc.font('bold').fontSize(7);
  for (const l of g.pieceLabels) {
    const w = doc.widthOfString(l.text) + 4;
    doc.rect(px(l.at[0]) - w / 2, py(l.at[1]) - 4.5, w, 9).fill('#ffffff');
    doc
      .fillColor(INK)
      .text(l.text, px(l.at[0]) - w / 2 + 2, py(l.at[1]) - 3.6, { lineBreak: false });
  }
  doc.font('regular').fontSize(5.5).fillColor(DIM);
  for (const l of g.jointLabels)
    doc.text(l.text, px(l.at[0]) + 2, py(l.at[1]) + 1.5, { lineBreak: false });

  doc.lineWidth(0.4).strokeColor(DIM).fillColor(DIM).font('medium').fontSize(6);
  for (const d of g.dimensions) {
    const y = py(d.from[1] + d.offset);
    const x0 = px(d.from[0]);
    const x1 = px(d.to[0]);
    doc.moveTo(x0, py(d.from[1])).lineTo(x0, y).moveTo(x1, py(d.to[1])).lineTo(x1, y).stroke();
    doc.moveTo(x0, y).lineTo(x1, y).stroke();
    for (const x of [x0, x1])
      doc
        .moveTo(x - 2, y + 2)
        .lineTo(x + 2, y - 2)
        .stroke();
    const tw = doc.widthOfString(d.text);
    doc.text(d.text, (x0 + x1) / 2 - tw / 2, y + (d.offset > 0 ? -7.5 : 1.5), { lineBreak: false });
  }
  doc.restore();
  return { px, py, scale };
}
