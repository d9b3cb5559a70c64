import { describe, expect, it } from 'vitest';
import {
  LUMBER_GRADES,
  LUMBER_SIZES,
  designValues,
  dressedSize,
  referenceValuesPsi,
  sizeFactors,
} from '../../../../shared/engine/lumber';

/**
 * The engine's reference tables asserted cell by cell against the NDS 2018 Supplement, typed here
 * independently of the engine: [Fb, Ft, Fv, Fc⊥, Fc, E, Emin] in psi.
 *
 * - Table 4A (SPF No.1/No.2, DF-L No.1, DF-L No.2, Hem-Fir No.2): engineering.md §1 (V2: two
 *   independent transcriptions agree). Hem-Fir No.1: Table 4A, from memory.
 * - Table 4B Southern Pine, size-specific: 2x4 and 2x6 rows engineering.md §1 (V2); the 2"–4"
 *   wide row also covers 2x3; 2x8, 2x10 and 2x12 rows from memory.
 * - Table 4C MSR: Fb, Ft, Fc, E per msrlumber.org (engineering.md §1, V); Emin 762,000 and
 *   915,000 from memory; Fv and Fc⊥ are the species' values (SPF 135 / 425; V for 1650f, from
 *   memory for 2100f).
 */
type Row = readonly [number, number, number, number, number, number, number];
const PROPS = ['fb', 'ft', 'fv', 'fcPerp', 'fc', 'e', 'emin'] as const;

const SPF_12: Row = [875, 450, 135, 425, 1150, 1_400_000, 510_000];
const DFL_1: Row = [1000, 675, 180, 625, 1500, 1_700_000, 620_000];
const DFL_2: Row = [900, 575, 180, 625, 1350, 1_600_000, 580_000];
const HF_1: Row = [975, 625, 150, 405, 1350, 1_500_000, 550_000]; // from memory
const HF_2: Row = [850, 525, 150, 405, 1300, 1_300_000, 470_000];
const MSR_1650: Row = [1650, 1020, 135, 425, 1700, 1_500_000, 762_000];
const MSR_2100: Row = [2100, 1575, 135, 425, 1875, 1_800_000, 915_000];

const allSizes = (row: Row): Record<string, Row> =>
  Object.fromEntries(['2x3', '2x4', '2x6', '2x8', '2x10', '2x12'].map((s) => [s, row]));

const TABLE: Record<string, Record<string, Row>> = {
  'SPF-1/2': allSizes(SPF_12),
  'DFL-1': allSizes(DFL_1),
  'DFL-2': allSizes(DFL_2),
  'HF-1': allSizes(HF_1),
  'HF-2': allSizes(HF_2),
  'SP-1': {
    '2x3': [1500, 1000, 175, 565, 1650, 1_600_000, 580_000],
    '2x4': [1500, 1000, 175, 565, 1650, 1_600_000, 580_000],
    '2x6': [1350, 875, 175, 565, 1550, 1_600_000, 580_000],
    '2x8': [1250, 800, 175, 565, 1500, 1_600_000, 580_000],
    '2x10': [1050, 700, 175, 565, 1450, 1_600_000, 580_000],
    '2x12': [1000, 650, 175, 565, 1400, 1_600_000, 580_000],
  },
  'SP-2': {
    '2x3': [1100, 675, 175, 565, 1450, 1_400_000, 510_000],
    '2x4': [1100, 675, 175, 565, 1450, 1_400_000, 510_000],
    '2x6': [1000, 600, 175, 565, 1400, 1_400_000, 510_000],
    '2x8': [925, 550, 175, 565, 1350, 1_400_000, 510_000],
    '2x10': [800, 475, 175, 565, 1300, 1_400_000, 510_000],
    '2x12': [750, 450, 175, 565, 1250, 1_400_000, 510_000],
  },
  'MSR-1650-1.5E': allSizes(MSR_1650),
  'MSR-2100-1.8E': allSizes(MSR_2100),
};

/**
 * NDS 2018 Supplement Table 4A size factors CF (grades SS, No.1, No.2, No.3; 2 & 3 in. thick),
 * engineering.md §1 (V, NELMA Table A): nominal width → [Fb, Ft, Fc]. Table 4B (SP, size-specific
 * values) and Table 4C (MSR up to 12 in.) take CF = 1.0.
 */
