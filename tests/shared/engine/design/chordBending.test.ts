import { describe, expect, it } from 'vitest';
import { chordBeams, chordMoments } from '../../../../shared/engine/design/chordBending';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { TrussProfile } from '../../../../shared/engine/profiles/types';

// Closed forms: AISC Steel Construction Manual (15th ed.), Table 3-23 Beam Diagrams and
// Formulas, from memory (simple span wL²/8; two equal spans wL²/8 at the support, 9wL²/128 in
// the spans), and the three-moment equation for the end moment of an overhang.

/** A 24 ft 4/12 Fink line model with 12 in overhangs (common practice geometry). */
const fink = generateProfile({
  kind: 'fink',
  span: 24 * 12 * 25.4,
  pitch: 4,
  heelHeight: 0,
  overhangLeft: 12 * 25.4,
  overhangRight: 12 * 25.4,
});
const index = (p: TrussProfile, id: string) => p.members.findIndex((m) => m.id === id);
const lengthOf = (p: TrussProfile, id: string) => p.members[index(p, id)].length;
const ids = (p: TrussProfile, ks: number[]) => ks.map((k) => p.members[k].id);

/** Line loads: w on every member of `role`, 0 elsewhere. */
const loadOn = (p: TrussProfile, role: 'topChord' | 'bottomChord', w: number) =>
  Float64Array.from(p.members, (m) => (m.role === role ? w : 0));

describe('chord beams of a Fink', () => {
  const beams = chordBeams(fink);

  it('follows each chord piece, heel to peak and heel to heel, and skips webs', () => {
    expect(beams.map((b) => ids(fink, b.members))).toEqual(
      fink.pieces.filter((p) => p.role !== 'web').map((p) => p.members),
    );
    expect(ids(fink, beams[0].members)).toEqual(['AE', 'EF']);
    expect(ids(fink, beams[1].members)).toEqual(['FG', 'DG']);
  });

  it('hangs the overhangs beyond the heel supports only', () => {
    expect(beams[0].startOverhang).toBe(index(fink, 'AE'));
    expect(beams[0].endOverhang).toBe(-1);
    expect(beams[1].startOverhang).toBe(-1);
    expect(beams[1].endOverhang).toBe(index(fink, 'DG'));
    for (const b of beams.slice(2)) expect([b.startOverhang, b.endOverhang]).toEqual([-1, -1]);
  });
});

describe('chord moments of a Fink', () => {
  const beams = chordBeams(fink);
  const w = 0.8;
  const L = lengthOf(fink, 'AE');
  const none = new Float64Array(fink.members.length);

  it('has equal top-chord panels (quarter points), so the two-span closed forms apply', () => {
    expect(lengthOf(fink, 'EF')).toBeWithin(L, { rel: 1e-12 });
  });

  it('gives two equal spans wL²/8 at the interior panel point and 9wL²/128 in the spans', () => {
    const m = chordMoments(beams, loadOn(fink, 'topChord', w), none);
    for (const id of ['AE', 'EF', 'FG', 'DG']) {
      expect(m.support[index(fink, id)]).toBeWithin((w * L * L) / 8, { rel: 1e-12 });
      expect(m.span[index(fink, id)]).toBeWithin((9 * w * L * L) / 128, { rel: 1e-12 });
    }
  });

  it('lets the overhang moment Mo at the heel lower the interior one to wL²/8 − Mo/4', () => {
    const mo = new Float64Array(fink.members.length);
    const cantilever = 0.05 * w * L * L;
    mo[index(fink, 'AE')] = cantilever;
    const m = chordMoments(beams, loadOn(fink, 'topChord', w), mo);
    const interior = (w * L * L) / 8 - cantilever / 4;
    expect(m.support[index(fink, 'EF')]).toBeWithin(interior, { rel: 1e-12 });
    expect(m.support[index(fink, 'AE')]).toBeWithin(Math.max(interior, cantilever), {
      rel: 1e-12,
    });
    // The other top chord is its own piece (hinge at the peak): untouched.
    expect(m.support[index(fink, 'FG')]).toBeWithin((w * L * L) / 8, { rel: 1e-12 });
  });

  it('gives a one-panel bottom-chord piece the simple span wL²/8 and no end moment', () => {
    const single = fink.pieces.find((p) => p.role === 'bottomChord' && p.members.length === 1)!;
    const k = index(fink, single.members[0]);
    const l = fink.members[k].length;
    const m = chordMoments(beams, loadOn(fink, 'bottomChord', w), none);
    expect(m.span[k]).toBeWithin((w * l * l) / 8, { rel: 1e-12 });
    expect(m.support[k]).toBe(0);
  });

  it('gives webs nothing and is symmetric on a symmetric truss', () => {
    const mo = new Float64Array(fink.members.length);
    mo[index(fink, 'AE')] = mo[index(fink, 'DG')] = 1e4;
    const m = chordMoments(beams, loadOn(fink, 'topChord', w), mo);
    fink.members.forEach((mb, k) => {
      if (mb.role === 'web') expect([m.span[k], m.support[k]]).toEqual([0, 0]);
    });
    for (const [a, b] of [
      ['AE', 'DG'],
      ['EF', 'FG'],
    ]) {
      expect(m.span[index(fink, a)]).toBeWithin(m.span[index(fink, b)], { rel: 1e-12 });
      expect(m.support[index(fink, a)]).toBeWithin(m.support[index(fink, b)], { rel: 1e-12 });
    }
  });

  it('scales with the load (moments are linear in it)', () => {
    const mo = new Float64Array(fink.members.length);
    mo[index(fink, 'AE')] = 2e4;
    const one = chordMoments(beams, loadOn(fink, 'topChord', w), mo);
    const three = chordMoments(
      beams,
      loadOn(fink, 'topChord', 3 * w),
      mo.map((v) => 3 * v),
    );
    one.support.forEach((v, k) => expect(three.support[k]).toBeWithin(3 * v, { rel: 1e-12 }));
    one.span.forEach((v, k) => expect(three.span[k]).toBeWithin(3 * v, { rel: 1e-12 }));
  });
});

