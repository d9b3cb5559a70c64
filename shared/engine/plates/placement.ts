import { MM_PER_INCH, TOLERANCE } from '../units';
import { regionAreaInPlate, type LocalMember, type Region } from './contact';
import type { MemberPlateCheck, PlateJoint, PlateSpec } from './types';

/*
 * Where one plate sits at a joint: centred, or slid across its length axis on a ¼ in grid to the
 * slide nearest the centre where every member's teeth hold (branch and bound over the slides).
 */
const ratioOf = (demand: number, capacity: number) =>
  demand === 0 ? 0 : capacity > 0 ? demand / capacity : Infinity;

// Slides are tried on a fixed ¼ in grid (common practice: plates are placed to the nearest
// ¼ in). The grid does not depend on the plate, and a larger plate may slide at least as far,
// so every placement of a smaller plate is also one of a larger plate that contains it: a
// larger plate never gives a member less area.
const SLIDE_STEP_MM = 0.25 * MM_PER_INCH;

// Relative slack before the summed-area bound drops a plate: a plate that holds its members
// with areas summing to its own (to rounding) must still be tried.
const AREA_SLACK = 1e-9;

/**
 * How many grid steps the plate may slide across its length axis to either side: as far as it
 * still covers the chord's depth (its edge at the chord's far face), so it reaches further onto
 * the members that need area (common practice). Centred first; otherwise the slide nearest the
 * centre that holds every member. Heels and splices stay centred: their steel checks assume
 * the joint line through the centre.
 */
export const slideSteps = (
  kind: PlateJoint['kind'],
  chordHalf: number,
  halfWidth: number,
): number => {
  if (kind === 'heel' || kind === 'splice' || chordHalf <= 0) return 0;
  return Math.max(0, Math.floor((halfWidth - chordHalf) / SLIDE_STEP_MM + TOLERANCE));
};

export interface PlateFrame {
  /** Grid steps the plate may slide to either side (0: it stays centred). */
  steps: number;
  endExclusion: number;
  edgeExclusion: number;
}

/** A plate placement that holds every member. */
export interface Fit {
  offset: number;
  checks: MemberPlateCheck[];
}

/** One plate tried at one joint: what every step of its placement needs. */
export interface Trial {
  joint: PlateJoint;
  regions: Region[];
  /** Member indices in the order to check them; the member that fails moves to the front. */
  order: number[];
  plate: PlateSpec;
  /** Tooth capacity per mm² of contact, both faces, N/mm², per member (its governing case). */
  perArea: number[];
  /** Tooth demand per member, N: the force of its governing case on this plate. */
  demand: number[];
  halfLength: number;
  halfWidth: number;
  /** Per member: its angles, lateral value (MPa) and heel factor, for the report. */
  angles: Omit<MemberPlateCheck, 'member' | 'area' | 'demand' | 'capacity' | 'ratio'>[];
  /** The member failing by the least at an exact slide, and its ratio, for the message. */
  bestI: number;
  bestRatio: number;
  /** When the plate does not fit: the member reported, and its ratio. */
  failMember: string;
  failRatio: number;
}

// Module-level functions, not closures, and no objects until a plate fits: this runs for
// every plate of every joint per keystroke.

const capacityOf = (t: Trial, i: number, area: number): number => area * t.perArea[i];

/** Moves order[k] to the front (no spread: this runs for most plates tried). */
const toFront = (order: number[], k: number) => {
  const i = order[k];
  for (let j = k; j > 0; j--) order[j] = order[j - 1];
  order[0] = i;
};

/** Moves member i to the front of the check order and records it as the plate's failure. */
const failing = (t: Trial, i: number, ratio: number): undefined => {
  toFront(t.order, t.order.indexOf(i));
  t.failMember = t.joint.members[i].id;
  t.failRatio = ratio;
  return undefined;
};

/**
 * Whether every member holds at one slide; or, with `spread` > 0, a bound for every slide
 * within ±spread of `offset` (the plate swept across them: no slide there gives any member
 * more). Stops at the first member that fails and moves it to the front.
 */
