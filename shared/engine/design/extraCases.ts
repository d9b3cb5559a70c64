import type { EngineDesignInput } from './input';
import type { CaseLoads } from '../loads/areaLoads';
import { eaveToRidge, velocityPressure, windCaseLoads, windCases } from '../loads/wind';
import { unbalancedSnow, unbalancedSnowCase } from '../loads/unbalancedSnow';
import type { TrussProfile } from '../profiles/types';
import { KPA_PER_PSF, MM_PER_INCH, type KPa, type Mm } from '../units';

/** Unbalanced snow with the wind from the left or right (ASCE 7-16 §7.6.1). */
export type UnbalancedCaseId = 'SuL' | 'SuR';
/** Wind cases of the envelope procedure: load case, wind from, sign of GCpi. */
export type WindCaseId = `W${'A' | 'B'}${'L' | 'R'}${'+' | '-'}`;
/** Load cases beyond the five ASCE cases and the attic live load. */
export type ExtraCaseId = UnbalancedCaseId | WindCaseId;

/** Label of an extra case inside a combination name, e.g. "S[unbal. L]", "W[AL+]". */
export const extraCaseLabel = (id: ExtraCaseId) =>
  id.startsWith('Su') ? `S[unbal. ${id.slice(2)}]` : `W[${id.slice(1)}]`;

const psf = (k: number) => (k / KPA_PER_PSF).toFixed(1);

/** The extra cases of one design, which plain case each replaces, and notes saying how. */
export interface ExtraCases {
  cases: Partial<Record<ExtraCaseId, CaseLoads>>;
  snow: UnbalancedCaseId[];
  wind: WindCaseId[];
  notes: string[];
}

const isGable = (profile: TrussProfile) =>
  profile.params.kind !== 'mono' && profile.params.kind !== 'flat';

/**
 * Unbalanced snow (gable roofs from 1/2 to 7 on 12, both directions) from the balanced ps, and
 * the wind cases of the low-rise envelope procedure when the job gives a wind speed.
 */
export function extraCases(
  input: EngineDesignInput,
  profile: TrussProfile,
  ps: KPa | undefined,
  slopeDeg: number,
): ExtraCases {
  const out: ExtraCases = { cases: {}, snow: [], wind: [], notes: [] };
  const { snow, wind } = input.loads;
  if (snow && ps !== undefined && ps > 0 && isGable(profile) && snow.unbalanced !== false) {
    const w = Math.max(eaveToRidge(profile, 'left'), eaveToRidge(profile, 'right')) as Mm;
    const u = unbalancedSnow({
      pg: (snow.pg * 1000) as KPa,
      ps,
      pitch: profile.params.pitch,
      eaveToRidge: w,
    });
    if (u) {
      out.cases.SuL = unbalancedSnowCase(profile, input.spacing, u, 'left');
      out.cases.SuR = unbalancedSnowCase(profile, input.spacing, u, 'right');
      out.snow.push('SuL', 'SuR');
      out.notes.push(
        `Unbalanced snow (ASCE 7-16 §7.6.1), each direction as its own combinations: windward ${psf(u.windward)} psf, ` +
          `leeward ${psf(u.leeward)} psf plus ${psf(u.surcharge)} psf over ${(u.extent / (12 * MM_PER_INCH)).toFixed(1)} ft from the ridge ` +
          `(hd = ${(u.hd / (12 * MM_PER_INCH)).toFixed(2)} ft, γ = ${u.gammaPcf.toFixed(1)} pcf). Labels: S[unbal. L] = wind from the left.`,
      );
    }
  }
  if (wind) {
    const qh = velocityPressure(wind);
    for (const c of windCases(qh, slopeDeg)) {
      const id = `W${c.id}` as WindCaseId;
      out.cases[id] = windCaseLoads(profile, input.spacing, c);
      out.wind.push(id);
    }
    out.notes.push(
      `Wind: ASCE 7-16 Ch. 28 envelope procedure (low-rise), qh = ${psf(qh)} psf (Eq. 26.10-1, Kd 0.85); ` +
        'roof zones 2 (windward) and 3 (leeward) of Fig. 28.3-1, load cases A and B, both directions, GCpi ±0.18 (enclosed), ' +
        'soffit GCp 0.7 under the windward overhang. Simplified: end zones 2E/3E, the zone-2 length limit and the §28.3.4 minimum are not applied. ' +
        'Labels: W[AL+] = case A, wind from the left, +GCpi.',
    );
  }
  return out;
}

type Terms = [string, number][];

/**
 * Every combination with S again with each unbalanced case in its place, and every combination
 * with W once per wind case (the plain W stays only when the job also gives a net uplift).
 */
export function expandCombinations<T extends { cd: number; terms: Terms }>(
  combos: T[],
  extra: ExtraCases,
  keepPlainWind: boolean,
): T[] {
  const out: T[] = [];
  const swap = (c: T, from: string, ids: string[]) =>
    ids.map((id) => ({ ...c, terms: c.terms.map(([k, f]) => [k === from ? id : k, f]) }) as T);
  for (const c of combos) {
    const hasW = c.terms.some(([k]) => k === 'W');
    const windForms =
      hasW && extra.wind.length > 0
        ? [...(keepPlainWind ? [c] : []), ...swap(c, 'W', extra.wind)]
        : [c];
    for (const w of windForms) {
      out.push(w);
      if (w.terms.some(([k]) => k === 'S')) out.push(...swap(w, 'S', extra.snow));
    }
  }
  return out;
}
