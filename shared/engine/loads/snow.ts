import { EngineError } from '../errors';
import { KPA_PER_PSF, kpa, type KPa } from '../units';

/** ASCE 7 edition; 7-22 drops the importance factor from the flat-roof snow load. */
export type AsceEdition = '7-16' | '7-22';

/** Thermal conditions of ASCE 7-16 Table 7.3-2 → Ct (engineering.md §3, V2 via xc). */
export const THERMAL_FACTOR = {
  heated: 1.0,
  /** Kept just above freezing, or cold ventilated roofs with R > 25 ft²·h·°F/Btu. */
  justAboveFreezing: 1.1,
  unheatedOrOpen: 1.2,
  keptBelowFreezing: 1.3,
  heatedGreenhouse: 0.85,
} as const;

/** Snow importance factor Is by risk category, ASCE 7-16 Table 1.5-2 (engineering.md §3). */
export const SNOW_IMPORTANCE_FACTOR = { I: 0.8, II: 1.0, III: 1.1, IV: 1.2 } as const;

/** Risk category of the building (ASCE 7-16 Table 1.5-1). */
export type RiskCategory = keyof typeof SNOW_IMPORTANCE_FACTOR;

/** Roof exposure for Ce (ASCE 7-16 Table 7.3-1). */
export type RoofExposure = 'fullyExposed' | 'partiallyExposed' | 'sheltered';

/**
 * Exposure factor Ce, ASCE 7-16 Table 7.3-1. Surface roughness B: 0.9/1.0/1.2 (engineering.md §3,
 * V2). Roughness C and D rows: from memory.
 */
export const EXPOSURE_FACTOR: Record<'B' | 'C' | 'D', Record<RoofExposure, number>> = {
  B: { fullyExposed: 0.9, partiallyExposed: 1.0, sheltered: 1.2 },
  C: { fullyExposed: 0.9, partiallyExposed: 1.0, sheltered: 1.1 }, // from memory
  D: { fullyExposed: 0.8, partiallyExposed: 0.9, sheltered: 1.0 }, // from memory
};

/** Inputs of the flat-roof snow load. */
export interface FlatRoofSnowInput {
  /** Ground snow load pg. */
  pg: KPa;
  ce: number;
  ct: number;
  /** Importance factor; ignored by ASCE 7-22 (default 1.0). */
  is?: number;
  edition?: AsceEdition;
}

/**
 * Flat-roof snow load: ASCE 7-16 Eq. 7.3-1 pf = 0.7·Ce·Ct·Is·pg; ASCE 7-22 pf = 0.7·Ce·Ct·pg
 * (its snow is strength-level, no Is). Minimum snow loads (7.3.4) are not applied here.
 */
export function flatRoofSnowLoad(input: FlatRoofSnowInput): KPa {
  const { pg, ce, ct, is = 1, edition = '7-16' } = input;
  for (const [name, value] of Object.entries({ pg, ce, ct, is })) {
    if (!Number.isFinite(value) || value < 0) {
      throw new EngineError('invalid', `Snow load: ${name} must be a number ≥ 0.`, {
        [name]: value,
      });
    }
  }
  const importance = edition === '7-22' ? 1 : is;
  return kpa(0.7 * ce * ct * importance * pg);
}

/** Inputs of the roof slope factor. */
export interface SlopeFactorInput {
  /** Roof slope, degrees from horizontal. */
  slopeDeg: number;
  ct: number;
  /** Unobstructed slippery surface (metal, membrane, …) that lets snow slide off the eave. */
  slippery: boolean;
}

// Fig. 7.4-1 breakpoints (engineering.md §3, V2): Cs = 1 up to the breakpoint, then linear to 0
// at 70°. Ct ≤ 1.0 uses the warm-roof curve; Ct = 1.1 its own; Ct ≥ 1.2 the 1.2 curve (1.3 is
// grouped with 1.2 — from memory of ASCE 7-16 7.4.2).
const BREAKPOINT_DEG = {
  warm: { slippery: 5, other: 30 },
  cold11: { slippery: 10, other: 37.5 },
  cold12: { slippery: 15, other: 45 },
} as const;

/**
 * Roof slope factor Cs, ASCE 7-16 Fig. 7.4-1 (e.g. warm, other surfaces: 1 − (θ − 30°)/40°).
 * The insulation conditions under which a warm roof counts as slippery are the caller's call.
 */
export function slopeFactor({ slopeDeg, ct, slippery }: SlopeFactorInput): number {
  if (!Number.isFinite(slopeDeg) || slopeDeg < 0 || slopeDeg > 90) {
    throw new EngineError('invalid', 'Roof slope must be between 0° and 90°.', { slopeDeg });
  }
  const curve =
    ct <= 1.0 ? BREAKPOINT_DEG.warm : ct <= 1.1 ? BREAKPOINT_DEG.cold11 : BREAKPOINT_DEG.cold12;
  const start = slippery ? curve.slippery : curve.other;
  if (slopeDeg <= start) return 1;
  if (slopeDeg >= 70) return 0;
  return 1 - (slopeDeg - start) / (70 - start);
}

/** Sloped-roof snow load ps = Cs·pf (ASCE 7-16 Eq. 7.4-1), on the horizontal projection. */
export function slopedRoofSnowLoad(input: FlatRoofSnowInput & Omit<SlopeFactorInput, 'ct'>): KPa {
  const pf = flatRoofSnowLoad(input);
  return kpa(
    slopeFactor({ slopeDeg: input.slopeDeg, ct: input.ct, slippery: input.slippery }) * pf,
  );
}

/** 20 psf in kPa: the cap on pg in the minimum roof snow load (ASCE 7-16 §7.3.4). */
const PM_CAP_KPA = 20 * KPA_PER_PSF;

/** Slopes below which the minimum roof snow load applies: 15° (ASCE 7-16 §7.3.4). */
export const MINIMUM_SNOW_MAX_SLOPE_DEG = 15;

/**
 * Minimum roof snow load pm, ASCE 7-16 §7.3.4 (7-22 §7.3.3; text from memory, agreeing with
 * published summaries): on monoslope, hip and gable roofs sloped under 15°, pm = Is·pg where
 * pg ≤ 20 psf and Is·20 psf where pg > 20 psf (7-22: no Is). It is a separate uniform load case,
 * not combined with drift, sliding, unbalanced or partial loads; returns 0 at 15° and steeper.
 */
export function minimumRoofSnowLoad(
  input: Pick<FlatRoofSnowInput, 'pg' | 'is' | 'edition'> & { slopeDeg: number },
): KPa {
  const { pg, is = 1, edition = '7-16', slopeDeg } = input;
  if (!(slopeDeg < MINIMUM_SNOW_MAX_SLOPE_DEG)) return kpa(0);
  const importance = edition === '7-22' ? 1 : is;
  return kpa(importance * Math.min(pg, PM_CAP_KPA));
}

/**
 * The uniform design roof snow load on the horizontal projection: the larger of ps = Cs·pf and,
 * under 15°, the minimum pm (a separate uniform case, so the larger uniform load governs).
 */
export function designRoofSnowLoad(input: FlatRoofSnowInput & Omit<SlopeFactorInput, 'ct'>): {
  ps: KPa;
  pm: KPa;
  governs: 'ps' | 'pm';
} {
  const ps = slopedRoofSnowLoad(input);
  const pm = minimumRoofSnowLoad(input);
  return pm > ps ? { ps, pm, governs: 'pm' } : { ps, pm, governs: 'ps' };
}
