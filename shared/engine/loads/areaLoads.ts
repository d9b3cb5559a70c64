import type { Joint, JointLoad } from '../analysis/types';
import { EngineError } from '../errors';
import type { Overhang, TrussProfile } from '../profiles/types';
import type { KPa, Mm } from '../units';
import type { LoadCaseId } from './combinations';

/** Design area loads (kPa); absent or zero means none. Wind uplift is a net upward magnitude. */
export interface AreaLoads {
  /** Top-chord live (roof live, case Lr), on the horizontal projection. */
  tcll?: KPa;
  /** Top-chord dead (case D), along the slope. */
  tcdl?: KPa;
  /** Bottom-chord live (attic, case L), on the horizontal projection. */
  bcll?: KPa;
  /** Bottom-chord dead (ceiling, case D), along the member. */
  bcdl?: KPa;
  /** Sloped-roof snow ps (case S), on the horizontal projection. */
  snow?: KPa;
  /** Net wind uplift (case W), normal to the top chord, outward. */
  windUplift?: KPa;
}

/** Line load across one chord member, N/mm; + points along the member's downward normal. */
export interface MemberLineLoad {
  member: string;
  transverse: number;
}

/** Cantilever moment at a heel from the overhang's load, N·mm; + is gravity (hogging). */
export interface OverhangMoment {
  side: Overhang['side'];
  heelJoint: string;
  member: string;
  moment: number;
}

/** Everything one load case puts on the truss. Gravity is −y. */
export interface CaseLoads {
  jointLoads: JointLoad[];
  memberLoads: MemberLineLoad[];
  /** Concentrated loads inside chord members (point loads between panel points). */
  pointLoads?: { member: string; at: number; fx?: number; fy: number }[];
  overhangMoments: OverhangMoment[];
}

type Projection = 'horizontal' | 'slope' | 'normal';

interface Source {
  key: keyof AreaLoads;
  loadCase: LoadCaseId;
  chord: 'topChord' | 'bottomChord';
  projection: Projection;
}

// Which case each area load belongs to and how it acts (DESIGN.md §4.3, common practice).
const SOURCES: Source[] = [
  { key: 'tcdl', loadCase: 'D', chord: 'topChord', projection: 'slope' },
  { key: 'bcdl', loadCase: 'D', chord: 'bottomChord', projection: 'slope' },
  { key: 'bcll', loadCase: 'L', chord: 'bottomChord', projection: 'horizontal' },
  { key: 'tcll', loadCase: 'Lr', chord: 'topChord', projection: 'horizontal' },
  { key: 'snow', loadCase: 'S', chord: 'topChord', projection: 'horizontal' },
  { key: 'windUplift', loadCase: 'W', chord: 'topChord', projection: 'normal' },
];

interface Geometry {
  dx: number;
  dy: number;
  length: number;
  /** Unit normal pointing away from the truss (outward). */
  outward: { x: number; y: number };
  /** outward · downward normal: −1 for a top chord, +1 for a bottom chord. */
  outwardDotDown: number;
}

function memberGeometry(a: Joint, b: Joint, centroid: { x: number; y: number }): Geometry {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const length = Math.hypot(dx, dy);
  let n = { x: -dy / length, y: dx / length };
  const mid = { x: (a.x + b.x) / 2 - centroid.x, y: (a.y + b.y) / 2 - centroid.y };
  if (n.x * mid.x + n.y * mid.y < 0) n = { x: -n.x, y: -n.y };
  // The downward normal is the perpendicular with negative y (x-sign breaks the vertical tie).
  const down = n.y < 0 || (n.y === 0 && n.x > 0) ? n : { x: -n.x, y: -n.y };
  return { dx, dy, length, outward: n, outwardDotDown: n.x * down.x + n.y * down.y };
}

/** Forces of a line load w (N/mm) on a member, as a total force vector and the transverse part. */
function lineLoadOn(g: Geometry, w: number, projection: Projection) {
  const cos = Math.abs(g.dx) / g.length;
  if (projection === 'horizontal') {
    return { fx: 0, fy: -w * Math.abs(g.dx), transverse: w * cos * cos };
  }
  if (projection === 'slope') return { fx: 0, fy: -w * g.length, transverse: w * cos };
  // Outward pressure on the member (wind uplift): signed so it reduces gravity.
  return {
    fx: w * g.length * g.outward.x,
    fy: w * g.length * g.outward.y,
    transverse: w * g.outwardDotDown,
  };
}

