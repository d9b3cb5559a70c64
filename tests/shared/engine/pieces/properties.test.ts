import fc from 'fast-check';
import polygonClipping from 'polygon-clipping';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../../shared/engine/errors';
import { cutPieces, type PieceOutline, type XY } from '../../../../shared/engine/pieces';
import { generateProfile } from '../../../../shared/engine/profiles/generate';
import { PROFILE_KINDS } from '../../../../shared/engine/profiles/kinds';
import type { ProfileKind, ProfileParams } from '../../../../shared/engine/profiles/types';

/**
 * Pieces against the drawing, over random trusses: no two pieces overlap (intersection area from
 * polygon-clipping, an independent implementation), and at every joint the pieces that meet
 * there touch one another in one connected cluster, each within reach of the joint.
 */
const FT = 304.8;
const IN = 25.4;

const shoelace = (ring: XY[]) =>
  ring.reduce((s, p, i) => {
    const q = ring[(i + 1) % ring.length];
    return s + (p[0] * q[1] - q[0] * p[1]) / 2;
  }, 0);

// Pieces that touch share edges exactly, where the library's sweep line can trip; each outline
// is first pulled 1 µm in toward its centroid (far below a saw's kerf), which leaves a real
// overlap in place and parts pieces that merely touch.
const shrink = (r: XY[], by: number): XY[] => {
  const cx = r.reduce((s, p) => s + p[0], 0) / r.length;
  const cy = r.reduce((s, p) => s + p[1], 0) / r.length;
  return r.map(([x, y]): XY => {
    const k = by / Math.max(Math.hypot(x - cx, y - cy), by);
    return [x - k * (x - cx), y - k * (y - cy)];
  });
};

const intersection = (a: XY[], b: XY[]): number => {
  let result: ReturnType<typeof polygonClipping.intersection> | undefined;
  for (const by of [1e-3, 1e-2]) {
    try {
      const [sa, sb] = [shrink(a, by), shrink(b, by)];
      result = polygonClipping.intersection([[...sa, sa[0]]], [[...sb, sb[0]]]);
      break;
    } catch {
      continue;
    }
  }
  if (!result) throw new Error('polygon-clipping could not intersect the outlines');
  return result.reduce(
    (sum, poly) =>
      sum +
      poly.reduce(
        (s, ring, k) => s + (k === 0 ? 1 : -1) * Math.abs(shoelace(ring.slice(0, -1) as XY[])),
        0,
      ),
    0,
  );
};

const segmentDistance = (p: XY, a: XY, b: XY): number => {
  const [dx, dy] = [b[0] - a[0], b[1] - a[1]];
  const len2 = dx * dx + dy * dy;
  const t =
    len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
};

/** Distance between two convex polygons that do not overlap (0 when they touch). */
const gap = (a: XY[], b: XY[]): number => {
  let best = Infinity;
  for (const [p, ring] of [
    [a, b],
    [b, a],
  ] as const) {
    for (const v of p) {
      for (let i = 0; i < ring.length; i++) {
        best = Math.min(best, segmentDistance(v, ring[i], ring[(i + 1) % ring.length]));
      }
    }
  }
  return best;
};

const pointGap = (p: XY, ring: XY[]) =>
  Math.min(...ring.map((a, i) => segmentDistance(p, a, ring[(i + 1) % ring.length])));

const KINDS: ProfileKind[] = PROFILE_KINDS.map((k) => k.kind);

const truss = fc.record({
  kind: fc.constantFrom(...KINDS),
  spanFt: fc.integer({ min: 16, max: 40 }),
  pitch: fc.constantFrom(3, 4, 5, 6, 7, 8, 10, 12),
  heelIn: fc.constantFrom(0, 0, 14, 24),
  overhangIn: fc.constantFrom(0, 12, 24),
  chord: fc.constantFrom('2x4 SPF-1/2', '2x6 SPF-1/2'),
  web: fc.constantFrom('2x4 HF-2', '2x6 HF-2'),
  panels: fc.constantFrom(4, 6, 8),
});

type Truss = typeof truss extends fc.Arbitrary<infer T> ? T : never;

const build = (t: Truss) => {
  const params: ProfileParams = {
    kind: t.kind,
    span: t.spanFt * FT,
    pitch: t.pitch,
    heelHeight: t.kind === 'flat' ? 0 : t.heelIn * IN,
    overhangLeft: t.kind === 'flat' ? 0 : t.overhangIn * IN,
    overhangRight: t.kind === 'flat' || t.kind === 'mono' ? 0 : t.overhangIn * IN,
    bottomPitch: t.kind === 'scissor' ? Math.max(1, t.pitch - 3) : undefined,
    depth: t.kind === 'flat' ? 30 * IN : undefined,
    panels: t.kind === 'flat' ? t.panels : undefined,
  };
  let profile;
  try {
    profile = generateProfile(params);
  } catch (e) {
    // Profiles the generator refuses (a span too short for a family) are not piece questions.
    if (e instanceof EngineError) fc.pre(false);
    throw e;
  }
  const lumber = Object.fromEntries(
    profile.pieces.map((p) => [p.id, p.role === 'web' ? t.web : t.chord]),
  );
  try {
    return { profile, result: cutPieces(profile, lumber) };
  } catch (e) {
    // Lumber too deep for the truss (a shallow scissor in 2x6): refused with a clear message,
    // checked on its own below.
    if (e instanceof EngineError && e.code === 'geometry') fc.pre(false);
    throw e;
  }
};

