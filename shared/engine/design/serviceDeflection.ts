import { solveFrame, type FrameLoads, type FrameResult, type PreparedFrame } from '../frame';
import type { CaseLoads } from '../loads';
import type { TrussProfile } from '../profiles/types';
import type { DesignCaseId } from './combinedLoads';
import type { SolvedSet } from './deflection';
import { caseFrameLoads } from './frameModel';
import type { DeflectionCheck, DesignDeflection } from './types';

const CASE_OF_LABEL: Record<string, DesignCaseId> = { Lr: 'Lr', S: 'S', L: 'L', 'L(bc)': 'Lbc' };

/** Horizontal movement of the roller bearing relative to the pin, mm (+ outward: spreading). */
export interface RollerMovement {
  joint: string;
  /** Load set, e.g. "D + Lr". */
  load: string;
  movement: number;
}

/** Deflections between and beyond the panel points (mm, down +), from the design frame. */
export interface ServiceDeflection {
  /** Largest drop at mid-length of a bottom-chord panel, live and dead + live, span/n limits. */
  midPanel: { live?: DeflectionCheck; total: DeflectionCheck };
  /**
   * Largest tip movement of an overhang (up or down), live and dead + live, against l/n with l
   * twice the overhang's horizontal run (IBC Table 1604.3 footnote for cantilevers, from memory).
   */
  overhangTip?: { live?: DeflectionCheck; total: DeflectionCheck };
  /** Scissor trusses: horizontal movement of the roller bearing under dead + live. */
  rollerMovement?: RollerMovement;
}

/** Unit normal of a frame member toward its downward side (x > 0 on a vertical member). */
function downNormal(frame: PreparedFrame, e: number) {
  const c = frame.cos[e];
  const s = frame.sin[e];
  const yDown = c < 0 || (c === 0 && -s > 0);
  return yDown ? { x: -s, y: c } : { x: s, y: -c };
}

/**
 * Drop at mid-length of member e relative to the straight line between its ends, along its
 * downward normal, mm (Euler–Bernoulli, no P-Δ): the simple beam under its own transverse loads,
 * 5wL⁴/(384EI) for a uniform load and P·a(3L² − 4a²)/(48EI) for a point load a from the nearer
 * end, plus (M₁ + M₂)L²/(16EI) from the end moments (sagging +).
 */
function midSpanSag(frame: PreparedFrame, loads: FrameLoads, result: FrameResult, e: number) {
  const member = frame.model.members[e];
  const L = frame.length[e];
  const ei = member.e * member.i;
  const n = downNormal(frame, e);
  let sag = 0;
  for (const l of loads.members ?? []) {
    if (l.member !== member.id) continue;
    if (l.kind === 'uniform') {
      const scale = l.per === 'horizontal' ? Math.abs(frame.cos[e]) : 1;
      const w = ((l.wx ?? 0) * n.x + (l.wy ?? 0) * n.y) * scale + (l.transverse ?? 0);
      sag += (5 * w * L ** 4) / (384 * ei);
    } else {
      const p = (l.fx ?? 0) * n.x + (l.fy ?? 0) * n.y;
      const a = Math.min(l.at, L - l.at);
      sag += (p * a * (3 * L * L - 4 * a * a)) / (48 * ei);
    }
  }
  const r = result.members[e];
  return sag + ((r.startMoment + r.endMoment) * L * L) / (16 * ei);
}

/** Largest downward drop at mid-length of any bottom-chord member, mm, and that member. */
function midPanelDrop(
  frame: PreparedFrame,
  profile: TrussProfile,
  loads: FrameLoads,
  result: FrameResult,
) {
  let worst = { drop: -Infinity, member: '' };
  profile.members.forEach((mb, e) => {
    if (mb.role !== 'bottomChord') return;
    const a = result.displacements[frame.from[e]];
    const b = result.displacements[frame.to[e]];
    const sag = midSpanSag(frame, loads, result, e);
    // The sag is along the downward normal; its vertical part is sag·(−n.y).
    const drop = -(a.uy + b.uy) / 2 - sag * downNormal(frame, e).y;
    if (drop > worst.drop) worst = { drop, member: mb.id };
  });
  return worst;
}

/**
 * Vertical tip movement of each overhang, mm (down +): the heel's drop, the heel's rotation
 * carried out to the tip, and the cantilever's own bending. The overhang enters the frame as its
 * heel moment M (transverse load × its lever about the heel), so its load across the chord is
 * w⊥ = 2M/s² over its slope length s, the tip deflects w⊥s⁴/(8EI) = Ms²/(4EI) square to the chord
 * and Ms²/(4EI)·a/s vertically (a: horizontal run).
 */
