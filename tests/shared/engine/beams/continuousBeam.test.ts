import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { spanPeakMoment, supportMoments } from '../../../../shared/engine/beams';
import { isEngineError } from '../../../../shared/engine/errors';

// Closed forms from AISC Steel Construction Manual (15th ed.), Table 3-23 "Shears, Moments and
// Deflections" (Beam Diagrams and Formulas), from memory. Any consistent units: here mm, N/mm.
const w = 1.7;
const L = 2400;

/** Largest |M| of a member: the span peak or either support moment. */
const maxAbs = (l: number, load: number, a: number, b: number) =>
  Math.max(Math.abs(spanPeakMoment(l, load, a, b)), Math.abs(a), Math.abs(b));

describe('a simple span', () => {
  it('has wL²/8 at mid-span and nothing at its pinned ends', () => {
    const m = supportMoments({ spans: [L], loads: [w] });
    expect(Array.from(m)).toEqual([0, 0]);
    expect(spanPeakMoment(L, w, 0, 0)).toBeWithin((w * L * L) / 8, { rel: 1e-12 });
  });
});

describe('two equal spans, uniform load on both', () => {
  const m = supportMoments({ spans: [L, L], loads: [w, w] });

  it('has the interior support moment wL²/8 (hogging)', () => {
    expect(m[0]).toBe(0);
    expect(m[1]).toBeWithin((w * L * L) / 8, { rel: 1e-12 });
    expect(m[2]).toBe(0);
  });

  it('has the positive moment 9wL²/128 in each span', () => {
    expect(spanPeakMoment(L, w, m[0], m[1])).toBeWithin((9 * w * L * L) / 128, { rel: 1e-12 });
    expect(spanPeakMoment(L, w, m[1], m[2])).toBeWithin((9 * w * L * L) / 128, { rel: 1e-12 });
  });
});

describe('three equal spans, uniform load on all', () => {
  const m = supportMoments({ spans: [L, L, L], loads: [w, w, w] });

  it('has the interior support moments 0.10 wL²', () => {
    expect(m[1]).toBeWithin(0.1 * w * L * L, { rel: 1e-12 });
    expect(m[2]).toBeWithin(0.1 * w * L * L, { rel: 1e-12 });
  });

  it('has 0.08 wL² in the end spans and 0.025 wL² in the centre span', () => {
    expect(spanPeakMoment(L, w, m[0], m[1])).toBeWithin(0.08 * w * L * L, { rel: 1e-12 });
    expect(spanPeakMoment(L, w, m[2], m[3])).toBeWithin(0.08 * w * L * L, { rel: 1e-12 });
    expect(spanPeakMoment(L, w, m[1], m[2])).toBeWithin(0.025 * w * L * L, { rel: 1e-12 });
  });
});

describe('a span with an overhang a beyond one support, uniform load throughout', () => {
  const a = 600;
  const cantilever = (w * a * a) / 2;

  it('has the support moment wa²/2 and the span moment w(L + a)²(L − a)²/(8L²)', () => {
    const m = supportMoments({ spans: [L], loads: [w], endMoment: cantilever });
    expect(m[1]).toBe(cantilever);
    const expected = (w * (L + a) ** 2 * (L - a) ** 2) / (8 * L * L);
    expect(spanPeakMoment(L, w, m[0], m[1])).toBeWithin(expected, { rel: 1e-12 });
    expect(spanPeakMoment(L, w, m[0], m[1])).toBeLessThan((w * L * L) / 8);
  });

  it('reduces the interior support moment of two spans by wa²/8 (three-moment equation)', () => {
    const m = supportMoments({ spans: [L, L], loads: [w, w], startMoment: cantilever });
    expect(m[1]).toBeWithin((w * L * L) / 8 - cantilever / 4, { rel: 1e-12 });
  });

  it('has no positive moment when the overhang is long enough (a ≥ L: M1 = 0)', () => {
    expect(spanPeakMoment(L, w, 0, (w * L * L) / 2)).toBe(0);
    expect(maxAbs(L, w, 0, (w * L * L) / 2)).toBeWithin((w * L * L) / 2, { rel: 1e-12 });
  });
});

/**
 * Independent reference: the slope-deflection (beam stiffness) method, rotations at the
 * supports as unknowns, fixed-end moments wL²/12, EI = 1 (it cancels on rigid supports).
 */
function stiffnessSupportMoments(spans: number[], loads: number[], mStart: number, mEnd: number) {
  const n = spans.length;
  const size = n + 1;
  const k = Array.from({ length: size }, () => new Array<number>(size).fill(0));
  const f = new Array<number>(size).fill(0);
  for (let i = 0; i < n; i++) {
    const l = spans[i];
    const fem = (loads[i] * l * l) / 12;
    k[i][i] += 4 / l;
    k[i][i + 1] += 2 / l;
    k[i + 1][i] += 2 / l;
    k[i + 1][i + 1] += 4 / l;
    // Fixed-end moments, counter-clockwise +: −fem at the left end, +fem at the right end.
    f[i] += fem;
    f[i + 1] -= fem;
  }
  // Applied end moments (hogging +): counter-clockwise at the left end, clockwise at the right.
  f[0] += -mStart;
  f[n] += mEnd;
  const x = solveDense(k, f);
  const hogging = new Array<number>(size).fill(0);
  hogging[0] = mStart;
  hogging[n] = mEnd;
  for (let i = 1; i < n; i++) {
    const l = spans[i - 1];
    // Moment at the right end of span i − 1, counter-clockwise on the member: hogging +.
    hogging[i] = (2 * x[i - 1]) / l + (4 * x[i]) / l + (loads[i - 1] * l * l) / 12;
  }
  return hogging;
}

