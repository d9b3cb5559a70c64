import { describe, expect, it } from 'vitest';
import { isEngineError } from '../../../../shared/engine/errors';
import {
  DESIGN_CAUTIONS,
  designTruss,
  effectiveLengths,
  type TrussDesign,
} from '../../../../shared/engine/design';
import { designLoads } from '../../../../shared/engine/design/combinedLoads';
import { checkMember } from '../../../../shared/engine/members/checkMember';
import { generateProfile } from '../../../../shared/engine/profiles';
import { KPA_PER_PSF, MM_PER_INCH } from '../../../../shared/engine/units';
import { ENGINE_VERSION } from '../../../../shared/engine/version';
import { engineInput, HEAVY_SNOW_FINK_40, lightFink, TYPICAL_LOADS } from './support/inputs';

describe('a light truss', () => {
  // Common practice: a 24 ft 4/12 Fink at 20/10/0/10 psf, 24 in o.c. is built of 2x4 chords.
  // Designed inside each test (README, mutation testing).
  const designed = () => designTruss(engineInput(lightFink()));

  it('passes with 2x4 chords and 2x4 webs', () => {
    const d = designed();
    expect(d.ok).toBe(true);
    expect(d.warnings).toEqual([]);
    for (const p of d.pieces) {
      expect(p.lumber.startsWith('2x4 ')).toBe(true);
      expect(p.failing).toBe(false);
    }
    for (const m of d.members) expect(m.csi).toBeLessThanOrEqual(1);
  });

  it('gives both top chords one lumber and every member the lumber of its piece', () => {
    const d = designed();
    const top = new Set(d.pieces.filter((p) => p.role === 'topChord').map((p) => p.lumber));
    expect(top.size).toBe(1);
    const byMark = new Map(d.pieces.map((p) => [p.mark, p]));
    for (const m of d.members) expect(m.lumber).toBe(byMark.get(m.piece)!.lumber);
  });

  it('analyses the 4 in standard heel as the pointed heel and says so', () => {
    const d = designed();
    expect(d.heelHeight.requested).toBeWithin(4 * MM_PER_INCH, { rel: 1e-12 });
    expect(d.heelHeight.analysed).toBe(0);
    expect(d.notes.some((n) => n.startsWith('Standard heel'))).toBe(true);
  });

  it('reports force envelopes as positive magnitudes and the governing combination', () => {
    const d = designed();
    for (const m of d.members) {
      expect(m.maxTension).toBe(Math.max(0, ...m.forces));
      expect(m.maxCompression).toBe(Math.max(0, ...m.forces.map((f) => -f)));
      expect(d.combinations.map((c) => c.name)).toContain(m.governingCombination);
    }
    // Top chords of a gable truss under gravity are in compression (common practice).
    for (const m of d.members.filter((x) => x.role === 'topChord')) {
      expect(m.maxCompression).toBeGreaterThan(0);
    }
  });

  it('plates every joint and bears on both supports', () => {
    const d = designed();
    expect(d.plates).toHaveLength(d.joints.length);
    expect(d.plates.every((p) => p.ok && p.design!.count === 2)).toBe(true);
    expect(d.plates.filter((p) => p.kind === 'heel').map((p) => p.joint)).toEqual(
      d.reactions.map((r) => r.joint),
    );
    expect(d.bearing.map((b) => b.pass)).toEqual([true, true]);
  });

  it('carries every caution of DESIGN.md §4.6 and the engine version', () => {
    const d = designed();
    expect(d.cautions).toEqual([...DESIGN_CAUTIONS]);
    const text = d.cautions.join(' ');
    for (const phrase of [
      /preliminary until the design is reviewed/,
      /sealed by a registered design professional/,
      /confirmed by the building designer/,
      /temporary and permanent bracing/,
      /bracing guide/,
      /cut or altered in the field without a written repair/,
      /Local codes govern/,
    ]) {
      expect(text).toMatch(phrase);
    }
    expect(d.engineVersion).toBe(ENGINE_VERSION);
  });
});

