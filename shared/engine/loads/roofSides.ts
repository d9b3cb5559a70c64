import type { JointLoad } from '../analysis/types';
import type { TrussProfile } from '../profiles/types';
import type { CaseLoads, MemberLineLoad, OverhangMoment } from './areaLoads';

/** A side of a gable roof, named by the heel it runs down to. */
export type RoofSide = 'left' | 'right';

/**
 * Horizontal position of the ridge, mm: the highest top-chord joint of a gable profile; for a
 * mono or flat truss (one plane) the middle of the span, where the zones of a roof split.
 */
export function ridgeX(profile: TrussProfile): number {
  const kind = profile.params.kind;
  if (kind === 'mono' || kind === 'flat') return profile.params.span / 2;
  const byId = new Map(profile.joints.map((j) => [j.id, j]));
  let best = byId.get(profile.topChordJoints[0])!;
  for (const id of profile.topChordJoints) {
    const j = byId.get(id)!;
    if (j.y > best.y) best = j;
  }
  return best.x;
}

/**
 * The profile with only the top-chord members (and the overhang) on one side of the ridge, so
 * the area-load machinery can load one side. Other members keep their roles but carry nothing
 * from top-chord sources.
 */
export function sideProfile(profile: TrussProfile, side: RoofSide): TrussProfile {
  const x0 = ridgeX(profile);
  const byId = new Map(profile.joints.map((j) => [j.id, j]));
  const onSide = (from: string, to: string) => {
    const mid = (byId.get(from)!.x + byId.get(to)!.x) / 2;
    return side === 'left' ? mid < x0 : mid > x0;
  };
  return {
    ...profile,
    members: profile.members.filter((m) => m.role !== 'topChord' || onSide(m.from, m.to)),
    overhangs: profile.overhangs.filter((o) => o.side === side),
  };
}

const EMPTY: CaseLoads = { jointLoads: [], memberLoads: [], overhangMoments: [] };

/** A case's loads times a factor (loads are linear in the pressure). */
export function scaleCase(c: CaseLoads | undefined, factor: number): CaseLoads {
  if (!c) return EMPTY;
  return {
    jointLoads: c.jointLoads.map((l) => ({
      joint: l.joint,
      fx: factor * (l.fx ?? 0),
      fy: factor * (l.fy ?? 0),
    })),
    memberLoads: c.memberLoads.map((l) => ({
      member: l.member,
      transverse: factor * l.transverse,
    })),
    overhangMoments: c.overhangMoments.map((o) => ({ ...o, moment: factor * o.moment })),
  };
}

/** The sum of several cases' loads. */
export function sumCases(...cases: (CaseLoads | undefined)[]): CaseLoads {
  const joints = new Map<string, JointLoad>();
  const members = new Map<string, number>();
  const moments = new Map<string, OverhangMoment>();
  for (const c of cases) {
    if (!c) continue;
    for (const l of c.jointLoads) {
      const cur = joints.get(l.joint) ?? { joint: l.joint, fx: 0, fy: 0 };
      joints.set(l.joint, {
        joint: l.joint,
        fx: (cur.fx ?? 0) + (l.fx ?? 0),
        fy: (cur.fy ?? 0) + (l.fy ?? 0),
      });
    }
    for (const l of c.memberLoads)
      members.set(l.member, (members.get(l.member) ?? 0) + l.transverse);
    for (const o of c.overhangMoments) {
      const cur = moments.get(o.side);
      moments.set(o.side, cur ? { ...cur, moment: cur.moment + o.moment } : { ...o });
    }
  }
  const memberLoads: MemberLineLoad[] = [...members].map(([member, transverse]) => ({
    member,
    transverse,
  }));
  return {
    jointLoads: [...joints.values()],
    memberLoads,
    overhangMoments: [...moments.values()],
  };
}

/**
 * A vertical load w (N/mm of horizontal run, downward +) over the horizontal interval [x1, x2]
 * of the top chord inside the span. Each member carries its part as a simply supported panel:
 * the panel points take it by statics, and the member's transverse line load is the uniform one
 * with the same largest simple-span moment (8·Mmax/L², L along the member), so a partial load
 * bends a panel as much as the real one does between its panel points.
 */
export function partialTopChordLoad(
  profile: TrussProfile,
  w: number,
  x1: number,
  x2: number,
): CaseLoads {
  const byId = new Map(profile.joints.map((j) => [j.id, j]));
  const jointLoads: JointLoad[] = [];
  const memberLoads: MemberLineLoad[] = [];
  const lo = Math.min(x1, x2);
  const hi = Math.max(x1, x2);
  for (const m of profile.members) {
    if (m.role !== 'topChord') continue;
    const a = byId.get(m.from)!;
    const b = byId.get(m.to)!;
    const left = Math.min(a.x, b.x);
    const run = Math.abs(b.x - a.x);
    const u = Math.max(lo, left);
    const v = Math.min(hi, left + run);
    if (!(v > u) || !(run > 0) || w === 0) continue;
    const total = w * (v - u);
    const centroid = (u + v) / 2;
    const toB = (total * (centroid - a.x)) / (b.x - a.x);
    jointLoads.push({ joint: m.from, fx: 0, fy: -(total - toB) }, { joint: m.to, fx: 0, fy: -toB });
    // Largest moment of the partial load on a simple span of horizontal length `run`.
    const s1 = u - left;
    const r1 = (total * (run - (centroid - left))) / run;
    const x = s1 + r1 / w;
    const mMax = r1 * x - (w * (x - s1) ** 2) / 2;
    memberLoads.push({ member: m.id, transverse: (8 * mMax) / m.length ** 2 });
  }
  return sumCases({ jointLoads, memberLoads, overhangMoments: [] });
}
