import type { PlateSpec } from './types';

// Plate lateral resistance by orientation and the heel-joint reduction. ANSI/TPI 1-2014 gives
// four tested values (Ch. 5 §5.2 test method; the design use in its joint-design chapter), from
// memory — the clause numbers of the design rules were not verified against the text:
//   AA  plate's length (slot) axis parallel to the load, load parallel to grain
//   EA  plate perpendicular to the load, load parallel to grain
//   AE  plate parallel to the load, load perpendicular to grain
//   EE  plate perpendicular to the load, load perpendicular to grain
// Intermediate plate-to-load angles by straight-line interpolation, intermediate load-to-grain
// angles by Hankinson's formula.

const HALF_PI = Math.PI / 2;

/** Folds any angle between two undirected lines into 0…π/2. */
export const foldAngle = (a: number): number => {
  const r = Math.abs(a) % Math.PI;
  return r > HALF_PI ? Math.PI - r : r;
};

/**
 * Lateral (tooth) resistance per unit plate–wood contact area, in the catalog's lbf/in² per
 * face, for a load at `plateToLoad` to the plate's length axis and `loadToGrain` to the wood's
 * grain (radians, any sign: both fold into 0…90°). The values at 0° and 90° of plate-to-load
 * interpolate linearly, P = AA + (EA − AA)·α/90°, Q = AE + (EE − AE)·α/90°; then Hankinson,
 * P·Q / (P sin²θ + Q cos²θ) (ANSI/TPI 1-2014, from memory).
 */
export const lateralValue = (plate: PlateSpec, plateToLoad: number, loadToGrain = 0): number => {
  const { aa, ea, ae, ee } = plate.lateralValue;
  const t = foldAngle(plateToLoad) / HALF_PI;
  const p = aa + (ea - aa) * t;
  const q = ae + (ee - ae) * t;
  const theta = foldAngle(loadToGrain);
  const s = Math.sin(theta);
  const c = Math.cos(theta);
  return (p * q) / (p * s * s + q * c * c);
};

/**
 * Heel-joint reduction factor on the top chord's tooth resistance at a heel:
 * HR = 0.85 − 0.05 (12 tan θ − 2.0), kept within 0.65 ≤ HR ≤ 0.85, θ the top chord's slope
 * (ANSI/TPI 1-2014 joint-design chapter, heel joints; from memory, clause not verified).
 * A 4/12 slope gives 0.75; 2/12 or flatter 0.85; 6/12 or steeper 0.65.
 */
export const heelReduction = (slope: number): number => {
  const hr = 0.85 - 0.05 * (12 * Math.tan(foldAngle(slope)) - 2);
  return Math.min(0.85, Math.max(0.65, hr));
};
