import { MM_PER_INCH, N_PER_LBF } from '../units';
import type { Point } from './geometry';
import { foldAngle, heelReduction, lateralValue } from './lateral';
import type { MemberPlateCheck, PlateJoint, PlateJointMember, PlateSpec } from './types';

// A member's tooth values at a joint: its angles once per joint, its lateral value once per
// distinct set of plate values (a catalog has a few gauges, many sizes).

const PSI_TO_N_PER_MM2 = N_PER_LBF / (MM_PER_INCH * MM_PER_INCH);

/** A member's lateral value on one plate, for the report and the tooth capacity. */
export type ToothValue = Omit<
  MemberPlateCheck,
  'member' | 'area' | 'demand' | 'capacity' | 'ratio'
>;

/** A member's tooth angles at a joint, independent of the plate size. */
export interface ToothAngles {
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
export const toothAngles = (joint: PlateJoint, m: PlateJointMember, local: Point): ToothAngles => {
  const loadToGrain = foldAngle(m.loadToGrain ?? 0);
  const axisAngle = Math.atan2(local[1], local[0]);
  const plateToLoad =
    loadToGrain === 0
      ? [foldAngle(axisAngle)]
      : [foldAngle(axisAngle + loadToGrain), foldAngle(axisAngle - loadToGrain)];
  return { plateToLoad, loadToGrain, heelFactor: heelFactorOf(joint, m) };
};

const slope = (d: { x: number; y: number }) => Math.atan2(d.y, d.x);

/**
 * HR for the top chord at a heel, from its slope above the bottom chord: the top chord's slope
 * where the bottom chord is level (the standard's case); for a scissor's sloped bottom chord the
 * angle between the chords (our reading, not the standard's words). 1 for every other member.
 */
const heelFactorOf = (joint: PlateJoint, m: PlateJointMember): number => {
  if (joint.kind !== 'heel' || m.role !== 'topChord') return 1;
  const bc = joint.members.find((o) => o.role === 'bottomChord');
  const relative = bc ? slope(m.direction) - slope(bc.direction) : slope(m.direction);
  return heelReduction(relative);
};

/** A member's lateral value on one plate, MPa per face, at the lowest of its angles. */
export const toothValue = (plate: PlateSpec, t: ToothAngles): ToothValue => {
  let best = { plateToLoad: t.plateToLoad[0], value: Infinity };
  for (const a of t.plateToLoad) {
    const value = lateralValue(plate, a, t.loadToGrain);
    if (value < best.value) best = { plateToLoad: a, value };
  }
  return {
    plateToLoad: best.plateToLoad,
    loadToGrain: t.loadToGrain,
    lateralValue: best.value * PSI_TO_N_PER_MM2,
    heelFactor: t.heelFactor,
  };
};

/**
 * Per plate (in the given order), the index of its class of equal lateral values: plates of one
 * class give every member the same tooth values, so they are computed once per class.
 */
export const toothClasses = (plates: readonly PlateSpec[]): number[] => {
  const keys: string[] = [];
  return plates.map((p) => {
    const { aa, ea, ae, ee } = p.lateralValue;
    const key = `${aa} ${ea} ${ae} ${ee}`;
    const known = keys.indexOf(key);
    return known >= 0 ? known : keys.push(key) - 1;
  });
};
