import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../../shared/engine/errors';
import { buildCutList, cutPieces } from '../../../../shared/engine/pieces';
import { LUMBER_SIZES } from '../../../../shared/engine/lumber/sizes';
import { generateProfile } from '../../../../shared/engine/profiles/generate';
import type { ProfileKind } from '../../../../shared/engine/profiles/types';

const FT = 304.8;

const line = fc.record({
  kind: fc.constantFrom<ProfileKind>('kingPost', 'fink', 'howe', 'fan', 'queenPost', 'mono'),
  spanFt: fc.integer({ min: 20, max: 36 }),
  pitch: fc.constantFrom(4, 5, 6, 8),
  overhangIn: fc.constantFrom(0, 12, 18),
  quantity: fc.integer({ min: 1, max: 30 }),
  plies: fc.integer({ min: 1, max: 3 }),
  chord: fc.constantFrom('2x4 SPF-1/2', '2x6 DFL-2'),
  web: fc.constantFrom('2x4 SPF-1/2', '2x3 HF-2'),
});

const trussOf = (l: typeof line extends fc.Arbitrary<infer T> ? T : never, mark: string) => {
  let profile;
  try {
    profile = generateProfile({
      kind: l.kind,
      span: l.spanFt * FT,
      pitch: l.pitch,
      heelHeight: 0,
      overhangLeft: l.overhangIn * 25.4,
      overhangRight: l.kind === 'mono' ? 0 : l.overhangIn * 25.4,
    });
  } catch (e) {
    // A profile the generator refuses (a king post chord longer than the stock) is no cut list.
    if (e instanceof EngineError) fc.pre(false);
    throw e;
  }
  const lumber = Object.fromEntries(
    profile.pieces.map((p) => [p.id, p.role === 'web' ? l.web : l.chord]),
  );
  return {
    profile,
    truss: {
      mark,
      quantity: l.quantity,
      plies: l.plies,
      pieces: cutPieces(profile, lumber).pieces,
    },
  };
};

describe('cut list', () => {
  it('every member of every truss is in exactly one row, and the quantities add up', () => {
    fc.assert(
      fc.property(fc.array(line, { minLength: 1, maxLength: 4 }), (lines) => {
        const built = lines.map((l, i) => trussOf(l, `T${i + 1}`));
        const list = buildCutList(built.map((b) => b.truss));
        const rows = list.groups.flatMap((g) => g.rows);
        for (const { profile, truss } of built) {
          const mine = rows.filter((r) => r.truss === truss.mark);
          const members = mine.flatMap((r) => r.members).sort();
          // Each row stands for perTruss pieces; a member is in one piece, so in one row.
          expect(members).toEqual(profile.members.map((m) => m.id).sort());
          const pieces = mine.reduce((s, r) => s + r.quantity, 0);
          expect(pieces).toBe(profile.pieces.length * truss.quantity * truss.plies);
        }
        expect(list.quantity).toBe(
          built.reduce((s, b) => s + b.profile.pieces.length * b.truss.quantity * b.truss.plies, 0),
        );
      }),
      { numRuns: 40 },
    );
  });

  it('sorted by lumber (smallest size first), then longest first', () => {
    fc.assert(
      fc.property(fc.array(line, { minLength: 1, maxLength: 3 }), (lines) => {
        const list = buildCutList(lines.map((l, i) => trussOf(l, `T${i + 1}`).truss));
        const sizes = list.groups.map((g) => LUMBER_SIZES.indexOf(g.lumber.split(' ')[0] as never));
        expect(sizes).toEqual([...sizes].sort((a, b) => a - b));
        for (const g of list.groups) {
          const lengths = g.rows.map((r) => r.sixteenths);
          expect(lengths).toEqual([...lengths].sort((a, b) => b - a));
          expect(new Set(g.rows.map((r) => r.lumber))).toEqual(new Set([g.lumber]));
        }
      }),
      { numRuns: 30 },
    );
  });

  it('a king post line of 10 trusses, 2 plies: 2 top chords × 10 × 2 = 40 to cut', () => {
    const { truss } = trussOf(
      {
        kind: 'kingPost',
        spanFt: 20,
        pitch: 6,
        overhangIn: 0,
        quantity: 10,
        plies: 2,
        chord: '2x4 SPF-1/2',
        web: '2x4 SPF-1/2',
      },
      'K1',
    );
    const list = buildCutList([truss]);
    const tc = list.groups[0].rows.find((r) => r.mark === 'K1-TC1')!;
    expect(tc).toMatchObject({ perTruss: 2, trusses: 10, plies: 2, quantity: 40 });
  });
});
