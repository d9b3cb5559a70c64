import type { ProfileKind } from './types';

/** One foot in mm (exact: 12 × 25.4). */
export const MM_PER_FOOT = 304.8;

/** A closed range of allowed values. */
export interface Range {
  min: number;
  max: number;
}

/**
 * Span limits per kind, mm. Common practice: prefabricated pitched trusses run about 4–80 ft;
 * monos are half trusses and rarely exceed 40 ft; parallel-chord flat trusses about 60 ft.
 * These are the product's limits, not a code requirement.
 */
export const SPAN_RANGE: Record<ProfileKind, Range> = {
  kingPost: { min: 4 * MM_PER_FOOT, max: 80 * MM_PER_FOOT },
  queenPost: { min: 4 * MM_PER_FOOT, max: 80 * MM_PER_FOOT },
  fink: { min: 4 * MM_PER_FOOT, max: 80 * MM_PER_FOOT },
  howe: { min: 4 * MM_PER_FOOT, max: 80 * MM_PER_FOOT },
  fan: { min: 4 * MM_PER_FOOT, max: 80 * MM_PER_FOOT },
  doubleFink: { min: 4 * MM_PER_FOOT, max: 80 * MM_PER_FOOT },
  scissor: { min: 4 * MM_PER_FOOT, max: 80 * MM_PER_FOOT },
  mono: { min: 4 * MM_PER_FOOT, max: 40 * MM_PER_FOOT },
  flat: { min: 4 * MM_PER_FOOT, max: 60 * MM_PER_FOOT },
};

/** Top-chord pitch, rise per 12 (common practice; 3/12–12/12 is the typical band). */
export const PITCH_RANGE: Range = { min: 2, max: 16 };

/** Overhang per side, mm: 0–4 ft (common practice; 6–36 in is typical). */
export const OVERHANG_RANGE: Range = { min: 0, max: 4 * MM_PER_FOOT };

/**
 * Heel height, mm. 0 is the pointed heel of the line model; a raised heel needs a heel post at
 * least MIN_MEMBER_LENGTH long. Above 4 ft the "heel" is a wall, not a heel (common practice:
 * raised energy heels run to about 2–3 ft), so the product stops there.
 */
export const HEEL_RANGE: Range = { min: 0, max: 4 * MM_PER_FOOT };

/** Scissor: the bottom chord must stay at least 2/12 flatter than the top chord (common practice). */
export const SCISSOR_MIN_PITCH_DIFFERENCE = 2;

/** Flat truss depth, mm: 6 in – 6 ft (common practice for parallel-chord roof trusses). */
export const FLAT_DEPTH_RANGE: Range = { min: 6 * 25.4, max: 6 * MM_PER_FOOT };

/** Flat truss panel count: even, 2–40 (product limit; keeps joint labels to two letters). */
export const FLAT_PANEL_RANGE: Range = { min: 2, max: 40 };

/** Shortest member the shop builds, mm: about 6 in (common practice). */
export const MIN_MEMBER_LENGTH = 150;

/**
 * Smallest angle between two members at a joint, degrees. Below this the two act as one line and
 * the joint forces blow up. Every heel the pitch rules allow is wider (the sharpest, a 16/12
 * scissor over a bottom chord just under 14/12, is 3.7°), so this only catches web panels.
 */
export const MIN_JOINT_ANGLE_DEG = 3;

/** Longest stock length for chords when none is given, mm: 20 ft (common practice). */
export const DEFAULT_STOCK_LENGTH = 20 * MM_PER_FOOT;

/** Length as the trade reads it, with the SI value beside it, e.g. "4.0 in (102 mm)". */
export const describeLength = (mmValue: number): string => {
  const inches = mmValue / 25.4;
  const imperial =
    Math.abs(inches) < 24 ? `${inches.toFixed(1)} in` : `${(inches / 12).toFixed(2)} ft`;
  return `${imperial} (${Math.round(mmValue)} mm)`;
};
