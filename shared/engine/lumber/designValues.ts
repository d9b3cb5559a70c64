import { EngineError } from '../errors';
import { MPA_PER_PSI, mpa, type MPa } from '../units';
import { parseLumberId } from './ids';
import { REPETITIVE_MEMBER_FACTOR, sizeFactors } from './factors';
import { GRADE_DATA, referenceValuesPsi } from './referenceValues';
import { dressedSize } from './sizes';

/** Options for adjusting reference values. */
export interface DesignValueOptions {
  /** Load duration factor CD of the governing load combination (NDS 2018 Table 2.3.2). */
  cd: number;
  /** Apply Cr = 1.15 on Fb (trusses ≤ 24 in. o.c. with sheathing). */
  repetitive: boolean;
}

/**
 * Adjusted (ASD) design values in MPa. Dry service (CM = 1), normal temperature (Ct = 1), not
 * incised (Ci = 1), CL applied per member (`checkMember`, NDS 2018 §3.3.3). `fcStar` is Fc* (all factors
 * but Cp); `fcPerp` excludes Cb (apply it per bearing); `e`/`emin` take no CD.
 */
export interface DesignValues {
  fb: MPa;
  ft: MPa;
  fv: MPa;
  fcStar: MPa;
  fcPerp: MPa;
  e: MPa;
  emin: MPa;
  /** The factors used, for reports and printouts. */
  factors: { cd: number; cfB: number; cfT: number; cfC: number; cr: number };
}

// CM, Ct and Ci (NDS 2018 Table 4.3.1) are 1.0 for the dry, enclosed, non-incised truss lumber
// Spanwise designs, so they are not multiplied in (a factor of 1 would only add equivalent
// mutants); a wet-service or temperature option would add them to each line below.

// Module level, not a closure: this runs for every member check.
const toMpa = (p: number) => mpa(p * MPA_PER_PSI);

/** Adjusted design values for a lumber id (NDS 2018 Table 4.3.1, ASD column). */
export function designValues(lumberId: string, options: DesignValueOptions): DesignValues {
  const { cd, repetitive } = options;
  if (!(cd > 0) || cd > 2) {
    throw new EngineError('invalid', `Load duration factor CD must be in (0, 2]; got ${cd}.`, {
      cd,
    });
  }
  const { size, grade } = parseLumberId(lumberId);
  const ref = referenceValuesPsi(grade, size);
  const cf = sizeFactors(GRADE_DATA[grade].sizeFactor, dressedSize(size).nominalWidth);
  const cr = repetitive ? REPETITIVE_MEMBER_FACTOR : 1;
  return {
    fb: toMpa(ref.fb * cd * cf.fb * cr),
    ft: toMpa(ref.ft * cd * cf.ft),
    fv: toMpa(ref.fv * cd),
    fcStar: toMpa(ref.fc * cd * cf.fc),
    fcPerp: toMpa(ref.fcPerp),
    e: toMpa(ref.e),
    emin: toMpa(ref.emin),
    factors: { cd, cfB: cf.fb, cfT: cf.ft, cfC: cf.fc, cr },
  };
}