/** Load on an overhang of horizontal run a and slope length s: force to the heel and its moment. */
function overhangLoad(o: Overhang, g: Geometry, w: number, projection: Projection) {
  const a = o.horizontal;
  const s = o.slopeLength;
  if (projection === 'horizontal') return { fx: 0, fy: -w * a, moment: (w * a * a) / 2 };
  if (projection === 'slope') return { fx: 0, fy: -w * s, moment: (w * s * a) / 2 };
  return {
    fx: w * s * g.outward.x,
    fy: w * s * g.outward.y,
    // Normal pressure over the slope length s acts at s/2 from the heel.
    moment: (w * s * s * g.outwardDotDown) / 2,
  };
}

function validate(spacing: number, loads: AreaLoads): void {
  if (!(spacing > 0) || !Number.isFinite(spacing)) {
    throw new EngineError('invalid', 'Truss spacing must be a positive length.', { spacing });
  }
  for (const [key, value] of Object.entries(loads)) {
    if (value !== undefined && (!Number.isFinite(value) || value < 0)) {
      throw new EngineError('invalid', `Area load ${key} must be a number ≥ 0 (kPa).`, {
        [key]: value,
      });
    }
  }
}

/**
 * Turns area loads × spacing into per-case truss loads: joint loads lumped to panel points by
 * tributary length (half of each adjacent chord member), line loads across each chord member
 * (for bending), and overhang loads moved to the heel joint with their cantilever moments.
 */
export function areaLoadCases(
  profile: TrussProfile,
  spacing: Mm,
  loads: AreaLoads,
): Partial<Record<LoadCaseId, CaseLoads>> {
  validate(spacing, loads);
  const joints = new Map(profile.joints.map((j) => [j.id, j]));
  const centroid = {
    x: profile.joints.reduce((s, j) => s + j.x, 0) / profile.joints.length,
    y: profile.joints.reduce((s, j) => s + j.y, 0) / profile.joints.length,
  };
  const geometryOf = (from: string, to: string) => {
    const a = joints.get(from);
    const b = joints.get(to);
    if (!a || !b) {
      throw new EngineError(
        'geometry',
        `Member ${from}${to} refers to a joint that does not exist.`,
        {
          from,
          to,
        },
      );
    }
    return memberGeometry(a, b, centroid);
  };

  const out: Partial<Record<LoadCaseId, CaseLoads>> = {};
  const acc = new Map<
    LoadCaseId,
    { joints: Map<string, JointLoad>; members: Map<string, number>; moments: OverhangMoment[] }
  >();
  const bucket = (c: LoadCaseId) => {
    let b = acc.get(c);
    if (!b) {
      b = { joints: new Map(), members: new Map(), moments: [] };
      acc.set(c, b);
    }
    return b;
  };
  const addJoint = (c: LoadCaseId, joint: string, fx: number, fy: number) => {
    const j = bucket(c).joints;
    const cur = j.get(joint) ?? { joint, fx: 0, fy: 0 };
    j.set(joint, { joint, fx: (cur.fx ?? 0) + fx, fy: (cur.fy ?? 0) + fy });
  };

  for (const src of SOURCES) {
    const q = loads[src.key] ?? 0;
    if (q === 0) continue;
    // kPa = 1e-3 N/mm²; × spacing (mm) → N/mm along the chord.
    const w = q * 1e-3 * spacing;
    const b = bucket(src.loadCase);
    for (const m of profile.members.filter((mm) => mm.role === src.chord)) {
      const g = geometryOf(m.from, m.to);
      const f = lineLoadOn(g, w, src.projection);
      addJoint(src.loadCase, m.from, f.fx / 2, f.fy / 2);
      addJoint(src.loadCase, m.to, f.fx / 2, f.fy / 2);
      b.members.set(m.id, (b.members.get(m.id) ?? 0) + f.transverse);
    }
    if (src.chord !== 'topChord') continue;
    for (const o of profile.overhangs) {
      if (!(o.horizontal > 0)) continue;
      const member = profile.members.find((mm) => mm.id === o.member);
      if (!member) {
        throw new EngineError(
          'geometry',
          `Overhang continues member ${o.member}, which does not exist.`,
          {
            member: o.member,
          },
        );
      }
      const f = overhangLoad(o, geometryOf(member.from, member.to), w, src.projection);
      addJoint(src.loadCase, o.heelJoint, f.fx, f.fy);
      const prev = b.moments.find((x) => x.side === o.side);
      if (prev) prev.moment += f.moment;
      else
        b.moments.push({
          side: o.side,
          heelJoint: o.heelJoint,
          member: o.member,
          moment: f.moment,
        });
    }
  }

  const order = new Map(profile.joints.map((j, i) => [j.id, i]));
  for (const [c, b] of acc) {
    out[c] = {
      jointLoads: [...b.joints.values()].sort((x, y) => order.get(x.joint)! - order.get(y.joint)!),
      memberLoads: [...b.members.entries()].map(([member, transverse]) => ({ member, transverse })),
      overhangMoments: b.moments,
    };
  }
  return out;
}
