/**
 * Stage 3: read a cut board the way the saw operator does. In the board's own frame (s along the
 * piece from its first joint, t across it) the outline's edges on the strip's sides are the
 * board's long edges; every other edge is a saw cut, at the first end (small s) or the last. The
 * overall length is the long-point length: from the farthest point of one end to the farthest
 * point of the other.
 */
import { MM_PER_INCH } from '../units';
import type { Board } from './boards';
import { dot, sub } from './polygon';
import type { CutEnd, CutKind, XY } from './types';

/** A cut shorter than this is a corner the saw does not make, mm. */
const SHORTEST_CUT = 0.5;
/** Within this of 90° a cut is square, degrees (a saw sets angles to a tenth of a degree). */
export const SQUARE_CUT_TOLERANCE_DEG = 0.05;
const SQUARE_WITHIN = SQUARE_CUT_TOLERANCE_DEG;

/** The board read in its own frame. */
export interface ReadBoard {
  /** Long-point length, mm (not rounded). */
  length: number;
  ends: [CutEnd, CutEnd];
  /** The reference edge: t of the edge angles and points are measured from. */
  reference: number;
  /** Outline in the board frame [s, t], s from 0 at the first end's long point. */
  frame: XY[];
}

/** Rounds mm to the nearest 1/16 in; returns mm and the count of sixteenths. */
export const toSixteenths = (mm: number): { length: number; sixteenths: number } => {
  const sixteenths = Math.round((mm / MM_PER_INCH) * 16);
  return { length: (sixteenths * MM_PER_INCH) / 16, sixteenths };
};

/** The reference edge: a chord's edge on the design line, else the strip's lower-t edge. */
export const referenceEdge = (b: Board): number =>
  b.piece.role === 'web' ? b.t0 : b.t0 === 0 ? b.t0 : b.t1;

/** Reads the outline of a cut board (stage 3). */
export const readBoard = (b: Board): ReadBoard => {
  const local = b.ring.map((p): XY => {
    const d = sub(p, b.start);
    return [dot(d, b.u), dot(d, b.n)];
  });
  const sMin = Math.min(...local.map((p) => p[0]));
  const sMax = Math.max(...local.map((p) => p[0]));
  const frame = local.map(([s, t]): XY => [s - sMin, t]);
  const length = sMax - sMin;
  const reference = referenceEdge(b);
  const onSide = (t: number) => Math.abs(t - b.t0) < 1e-6 || Math.abs(t - b.t1) < 1e-6;

  const cuts: Array<Array<{ angle: number; from: number; to: number; mid: number }>> = [[], []];
  for (let i = 0; i < frame.length; i++) {
    const p = frame[i];
    const q = frame[(i + 1) % frame.length];
    if (onSide(p[1]) && onSide(q[1]) && Math.abs(p[1] - q[1]) < 1e-6) continue;
    const ds = q[0] - p[0];
    const dt = q[1] - p[1];
    if (Math.hypot(ds, dt) < SHORTEST_CUT) continue;
    const angle = (Math.atan2(Math.abs(dt), Math.abs(ds)) * 180) / Math.PI;
    const [from, to] = [Math.abs(p[1] - reference), Math.abs(q[1] - reference)];
    const mid = (p[0] + q[0]) / 2;
    cuts[mid < length / 2 ? 0 : 1].push({
      angle,
      from: Math.min(from, to),
      to: Math.max(from, to),
      mid,
    });
  }

  const end = (k: 0 | 1): CutEnd => {
    const list = cuts[k].sort((x, y) => x.from - y.from);
    const kind: CutKind =
      list.length <= 1
        ? list.length === 1 && Math.abs(list[0].angle - 90) > SQUARE_WITHIN
          ? 'single'
          : 'square'
        : list.length === 2
          ? 'double'
          : 'multiple';
    const cut: CutEnd = {
      joint: k === 0 ? b.joints[0] : b.joints[b.joints.length - 1],
      site: b.sites[k],
      kind,
      angles: list.length ? list.map((c) => c.angle) : [90],
    };
    if (kind === 'double') cut.point = list[0].to;
    return cut;
  };
  return { length, ends: [end(0), end(1)], reference, frame };
};