describe('a long truss under heavy snow', () => {
  // 40 ft 6/12 Fink, pg = 70 psf: the W's long compression webs (about 6 ft) buckle out of
  // plane over their full length (NDS 2018 3.7.1, le/b near 50), and the chords must be
  // deeper than 2x4 (common practice for such a truss).
  const designed = () => designTruss(engineInput(HEAVY_SNOW_FINK_40));

  it('upsizes the chords and braces the long webs', () => {
    const d = designed();
    const chords = d.pieces.filter((p) => p.role !== 'web');
    expect(chords.every((p) => !p.lumber.startsWith('2x4 '))).toBe(true);
    const braced = d.members.filter((m) => m.braced);
    expect(braced.length).toBeGreaterThan(0);
    for (const m of braced) {
      expect(m.role).toBe('web');
      expect(m.maxCompression).toBeGreaterThan(0);
      expect(m.length).toBeGreaterThan(60 * MM_PER_INCH);
      expect(m.bracing).toMatch(/mid-length/);
    }
    expect(d.combinations.map((c) => c.name)).toContain('D + S');
  });

  it('prefers a 2x4 web with a brace over a deeper web', () => {
    const d = designed();
    for (const m of d.members.filter((x) => x.braced)) expect(m.lumber).toBe('2x4 SPF-1/2');
  });
});

describe('a fixed lumber that cannot pass', () => {
  const designed = () =>
    designTruss(
      engineInput({
        ...lightFink({ span: 32 * 12 }),
        loads: { ...TYPICAL_LOADS, snow: { pg: 60 } },
        lumber: { topChord: '2x3 SPF-1/2' },
      }),
    );

  it('returns ok = false with a readable warning instead of throwing', () => {
    const d = designed();
    expect(d.ok).toBe(false);
    const top = d.pieces.filter((p) => p.role === 'topChord');
    expect(top.every((p) => p.failing && p.lumber === '2x3 SPF-1/2')).toBe(true);
    expect(d.warnings.join('\n')).toMatch(
      /^Top chord: the required 2x3 SPF No\.1\/No\.2 does not pass at CSI \d+\.\d\d \([a-z+]+, D \+ [^)]+\)\.$/m,
    );
  });

  it('keeps the strongest candidate when a list has none that passes', () => {
    const list = designTruss(
      engineInput({
        ...lightFink({ span: 32 * 12 }),
        loads: { ...TYPICAL_LOADS, snow: { pg: 60 } },
        lumber: { topChord: ['2x3 SPF-1/2', '2x3 DFL-2'] },
      }),
    );
    expect(list.warnings.join('\n')).toMatch(
      /Top chord: no allowed lumber passes; best is 2x3 DF-L No\.2 at CSI/,
    );
    expect(list.pieces.find((p) => p.role === 'topChord')!.lumber).toBe('2x3 DFL-2');
  });
});

describe('units', () => {
  it('an imperial and a metric request of one truss give the same design', () => {
    const imperial = designTruss(
      engineInput(lightFink({ loads: { ...TYPICAL_LOADS, snow: { pg: 25 } } })),
    );
    // The same truss in exact metric values: 1 in = 25.4 mm, 1 psf = KPA_PER_PSF kPa.
    const kpa = (v: number) => v * KPA_PER_PSF;
    const metric = designTruss(
      engineInput({
        units: 'metric',
        profile: 'fink',
        span: 288 * 25.4,
        pitch: 4,
        heelHeight: 4 * 25.4,
        overhang: 12 * 25.4,
        spacing: 24 * 25.4,
        bearingWidth: 3.5 * 25.4,
        loads: { tcll: kpa(20), tcdl: kpa(10), bcll: 0, bcdl: kpa(10), snow: { pg: kpa(25) } },
      }),
    );
    expect(metric.pieces.map((p) => p.lumber)).toEqual(imperial.pieces.map((p) => p.lumber));
    expect(metric.combinations).toEqual(imperial.combinations);
    metric.members.forEach((m, k) => {
      m.forces.forEach((f, i) =>
        expect(f).toBeWithin(imperial.members[k].forces[i], { rel: 1e-9, abs: 1e-6 }),
      );
      expect(m.csi).toBeWithin(imperial.members[k].csi, { rel: 1e-9 });
    });
    expect(metric.deflection.total.max).toBeWithin(imperial.deflection.total.max, { rel: 1e-9 });
    expect(metric.plates.map((p) => p.design?.plate.id)).toEqual(
      imperial.plates.map((p) => p.design?.plate.id),
    );
  });
});