describe('a spliced chord', () => {
  // 30 ft flat truss: the 30 ft top chord exceeds the 20 ft stock and is spliced.
  const flat = generateProfile({
    kind: 'flat',
    span: 30 * 12 * 25.4,
    pitch: 0,
    heelHeight: 0,
    overhangLeft: 0,
    overhangRight: 0,
    depth: 30 * 25.4,
    panels: 10,
  });
  const beams = chordBeams(flat);
  const top = flat.pieces.filter((p) => p.role === 'topChord');

  it('is one beam per piece', () => {
    expect(top.length).toBeGreaterThan(1);
    expect(top[0].spliceAt).toBeDefined();
    expect(beams.filter((b) => flat.members[b.members[0]].role === 'topChord')).toHaveLength(
      top.length,
    );
  });

  it('is a hinge at the splice: a load on one piece bends no other', () => {
    const first = new Set(top[0].members);
    const t = Float64Array.from(flat.members, (m) => (first.has(m.id) ? 1 : 0));
    const m = chordMoments(beams, t, new Float64Array(flat.members.length));
    flat.members.forEach((mb, k) => {
      if (first.has(mb.id)) expect(m.span[k] + m.support[k]).toBeGreaterThan(0);
      else expect([m.span[k], m.support[k]]).toEqual([0, 0]);
    });
    // The spliced end carries no moment: the last span is pinned there and continuous over its
    // inner panel point, so its span peak is below the simple span's wL²/8.
    const last = index(flat, top[0].members[top[0].members.length - 1]);
    const l = flat.members[last].length;
    expect(m.span[last]).toBeGreaterThan(0);
    expect(m.span[last]).toBeLessThan((l * l) / 8);
  });
});

describe('a one-member chord piece with an overhang at each end', () => {
  // Synthetic: the per-member overhang moment cannot be split between the two ends.
  const base = generateProfile({
    kind: 'flat',
    span: 8 * 12 * 25.4,
    pitch: 0,
    heelHeight: 0,
    overhangLeft: 0,
    overhangRight: 0,
    depth: 24 * 25.4,
    panels: 2,
  });
  const tc = base.members.find((m) => m.role === 'topChord')!;
  const first = base.topChordJoints[0];
  const last = base.topChordJoints[base.topChordJoints.length - 1];
  const synthetic: TrussProfile = {
    ...base,
    members: base.members.map((m) =>
      m.id === tc.id ? { ...m, from: first, to: last, length: 1000 } : m,
    ),
    pieces: [{ id: 'TC1', role: 'topChord', members: [tc.id], length: 1000 }],
    overhangs: [
      { side: 'left', heelJoint: first, horizontal: 300, slopeLength: 300, member: tc.id },
      { side: 'right', heelJoint: last, horizontal: 300, slopeLength: 300, member: tc.id },
    ],
  };

  it('keeps the simple-span wL²/8 and the overhang moment (conservative)', () => {
    const [beam] = chordBeams(synthetic);
    expect(beam.simpleFallback).toBe(true);
    const k = index(synthetic, tc.id);
    const t = new Float64Array(synthetic.members.length);
    const mo = new Float64Array(synthetic.members.length);
    t[k] = 2;
    mo[k] = 9e4;
    const m = chordMoments([beam], t, mo);
    expect(m.span[k]).toBeWithin((2 * 1000 * 1000) / 8, { rel: 1e-12 });
    expect(m.support[k]).toBe(9e4);
  });
});