const bbox = (r: XY[]) => {
  const xs = r.map((p) => p[0]);
  const ys = r.map((p) => p[1]);
  return [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)];
};
const boxesMeet = (a: XY[], b: XY[]) => {
  const [ax0, ay0, ax1, ay1] = bbox(a);
  const [bx0, by0, bx1, by1] = bbox(b);
  return ax0 <= bx1 + 1 && bx0 <= ax1 + 1 && ay0 <= by1 + 1 && by0 <= ay1 + 1;
};

describe('pieces against the drawing', () => {
  it('no two pieces overlap', () => {
    fc.assert(
      fc.property(truss, (t) => {
        const { result } = build(t);
        const o = result.outlines;
        for (let i = 0; i < o.length; i++) {
          expect(shoelace(o[i].polygon)).toBeGreaterThan(0);
          for (let j = i + 1; j < o.length; j++) {
            if (!boxesMeet(o[i].polygon, o[j].polygon)) continue;
            // 0.01 mm² is a hair's width along a 100 mm contact: floating noise, not wood.
            expect(
              intersection(o[i].polygon, o[j].polygon),
              `${o[i].piece} × ${o[j].piece}`,
            ).toBeLessThan(0.01);
          }
        }
      }),
      { numRuns: 100 },
    );
  }, 60_000);

  it("every joint's pieces meet: one touching cluster, each within reach of the joint", () => {
    fc.assert(
      fc.property(truss, (t) => {
        const { profile, result } = build(t);
        for (const joint of profile.joints) {
          const here: PieceOutline[] = result.outlines.filter((o) => o.joints.includes(joint.id));
          expect(here.length).toBeGreaterThan(1);
          // Connected: grow a cluster from the first piece through touching pieces (gap < 0.01 mm).
          const cluster = new Set([here[0].piece]);
          for (let grown = true; grown;) {
            grown = false;
            for (const p of here) {
              if (cluster.has(p.piece)) continue;
              if (here.some((q) => cluster.has(q.piece) && gap(p.polygon, q.polygon) < 0.01)) {
                cluster.add(p.piece);
                grown = true;
              }
            }
          }
          expect([...cluster].sort(), `joint ${joint.id}`).toEqual(here.map((p) => p.piece).sort());
          // Reach: a board cut back to a neighbour meeting it at angle α ends within about
          // depth / sin α of the joint; allow twice the deepest board over the sharpest angle.
          const at = new Map(profile.joints.map((j) => [j.id, j]));
          const directions = profile.members
            .filter((m) => m.from === joint.id || m.to === joint.id)
            .map((m) => {
              const o = at.get(m.from === joint.id ? m.to : m.from)!;
              return Math.atan2(o.y - joint.y, o.x - joint.x);
            });
          let sharpest = Math.PI / 2;
          for (const a of directions)
            for (const b of directions) {
              const diff = Math.abs(a - b) % Math.PI;
              if (diff > 1e-9) sharpest = Math.min(sharpest, diff, Math.PI - diff);
            }
          const reach = (2 * 5.5 * IN) / Math.sin(sharpest);
          for (const p of here) expect(pointGap([joint.x, joint.y], p.polygon)).toBeLessThan(reach);
        }
      }),
      { numRuns: 100 },
    );
  }, 60_000);

  it('every profile piece is in exactly one cut piece, and identical pieces share a mark', () => {
    fc.assert(
      fc.property(truss, (t) => {
        const { profile, result } = build(t);
        const covered = result.pieces.flatMap((p) => p.pieces).sort();
        expect(covered).toEqual(profile.pieces.map((p) => p.id).sort());
        for (const p of result.pieces) expect(p.perTruss).toBe(p.pieces.length);
        for (const o of result.outlines)
          expect(result.pieces.find((p) => p.mark === o.mark)!.pieces).toContain(o.piece);
      }),
      { numRuns: 60 },
    );
  });

  it('lumber too deep for the truss is refused with a clear message', () => {
    // Scissor 16 ft, 12/12 over 9/12: at the quarter-point the chords' lines are 48 − 36 = 12 in
    // apart, but 2x6 chords need 5.5/cos 45° + 5.5/cos 36.87° = 7.78 + 6.88 = 14.65 in.
    const profile = generateProfile({
      kind: 'scissor',
      span: 16 * FT,
      pitch: 12,
      bottomPitch: 9,
      heelHeight: 0,
      overhangLeft: 0,
      overhangRight: 0,
    });
    const lumber = Object.fromEntries(
      profile.pieces.map((p) => [p.id, p.role === 'web' ? '2x4 HF-2' : '2x6 SPF-1/2']),
    );
    expect(() => cutPieces(profile, lumber)).toThrow(/too shallow/);
  });
});