function overhangTips(
  frame: PreparedFrame,
  profile: TrussProfile,
  terms: readonly (readonly [CaseLoads | undefined, number])[],
  result: FrameResult,
) {
  return profile.overhangs
    .filter((o) => o.horizontal > 0)
    .map((o) => {
      let moment = 0;
      for (const [c, f] of terms) {
        for (const m of c?.overhangMoments ?? [])
          if (m.heelJoint === o.heelJoint) moment += f * m.moment;
      }
      const e = frame.memberIndex.get(o.member)!;
      const { e: modulus, i } = frame.model.members[e];
      const u = result.displacements[frame.jointIndex.get(o.heelJoint)!];
      const a = o.horizontal;
      const s = o.slopeLength;
      // A left overhang's tip rises as the heel turns clockwise (rz < 0): tip uy = −a·rz.
      const turn = (o.side === 'left' ? a : -a) * u.rz;
      const own = ((moment * s * s) / (4 * modulus * i)) * (a / s);
      return { joint: `${o.side} overhang tip`, run: a, drop: -u.uy + turn + own };
    });
}

const ratioCheck = (
  load: string,
  joint: string,
  movement: number,
  length: number,
  limit: number,
): DeflectionCheck => {
  const max = Math.abs(movement);
  const ratio = max > 0 ? length / max : Infinity;
  return { load, max, joint, ratio, limit, pass: ratio >= limit };
};

/**
 * Mid-panel and overhang-tip deflection, and (scissor) the roller bearing's movement, from the
 * design frame with the chosen lumber under the unfactored live case of `deflection` and dead
 * plus it: one extra frame solve per load set.
 */
export function serviceDeflection(
  frame: PreparedFrame,
  profile: TrussProfile,
  cases: Partial<Record<DesignCaseId, CaseLoads>>,
  deflection: DesignDeflection,
  limits: { live: number; total: number },
  solved: { live?: SolvedSet; total?: SolvedSet } = {},
): ServiceDeflection {
  const liveId = deflection.liveCase ? CASE_OF_LABEL[deflection.liveCase] : undefined;
  const sets: { name: 'live' | 'total'; load: string; terms: [CaseLoads | undefined, number][] }[] =
    [
      ...(liveId
        ? [
            {
              name: 'live' as const,
              load: deflection.liveCase!,
              terms: [[cases[liveId], 1]] as [CaseLoads | undefined, number][],
            },
          ]
        : []),
      {
        name: 'total',
        load: deflection.total.load,
        terms: [
          [cases.D, 1],
          [liveId && cases[liveId], 1],
        ],
      },
    ];
  const span = profile.params.span;
  const out: ServiceDeflection = { midPanel: {} as ServiceDeflection['midPanel'] };
  for (const set of sets) {
    // The same load sets as `designDeflection`'s: reuse its solutions when given.
    const known = solved[set.name];
    const loads = known?.loads ?? caseFrameLoads(profile, set.terms);
    const result = known?.result ?? solveFrame(frame, loads);
    const limit = limits[set.name];
    const mid = midPanelDrop(frame, profile, loads, result);
    out.midPanel[set.name] = ratioCheck(
      set.load,
      `mid-panel of ${mid.member}`,
      mid.drop,
      span,
      limit,
    );
    const tips = overhangTips(frame, profile, set.terms, result);
    if (tips.length > 0) {
      const worst = tips.reduce((p, q) =>
        Math.abs(q.drop) / q.run > Math.abs(p.drop) / p.run ? q : p,
      );
      out.overhangTip ??= {} as NonNullable<ServiceDeflection['overhangTip']>;
      out.overhangTip[set.name] = ratioCheck(
        set.load,
        worst.joint,
        worst.drop,
        2 * worst.run,
        limit,
      );
    }
    if (set.name === 'total' && profile.params.kind === 'scissor') {
      out.rollerMovement = rollerMovement(frame, profile, result, set.load);
    }
  }
  return out;
}

function rollerMovement(
  frame: PreparedFrame,
  profile: TrussProfile,
  result: FrameResult,
  load: string,
): RollerMovement | undefined {
  const roller = profile.supports.find((s) => s.type === 'roller');
  const pin = profile.supports.find((s) => s.type === 'pin');
  if (!roller || !pin) return undefined;
  const at = (id: string) => result.displacements[frame.jointIndex.get(id)!];
  const x = (id: string) => profile.joints.find((j) => j.id === id)!.x;
  const outward = Math.sign(x(roller.joint) - x(pin.joint)) || 1;
  return {
    joint: roller.joint,
    load,
    movement: outward * (at(roller.joint).ux - at(pin.joint).ux),
  };
}
