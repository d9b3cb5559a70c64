import { KPA_PER_PSF, MM_PER_INCH, kpa, type KPa, type Mm } from '../units';
import type { TrussProfile } from '../profiles/types';
import { areaLoadCases, type CaseLoads } from './areaLoads';
import { partialTopChordLoad, ridgeX, sideProfile, sumCases, type RoofSide } from './roofSides';

const FT = 12 * MM_PER_INCH;

/** Slopes between which a gable roof needs unbalanced snow: 1/2 on 12 to 7 on 12 (ASCE 7-16 §7.6.1). */
export const UNBALANCED_MIN_PITCH = 0.5;
export const UNBALANCED_MAX_PITCH = 7;

/** The unbalanced snow load of one gable roof, on the horizontal projection. */
export interface UnbalancedSnow {
  /** Windward side: 0.3·ps. */
  windward: KPa;
  /** Leeward side: ps, plus the surcharge next to the ridge. */
  leeward: KPa;
  /** Rectangular surcharge hd·γ/√S on the leeward side, over `extent` from the ridge. */
  surcharge: KPa;
  extent: Mm;
  /** Drift height hd, mm, and snow density γ, pcf, for the notes. */
  hd: Mm;
  gammaPcf: number;
}

/**
 * Unbalanced snow on a gable roof, ASCE 7-16 §7.6.1 (from memory, cross-checked only against
 * summaries of the clause): required for slopes from 1/2 on 12 to 7 on 12. A truss spans eave to
 * eave, so the general case applies (not the W ≤ 20 ft rule for rafters from ridge to eave):
 * windward 0.3·ps; leeward ps plus a surcharge hd·γ/√S over 8·hd·√S/3 from the ridge, with
 * hd = 0.43·∛W·∜(pg + 10) − 1.5 ft (Fig. 7.6-1, W for lu, W not less than 20 ft — from memory),
 * γ = 0.13·pg + 14 ≤ 30 pcf (Eq. 7.7-1), S the run per unit rise. pg and ps in kPa, W in mm.
 * Returns undefined outside the slope range.
 */
export function unbalancedSnow(input: {
  pg: KPa;
  ps: KPa;
  pitch: number;
  eaveToRidge: Mm;
}): UnbalancedSnow | undefined {
  const { pg, ps, pitch, eaveToRidge } = input;
  if (!(pitch >= UNBALANCED_MIN_PITCH && pitch <= UNBALANCED_MAX_PITCH)) return undefined;
  const pgPsf = pg / KPA_PER_PSF;
  const lu = Math.max(eaveToRidge / FT, 20);
  const hdFt = Math.max(0, 0.43 * Math.cbrt(lu) * (pgPsf + 10) ** 0.25 - 1.5);
  const gammaPcf = Math.min(0.13 * pgPsf + 14, 30);
  const s = 12 / pitch;
  return {
    windward: kpa(0.3 * ps),
    leeward: ps,
    surcharge: kpa(((hdFt * gammaPcf) / Math.sqrt(s)) * KPA_PER_PSF),
    extent: (((8 * hdFt * Math.sqrt(s)) / 3) * FT) as Mm,
    hd: (hdFt * FT) as Mm,
    gammaPcf,
  };
}

/**
 * The truss loads of unbalanced snow with the wind from `windFrom` (that side is windward):
 * 0.3·ps on the windward half and its overhang, ps on the leeward half and its overhang, and the
 * surcharge from the ridge toward the leeward heel (kept inside the span: it is not carried onto
 * the overhang). Loads on the horizontal projection, like balanced snow.
 */
export function unbalancedSnowCase(
  profile: TrussProfile,
  spacing: Mm,
  snow: UnbalancedSnow,
  windFrom: RoofSide,
): CaseLoads {
  const leeSide: RoofSide = windFrom === 'left' ? 'right' : 'left';
  const windward = areaLoadCases(sideProfile(profile, windFrom), spacing, {
    snow: snow.windward,
  }).S;
  const leeward = areaLoadCases(sideProfile(profile, leeSide), spacing, { snow: snow.leeward }).S;
  const x0 = ridgeX(profile);
  const end =
    leeSide === 'right'
      ? Math.min(x0 + snow.extent, profile.params.span)
      : Math.max(x0 - snow.extent, 0);
  const surcharge = partialTopChordLoad(profile, snow.surcharge * 1e-3 * spacing, x0, end);
  return sumCases(windward, leeward, surcharge);
}
