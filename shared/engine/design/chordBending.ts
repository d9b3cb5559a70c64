import { spanPeakMoment, supportMoments } from '../beams';
import type { TrussProfile } from '../profiles/types';

/**
 * One chord piece as a continuous beam: its members in order along the piece (member indices),
 * supported at every panel point, with the overhang cantilever (if any) beyond an end support.
 */
export interface ChordBeam {
  /** Member indices along the piece, one per span. */
  members: number[];
  /** Span lengths (the members' lengths), mm. */
  spans: Float64Array;
  /** Member indices whose overhang moment acts at the start / end support (−1: none). */
  startOverhang: number;
  endOverhang: number;
  /**
   * A one-member piece with an overhang at each end: the per-member overhang moment cannot be
   * split between the ends, so that member keeps max(wL²/8, |overhang moment|).
   */
  simpleFallback: boolean;
}

/** Bending per member for one set of loads, N·mm (≥ 0). */
export interface ChordMoments {
  /** Largest |M| between the member's end supports (0 when the ends govern). */
  span: Float64Array;
  /** Largest |M| at the member's two end supports. */
  support: Float64Array;
}

/** The joint sequence of a piece: consecutive members share one joint. */
function jointsAlong(profile: TrussProfile, members: number[]): string[] {
  const ms = members.map((k) => profile.members[k]);
  if (ms.length === 1) return [ms[0].from, ms[0].to];
  const shared = (a: (typeof ms)[0], b: (typeof ms)[0]) =>
    a.from === b.from || a.from === b.to ? a.from : a.to;
  const first = shared(ms[0], ms[1]) === ms[0].to ? ms[0].from : ms[0].to;
  const out = [first];
  for (const m of ms) out.push(m.from === out[out.length - 1] ? m.to : m.from);
  return out;
}

/**
 * The continuous beams of a profile's chords, one per chord piece (common practice: a chord is
 * continuous over its panel points within one piece of lumber). Pieces end at the peak, at a
 * change of chord direction and at a splice; each such end is taken as a hinge (no moment):
 * a splice plate is not designed for moment here, which is conservative for the span moments.
 * Heel overhangs hang as cantilevers beyond the heel support of their top-chord piece.
 */
export function chordBeams(profile: TrussProfile): ChordBeam[] {
  const index = new Map(profile.members.map((m, k) => [m.id, k]));
  return profile.pieces
    .filter((p) => p.role !== 'web')
    .map((p) => {
      const members = p.members.map((id) => index.get(id)!);
      const joints = jointsAlong(profile, members);
      let startOverhang = -1;
      let endOverhang = -1;
      for (const o of profile.overhangs) {
        if (!(o.horizontal > 0)) continue;
        const k = index.get(o.member);
        if (k === undefined) continue;
        if (o.heelJoint === joints[0] && k === members[0]) startOverhang = k;
        else if (o.heelJoint === joints[joints.length - 1] && k === members[members.length - 1])
          endOverhang = k;
      }
      const simpleFallback = members.length === 1 && startOverhang >= 0 && endOverhang >= 0;
      const spans = new Float64Array(members.map((k) => profile.members[k].length));
      return { members, spans, startOverhang, endOverhang, simpleFallback };
    });
}

/**
 * Chord moments for one set of loads (a load case or a factored combination: moments are linear
 * in the loads), per member index. `transverse` is the line load across each member, N/mm (+ along its downward
 * normal), and `overhangMoment` the cantilever moment at the heel of the member it continues,
 * N·mm (+ gravity, hogging). Each chord piece is solved as a continuous beam on rigid supports
 * at its panel points (truss joint deflection ignored, as is the axial force's P-Δ effect, which
 * the NDS 3.9.2 amplifier covers in the member check). Webs get 0. Writes into `into` from
 * `offset` when given (row-major demand arrays, no allocation per combination).
 */
export function chordMoments(
  beams: readonly ChordBeam[],
  transverse: ArrayLike<number>,
  overhangMoment: ArrayLike<number>,
  into: ChordMoments = {
    span: new Float64Array(transverse.length),
    support: new Float64Array(transverse.length),
  },
  offset = 0,
): ChordMoments {
  const { span, support } = into;
  for (const b of beams) {
    const { spans, members } = b;
    if (b.simpleFallback) {
      const k = members[0];
      span[offset + k] = Math.abs(transverse[k]) * spans[0] * spans[0] * 0.125;
      support[offset + k] = Math.abs(overhangMoment[k]);
      continue;
    }
    const loads = new Float64Array(members.length);
    for (let j = 0; j < members.length; j++) loads[j] = transverse[members[j]];
    const m = supportMoments({
      spans,
      loads,
      startMoment: b.startOverhang >= 0 ? overhangMoment[b.startOverhang] : 0,
      endMoment: b.endOverhang >= 0 ? overhangMoment[b.endOverhang] : 0,
    });
    for (let j = 0; j < members.length; j++) {
      const k = offset + members[j];
      span[k] = Math.abs(spanPeakMoment(spans[j], loads[j], m[j], m[j + 1]));
      support[k] = Math.max(Math.abs(m[j]), Math.abs(m[j + 1]));
    }
  }
  return into;
}
