import type { Joint } from '../../../shared/engine/analysis/types';
import { dressedSize, isLumberSize } from '../../../shared/engine/lumber/sizes';
import type { DrawingModel } from './model';

/** A point in drawing (mm, y up) or screen (px, y down) coordinates. */
export interface Point {
  x: number;
  y: number;
}

/** Axis-aligned bounds in mm. */
export interface Bounds {
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

/** Maps mm (y up) to screen px (y down): screen = (x·scale + dx, dy − y·scale). */
export interface ScreenTransform {
  scale: number;
  dx: number;
  dy: number;
}

/** Margins around the truss, px: room for dimensions below and left, labels above and right. */
export interface Margins {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

/** Looks up joints by id; a missing joint is a programming error, so it throws plainly. */
export function jointIndex(joints: readonly Joint[]): Map<string, Joint> {
  return new Map(joints.map((j) => [j.id, j]));
}

/**
 * The outer end of each overhang: the top-chord line continued beyond its heel joint by the
 * horizontal projection, so the cantilever keeps the chord's slope.
 */
export function overhangTips(
  model: DrawingModel,
): { side: 'left' | 'right'; heel: Point; tip: Point }[] {
  const at = jointIndex(model.joints);
  const members = new Map(model.members.map((m) => [m.id, m]));
  const tips: { side: 'left' | 'right'; heel: Point; tip: Point }[] = [];
  for (const o of model.overhangs) {
    const heel = at.get(o.heelJoint);
    const member = members.get(o.member);
    if (!heel || !member || o.horizontal <= 0) continue;
    const otherId = member.from === o.heelJoint ? member.to : member.from;
    const other = at.get(otherId);
    if (!other || other.x === heel.x) continue;
    const slope = (other.y - heel.y) / (other.x - heel.x);
    const x = o.side === 'left' ? heel.x - o.horizontal : heel.x + o.horizontal;
    tips.push({ side: o.side, heel, tip: { x, y: heel.y + slope * (x - heel.x) } });
  }
  return tips;
}

/** Bounds of every joint and overhang tip, mm. */
export function drawingBounds(model: DrawingModel): Bounds {
  const points: Point[] = [...model.joints, ...overhangTips(model).map((t) => t.tip)];
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  return {
    minX: Math.min(...xs, 0),
    maxX: Math.max(...xs, model.span),
    minY: Math.min(...ys, 0),
    maxY: Math.max(...ys, 0),
  };
}

/**
 * The largest uniform scale that fits `bounds` inside the box less its margins, centred. Uniform
 * because a truss drawn with unequal scales shows a false pitch.
 */
export function fitTransform(
  bounds: Bounds,
  width: number,
  height: number,
  margins: Margins,
): ScreenTransform {
  const w = Math.max(bounds.maxX - bounds.minX, 1);
  const h = Math.max(bounds.maxY - bounds.minY, 1);
  const innerW = Math.max(width - margins.left - margins.right, 1);
  const innerH = Math.max(height - margins.top - margins.bottom, 1);
  const scale = Math.min(innerW / w, innerH / h);
  const dx = margins.left + (innerW - w * scale) / 2 - bounds.minX * scale;
  const dy = margins.top + (innerH + h * scale) / 2 + bounds.minY * scale;
  return { scale, dx, dy };
}

/** Drawing point (mm, y up) → screen point (px, y down). */
export function toScreen(t: ScreenTransform, p: Point): Point {
  return { x: p.x * t.scale + t.dx, y: t.dy - p.y * t.scale };
}

/** Dressed width of a lumber id's size in mm ("2x4 SPF-1/2" → 88.9); 89 mm when unknown. */
export function lumberDepthMm(lumber: string | undefined): number {
  const size = lumber?.split(' ')[0] ?? '';
  return isLumberSize(size) ? dressedSize(size).width : 88.9;
}

/**
 * On-screen width of a member band: the lumber's dressed width at drawing scale, kept between
 * 3 px (still visible and hoverable) and 16 px (a small drawing of a big truss stays readable).
 */
export function bandWidthPx(lumber: string | undefined, scale: number): number {
  return Math.min(16, Math.max(3, lumberDepthMm(lumber) * scale));
}

/**
 * Where a joint's letter goes: `distance` px from the joint, pointing away from the truss's
 * middle so labels sit outside the members (bottom-chord joints below, top-chord joints above).
 */
export function labelOffset(joint: Point, centre: Point, distance: number): Point {
  const vx = joint.x - centre.x;
  const vy = joint.y - centre.y;
  const len = Math.hypot(vx, vy);
  if (len < 1e-9) return { x: 0, y: -distance };
  return { x: (vx / len) * distance, y: (vy / len) * distance };
}

/** Centre of the truss's bearing-to-peak area, mm: a point inside for every profile. */
export function drawingCentre(model: DrawingModel): Point {
  const b = drawingBounds(model);
  return { x: (b.minX + b.maxX) / 2, y: (b.minY + b.maxY) / 2 };
}

/** Midpoint of a screen segment. */
export function midpoint(a: Point, b: Point): Point {
  return { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
}
