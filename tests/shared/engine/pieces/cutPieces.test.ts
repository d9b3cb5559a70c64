import { describe, expect, it } from 'vitest';
import { cutPieces } from '../../../../shared/engine/pieces';
import { generateProfile } from '../../../../shared/engine/profiles/generate';
import type { ProfileParams } from '../../../../shared/engine/profiles/types';

/**
 * Piece geometry against closed forms worked by hand. Layout conventions (common practice): a
 * top chord's top edge and a bottom chord's bottom edge lie on the design lines, webs are centred
 * on their panel points, the top chord runs over the bottom chord at a pointed heel, chords run
 * through webs. Lumber 2x4: dressed width d = 3.5 in (PS 20 / NDS 2018 Supplement Table 1A).
 * Lengths in inches here; the engine answers in mm rounded to 1/16 in.
 */
const IN = 25.4;
const FT = 12 * IN;
const d = 3.5;
const LUMBER = '2x4 SPF-1/2';

const cut = (params: Partial<ProfileParams> & Pick<ProfileParams, 'kind' | 'span'>) => {
  const profile = generateProfile({
    pitch: 6,
    heelHeight: 0,
    overhangLeft: 0,
    overhangRight: 0,
    ...params,
  });
  const lumber = Object.fromEntries(profile.pieces.map((p) => [p.id, LUMBER]));
  return { profile, ...cutPieces(profile, lumber) };
};

const sixteenth = (inches: number) => Math.round(inches * 16);
const deg = (rad: number) => (rad * 180) / Math.PI;

describe('king post, 16 ft at 6/12, pointed heels, no overhang', () => {
  // θ = atan(6/12) = 26.565°; sin θ = 1/√5, cos θ = 2/√5. Span L = 192 in, rise R = 96 × ½ = 48 in.
  const theta = Math.atan(0.5);
  const { pieces } = cut({ kind: 'kingPost', span: 16 * FT });
  const byMark = Object.fromEntries(pieces.map((p) => [p.mark, p]));

  it('top chords: one mirror pair, top-edge length L/2 ÷ cos θ, heel cut θ, plumb peak 90° − θ', () => {
    // The top edge is the design line from the heel (0, 0) to the peak (96, 48): 96 / cos θ =
    // 48√5 = 107.331 in. At the heel the chord is cut off along the bearing line (a single cut at
    // θ to its edges, from (0, 0) to (d / sin θ, 0)); at the peak it is cut plumb (90° − θ). The
    // top edge is the longest line of the board, so the long-point length is 107 5/16 in.
    const tc = byMark.TC1;
    expect(tc.pieces).toEqual(['TC1', 'TC2']);
    expect(tc.perTruss).toBe(2);
    expect(tc.sixteenths).toBe(sixteenth(96 / Math.cos(theta)));
    const [heel, peak] = tc.ends;
    expect(heel).toMatchObject({ site: 'heel', kind: 'single' });
    expect(heel.angles[0]).toBeWithin(deg(theta), { abs: 1e-6 });
    expect(peak).toMatchObject({ site: 'peak', kind: 'single' });
    expect(peak.angles[0]).toBeWithin(90 - deg(theta), { abs: 1e-6 });
  });

  it('bottom chord: cut at both heels along the top chord underside, heel cut angle = pitch angle', () => {
    // The top chord's underside is y = x tan θ − d / cos θ; it meets the bearing line at
    // x = d / sin θ = 3.5√5 = 7.826 in. The bottom chord's long point (its bottom edge) runs
    // between those points: 192 − 2 × 7.826 = 176.348 in → 176 3/8 in.
    const bc = byMark.BC1;
    expect(bc.pieces).toEqual(['BC1']);
    expect(bc.sixteenths).toBe(sixteenth(192 - (2 * d) / Math.sin(theta)));
    expect(bc.sixteenths).toBe(176 * 16 + 6);
    for (const end of bc.ends) {
      expect(end).toMatchObject({ site: 'heel', kind: 'single' });
      expect(end.angles[0]).toBeWithin(deg(theta), { abs: 1e-6 });
    }
  });

  it('king post: square on the bottom chord, double bevel under the peak', () => {
    // Centred on x = 96, it stands on the bottom chord's top edge y = d and reaches up to the two
    // top-chord undersides, which meet on its centre line at y = 48 − d / cos θ = 44.087 in. Long
    // point 48 − 3.913 − 3.5 = 40.587 in → 40 9/16 in; both top cuts at 90° − θ, point at d/2.
    const post = byMark.W1;
    expect(post.sixteenths).toBe(sixteenth(48 - d / Math.cos(theta) - d));
    expect(post.sixteenths).toBe(40 * 16 + 9);
    const [bottom, top] = post.ends;
    expect(bottom.kind).toBe('square');
    expect(top.kind).toBe('double');
    for (const a of top.angles) expect(a).toBeWithin(90 - deg(theta), { abs: 1e-6 });
    expect(top.point!).toBeWithin((d / 2) * IN, { abs: 1e-6 });
  });
});