const CF_4A: Record<number, readonly [number, number, number]> = {
  2: [1.5, 1.5, 1.15],
  3: [1.5, 1.5, 1.15],
  4: [1.5, 1.5, 1.15],
  5: [1.4, 1.4, 1.1],
  6: [1.3, 1.3, 1.1],
  8: [1.2, 1.2, 1.05],
  10: [1.1, 1.1, 1.0],
  12: [1.0, 1.0, 1.0],
};
const TABLE_4A = new Set(['SPF-1/2', 'DFL-1', 'DFL-2', 'HF-1', 'HF-2']);

// Nominal width and dressed depth, in. (PS 20 / NDS 2018 Supplement Table 1A; engineering.md §6).
const WIDTH: Record<string, [number, number]> = {
  '2x3': [3, 2.5],
  '2x4': [4, 3.5],
  '2x6': [6, 5.5],
  '2x8': [8, 7.25],
  '2x10': [10, 9.25],
  '2x12': [12, 11.25],
};

/** 1 psi = 6894.757 Pa (1 lbf = 4.4482216 N, 1 in = 25.4 mm). */
const MPA_PER_PSI = 4.4482216152605 / 25.4 ** 2;

describe('NDS 2018 Supplement reference values, every species × grade × size × property', () => {
  it('the engine knows exactly the grades and sizes tabulated here', () => {
    expect([...LUMBER_GRADES].sort()).toEqual(Object.keys(TABLE).sort());
    expect([...LUMBER_SIZES].sort()).toEqual(Object.keys(WIDTH).sort());
  });

  for (const grade of LUMBER_GRADES) {
    for (const size of LUMBER_SIZES) {
      it(`${size} ${grade}`, () => {
        const row = TABLE[grade][size];
        const got = referenceValuesPsi(grade, size);
        PROPS.forEach((p, i) => expect({ [p]: got[p] }).toEqual({ [p]: row[i] }));
      });
    }
  }
});

describe('NDS 2018 Supplement Table 4A size factor CF, the whole table', () => {
  for (const [width, [fb, ft, fc]] of Object.entries(CF_4A)) {
    it(`nominal width ${width} in.: Fb ${fb}, Ft ${ft}, Fc ${fc}`, () => {
      expect(sizeFactors('table4A', Number(width))).toEqual({ fb, ft, fc });
      expect(sizeFactors('none', Number(width))).toEqual({ fb: 1, ft: 1, fc: 1 });
    });
  }

  it('has no factor for widths it does not tabulate (7, 9 in.)', () => {
    expect(() => sizeFactors('table4A', 7)).toThrow(/size factor/);
    expect(() => sizeFactors('table4A', 9)).toThrow(/size factor/);
  });
});

describe('adjusted design values = reference × CD × CF × Cr (NDS 2018 Table 4.3.1, ASD)', () => {
  for (const grade of LUMBER_GRADES) {
    for (const size of LUMBER_SIZES) {
      it(`${size} ${grade}`, () => {
        const [width, depth] = WIDTH[size];
        expect(dressedSize(size).nominalWidth).toBe(width);
        expect(dressedSize(size).widthIn).toBe(depth);
        const [cfB, cfT, cfC] = TABLE_4A.has(grade) ? CF_4A[width] : [1, 1, 1];
        const [fb, ft, fv, fcPerp, fc, e, emin] = TABLE[grade][size];
        for (const [cd, repetitive] of [
          [0.9, false],
          [1.15, true],
          [1.6, true],
        ] as const) {
          const cr = repetitive ? 1.15 : 1;
          const d = designValues(`${size} ${grade}`, { cd, repetitive });
          const expectPsi = (mpa: number, psi: number) =>
            expect(mpa / MPA_PER_PSI).toBeWithin(psi, { rel: 1e-9 });
          expectPsi(d.fb, fb * cd * cfB * cr);
          expectPsi(d.ft, ft * cd * cfT);
          expectPsi(d.fv, fv * cd);
          expectPsi(d.fcStar, fc * cd * cfC);
          // Fc⊥, E and Emin take no CD (NDS 2018 Table 4.3.1 and 2.3.2).
          expectPsi(d.fcPerp, fcPerp);
          expectPsi(d.e, e);
          expectPsi(d.emin, emin);
        }
      });
    }
  }
});
