import type { QuoteDesignSummary } from '../pricing';
import { COLORS, type Doc } from './theme';

/** A rectangle on the page, in points. */
export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

// Room under the truss for the span dimension, and above it for the pitch mark.
const DIM_ROOM = 22;
const TOP_ROOM = 14;

/**
 * A line drawing of one truss from its stored joints and members, scaled to fit the box (y up in
 * the design, down on the page), with the span dimensioned below and the pitch marked on the left
 * top chord. Chords draw heavier than webs, as shop drawings do (common practice).
 */
export function drawTruss(doc: Doc, d: QuoteDesignSummary, box: Box) {
  const tips = d.criteria?.overhangTips ?? [];
  const xs = [...d.joints.map((j) => j.x), ...tips.map((t) => t.tip.x)];
  const ys = [...d.joints.map((j) => j.y), ...tips.map((t) => t.tip.y)];
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const width = Math.max(maxX - minX, 1e-9);
  const height = Math.max(maxY - minY, 1e-9);
  const room = { w: box.w - 8, h: box.h - DIM_ROOM - TOP_ROOM };
  const scale = Math.min(room.w / width, room.h / height);
  const ox = box.x + (box.w - width * scale) / 2;
  const baseY = box.y + TOP_ROOM + room.h; // lowest joint sits here
  const px = (x: number) => ox + (x - minX) * scale;
  const py = (y: number) => baseY - (y - minY) * scale;
  const at = new Map(d.joints.map((j) => [j.id, j]));

  doc.save();
  doc.lineCap('round').lineJoin('round');
  // Webs first, so the chords' heavier lines sit on top at the panel points.
  const ordered = [...d.members].sort(
    (a, b) => Number(a.role !== 'web') - Number(b.role !== 'web'),
  );
  for (const m of ordered) {
    const a = at.get(m.from);
    const b = at.get(m.to);
    if (!a || !b) continue;
    const web = m.role === 'web';
    doc
      .moveTo(px(a.x), py(a.y))
      .lineTo(px(b.x), py(b.y))
      .lineWidth(web ? 0.8 : 1.6)
      .strokeColor(web ? COLORS.web : COLORS.chord)
      .stroke();
  }
  drawOverhangsAndHeel(doc, d, px, py, baseY);
  const jx = d.joints.map((j) => j.x);
  drawSpan(doc, px(Math.min(...jx)), px(Math.max(...jx)), baseY + 8, d.span);
  if (d.pitch) drawPitch(doc, d, px, py);
  doc.restore();
}

/**
 * The overhangs as the top chord continued to its tips, each with its length under the tip, and
 * the heel height marked at the left bearing (a standard heel draws pointed in the line model).
 */
function drawOverhangsAndHeel(
  doc: Doc,
  d: QuoteDesignSummary,
  px: (x: number) => number,
  py: (y: number) => number,
  baseY: number,
) {
  const c = d.criteria;
  if (!c) return;
  const byX = [...d.joints].sort((a, b) => a.x - b.x || a.y - b.y);
  doc.font('regular').fontSize(6.5);
  for (const t of c.overhangTips) {
    const { heel } = t;
    doc
      .moveTo(px(heel.x), py(heel.y))
      .lineTo(px(t.tip.x), py(t.tip.y))
      .lineWidth(1.6)
      .strokeColor(COLORS.chord)
      .stroke();
    // Under the span's dimension line, flush with the tip, clear of the span text in the middle.
    const label = `${t.text} overhang`;
    const tw = doc.widthOfString(label);
    const x = t.side === 'left' ? px(t.tip.x) : px(t.tip.x) - tw;
    doc.fillColor(COLORS.dim).text(label, x, baseY + 13, { lineBreak: false });
  }
  if (c.heelHeight > 0 && byX[0]) {
    const x = px(byX[0].x);
    doc.font('regular').fontSize(6.5).fillColor(COLORS.dim);
    const label = `heel ${c.heel}`;
    doc.text(label, x + 4, py(byX[0].y) + 2, { lineBreak: false });
  }
}

/** A dimension line with end ticks and the span text centred in a gap. */
function drawSpan(doc: Doc, x0: number, x1: number, y: number, text: string) {
  doc.font('medium').fontSize(7.5);
  const label = `Span ${text}`;
  const tw = doc.widthOfString(label);
  const mid = (x0 + x1) / 2;
  doc.lineWidth(0.5).strokeColor(COLORS.dim);
  doc
    .moveTo(x0, y - 3)
    .lineTo(x0, y + 3)
    .moveTo(x1, y - 3)
    .lineTo(x1, y + 3)
    .stroke();
  doc
    .moveTo(x0, y)
    .lineTo(Math.max(x0, mid - tw / 2 - 4), y)
    .stroke();
  doc
    .moveTo(Math.min(x1, mid + tw / 2 + 4), y)
    .lineTo(x1, y)
    .stroke();
  doc.fillColor(COLORS.dim).text(label, mid - tw / 2, y - 3.6, { lineBreak: false });
}

/** "4/12" as a slope triangle sitting just above the left top chord, near the heel. */
function drawPitch(
  doc: Doc,
  d: QuoteDesignSummary,
  px: (x: number) => number,
  py: (y: number) => number,
) {
  const rise = Number(d.pitch!.split('/')[0]);
  if (!Number.isFinite(rise) || rise <= 0) return;
  // The top of the left heel: the left-most joint, highest first (a raised heel has two).
  const heel = [...d.joints].sort((a, b) => a.x - b.x || b.y - a.y)[0];
  const run = 18;
  const up = (run * rise) / 12;
  // The hypotenuse runs parallel to the chord, 5 pt above it; the legs sit above the hypotenuse.
  const x0 = px(heel.x) + 10;
  const y0 = py(heel.y) - (10 * rise) / 12 - 5;
  doc.lineWidth(0.5).strokeColor(COLORS.dim);
  doc
    .moveTo(x0, y0)
    .lineTo(x0, y0 - up)
    .lineTo(x0 + run, y0 - up)
    .lineTo(x0, y0)
    .stroke();
  doc.font('regular').fontSize(6.5).fillColor(COLORS.dim);
  doc.text('12', x0 + run / 2 - 3.5, y0 - up - 8, { lineBreak: false });
  const label = String(rise);
  doc.text(label, x0 - doc.widthOfString(label) - 2, y0 - up / 2 - 3.5, { lineBreak: false });
}
