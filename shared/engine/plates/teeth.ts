import { N_PER_LBF, MM_PER_INCH } from '../units';
import type { Point } from './geometry';
import { foldAngle, heelReduction, lateralValue } from './lateral';
import type { MemberPlateCheck, PlateJoint, PlateJointMember, PlateSpec } from './types';

const PSI_TO_N_PER_MM2 = N_PER_LBF / (MM_PER_INCH * MM_PER_INCH);

/** A member's tooth angles, value (MPa per face) and heel factor, as a plate check reports them. */
export type ToothCheck = Omit<
  MemberPlateCheck,
  'member' | 'area' | 'demand' | 'capacity' | 'ratio'
>;

/** A member's tooth angles at a joint, independent of the plate size. */
interface ToothAngles {
  /** Plate-to-load angles to try (the load at ±θ to the member when θ ≠ 0). */
  plateToLoad: number[];
  loadToGrain: number;
  heelFactor: number;
}

/**
 * The angles of a member's load at a joint: along its axis (grain) for an axial force, else at
 * `loadToGrain` to it, to either side (the lower value is used). The top chord at a heel takes
 * the heel reduction for its slope.
 */
const toothAngles = (local: Point, toGrain: number, heelFactor: number): ToothAngles => {
  const loadToGrain = foldAngle(toGrain);
  const axisAngle = Math.atan2(local[1], local[0]);
  const plateToLoad =
    loadToGrain === 0
      ? [foldAngle(axisAngle)]
      : [foldAngle(axisAngle + loadToGrain), foldAngle(axisAngle - loadToGrain)];
  return { plateToLoad, loadToGrain, heelFactor };
};

/**
 * HR for the top chord at a heel, from its slope above the bottom chord: the top chord's slope
 * where the bottom chord is level (the standard's case); for a scissor's sloped bottom chord the
 * angle between the chords (our reading, not the standard's words). 1 for every other member.
 */
const heelFactorOf = (joint: PlateJoint, m: PlateJointMember): number => {
  if (joint.kind !== 'heel' || m.role !== 'topChord') return 1;
  const bc = joint.members.find((o) => o.role === 'bottomChord');
  const slope = (d: { x: number; y: number }) => Math.atan2(d.y, d.x);
  const relative = bc ? slope(m.direction) - slope(bc.direction) : slope(m.direction);
  return heelReduction(relative);
};

/** One tooth load of a member: its magnitude (N, over CD) and angles. */
export interface ToothCase {
  force: number;
  angles: ToothAngles;
}

/**
 * A member's tooth loads: its `toothCases` (axial force and end shear as one vector, per load
 * case), or its axial envelope along the grain. Cases at the same angle keep only the largest.
 */
export const toothCasesOf = (joint: PlateJoint, m: PlateJointMember, local: Point): ToothCase[] => {
  const raw = m.toothCases ?? [{ force: Math.abs(m.force), loadToGrain: m.loadToGrain ?? 0 }];
  // Parallel arrays, not a Map and a spread: a handful of cases, for every member of every joint.
  const angles: number[] = [];
  const forces: number[] = [];
  for (const c of raw) {
    const a = foldAngle(c.loadToGrain);
    const f = Math.abs(c.force);
    const k = angles.indexOf(a);
    if (k < 0) {
      angles.push(a);
      forces.push(f);
    } else if (f >= forces[k]) forces[k] = f;
  }
  const heelFactor = heelFactorOf(joint, m);
  const out: ToothCase[] = [];
  for (let k = 0; k < angles.length; k++) {
    out.push({ force: forces[k], angles: toothAngles(local, angles[k], heelFactor) });
  }
  return out;
};

// The value `lowestAngle` found (psi per face), read right after each call: the hot loop of
// `governingTooth` then builds no object per case.
let lowestFound = Infinity;

/** Index of the plate-to-load angle with the lowest lateral value on one plate (first on a tie). */
const lowestAngle = (plate: PlateSpec, t: ToothAngles): number => {
  let k = 0;
  let value = Infinity;
  for (let a = 0; a < t.plateToLoad.length; a++) {
    const v = lateralValue(plate, t.plateToLoad[a], t.loadToGrain);
    if (v < value) {
      value = v;
      k = a;
    }
  }
  lowestFound = value;
  return k;
};

/** A member's lateral value on one plate, MPa per face, at the lowest of its angles. */
const toothValue = (plate: PlateSpec, t: ToothAngles): ToothCheck => {
  const k = lowestAngle(plate, t);
  return {
    plateToLoad: t.plateToLoad[k],
    loadToGrain: t.loadToGrain,
    lateralValue: lowestFound * PSI_TO_N_PER_MM2,
    heelFactor: t.heelFactor,
  };
};

/**
 * The case that governs a member on one plate: the largest demand over tooth value (the contact
 * area is the same for every case, so this is the largest ratio wherever the plate sits).
 */
export const governingTooth = (plate: PlateSpec, cases: ToothCase[]) => {
  // Scores first, one object for the case that governs: this runs for every member, every
  // case and every set of lateral values at each joint.
  let k = 0;
  let worst = -1;
  for (let c = 0; c < cases.length; c++) {
    lowestAngle(plate, cases[c].angles);
    const score = cases[c].force / (lowestFound * PSI_TO_N_PER_MM2);
    if (score > worst) {
      worst = score;
      k = c;
    }
  }
  return {
    demand: worst === -1 ? 0 : cases[k].force,
    angles: toothValue(plate, cases[k].angles),
  };
};
