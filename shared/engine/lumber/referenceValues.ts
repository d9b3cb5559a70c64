import type { LumberSize } from './sizes';

/**
 * Reference design values as published, in psi (NDS 2018 Supplement). Fc⊥ is `fcPerp`.
 * Sources are cited beside each row; "from memory" marks values not in
 * /work/shared/references/engineering.md §1 (or marked U there).
 */
export interface ReferenceValuesPsi {
  fb: number;
  ft: number;
  fv: number;
  fcPerp: number;
  fc: number;
  e: number;
  emin: number;
}

/** How the size factor CF applies to a grade's values. */
export type SizeFactorRule = 'table4A' | 'none';

/** One species/grade: values either for all sizes or per size, and where they come from. */
export interface GradeData {
  label: string;
  species: string;
  table:
    | 'NDS 2018 Supplement Table 4A'
    | 'NDS 2018 Supplement Table 4B'
    | 'NDS 2018 Supplement Table 4C';
  sizeFactor: SizeFactorRule;
  values: ReferenceValuesPsi | Record<LumberSize, ReferenceValuesPsi>;
}

const v = (
  fb: number,
  ft: number,
  fv: number,
  fcPerp: number,
  fc: number,
  e: number,
  emin: number,
): ReferenceValuesPsi => ({ fb, ft, fv, fcPerp, fc, e, emin });

// Southern Pine, NDS 2018 Supplement Table 4B (values effective June 1, 2013). Table 4B groups
// 2"–4" widths, so 2x3 shares the 2x4 row (from memory). 2x4 and 2x6 rows: engineering.md §1 (V2).
// 2x8–2x12 rows: from memory; they agree with the SFPA metric values transcribed in xc
// (python_modules/materials/awc_nds/dimensional_lumber.py) after rounding to published psi steps.
const SP1_2X4 = v(1500, 1000, 175, 565, 1650, 1_600_000, 580_000);
const SP2_2X4 = v(1100, 675, 175, 565, 1450, 1_400_000, 510_000);

/** Grade ids shared across the product; the lumber id is "<size> <grade>". */
export const LUMBER_GRADES = [
  'SPF-1/2',
  'DFL-1',
  'DFL-2',
  'HF-1',
  'HF-2',
  'SP-1',
  'SP-2',
  'MSR-1650-1.5E',
  'MSR-2100-1.8E',
] as const;

/** A grade id, e.g. "SPF-1/2". */
export type LumberGrade = (typeof LUMBER_GRADES)[number];

/** Reference data per grade id. */
export const GRADE_DATA: Record<LumberGrade, GradeData> = {
  // NDS 2018 Supplement Table 4A, "2 in. & wider" — engineering.md §1 (V2) unless noted.
  'SPF-1/2': {
    label: 'SPF No.1/No.2',
    species: 'Spruce-Pine-Fir',
    table: 'NDS 2018 Supplement Table 4A',
    sizeFactor: 'table4A',
    values: v(875, 450, 135, 425, 1150, 1_400_000, 510_000),
  },
  'DFL-1': {
    label: 'DF-L No.1',
    species: 'Douglas Fir-Larch',
    table: 'NDS 2018 Supplement Table 4A',
    sizeFactor: 'table4A',
    values: v(1000, 675, 180, 625, 1500, 1_700_000, 620_000),
  },
  'DFL-2': {
    label: 'DF-L No.2',
    species: 'Douglas Fir-Larch',
    table: 'NDS 2018 Supplement Table 4A',
    sizeFactor: 'table4A',
    values: v(900, 575, 180, 625, 1350, 1_600_000, 580_000),
  },
  'HF-1': {
    label: 'Hem-Fir No.1',
    species: 'Hem-Fir',
    table: 'NDS 2018 Supplement Table 4A',
    sizeFactor: 'table4A',
    // From memory (absent from engineering.md); agrees with the buddyd16 Table 4A CSV (source [B] there).
    values: v(975, 625, 150, 405, 1350, 1_500_000, 550_000),
  },
  'HF-2': {
    label: 'Hem-Fir No.2',
    species: 'Hem-Fir',
    table: 'NDS 2018 Supplement Table 4A',
    sizeFactor: 'table4A',
    values: v(850, 525, 150, 405, 1300, 1_300_000, 470_000),
  },
  // NDS 2018 Supplement Table 4B: size-specific, CF already built in (CF = 1.0 for 2x4–2x12).
  'SP-1': {
    label: 'SP No.1',
    species: 'Southern Pine',
    table: 'NDS 2018 Supplement Table 4B',
    sizeFactor: 'none',
    values: {
      '2x3': SP1_2X4, // from memory (2"–4" wide group)
      '2x4': SP1_2X4,
      '2x6': v(1350, 875, 175, 565, 1550, 1_600_000, 580_000),
      '2x8': v(1250, 800, 175, 565, 1500, 1_600_000, 580_000), // from memory
      '2x10': v(1050, 700, 175, 565, 1450, 1_600_000, 580_000), // from memory
      '2x12': v(1000, 650, 175, 565, 1400, 1_600_000, 580_000), // from memory
    },
  },
  'SP-2': {
    label: 'SP No.2',
    species: 'Southern Pine',
    table: 'NDS 2018 Supplement Table 4B',
    sizeFactor: 'none',
    values: {
      '2x3': SP2_2X4, // from memory (2"–4" wide group)
      '2x4': SP2_2X4,
      '2x6': v(1000, 600, 175, 565, 1400, 1_400_000, 510_000),
      '2x8': v(925, 550, 175, 565, 1350, 1_400_000, 510_000), // from memory
      '2x10': v(800, 475, 175, 565, 1300, 1_400_000, 510_000), // from memory
      '2x12': v(750, 450, 175, 565, 1250, 1_400_000, 510_000), // from memory
    },
  },
  // NDS 2018 Supplement Table 4C (MSR), Fb/Ft/Fc/E per msrlumber.org (engineering.md §1, V).
  // Fv and Fc⊥ depend on species; we assume SPF stock (135/425 — V for 1650f, from memory for
  // 2100f). Emin 762,000 and 915,000: from memory (U in engineering.md). CF = 1.0 up to 12 in.
  'MSR-1650-1.5E': {
    label: 'MSR 1650f-1.5E',
    species: 'Spruce-Pine-Fir (MSR)',
    table: 'NDS 2018 Supplement Table 4C',
    sizeFactor: 'none',
    values: v(1650, 1020, 135, 425, 1700, 1_500_000, 762_000),
  },
  'MSR-2100-1.8E': {
    label: 'MSR 2100f-1.8E',
    species: 'Spruce-Pine-Fir (MSR)',
    table: 'NDS 2018 Supplement Table 4C',
    sizeFactor: 'none',
    values: v(2100, 1575, 135, 425, 1875, 1_800_000, 915_000),
  },
};

/** True when `g` is one of LUMBER_GRADES. */
export const isLumberGrade = (g: string): g is LumberGrade =>
  (LUMBER_GRADES as readonly string[]).includes(g);

const isPerSize = (values: GradeData['values']): values is Record<LumberSize, ReferenceValuesPsi> =>
  !('fb' in values);

/** Published reference values (psi) for a grade and size. */
export function referenceValuesPsi(grade: LumberGrade, size: LumberSize): ReferenceValuesPsi {
  const { values } = GRADE_DATA[grade];
  return isPerSize(values) ? values[size] : values;
}
