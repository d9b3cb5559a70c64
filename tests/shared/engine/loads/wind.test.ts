import { describe, expect, it } from 'vitest';
import {
  GCPI_ENCLOSED,
  roofPressureCoefficients,
  velocityPressure,
  velocityPressureCoefficient,
  windCases,
} from '../../../../shared/engine/loads/wind';
import { kpa, kpaToPsf, mm } from '../../../../shared/engine/units';

const MPS = 0.44704; // m/s per mph (exact)
const FT = 304.8;

describe('velocity pressure qh, ASCE 7-16 Eq. 26.10-1, by hand', () => {
  it('V = 115 mph, exposure C, h = 15 ft: Kz = 2.01·(15/900)^(2/9.5) = 0.849, qh = 24.4 psf', () => {
    const kz = 2.01 * (15 / 900) ** (2 / 9.5);
    expect(kz).toBeWithin(0.85, { abs: 0.002 }); // Table 26.10-1 tabulates 0.85 (from memory)
    const qh = 0.00256 * kz * 1 * 0.85 * 1 * 115 ** 2;
    expect(qh).toBeWithin(24.43, { abs: 0.01 });
    const got = velocityPressure({ speed: 115 * MPS, exposure: 'C', meanRoofHeight: mm(15 * FT) });
    expect(kpaToPsf(got)).toBeWithin(qh, { rel: 1e-9 });
  });

  it('exposure B in the low-rise procedure: Kz = 0.70 below 30 ft (Table 26.10-1 note)', () => {
    expect(velocityPressureCoefficient(20 * FT, 'B')).toBeWithin(0.7, { abs: 0.001 });
    const qh = 0.00256 * 2.01 * (30 / 1200) ** (2 / 7) * 0.85 * 130 ** 2;
    const got = velocityPressure({ speed: 130 * MPS, exposure: 'B', meanRoofHeight: mm(20 * FT) });
    expect(kpaToPsf(got)).toBeWithin(qh, { rel: 1e-9 });
  });

  it('exposure D at 30 ft: 2.01·(30/700)^(2/11.5) = 1.16 (table 1.16); Kzt and Ke multiply', () => {
    expect(velocityPressureCoefficient(30 * FT, 'D')).toBeWithin(1.16, { abs: 0.005 });
    const base = { speed: 115 * MPS, exposure: 'C' as const, meanRoofHeight: mm(15 * FT) };
    expect(velocityPressure({ ...base, kzt: 1.2 }) / velocityPressure(base)).toBeWithin(1.2, {
      rel: 1e-12,
    });
    // Ke = e^(−0.0000362·5000) = 0.834 at 5,000 ft (Table 26.9-1 gives 0.83, from memory).
    expect(
      velocityPressure({ ...base, groundElevation: mm(5000 * FT) }) / velocityPressure(base),
    ).toBeWithin(Math.exp(-0.0000362 * 5000), { rel: 1e-9 });
  });

  it('refuses nonsense', () => {
    expect(() => velocityPressure({ speed: 0, exposure: 'C', meanRoofHeight: mm(1000) })).toThrow(
      /wind speed/,
    );
    expect(() =>
      velocityPressure({ speed: 50, exposure: 'C', meanRoofHeight: mm(1000), kzt: 0.5 }),
    ).toThrow(/Kzt/);
  });
});

describe('GCpf of Fig. 28.3-1, load case A, zones 2 and 3 (from memory)', () => {
  it.each([
    [0, -0.69, -0.37],
    [5, -0.69, -0.37],
    [20, -0.69, -0.48],
    [30, 0.21, -0.43],
    [45, 0.21, -0.43],
    [90, 0.56, -0.37],
  ])('θ = %s°: zone 2 %s, zone 3 %s', (t, w, l) => {
    const c = roofPressureCoefficients(t);
    expect(c.windward).toBeWithin(w, { abs: 1e-12 });
    expect(c.leeward).toBeWithin(l, { abs: 1e-12 });
  });

  it('interpolates linearly: 4/12 (18.43°) zone 3 = −0.37 − 0.11·(18.43 − 5)/15; 25° zone 2 = −0.24', () => {
    const t = (Math.atan(4 / 12) * 180) / Math.PI;
    expect(roofPressureCoefficients(t).leeward).toBeWithin(-0.37 - (0.11 * (t - 5)) / 15, {
      rel: 1e-12,
    });
    expect(roofPressureCoefficients(25).windward).toBeWithin(-0.24, { abs: 1e-12 });
  });

  it('eight cases: A and B, both directions, GCpi ±0.18; net p = qh(GCpf − GCpi)', () => {
    const cases = windCases(kpa(1), 5);
    expect(cases.map((c) => c.id)).toEqual([
      'AL+',
      'AL-',
      'AR+',
      'AR-',
      'BL+',
      'BL-',
      'BR+',
      'BR-',
    ]);
    expect(cases[0].windward).toBeWithin(-0.69 - GCPI_ENCLOSED, { abs: 1e-12 });
    expect(cases[1].leeward).toBeWithin(-0.37 + 0.18, { abs: 1e-12 });
    expect(cases[0].soffit).toBeWithin(0.7, { abs: 1e-12 });
    // Case B keeps −0.69 / −0.37 on a steep roof where case A turns positive.
    const steep = windCases(kpa(1), 35);
    expect(steep[0].windward).toBeWithin(0.21 - 0.18, { abs: 1e-12 });
    expect(steep[4].windward).toBeWithin(-0.69 - 0.18, { abs: 1e-12 });
  });
});
