import { describe, expect, it } from 'vitest';
import { designRoofSnowLoad, minimumRoofSnowLoad } from '../../../../shared/engine/loads';
import { unbalancedSnow } from '../../../../shared/engine/loads/unbalancedSnow';
import { kpaToPsf, mm, psf, psfToKpa } from '../../../../shared/engine/units';

const deg = (risePer12: number) => (Math.atan(risePer12 / 12) * 180) / Math.PI;
const P = (v: number) => psfToKpa(psf(v));

describe('minimum roof snow load pm, ASCE 7-16 §7.3.4 (from memory; text as summarised in references)', () => {
  it('3/12 roof (14.04°), pg = 15 psf: pf = 0.7·15 = 10.5 psf, pm = Is·pg = 15 psf governs', () => {
    const r = designRoofSnowLoad({
      pg: P(15),
      ce: 1,
      ct: 1,
      is: 1,
      slopeDeg: deg(3),
      slippery: false,
    });
    expect(kpaToPsf(r.ps)).toBeWithin(10.5, { rel: 1e-9 });
    expect(kpaToPsf(r.pm)).toBeWithin(15, { rel: 1e-9 });
    expect(r.governs).toBe('pm');
  });

  it('pg over 20 psf caps pm at Is·20 psf; Is multiplies (7-16) and is dropped (7-22)', () => {
    expect(kpaToPsf(minimumRoofSnowLoad({ pg: P(40), is: 1.2, slopeDeg: 5 }))).toBeWithin(24, {
      rel: 1e-9,
    });
    expect(
      kpaToPsf(minimumRoofSnowLoad({ pg: P(40), is: 1.2, slopeDeg: 5, edition: '7-22' })),
    ).toBeWithin(20, { rel: 1e-9 });
    expect(kpaToPsf(minimumRoofSnowLoad({ pg: P(12), is: 0.8, slopeDeg: 0 }))).toBeWithin(9.6, {
      rel: 1e-9,
    });
  });

  it('fully exposed in exposure D (Ce 0.8), pg = 15: pf = 8.4 < pm = 15 (eng-tips qid=49583 example, 7-98 form)', () => {
    const r = designRoofSnowLoad({
      pg: P(15),
      ce: 0.8,
      ct: 1,
      is: 1,
      slopeDeg: 2,
      slippery: false,
    });
    expect(kpaToPsf(r.ps)).toBeWithin(8.4, { rel: 1e-9 });
    expect(r.governs).toBe('pm');
  });

  it('applies only under 15°: 4/12 (18.4°) and exactly 15° get none; pf governs when larger', () => {
    expect(minimumRoofSnowLoad({ pg: P(15), slopeDeg: deg(4) })).toBe(0);
    expect(minimumRoofSnowLoad({ pg: P(15), slopeDeg: 15 })).toBe(0);
    expect(kpaToPsf(minimumRoofSnowLoad({ pg: P(15), slopeDeg: 14.99 }))).toBeWithin(15, {
      rel: 1e-9,
    });
    const r = designRoofSnowLoad({
      pg: P(30),
      ce: 1,
      ct: 1,
      is: 1,
      slopeDeg: deg(2),
      slippery: false,
    });
    expect(kpaToPsf(r.ps)).toBeWithin(21, { rel: 1e-9 });
    expect(kpaToPsf(r.pm)).toBeWithin(20, { rel: 1e-9 });
    expect(r.governs).toBe('ps');
  });
});

describe('unbalanced snow on a gable roof, ASCE 7-16 §7.6.1 (from memory), by hand', () => {
  // pg = 30 psf, 6/12, W = 20 ft, Ce = Ct = Is = 1: ps = 21 psf (Cs = 1).
  // hd = 0.43·∛20·∜(30 + 10) − 1.5 = 1.435 ft (Fig. 7.6-1 with W for lu); γ = 0.13·30 + 14 =
  // 17.9 pcf (Eq. 7.7-1); S = 2: surcharge hd·γ/√S = 18.17 psf over 8·hd·√S/3 = 5.41 ft.
  const hd = 0.43 * Math.cbrt(20) * 40 ** 0.25 - 1.5;
  const u = () => unbalancedSnow({ pg: P(30), ps: P(21), pitch: 6, eaveToRidge: mm(20 * 304.8) })!;

  it('windward 0.3·ps = 6.3 psf, leeward ps = 21 psf', () => {
    expect(kpaToPsf(u().windward)).toBeWithin(6.3, { rel: 1e-9 });
    expect(kpaToPsf(u().leeward)).toBeWithin(21, { rel: 1e-9 });
  });

  it('surcharge 18.17 psf over 5.41 ft from the ridge', () => {
    expect(hd).toBeWithin(1.4354, { abs: 1e-4 });
    expect(u().gammaPcf).toBeWithin(17.9, { rel: 1e-12 });
    expect(kpaToPsf(u().surcharge)).toBeWithin((hd * 17.9) / Math.SQRT2, { rel: 1e-9 });
    expect(kpaToPsf(u().surcharge)).toBeWithin(18.17, { abs: 0.01 });
    expect(u().extent / 304.8).toBeWithin((8 * hd * Math.SQRT2) / 3, { rel: 1e-9 });
    expect(u().extent / 304.8).toBeWithin(5.413, { abs: 0.001 });
  });

  it('W under 20 ft is taken as 20 ft; γ is capped at 30 pcf', () => {
    const short = unbalancedSnow({ pg: P(30), ps: P(21), pitch: 6, eaveToRidge: mm(8 * 304.8) })!;
    expect(short.hd).toBeWithin(u().hd, { rel: 1e-12 });
    const heavy = unbalancedSnow({
      pg: P(150),
      ps: P(105),
      pitch: 6,
      eaveToRidge: mm(20 * 304.8),
    })!;
    expect(heavy.gammaPcf).toBe(30);
  });

  it('is required only from 1/2 on 12 to 7 on 12', () => {
    const at = (pitch: number) =>
      unbalancedSnow({ pg: P(30), ps: P(21), pitch, eaveToRidge: mm(20 * 304.8) });
    expect(at(0.49)).toBeUndefined();
    expect(at(0.5)).toBeDefined();
    expect(at(7)).toBeDefined();
    expect(at(7.01)).toBeUndefined();
  });
});