describe('raised heels', () => {
  it('a heel over 8 in gets the heel post and heel webs', () => {
    const d = designTruss(engineInput(lightFink({ heelHeight: 12 })));
    expect(d.heelHeight.analysed).toBeWithin(12 * MM_PER_INCH, { rel: 1e-12 });
    // Fink with raised heels: 4 W webs + 2 posts + 2 heel webs + 2 webs closing the end panels.
    expect(d.members.filter((m) => m.role === 'web')).toHaveLength(10);
    expect(d.notes.some((n) => n.startsWith('Standard heel'))).toBe(false);
  });

  it('an unbuildable request throws the generator’s EngineError', () => {
    let error: unknown;
    try {
      designTruss(engineInput(lightFink({ span: 60 * 12, maxStockLength: 96 })));
    } catch (e) {
      error = e;
    }
    expect(isEngineError(error) && error.code).toBe('geometry');
  });
});

describe('chord bending from the continuous chord', () => {
  // The light Fink (common practice: 2x4 chords). The simple-span model it replaces took
  // max(wL²/8, overhang moment) per top-chord panel; the continuous chord lowers the moment at
  // the heel panel point (three-moment equation), so the top chord's CSI drops.
  const draft = lightFink();
  const profile = generateProfile({ ...engineInput(draft).profile, heelHeight: 0 });
  const { combinations } = designLoads(engineInput(draft), profile, '7-16');

  /** Worst CSI of a top-chord member over the combinations with the simple-span moments. */
  const simpleSpanCsi = (d: TrussDesign, id: string) => {
    const k = profile.members.findIndex((mb) => mb.id === id);
    const mb = d.members[k];
    return Math.max(
      ...combinations.map((c, i) => {
        const moment = Math.max(
          (Math.abs(c.transverse[k]) * mb.length ** 2) / 8,
          Math.abs(c.overhangMoment[k]),
        );
        return checkMember({
          lumberId: mb.lumber,
          plies: 1,
          axial: mb.forces[i],
          moment,
          ...effectiveLengths(profile.members[k], false),
          cd: c.cd,
          repetitive: true,
        }).csi;
      }),
    );
  };

  for (const lumber of [undefined, '2x4 SPF-1/2', '2x4 SP-2']) {
    it(`lowers the top-chord CSI (${lumber ?? 'auto-sized'})`, () => {
      const d = designTruss(
        engineInput(lightFink(lumber ? { lumber: { topChord: [lumber] } } : {})),
      );
      for (const mb of d.members.filter((x) => x.role === 'topChord')) {
        expect(mb.csi).toBeLessThan(simpleSpanCsi(d, mb.id));
      }
      expect(d.notes.some((n) => n.includes('plane frame'))).toBe(true);
    });
  }
});

describe('panel-point moments are not amplified (NDS 2018 3.9.2 applied to the span moment)', () => {
  // Common practice: a 24 ft 4/12 Fink at 20/10/0/10 psf, 24 in o.c., is built with 2x4 chords.
  // On the frame the heel-panel span moment (amplified) governs the top chord: a fixed 2x4
  // SPF No.1/No.2 sits at about CSI 1.01 and SP No.2 (lower Fb) at 1.12, so auto-sizing moves on
  // to the next allowed lumber and the design passes.
  it('auto-sizes the light Fink to a passing design', () => {
    const d = designTruss(engineInput(lightFink()));
    expect(Math.max(...d.members.map((m) => m.csi))).toBeLessThanOrEqual(1);
    expect(d.ok).toBe(true);
  });

  it('checks the span moment with the amplifier: a fixed 2x4 SP No.2 top chord fails', () => {
    const d = designTruss(engineInput(lightFink({ lumber: { topChord: ['2x4 SP-2'] } })));
    const worst = d.members.filter((m) => m.role === 'topChord').sort((a, b) => b.csi - a.csi)[0];
    expect(worst.governingCheck).toBe('compression+bending');
    expect(d.ok).toBe(false);
  });
});