function solveDense(a: number[][], b: number[]): number[] {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i]]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(m[r][c]) > Math.abs(m[p][c])) p = r;
    [m[c], m[p]] = [m[p], m[c]];
    for (let r = c + 1; r < n; r++) {
      const q = m[r][c] / m[c][c];
      for (let j = c; j <= n; j++) m[r][j] -= q * m[c][j];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = m[r][n];
    for (let j = r + 1; j < n; j++) s -= m[r][j] * x[j];
    x[r] = s / m[r][r];
  }
  return x;
}

const beamArb = fc.integer({ min: 1, max: 7 }).chain((n) =>
  fc.record({
    spans: fc.array(fc.double({ min: 300, max: 4000, noNaN: true }), {
      minLength: n,
      maxLength: n,
    }),
    loads: fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: n, maxLength: n }),
    startMoment: fc.double({ min: -2e6, max: 2e6, noNaN: true }),
    endMoment: fc.double({ min: -2e6, max: 2e6, noNaN: true }),
  }),
);

const pick = (b: { startMoment: number; endMoment: number }) => ({
  startMoment: b.startMoment,
  endMoment: b.endMoment,
});

describe('any continuous beam', () => {
  it('agrees with the beam stiffness method', () => {
    fc.assert(
      fc.property(beamArb, (b) => {
        const m = supportMoments(b);
        const ref = stiffnessSupportMoments(b.spans, b.loads, b.startMoment, b.endMoment);
        const scale = Math.max(...b.spans) ** 2 * 3 + 2e6;
        m.forEach((v, i) => expect(v).toBeWithin(ref[i], { rel: 1e-9, abs: 1e-9 * scale }));
      }),
    );
  });

  it('is linear in the loads and end moments (superposition)', () => {
    fc.assert(
      fc.property(beamArb, beamArb, fc.double({ min: -2, max: 2, noNaN: true }), (a, b, k) => {
        const spans = a.spans;
        const other = spans.map((_, i) => b.loads[i % b.loads.length]);
        const sum = supportMoments({
          spans,
          loads: a.loads.map((v, i) => v + k * other[i]),
          startMoment: a.startMoment + k * b.startMoment,
          endMoment: a.endMoment + k * b.endMoment,
        });
        const ma = supportMoments(a);
        const mb = supportMoments({ spans, loads: other, ...pick(b) });
        const scale = Math.max(...spans) ** 2 * 9 + 6e6;
        sum.forEach((v, i) => expect(v).toBeWithin(ma[i] + k * mb[i], { abs: 1e-9 * scale }));
      }),
    );
  });

  it('mirrors: reversing the spans reverses the support moments', () => {
    fc.assert(
      fc.property(beamArb, (b) => {
        const m = supportMoments(b);
        const r = supportMoments({
          spans: [...b.spans].reverse(),
          loads: [...b.loads].reverse(),
          startMoment: b.endMoment,
          endMoment: b.startMoment,
        });
        const scale = Math.max(...b.spans) ** 2 * 3 + 2e6;
        m.forEach((v, i) => expect(r[m.length - 1 - i]).toBeWithin(v, { abs: 1e-9 * scale }));
      }),
    );
  });

  it('has a span peak that bounds the moment diagram between the supports', () => {
    fc.assert(
      fc.property(beamArb, (b) => {
        const m = supportMoments(b);
        b.spans.forEach((l, j) => {
          const w = b.loads[j];
          let sampled = 0;
          for (let s = 0; s <= 200; s++) {
            const x = (l * s) / 200;
            const mx = (w * x * (l - x)) / 2 - m[j] * (1 - x / l) - (m[j + 1] * x) / l;
            sampled = Math.max(sampled, Math.abs(mx));
          }
          const peak = maxAbs(l, w, m[j], m[j + 1]);
          expect(peak).toBeGreaterThanOrEqual(sampled * (1 - 1e-9) - 1e-6);
          expect(peak).toBeLessThanOrEqual(sampled + (Math.abs(w) * l * l) / 8 / 1e4 + 1e-6);
        });
      }),
    );
  });
});

describe('invalid beams', () => {
  it('throws EngineError invalid for no spans, a missing load or a non-positive span', () => {
    for (const bad of [
      { spans: [], loads: [] },
      { spans: [1000, 1000], loads: [1] },
      { spans: [1000, 0], loads: [1, 1] },
      { spans: [1000], loads: [Number.NaN] },
    ]) {
      let caught: unknown;
      try {
        supportMoments(bad);
      } catch (e) {
        caught = e;
      }
      expect(isEngineError(caught) && caught.code === 'invalid').toBe(true);
    }
  });
});
