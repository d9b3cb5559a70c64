import type { CaseLoads } from '../loads/areaLoads';
import { EngineError } from '../errors';
import type { TrussProfile } from '../profiles/types';
import { MM_PER_INCH, type Mm, type Newton } from '../units';
import type { DesignCaseId } from './combinedLoads';

/** The live case a point load belongs to: roof live, snow, or floor/attic live. */
export type PointLoadKind = 'Lr' | 'S' | 'L';

/**
 * A concentrated load on a chord, e.g. the reaction of trusses hung on a girder. `x` is the
 * horizontal distance from the left heel (mm); `dead` and `live` are unfactored forces (N,
 * downward + ) and `kind` names the live load's case (and so its combinations and CD).
 */
export interface EnginePointLoad {
  x: Mm;
  chord: 'top' | 'bottom';
  dead: Newton;
  live: Newton;
  kind: PointLoadKind;
  label?: string;
}

/** A concentrated load on a member at `at` mm from its `from` end (global components, N). */
export interface MemberPointLoad {
  member: string;
  at: number;
  fx?: number;
  fy: number;
}

/** Where a point load lands: at a panel point (a joint load) or inside a chord member. */
export type PointLoadPlace = { joint: string } | { member: string; at: number };

/** Within this horizontal distance of a panel point a load is taken as at the panel point, mm. */
export const PANEL_POINT_SNAP_MM = 1;

const ROLE = { top: 'topChord', bottom: 'bottomChord' } as const;

/**
 * The chord member (or panel point) under horizontal position x. Throws EngineError `invalid`
 * when no chord of that kind spans x (outside the bearings, or on an overhang, which is not
 * modelled for point loads).
 */
export function placePointLoad(
  profile: TrussProfile,
  chord: EnginePointLoad['chord'],
  x: number,
): PointLoadPlace {
  const at = new Map(profile.joints.map((j) => [j.id, j]));
  let best: PointLoadPlace | undefined;
  for (const mb of profile.members) {
    if (mb.role !== ROLE[chord]) continue;
    const a = at.get(mb.from)!;
    const b = at.get(mb.to)!;
    const lo = Math.min(a.x, b.x);
    const hi = Math.max(a.x, b.x);
    if (
      hi - lo < PANEL_POINT_SNAP_MM ||
      x < lo - PANEL_POINT_SNAP_MM ||
      x > hi + PANEL_POINT_SNAP_MM
    )
      continue;
    if (Math.abs(x - a.x) <= PANEL_POINT_SNAP_MM) return { joint: a.id };
    if (Math.abs(x - b.x) <= PANEL_POINT_SNAP_MM) return { joint: b.id };
    best = { member: mb.id, at: (Math.abs(x - a.x) / (hi - lo)) * mb.length };
  }
  if (best) return best;
  const span = profile.params.span;
  throw new EngineError(
    'invalid',
    `A point load at ${(x / MM_PER_INCH).toFixed(1)} in. from the left heel is not on the ${chord} chord ` +
      `(point loads go between the bearings, 0 to ${(span / MM_PER_INCH).toFixed(1)} in.).`,
    { x, chord },
  );
}

const emptyCase = (): CaseLoads => ({ jointLoads: [], memberLoads: [], overhangMoments: [] });

function addTo(c: CaseLoads, place: PointLoadPlace, force: number) {
  if (force === 0) return;
  if ('joint' in place) c.jointLoads.push({ joint: place.joint, fy: -force });
  else (c.pointLoads ??= []).push({ member: place.member, at: place.at, fy: -force });
}

/**
 * Adds point loads to the design's load cases: dead to D, live to its kind's case (created when
 * the area loads have none, so its combinations appear). Snow also goes into each unbalanced
 * snow case, which stands in for S in its combinations: the hung trusses' snow reaction is
 * taken whole there too (conservative; it is not redistributed). Returns a note, or none.
 */
export function addPointLoads(
  cases: Partial<Record<DesignCaseId, CaseLoads>>,
  profile: TrussProfile,
  loads: readonly EnginePointLoad[] | undefined,
): string[] {
  if (!loads || loads.length === 0) return [];
  for (const l of loads) {
    if (![l.x, l.dead, l.live].every(Number.isFinite) || l.dead < 0 || l.live < 0) {
      throw new EngineError('invalid', 'A point load needs a position and loads of 0 or more.', {
        load: l.label ?? null,
      });
    }
    const place = placePointLoad(profile, l.chord, l.x);
    addTo((cases.D ??= emptyCase()), place, l.dead);
    if (l.live > 0) {
      addTo((cases[l.kind] ??= emptyCase()), place, l.live);
      if (l.kind === 'S')
        for (const u of ['SuL', 'SuR'] as const) if (cases[u]) addTo(cases[u], place, l.live);
    }
  }
  return [
    `Point loads (${loads.length}): at a panel point as a joint load, between panel points as a concentrated load on the chord member (its bending and shear in the chord); dead with D, live with its case (roof live, snow or floor live). Snow point loads are taken whole in the unbalanced snow cases too.`,
  ];
}
