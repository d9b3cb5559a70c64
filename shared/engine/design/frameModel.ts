import type { JointLoad } from '../analysis/types';
import type { CaseLoads } from '../loads';
import { designValues, parseLumberId, sectionProperties } from '../lumber';
import {
  prepareFrame,
  type FrameJointLoad,
  type FrameLoads,
  type FrameMemberLoad,
  type PreparedFrame,
} from '../frame';
import type { TrussProfile } from '../profiles/types';

/** The joint sequence of a chord piece: consecutive members share one joint. */
function jointsAlong(profile: TrussProfile, ids: readonly string[]): string[] {
  const byId = new Map(profile.members.map((m) => [m.id, m]));
  const ms = ids.map((id) => byId.get(id)!);
  if (ms.length === 1) return [ms[0].from, ms[0].to];
  const shared = (a: (typeof ms)[0], b: (typeof ms)[0]) =>
    a.from === b.from || a.from === b.to ? a.from : a.to;
  const first = shared(ms[0], ms[1]) === ms[0].to ? ms[0].from : ms[0].to;
  const out = [first];
  for (const m of ms) out.push(m.from === out[out.length - 1] ? m.to : m.from);
  return out;
}

/**
 * Member-end releases of the design frame, per member index: webs are pinned at both ends; a
 * chord is continuous through the panel points within one piece of lumber and hinged where the
 * piece ends (heel, peak, splice, change of direction), except at a heel where the piece runs on
 * into an overhang (common practice: a splice or heel plate is not designed for moment).
 */
export function memberReleases(profile: TrussProfile): { start: boolean[]; end: boolean[] } {
  const index = new Map(profile.members.map((m, k) => [m.id, k]));
  const start = profile.members.map(() => true);
  const end = profile.members.map(() => true);
  for (const piece of profile.pieces) {
    if (piece.role === 'web') continue;
    const joints = jointsAlong(profile, piece.members);
    piece.members.forEach((id, n) => {
      const k = index.get(id)!;
      const mb = profile.members[k];
      for (const [joint, last] of [
        [joints[n], n === 0],
        [joints[n + 1], n === piece.members.length - 1],
      ] as const) {
        const overhang = profile.overhangs.some(
          (o) => o.horizontal > 0 && o.member === id && o.heelJoint === joint,
        );
        const hinge = last && !overhang;
        if (mb.from === joint) start[k] = hinge;
        else end[k] = hinge;
      }
    });
  }
  return { start, end };
}

/** E (MPa, no CD: NDS 2018 Table 4.3.1), A and I of a lumber id with `plies` side by side. */
export function memberSection(lumberId: string, plies: number) {
  const { size } = parseLumberId(lumberId);
  const s = sectionProperties(size, plies);
  return { e: designValues(lumberId, { cd: 1, repetitive: false }).e, a: s.area, i: s.ix };
}

/**
 * The profile as a plane frame with each member's lumber (E, A, I) and the releases of
 * `memberReleases`, factorised once for every load set of the design.
 */
export function designFrame(
  profile: TrussProfile,
  lumberOf: readonly string[],
  plies: number,
): PreparedFrame {
  const releases = memberReleases(profile);
  const sections = new Map<string, ReturnType<typeof memberSection>>();
  return prepareFrame({
    joints: profile.joints,
    supports: profile.supports,
    members: profile.members.map((m, k) => {
      let s = sections.get(lumberOf[k]);
      if (!s) sections.set(lumberOf[k], (s = memberSection(lumberOf[k], plies)));
      return {
        id: m.id,
        from: m.from,
        to: m.to,
        e: s.e,
        a: s.a,
        i: s.i,
        releaseStart: releases.start[k],
        releaseEnd: releases.end[k],
      };
    }),
  });
}

/** Unit normal of a member toward its downward side (x > 0 on a vertical member). */
function downNormal(
  joints: ReadonlyMap<string, { x: number; y: number }>,
  from: string,
  to: string,
) {
  const a = joints.get(from)!;
  const b = joints.get(to)!;
  const len = Math.hypot(b.x - a.x, b.y - a.y);
  const x = -(b.y - a.y) / len;
  const y = (b.x - a.x) / len;
  return y < 0 || (y === 0 && x > 0) ? { x, y, len } : { x: -x, y: -y, len };
}

