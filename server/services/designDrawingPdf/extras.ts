import type { ShopDrawingGeometry } from '../../../shared/api/shopPaper';
import type { Doc } from '../quotePdf/theme';
import type { PaperOverhang } from '../designFacts';

const DIM = '#4a5563';

/** The page mapping `drawGeometry` returns. */
export interface PageMap {
  px: (x: number) => number;
  py: (y: number) => number;
}

/** The slash that ends a dimension line, as the shop drawing draws it. */
const tick = (doc: Doc, x: number, y: number) =>
  doc
    .moveTo(x - 2, y + 2)
    .lineTo(x + 2, y - 2)
    .stroke();

/** A horizontal dimension at page height `y` between page xs, text centred above or below. */
function horizontal(
  doc: Doc,
  x0: number,
  x1: number,
  y: number,
  text: string,
  within: [number, number],
) {
  doc.moveTo(x0, y).lineTo(x1, y).stroke();
  tick(doc, x0, y);
  tick(doc, x1, y);
  const tw = doc.widthOfString(text);
  // Centred under the dimension, but kept inside the drawing's frame (a short end overhang).
  const tx = Math.min(Math.max((x0 + x1) / 2 - tw / 2, within[0]), within[1] - tw);
  doc.text(text, tx, y + 1.5, { lineBreak: false });
}

/** A vertical dimension at page x between page ys, its text turned to read up beside it. */
function vertical(doc: Doc, x: number, y0: number, y1: number, text: string, left: boolean) {
  doc.moveTo(x, y0).lineTo(x, y1).stroke();
  tick(doc, x, y0);
  tick(doc, x, y1);
  const tw = doc.widthOfString(text);
  const cy = (y0 + y1) / 2;
  // Turned a quarter left about its own start; short dimensions keep the text level instead.
  if (Math.abs(y0 - y1) < tw + 4) {
    doc.text(text, left ? x - tw - 3 : x + 3, cy - 3, { lineBreak: false });
    return;
  }
  const tx = left ? x - 3 : x + 8;
  doc.save().rotate(-90, { origin: [tx, cy + tw / 2] });
  doc.text(text, tx, cy + tw / 2, { lineBreak: false });
  doc.restore();
}

/**
 * What the truss design drawing adds to the shop geometry: overhang lengths on the overall
 * chain, the heel height at the left bearing, the overall height at the right, and a bearing
 * mark under each support.
 */
export function drawExtras(
  doc: Doc,
  g: ShopDrawingGeometry,
  map: PageMap,
  o: {
    overhangs: PaperOverhang[];
    heel: number;
    heelText: string;
    overall: number;
    overallText: string;
    bearings: { x: number; label: string }[];
    /** Page xs of the drawing's frame: no text passes them. */
    frame: [number, number];
  },
) {
  const { px, py } = map;
  const lowest = g.dimensions.reduce(
    (lo, d) => (d.offset < lo.offset ? d : lo),
    g.dimensions[0] ?? { from: [0, 0], offset: 0 },
  );
  const chainY = py(lowest.from[1] + lowest.offset);
  doc.save().lineWidth(0.4).strokeColor(DIM).fillColor(DIM).font('medium').fontSize(6);
  for (const oh of o.overhangs) {
    const x0 = px(Math.min(oh.heel.x, oh.tip.x));
    const x1 = px(Math.max(oh.heel.x, oh.tip.x));
    const tipX = px(oh.tip.x);
    doc
      .moveTo(tipX, py(oh.tip.y) + 3)
      .lineTo(tipX, chainY)
      .stroke();
    horizontal(doc, x0, x1, chainY, `${oh.text} overhang`, o.frame);
  }
  const xs = g.outlines.flatMap((ol) => ol.points.map((p) => p[0]));
  const left = px(Math.min(...xs)) - 10;
  const right = px(Math.max(...xs)) + 10;
  if (o.heel > 0) vertical(doc, left, py(0), py(o.heel), `Heel ${o.heelText}`, true);
  vertical(doc, right, py(0), py(o.overall), `Height ${o.overallText}`, false);
  doc.font('regular').fontSize(5.5);
  const mid = (left + right) / 2;
  for (const b of o.bearings) {
    const x = px(b.x);
    const inward = x < mid;
    const y = py(0) + 6;
    doc
      .moveTo(x, y)
      .lineTo(x - 5, y + 7)
      .lineTo(x + 5, y + 7)
      .closePath()
      .fillAndStroke('#d5dae0', DIM);
    doc.fillColor(DIM);
    const tw = doc.widthOfString(b.label);
    doc.text(b.label, inward ? x + 7 : x - 7 - tw, y + 1, { lineBreak: false });
  }
  doc.restore();
}
