import { isEngineError } from '../errors';
import { dressedSize, parseLumberId } from '../lumber';
import { designJointPlate } from '../plates';
import type { PlateCatalog, PlateJointKind, PlateJointMember } from '../plates/types';
import type { TrussProfile } from '../profiles/types';
import { mm, newton } from '../units';
import type { MemberDemands } from './demands';
import type { DesignPlate } from './types';

/**
 * Kind of each joint for the plate's steel checks: a heel where a top and a bottom chord meet, a
 * splice where a chord piece ends at a splice, otherwise a panel point.
 */
export function jointKinds(profile: TrussProfile): Map<string, PlateJointKind> {
  const kinds = new Map<string, PlateJointKind>();
  const roles = new Map<string, Set<string>>();
  for (const m of profile.members) {
    for (const j of [m.from, m.to]) {
      const set = roles.get(j) ?? new Set<string>();
      set.add(m.role);
      roles.set(j, set);
    }
  }
  const splices = new Set(profile.pieces.flatMap((p) => p.spliceAt ?? []));
  for (const j of profile.joints) {
    const r = roles.get(j.id);
    kinds.set(
      j.id,
      r?.has('topChord') && r.has('bottomChord') ? 'heel' : splices.has(j.id) ? 'splice' : 'panel',
    );
  }
  return kinds;
}

/**
 * A chord's tooth loads at one of its ends, per combination: its axial force N and its end shear
 * V there act on the plate together, so the teeth carry √(N² + V²)/CD at atan(|V|/|N|) to the
 * grain (the vector sum; Hankinson's formula then gives the tooth value, `lateralValue`). Webs
 * are pinned: their load runs along the grain.
 */
function toothCases(
  demands: MemberDemands,
  endShear: Float64Array,
  cds: readonly number[],
  k: number,
  plies: number,
): { force: number; loadToGrain: number }[] {
  const m = demands.members;
  return cds.map((cd, i) => {
    const n = Math.abs(demands.axial[i * m + k]) / plies;
    const v = endShear[i * m + k] / plies;
    return { force: Math.hypot(n, v) / cd, loadToGrain: Math.atan2(v, n) };
  });
}

/**
 * Plates (both faces) at every joint. Each member's tooth demand is its envelope max over the
 * combinations of |F|/CD with the plate's CD = 1: tooth holding scales with CD, so this is the
 * same check as one per combination, done in one call per joint. The steel (tension, shear and
 * both combined across every section of `steelSections`: heel and splice lines, the chord's face
 * at a panel point, the joint line at a peak) takes each combination's full signed forces:
 * steel capacities are not adjusted for load duration (common practice; ANSI/TPI 1-2014 Ch. 5
 * tests the steel without a duration factor, from memory). Tooth values follow each member's
 * angle to the plate (`lateralValue`) and, for a chord, the direction of its axial force and end
 * shear together (`toothCases`); the top chord at a heel takes `heelReduction`.
 * A joint with no fitting plate
 * is reported (`ok: false`, with the reason), never thrown.
 */
export function designPlates(
  profile: TrussProfile,
  demands: MemberDemands,
  cds: readonly number[],
  lumberOf: readonly string[],
  catalog: PlateCatalog,
  plies = 1,
): DesignPlate[] {
  const m = profile.members.length;
  const envelope = new Float64Array(m);
  const steelEnvelope = new Float64Array(m);
  for (let i = 0; i < cds.length; i++) {
    for (let k = 0; k < m; k++) {
      // Each ply is plated on its own faces and carries 1/plies of the force.
      const full = Math.abs(demands.axial[i * m + k]) / plies;
      if (full / cds[i] > envelope[k]) envelope[k] = full / cds[i];
      if (full > steelEnvelope[k]) steelEnvelope[k] = full;
    }
  }
  const depthOf = new Map<string, number>();
  const depth = (id: string) => {
    let d = depthOf.get(id);
    if (d === undefined) depthOf.set(id, (d = dressedSize(parseLumberId(id).size).width));
    return d;
  };
  const at = new Map(profile.joints.map((j) => [j.id, j]));
  const meeting = new Map<string, PlateJointMember[]>(profile.joints.map((j) => [j.id, []]));
  profile.members.forEach((mb, k) => {
    const a = at.get(mb.from)!;
    const b = at.get(mb.to)!;
    // Signed full force per combination: forces crossing one steel section add as vectors.
    // A plain loop, not Array.from with a map function (several times slower).
    const steelForces: number[] = [];
    for (let i = 0; i < cds.length; i++) steelForces.push(demands.axial[i * m + k] / plies);
    const d = mm(depth(lumberOf[k]));
    const member = (dx: number, dy: number, endShear: Float64Array): PlateJointMember => ({
      id: mb.id,
      role: mb.role,
      direction: { x: dx, y: dy },
      depth: d,
      force: newton(envelope[k]),
      steelForce: newton(steelEnvelope[k]),
      steelForces,
      ...(mb.role !== 'web' && { toothCases: toothCases(demands, endShear, cds, k, plies) }),
    });
    meeting.get(a.id)!.push(member(b.x - a.x, b.y - a.y, demands.startShear));
    meeting.get(b.id)!.push(member(a.x - b.x, a.y - b.y, demands.endShear));
  });
  const kinds = jointKinds(profile);
  // The top chord's board runs on past a heel into its overhang: the plate's teeth there hold
  // the top chord too (common practice: the top chord is the through board at a pointed heel).
  for (const o of profile.overhangs) {
    const k = profile.members.findIndex((mb) => mb.id === o.member);
    const tc = meeting
      .get(o.heelJoint)
      ?.find((pm) => pm.id === o.member && pm.partOf === undefined);
    if (k < 0 || !tc || !(o.slopeLength > 0)) continue;
    meeting.get(o.heelJoint)!.push({
      id: `${o.member} overhang`,
      role: 'topChord',
      direction: { x: -tc.direction.x, y: -tc.direction.y },
      depth: tc.depth,
      force: newton(0),
      partOf: o.member,
      length: mm(o.slopeLength),
    });
  }
  return profile.joints.map((j): DesignPlate => {
    const kind = kinds.get(j.id)!;
    try {
      const design = designJointPlate(
        { id: j.id, x: j.x, y: j.y, kind, members: meeting.get(j.id)! },
        catalog,
        { cd: 1 },
      );
      return { joint: j.id, kind, design, ok: true };
    } catch (e) {
      if (isEngineError(e) && e.code === 'no_plate_fits') {
        return { joint: j.id, kind, ok: false, message: e.message };
      }
      throw e;
    }
  });
}
