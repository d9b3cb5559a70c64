import type { ProfileParams } from './types';

/** A point of the line model, mm. */
export interface Point {
  x: number;
  y: number;
}

/**
 * A profile family's geometry before labels: points, the two chord lines through them and the
 * webs. The assembler turns it into joints, members and pieces.
 */
export interface Layout {
  points: Point[];
  /** Point indices along the top chord, left to right. */
  top: number[];
  /** Point indices along the bottom chord, left to right. */
  bottom: number[];
  /** Web members as pairs of point indices. */
  webs: Array<readonly [number, number]>;
  /** Positions in `top` where the chord changes direction (a piece ends there), e.g. the peak. */
  topBreaks: number[];
  /** Positions in `bottom` where the chord changes direction (scissor bottom peak). */
  bottomBreaks: number[];
  /** Height of the highest top-chord point above the bearing line, mm. */
  rise: number;
}

/** A web end: an interior top-chord (`t`) or bottom-chord (`b`) panel point, by index. */
export type WebEnd = readonly ['t' | 'b', number];

/** The interior panel points of a pitched family; the heels are added by `pitchedLayout`. */
export interface PitchedSpec {
  span: number;
  heelHeight: number;
  /** Top and bottom chord lines, y as a function of x (bottomY(0) = bottomY(span) = 0). */
  topY: (x: number) => number;
  bottomY: (x: number) => number;
  /** Interior panel points strictly between the bearings, left to right. */
  topXs: number[];
  bottomXs: number[];
  webs: Array<readonly [WebEnd, WebEnd]>;
  /** Index in `topXs` of the peak, where the top chord breaks into two pieces. */
  peak?: number;
  /** Index in `bottomXs` of the bottom-chord peak (scissor). */
  bottomPeak?: number;
  /** 'heel': a heel like the left one; 'tallEnd': the high end of a mono, always a vertical. */
  rightEnd: 'heel' | 'tallEnd';
  rise: number;
}

/**
 * Builds a pitched layout from its interior panel points and adds the heels: with heelHeight 0
 * the top and bottom chords meet at the bearing joint. A raised heel is built as the trade
 * builds it (common practice): a heel post stands on the bottom chord at the bearing, the top
 * chord bears over its top (and runs on into the overhang), a heel web rises from the bearing
 * to a top-chord panel point a quarter of the way to the first one, and a web from there down
 * to the first bottom-chord panel point closes the end panel (a quarter keeps both webs steep
 * enough to plate on a 12 in heel; chosen by trial on the demo catalog). The roof thrust comes down the heel web to the
 * bearing and the bottom chord's end panel ties it.
 */
export const pitchedLayout = (spec: PitchedSpec): Layout => {
  const points: Point[] = [];
  const add = (x: number, y: number): number => points.push({ x, y }) - 1;
  const webs: Array<readonly [number, number]> = [];
  const { span, heelHeight } = spec;
  const raised = heelHeight > 0;

  const bottom = [add(0, 0)];
  for (const x of spec.bottomXs) bottom.push(add(x, spec.bottomY(x)));
  bottom.push(add(span, 0));
  const rightBearing = bottom[bottom.length - 1];

  // Horizontal run from each raised heel to the heel web's top-chord panel point.
  const heelRun = (run: number) => run / 4;
  const topXs = raised
    ? [
        heelRun(spec.topXs[0]),
        ...spec.topXs,
        ...(spec.rightEnd === 'heel' ? [span - heelRun(span - spec.topXs.at(-1)!)] : []),
      ]
    : spec.topXs;

  const top: number[] = [];
  const leftHeel = raised ? add(0, heelHeight) : bottom[0];
  top.push(leftHeel);
  const topPoints = topXs.map((x) => add(x, spec.topY(x)));
  // The spec's webs index its own interior points, after the heel web's point when raised.
  const topInterior = raised ? topPoints.slice(1, 1 + spec.topXs.length) : topPoints;
  if (raised)
    webs.push([bottom[0], leftHeel], [bottom[0], topPoints[0]], [topPoints[0], bottom[1]]);
  top.push(...topPoints);
  if (spec.rightEnd === 'tallEnd') {
    const end = add(span, spec.topY(span));
    top.push(end);
    webs.push([rightBearing, end]);
  } else if (raised) {
    const heel = add(span, heelHeight);
    top.push(heel);
    const point = topPoints[topPoints.length - 1];
    webs.push([point, bottom[bottom.length - 2]], [point, rightBearing], [rightBearing, heel]);
  } else {
    top.push(rightBearing);
  }

  const at = ([chord, i]: WebEnd): number => (chord === 't' ? topInterior[i] : bottom[i + 1]);
  for (const [a, b] of spec.webs) webs.push([at(a), at(b)]);

  return {
    points,
    top,
    bottom,
    webs,
    // +1: position 0 of each chord list is the heel (+1 more for a raised heel's web point).
    topBreaks: spec.peak === undefined ? [] : [spec.peak + (raised ? 2 : 1)],
    bottomBreaks: spec.bottomPeak === undefined ? [] : [spec.bottomPeak + 1],
    rise: spec.rise,
  };
};

/** Top chord line of a symmetric pitched truss: heel height plus slope × distance to the nearer heel. */
export const gableTopY =
  (span: number, pitch: number, heelHeight: number) =>
  (x: number): number =>
    heelHeight + (Math.min(x, span - x) * pitch) / 12;

/** A flat bottom chord on the bearing line. */
export const flatBottomY = (): number => 0;

/** The interior panel points and webs of a symmetric gable family (the rest follows from params). */
export type GableSpec = Pick<PitchedSpec, 'topXs' | 'bottomXs' | 'webs' | 'peak' | 'bottomPeak'> & {
  /** Bottom chord line; flat unless given (scissor). */
  bottomY?: (x: number) => number;
};

/**
 * A gable layout: top chords at the profile's pitch from both heels to a peak at mid-span,
 * heels alike at both ends, rise = heel + half the span × pitch.
 */
export const gableLayout = (p: ProfileParams, spec: GableSpec): Layout =>
  pitchedLayout({
    ...spec,
    span: p.span,
    heelHeight: p.heelHeight,
    topY: gableTopY(p.span, p.pitch, p.heelHeight),
    bottomY: spec.bottomY ?? flatBottomY,
    rightEnd: 'heel',
    rise: p.heelHeight + (p.span / 2) * (p.pitch / 12),
  });
