import { inchToMm, inch, type Mm } from '../units';

/** Nominal sizes the engine designs with (2 in. nominal thickness only). */
export const LUMBER_SIZES = ['2x3', '2x4', '2x6', '2x8', '2x10', '2x12'] as const;

/** A nominal size id, e.g. "2x4". */
export type LumberSize = (typeof LUMBER_SIZES)[number];

/** Dressed (actual) dimensions of a size: thickness b and width d. */
export interface DressedSize {
  /** Nominal width in inches (the "4" of 2x4); size factors are tabulated by it. */
  nominalWidth: number;
  thicknessIn: number;
  widthIn: number;
  /** Exact conversions of the inch dimensions (1 in = 25.4 mm). */
  thickness: Mm;
  width: Mm;
}

// Dry (≤ 19 % MC) dressed sizes, PS 20 / NDS 2018 Supplement Table 1A.
const DRESSED_IN: Record<LumberSize, { nominalWidth: number; b: number; d: number }> = {
  '2x3': { nominalWidth: 3, b: 1.5, d: 2.5 },
  '2x4': { nominalWidth: 4, b: 1.5, d: 3.5 },
  '2x6': { nominalWidth: 6, b: 1.5, d: 5.5 },
  '2x8': { nominalWidth: 8, b: 1.5, d: 7.25 },
  '2x10': { nominalWidth: 10, b: 1.5, d: 9.25 },
  '2x12': { nominalWidth: 12, b: 1.5, d: 11.25 },
};

/** True when `s` is one of LUMBER_SIZES. */
export const isLumberSize = (s: string): s is LumberSize =>
  (LUMBER_SIZES as readonly string[]).includes(s);

/** Dressed dimensions of a nominal size (PS 20 / NDS 2018 Supplement Table 1A). */
export function dressedSize(size: LumberSize): DressedSize {
  const { nominalWidth, b, d } = DRESSED_IN[size];
  return {
    nominalWidth,
    thicknessIn: b,
    widthIn: d,
    thickness: inchToMm(inch(b)),
    width: inchToMm(inch(d)),
  };
}

/** Section properties in mm², mm³, mm⁴; x is the strong axis (bending in the plane of the truss). */
export interface SectionProperties {
  /** Total thickness b (all plies side by side) and width d, mm. */
  b: number;
  d: number;
  area: number;
  sx: number;
  ix: number;
  iy: number;
}

/**
 * Section properties of `plies` pieces side by side, computed from the dressed dimensions
 * (rectangle: A = b·d, Sx = b·d²/6, Ix = b·d³/12, Iy = d·b³/12).
 */
export function sectionProperties(size: LumberSize, plies = 1): SectionProperties {
  const { thickness, width } = dressedSize(size);
  const b = thickness * plies;
  const d = width;
  return {
    b,
    d,
    area: b * d,
    sx: (b * d * d) / 6,
    ix: (b * d ** 3) / 12,
    iy: (d * b ** 3) / 12,
  };
}