describe('mitred peak with overhangs', () => {
  it('top chord of a Fink 24 ft at 4/12 with 18 in overhangs: (L/2 + o) / cos θ, plumb tail and peak', () => {
    // θ = atan(4/12); the top edge runs from the tail's plumb cut at x = −18 in to the peak at
    // x = 144 in, 162 / cos θ = 162 × √10 / 3 = 170.763 in. A plumb cut on a sloping board
    // reaches further along it on the lower edge: d·tan θ = 3.5 / 3 = 1.167 in more at the tail
    // (at the peak the top edge is the long point). 171.930 in → 171 15/16 in. Tail and peak are
    // both plumb: 90° − θ to the edges.
    const theta = Math.atan(4 / 12);
    const { pieces } = cut({
      kind: 'fink',
      span: 24 * FT,
      pitch: 4,
      overhangLeft: 18 * IN,
      overhangRight: 18 * IN,
    });
    const tc = pieces.find((p) => p.mark === 'TC1')!;
    expect(tc.perTruss).toBe(2);
    expect(tc.sixteenths).toBe(sixteenth(162 / Math.cos(theta) + d * Math.tan(theta)));
    expect(tc.sixteenths).toBe(171 * 16 + 15);
    expect(tc.ends[0].site).toBe('tail');
    expect(tc.ends[1].site).toBe('peak');
    for (const e of tc.ends) expect(e.angles[0]).toBeWithin(90 - deg(theta), { abs: 1e-6 });
  });
});

describe("Fink's webs, 16 ft at 6/12", () => {
  // Panel points: bottom third-points B (64, 0), C (128, 0); top quarter-points E (48, 24),
  // G (144, 24); peak F (96, 48). Short web BE, long web BF; their mirrors CG and CF.
  const { pieces } = cut({ kind: 'fink', span: 16 * FT });
  const webs = pieces.filter((p) => p.role === 'web');

  /**
   * Long point of a centred web of width d whose centre line crosses its two end cuts a distance
   * c apart, at angles α1 and α2 to the cuts: each end reaches (d/2)·cot α beyond where the
   * centre line crosses it.
   */
  const longPoint = (c: number, a1: number, a2: number) =>
    c + (d / 2) * (1 / Math.tan(a1) + 1 / Math.tan(a2));

  it('two distinct webs, each a mirror pair', () => {
    expect(webs.map((w) => w.perTruss)).toEqual([2, 2]);
  });

  it('short web BE: bottom cut at 56.31° on the chord, top at 82.87° under the top chord', () => {
    // Direction B → E: (−16, 24), at β = atan(24/16) = 56.31° to the horizontal. The centre line
    // meets the bottom chord's top edge y = 3.5 at 3.5 / sin β = 4.2066 in from B, and the top
    // chord's underside y = x/2 − d/cos θ at k with 0.83205k = 32 − 0.27735k − 3.9131, i.e.
    // k = 25.3178 in. The top cut meets the web at β + θ = 82.87°; the bottom at β.
    const theta = Math.atan(0.5);
    const beta = Math.atan(24 / 16);
    const sinB = Math.sin(beta);
    const cosB = Math.cos(beta);
    const k = (32 - d / Math.cos(theta)) / (sinB + cosB / 2);
    const expected = longPoint(k - d / sinB, beta, beta + theta);
    const be = webs.find((w) => w.mark === 'W1')!;
    expect(be.sixteenths).toBe(sixteenth(expected));
    const angles = be.ends.map((e) => e.angles[0]).sort((a, b) => a - b);
    expect(angles[0]).toBeWithin(deg(beta), { abs: 1e-6 });
    expect(angles[1]).toBeWithin(deg(beta + theta), { abs: 1e-6 });
  });

  it('long web BF: bottom cut at 56.31° on the chord, top at 29.74° under the near top chord', () => {
    // Direction B → F: (32, 48), again β = 56.31° (the W's legs are parallel in pairs). It ends
    // under the left top chord, whose underside y = x/2 − d/cos θ it meets at β − θ = 29.74°:
    // 0.83205k = 32 + 0.27735k − 3.9131, k = 50.634 in along the centre line from B. Along that
    // cut the web's upper edge reaches (d/2)/sin 29.74° = 3.53 in further, to x = 95.25 in: short
    // of the plumb mitre x = 96 with its mirror CF, so no second cut is made.
    const theta = Math.atan(0.5);
    const beta = Math.atan(48 / 32);
    const sinB = Math.sin(beta);
    const cosB = Math.cos(beta);
    const k = (32 - d / Math.cos(theta)) / (sinB - cosB / 2);
    const expected = longPoint(k - d / sinB, beta, beta - theta);
    const bf = webs.find((w) => w.mark === 'W2')!;
    expect(bf.sixteenths).toBe(sixteenth(expected));
    expect(bf.ends.every((e) => e.kind === 'single')).toBe(true);
  });
});
