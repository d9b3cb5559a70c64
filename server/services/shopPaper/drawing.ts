import type {
  JointPlateRow,
  ShopDrawing,
  ShopDrawingGeometry,
} from '../../../shared/api/shopPaper';
import { dressedSize, isLumberSize } from '../../../shared/engine/lumber/sizes';
import type { PresentedDesign } from '../../../shared/engine/design';
import type { TrussPieces } from '../../../shared/engine/pieces';
import { cutStoredDesign } from '../cutList';
import { fromMm, lengthText, pitchText, type ShopLine, type ShopOrderPaper } from './lines';

type Point = [number, number];

/** A closed outline of lumber in the drawing (design units, y up), with its piece mark. */
export interface PieceOutline {
  piece: string;
  role: string;
  points: Point[];
}

const round = (v: number) => Math.round(v * 1000) / 1000 + 0;
const pt = (x: number, y: number): Point => [round(x), round(y)];

/** Dressed depth of a lumber id in the design's units (3.5 in / 88.9 mm for a 2x4). */
export function depthOf(design: PresentedDesign, lumber: string): number {
  const [size] = lumber.trim().split(/\s+/);
  const inches = size && isLumberSize(size) ? dressedSize(size).widthIn : 3.5;
  return design.units.length === 'mm' ? inches * 25.4 : inches;
}

/**
 * Each piece as the saw cuts it (`cutPieces`' outline: bevels, heel, peak, splice and tail cuts),
 * in the design's units. Identical pieces keep their own outlines, marked with their profile mark.
 */
export function pieceOutlines(design: PresentedDesign, { outlines }: TrussPieces) {
  return outlines.map((o): PieceOutline => ({
    piece: o.piece,
    role: o.role,
    points: o.polygon.map(([x, y]) => pt(fromMm(design, x), fromMm(design, y))),
  }));
}

/** Each joint's plate as a rectangle: length along its axis, width across, centre slid. */
export function plateOutlines(design: PresentedDesign, rows: JointPlateRow[]) {
  const at = new Map(design.joints.map((j) => [j.id, j]));
  const unit = design.units.length === 'mm' ? 25.4 : 1; // plate sizes are inches
  return rows.flatMap((r) => {
    const j = at.get(r.joint);
    if (!j) return [];
    const a = ((r.angleDeg ?? 0) * Math.PI) / 180;
    const cx = j.x + (r.dx?.value ?? 0);
    const cy = j.y + (r.dy?.value ?? 0);
    const ux = Math.cos(a);
    const uy = Math.sin(a);
    const l = (r.lengthIn * unit) / 2;
    const w = (r.widthIn * unit) / 2;
    const corner = (sl: number, sw: number) =>
      pt(cx + sl * l * ux - sw * w * uy, cy + sl * l * uy + sw * w * ux);
    return [
      {
        joint: r.joint,
        plate: r.plate,
        points: [corner(-1, -1), corner(1, -1), corner(1, 1), corner(-1, 1)],
      },
    ];
  });
}

/** Panel points of a chord role, left to right (distinct x). */
function panelPoints(design: PresentedDesign, role: string) {
  const ids = new Set(design.members.filter((m) => m.role === role).flatMap((m) => [m.from, m.to]));
  const xs = design.joints.filter((j) => ids.has(j.id)).map((j) => j.x);
  return [...new Set(xs.map(round))].sort((a, b) => a - b);
}

/**
 * The sheet's geometry: outlines, plates, piece marks at their longest member's middle, joint
 * letters, and dimension chains to the panel points — the top chord's above, the bottom chord's
 * and the overall length below — in feet-inches-sixteenths (or mm).
 */
export function shopDrawingGeometry(
  design: PresentedDesign,
  outlines: PieceOutline[],
  plates: ReturnType<typeof plateOutlines>,
): ShopDrawingGeometry {
  const all = [...outlines.flatMap((o) => o.points), ...plates.flatMap((p) => p.points)];
  const minX = Math.min(...all.map((p) => p[0]));
  const maxX = Math.max(...all.map((p) => p[0]));
  const minY = Math.min(...all.map((p) => p[1]));
  const maxY = Math.max(...all.map((p) => p[1]));
  const size = Math.max(maxX - minX, maxY - minY);
  const gap = size * 0.05;
  const at = new Map(design.joints.map((j) => [j.id, j]));

  const pieceLabels = design.pieces.flatMap((p) => {
    const members = design.members.filter((m) => m.piece === p.mark);
    const longest = members.sort((a, b) => b.length.value - a.length.value)[0];
    const a = longest && at.get(longest.from);
    const b = longest && at.get(longest.to);
    return a && b ? [{ text: p.mark, at: pt((a.x + b.x) / 2, (a.y + b.y) / 2) }] : [];
  });
  const jointLabels = design.joints.map((j) => ({ text: j.id, at: pt(j.x, j.y) }));

  const chain = (xs: number[], y: number, offset: number) =>
    xs.slice(1).map((x, i) => ({
      from: pt(xs[i], y),
      to: pt(x, y),
      offset: round(offset),
      text: lengthText(design, x - xs[i]),
    }));
  const jx = design.joints.map((j) => j.x);
  const overall = [Math.min(...jx), Math.max(...jx)];
  const top = panelPoints(design, 'topChord');
  const bottom = panelPoints(design, 'bottomChord');
  const dimensions = [
    ...chain(top, maxY, gap),
    ...chain(bottom, minY, -gap),
    ...chain(overall, minY, -2.2 * gap),
  ];
  return {
    outlines: outlines.map((o) => ({ piece: o.piece, role: o.role, points: o.points })),
    plates,
    pieceLabels,
    jointLabels,
    dimensions,
    bounds: {
      minX: round(minX),
      minY: round(minY - 2.6 * gap),
      maxX: round(maxX),
      maxY: round(maxY + 1.4 * gap),
    },
  };
}

/** One sheet of the shop drawing set: a truss mark with its pieces, plates and cautions. */
export function shopDrawing(
  paper: ShopOrderPaper,
  line: ShopLine,
  rows: JointPlateRow[],
): ShopDrawing {
  const d = line.design;
  const cut = cutStoredDesign({ ...line, designResult: d });
  const geometry = shopDrawingGeometry(d, pieceOutlines(d, cut), plateOutlines(d, rows));
  // Each profile piece's long-point length as cut (the centre-line length if not found).
  const cutLength = new Map(
    cut.pieces.flatMap((c) => c.pieces.map((mark) => [mark, c.length] as const)),
  );
  return {
    order: paper.order,
    lineId: line.id,
    mark: line.mark,
    description: line.description,
    quantity: line.quantity,
    plies: line.plies,
    span: d.span.text,
    pitch: pitchText(line),
    rise: d.rise.text,
    heelHeight: d.heelHeight.requested.text,
    geometry,
    pieces: d.pieces.map((p) => ({
      mark: p.mark,
      role: p.role,
      lumber: p.lumber,
      length: cutLength.has(p.mark)
        ? lengthText(d, fromMm(d, cutLength.get(p.mark)!))
        : p.length.text,
      count: line.plies,
    })),
    plates: rows,
    bracing: d.members.filter((m) => m.braced).map((m) => `${m.piece} (${m.id}): ${m.bracing}`),
    demoPlates: d.demoPlates,
    engineVersion: d.engineVersion,
    cautions: d.cautions,
    ...(d.plyConnections && { plyFastening: d.plyConnections.map((c) => c.text) }),
  };
}