const holds = (t: Trial, offset: number, spread: number): boolean => {
  for (let k = 0; k < t.order.length; k++) {
    const i = t.order[k];
    const area = regionAreaInPlate(t.regions[i], t.halfLength, t.halfWidth + spread, offset);
    const ratio = ratioOf(t.demand[i], capacityOf(t, i, area));
    if (ratio > 1) {
      if (spread === 0 && ratio < t.bestRatio) {
        t.bestI = i;
        t.bestRatio = ratio;
      }
      if (k > 0) toFront(t.order, k);
      return false;
    }
  }
  return true;
};

/** Every member's check at a slide that holds them all, in the joint's member order. */
const checksAt = (t: Trial, offset: number): MemberPlateCheck[] => {
  const checks: MemberPlateCheck[] = [];
  for (let i = 0; i < t.regions.length; i++) {
    const area = regionAreaInPlate(t.regions[i], t.halfLength, t.halfWidth, offset);
    const demand = t.demand[i];
    const capacity = capacityOf(t, i, area);
    // Every field written out: spreading the check and the angles in cost more than the rest.
    const a = t.angles[i];
    checks.push({
      member: t.joint.members[i].id,
      area,
      demand,
      capacity,
      ratio: ratioOf(demand, capacity),
      plateToLoad: a.plateToLoad,
      loadToGrain: a.loadToGrain,
      lateralValue: a.lateralValue,
      heelFactor: a.heelFactor,
    });
  }
  return checks;
};

/**
 * Slides of k1…k2 grid steps to one side: the offset of the one nearest the centre that holds
 * every member, found by halving the range wherever its swept bound still holds (branch and
 * bound).
 */
const nearestSlide = (t: Trial, side: number, k1: number, k2: number): number | undefined => {
  if (k1 > k2) return undefined;
  const mid = ((k1 + k2) / 2) * SLIDE_STEP_MM * side;
  if (k1 === k2) return holds(t, mid, 0) ? mid : undefined;
  if (!holds(t, mid, ((k2 - k1) / 2) * SLIDE_STEP_MM)) return undefined;
  const m = Math.floor((k1 + k2) / 2);
  return nearestSlide(t, side, k1, m) ?? nearestSlide(t, side, m + 1, k2);
};

/**
 * Tooth holding of every member for one plate, centred or at the slide nearest the centre
 * that holds them all; undefined when none does, with the member that fails at the best slide
 * tried in `t.failMember` (for the message when no plate fits). `exact` (the catalog's last
 * plate, whose failure is reported) skips the bounds that only tell that some member fails,
 * not which fails by the least.
 */
export const placePlate = (
  t: Trial,
  local: LocalMember[],
  frame: PlateFrame,
  exact: boolean,
): Fit | undefined => {
  const { steps } = frame;
  const plateArea = 4 * t.halfLength * t.halfWidth;
  // Cheap bound, for every slide at once: a member's band (its depth less the edge margins)
  // holds no more than out to the far corner of the plate slid furthest, nor the whole plate.
  const reachInPlate =
    Math.hypot(t.halfLength, t.halfWidth + steps * SLIDE_STEP_MM) - frame.endExclusion;
  let needed = 0;
  for (const i of t.order) {
    const band = 2 * Math.max(0, local[i].halfDepth - frame.edgeExclusion) * reachInPlate;
    const area = Math.min(plateArea, Math.max(0, band));
    if (t.demand[i] > capacityOf(t, i, area)) return failing(t, i, Infinity);
    if (t.demand[i] > 0) needed += t.demand[i] / t.perArea[i];
  }
  if (!exact) {
    // The members' contact regions are disjoint, so together they hold no more than the plate.
    if (needed > plateArea * (1 + AREA_SLACK)) return failing(t, t.order[0], Infinity);
    // No slide within ±steps gives any member more than the plate swept across all of them.
    if (steps > 0 && !holds(t, 0, steps * SLIDE_STEP_MM)) return failing(t, t.order[0], Infinity);
  }
  if (holds(t, 0, 0)) return { offset: 0, checks: checksAt(t, 0) };
  const up = nearestSlide(t, 1, 1, steps);
  const nearer = up !== undefined ? Math.round(Math.abs(up) / SLIDE_STEP_MM) - 1 : steps;
  const offset = nearestSlide(t, -1, 1, nearer) ?? up;
  return offset !== undefined
    ? { offset, checks: checksAt(t, offset) }
    : failing(t, t.bestI, t.bestRatio);
};