/** What every load set of a profile reuses: member index by id, each member's down normal. */
interface ProfileLoadGeometry {
  index: ReadonlyMap<string, number>;
  normals: { x: number; y: number; len: number }[];
}

// Loads are built several times per design (each combination, each sizing pass, deflection):
// the geometry they need is the profile's and is computed once per profile.
const geometryOf = new WeakMap<TrussProfile, ProfileLoadGeometry>();

function loadGeometry(profile: TrussProfile): ProfileLoadGeometry {
  let g = geometryOf.get(profile);
  if (!g) {
    const byId = new Map(profile.joints.map((j) => [j.id, j]));
    g = {
      index: new Map(profile.members.map((m, k) => [m.id, k])),
      normals: profile.members.map((mb) => downNormal(byId, mb.from, mb.to)),
    };
    geometryOf.set(profile, g);
  }
  return g;
}

/**
 * Loads of one load set on the design frame. The loads module lumps each chord's line load to
 * its panel points (half of each member's total to each end) and gives the part across the
 * member as `transverse` (N/mm, + along the downward normal): here that part goes back onto the
 * member as a line load and its lumped half is taken off each end, so the frame carries the real
 * line loads; the part along the member stays lumped (the member's axial force is then its
 * mid-length value). An overhang, a statically determinate cantilever, enters as its force and
 * moment at the heel.
 */
export function frameLoadsOf(
  profile: TrussProfile,
  jointLoads: readonly JointLoad[],
  transverse: ArrayLike<number>,
  overhangMoment: ArrayLike<number>,
  points: readonly { member: string; at: number; fx?: number; fy: number }[] = [],
): FrameLoads {
  const joints = new Map<string, FrameJointLoad>();
  const at = (joint: string) => {
    let l = joints.get(joint);
    if (!l) joints.set(joint, (l = { joint, fx: 0, fy: 0, m: 0 }));
    return l;
  };
  for (const l of jointLoads) {
    const j = at(l.joint);
    j.fx! += l.fx ?? 0;
    j.fy! += l.fy ?? 0;
  }
  const members: FrameMemberLoad[] = [];
  const { index, normals } = loadGeometry(profile);
  profile.members.forEach((mb, k) => {
    const t = transverse[k];
    if (!t) return;
    const n = normals[k];
    for (const end of [mb.from, mb.to]) {
      const j = at(end);
      j.fx! -= (t * n.len * n.x) / 2;
      j.fy! -= (t * n.len * n.y) / 2;
    }
    members.push({ kind: 'uniform', member: mb.id, transverse: t });
  });
  const seen = new Set<number>();
  for (const o of profile.overhangs) {
    const k = index.get(o.member);
    if (k === undefined || seen.has(k) || !overhangMoment[k]) continue;
    seen.add(k);
    // A left overhang's gravity load turns the heel counter-clockwise, a right one clockwise.
    at(o.heelJoint).m! += (o.side === 'left' ? 1 : -1) * overhangMoment[k];
  }
  for (const p of points) members.push({ kind: 'point', ...p });
  return { joints: [...joints.values()], members };
}

/** Frame loads of a sum of factored unfactored cases (e.g. D + Lr for deflection). */
export function caseFrameLoads(
  profile: TrussProfile,
  terms: readonly (readonly [CaseLoads | undefined, number])[],
): FrameLoads {
  const { index } = loadGeometry(profile);
  const transverse = new Float64Array(profile.members.length);
  const overhang = new Float64Array(profile.members.length);
  const jointLoads: JointLoad[] = [];
  const points: { member: string; at: number; fy: number }[] = [];
  for (const [c, f] of terms) {
    if (!c) continue;
    for (const p of c.pointLoads ?? []) points.push({ member: p.member, at: p.at, fy: f * p.fy });
    for (const l of c.jointLoads)
      jointLoads.push({ joint: l.joint, fx: f * (l.fx ?? 0), fy: f * (l.fy ?? 0) });
    for (const l of c.memberLoads) transverse[index.get(l.member)!] += f * l.transverse;
    for (const o of c.overhangMoments) overhang[index.get(o.member)!] += f * o.moment;
  }
  return frameLoadsOf(profile, jointLoads, transverse, overhang, points);
}
