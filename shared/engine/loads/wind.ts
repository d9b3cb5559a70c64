import { EngineError } from '../errors';
import type { TrussProfile } from '../profiles/types';
import { KPA_PER_PSF, MM_PER_INCH, kpa, type KPa, type Mm } from '../units';
import { areaLoadCases, type CaseLoads } from './areaLoads';
import { ridgeX, scaleCase, sideProfile, sumCases, type RoofSide } from './roofSides';

const FT = 12 * MM_PER_INCH;
const MPH_PER_MPS = 1 / 0.44704;

/** Exposure category of ASCE 7-16 §26.7. */
export type WindExposure = 'B' | 'C' | 'D';

/** Terrain constants α and zg (ft), ASCE 7-16 Table 26.11-1 (from memory). */
export const TERRAIN: Record<WindExposure, { alpha: number; zgFt: number }> = {
  B: { alpha: 7, zgFt: 1200 },
  C: { alpha: 9.5, zgFt: 900 },
  D: { alpha: 11.5, zgFt: 700 },
};

/** Wind directionality factor Kd for the MWFRS of buildings, ASCE 7-16 Table 26.6-1. */
export const KD_BUILDINGS = 0.85;

/** Internal pressure coefficient of an enclosed building, ±0.18 (ASCE 7-16 Table 26.13-1). */
export const GCPI_ENCLOSED = 0.18;

/** External coefficient on the underside of a windward overhang, 0.7 (ASCE 7-16 §28.3.3, from memory). */
export const GCP_SOFFIT = 0.7;

/** Site and building data of the wind load. */
export interface WindSite {
  /** Basic wind speed V (ultimate, 3-s gust at 33 ft), m/s. */
  speed: number;
  exposure: WindExposure;
  /** Mean roof height h, mm. */
  meanRoofHeight: Mm;
  /** Topographic factor Kzt (§26.8); default 1.0 (flat terrain). */
  kzt?: number;
  /** Ground elevation above sea level, mm, for Ke (§26.9); default 0 (Ke = 1.0). */
  groundElevation?: Mm;
}

/**
 * Velocity pressure exposure coefficient Kz, ASCE 7-16 Table 26.10-1 (formula, from memory):
 * 2.01·(z/zg)^(2/α) with z not below 15 ft; for the low-rise envelope procedure (Chapter 28) in
 * exposure B, z not below 30 ft (the table's note: Kz = 0.70).
 */
export function velocityPressureCoefficient(zMm: number, exposure: WindExposure): number {
  const { alpha, zgFt } = TERRAIN[exposure];
  const floor = exposure === 'B' ? 30 : 15;
  const z = Math.min(Math.max(zMm / FT, floor), zgFt);
  return 2.01 * (z / zgFt) ** (2 / alpha);
}

/** Ground elevation factor Ke = e^(−0.0000362·zg), zg in ft, ASCE 7-16 Table 26.9-1 note (from memory). */
export const groundElevationFactor = (elevationMm = 0) =>
  Math.exp(-0.0000362 * Math.max(0, elevationMm / FT));

/**
 * Velocity pressure at the mean roof height, ASCE 7-16 Eq. 26.10-1:
 * qh = 0.00256·Kz·Kzt·Kd·Ke·V² (psf, V in mph), returned in kPa (strength level: ASD takes 0.6W).
 */
export function velocityPressure(site: WindSite): KPa {
  const { speed, exposure, meanRoofHeight, kzt = 1, groundElevation = 0 } = site;
  const bad = [
    !(speed > 0) && 'wind speed must be positive',
    !(meanRoofHeight > 0) && 'mean roof height must be positive',
    !(exposure in TERRAIN) && 'exposure must be B, C or D',
    !(kzt >= 1) && 'Kzt must be at least 1.0',
  ].filter(Boolean);
  if (bad.length > 0) {
    throw new EngineError('invalid', `Wind: ${bad.join('; ')}.`, { ...site });
  }
  const v = speed * MPH_PER_MPS;
  const kz = velocityPressureCoefficient(meanRoofHeight, exposure);
  const psf = 0.00256 * kz * kzt * KD_BUILDINGS * groundElevationFactor(groundElevation) * v * v;
  return kpa(psf * KPA_PER_PSF);
}

// ASCE 7-16 Fig. 28.3-1, load case A, interior zones 2 (windward roof) and 3 (leeward roof):
// roof angle θ (deg) → GCpf, linear in between (from memory).
const CASE_A: readonly (readonly [number, number, number])[] = [
  [0, -0.69, -0.37],
  [5, -0.69, -0.37],
  [20, -0.69, -0.48],
  [30, 0.21, -0.43],
  [45, 0.21, -0.43],
  [90, 0.56, -0.37],
];
// Load case B (wind along the ridge): zone 2 −0.69, zone 3 −0.37 at every slope (from memory).
const CASE_B = { windward: -0.69, leeward: -0.37 } as const;

/** GCpf of Fig. 28.3-1 for the windward (zone 2) and leeward (zone 3) roof, load case A. */
export function roofPressureCoefficients(slopeDeg: number): { windward: number; leeward: number } {
  const t = Math.min(Math.max(slopeDeg, 0), 90);
  for (let i = 1; i < CASE_A.length; i++) {
    const [t1, w1, l1] = CASE_A[i];
    if (t > t1) continue;
    const [t0, w0, l0] = CASE_A[i - 1];
    const f = (t - t0) / (t1 - t0);
    return { windward: w0 + f * (w1 - w0), leeward: l0 + f * (l1 - l0) };
  }
  return { windward: 0.56, leeward: -0.37 };
}

/** One wind load case on the truss: its label and the net pressures used (kPa, + toward the roof). */
export interface WindCase {
  /** e.g. "A, from left, +GCpi". */
  label: string;
  /** Short id for combination names, e.g. "AL+". */
  id: string;
  windFrom: RoofSide;
  loadCase: 'A' | 'B';
  gcpi: number;
  /** Net pressure on the windward and leeward roof: qh·(GCpf − GCpi), + toward the surface. */
  windward: KPa;
  leeward: KPa;
  /** Upward pressure on the windward overhang's underside, qh·0.7. */
  soffit: KPa;
  /** Velocity pressure qh, kPa. */
  qh: KPa;
}

/**
 * The roof pressures of the ASCE 7-16 Chapter 28 envelope procedure (low-rise buildings) for a
 * truss in the interior zones, both wind directions, load cases A and B, internal pressure ±0.18.
 * Simplified: end zones (2E/3E) and the Fig. 28.3-1 note that turns a negative zone 2 into zone 3
 * beyond 0.5·B or 2.5·he from the eave are not applied (zone 2 over the whole windward half is
 * the larger uplift); the minimum of §28.3.4 is not applied.
 */
export function windCases(qh: KPa, slopeDeg: number): WindCase[] {
  const a = roofPressureCoefficients(slopeDeg);
  const out: WindCase[] = [];
  for (const loadCase of ['A', 'B'] as const) {
    const gcpf = loadCase === 'A' ? a : CASE_B;
    for (const windFrom of ['left', 'right'] as const) {
      for (const gcpi of [GCPI_ENCLOSED, -GCPI_ENCLOSED]) {
        const sign = gcpi > 0 ? '+' : '−';
        out.push({
          label: `${loadCase}, from ${windFrom}, ${sign}GCpi`,
          id: `${loadCase}${windFrom === 'left' ? 'L' : 'R'}${gcpi > 0 ? '+' : '-'}`,
          windFrom,
          loadCase,
          gcpi,
          windward: kpa(qh * (gcpf.windward - gcpi)),
          leeward: kpa(qh * (gcpf.leeward - gcpi)),
          soffit: kpa(qh * GCP_SOFFIT),
          qh,
        });
      }
    }
  }
  return out;
}

/**
 * Truss loads of one wind case: each roof side's net pressure normal to its top chord (and on its
 * overhang's top surface, external pressure only: no internal pressure outside the walls), plus
 * the soffit pressure pushing the windward overhang up (on its horizontal projection).
 */
export function windCaseLoads(profile: TrussProfile, spacing: Mm, wind: WindCase): CaseLoads {
  const lee: RoofSide = wind.windFrom === 'left' ? 'right' : 'left';
  // A unit outward pressure, scaled by −p (p + toward the surface, i.e. inward).
  const unit = (side: RoofSide, withOverhang: boolean) => {
    const p = sideProfile(profile, side);
    return areaLoadCases(withOverhang ? p : { ...p, overhangs: [] }, spacing, {
      windUplift: kpa(1),
    }).W;
  };
  // The overhang alone: its top chord stays (the overhang takes its direction from the member
  // it continues) but as an unloaded member, so only the overhang carries the pressure.
  const overhangOnly = (side: RoofSide) => {
    const p = sideProfile(profile, side);
    const members = p.members.map((m) =>
      m.role === 'topChord' ? { ...m, role: 'web' as const } : m,
    );
    return areaLoadCases({ ...p, members }, spacing, { windUplift: kpa(1) }).W;
  };
  const external = (side: RoofSide) => (side === wind.windFrom ? wind.windward : wind.leeward);
  const parts: CaseLoads[] = [];
  for (const side of [wind.windFrom, lee]) {
    parts.push(scaleCase(unit(side, false), -external(side)));
    // Overhang top surface: external pressure only, qh·GCpf = net + qh·GCpi.
    parts.push(scaleCase(overhangOnly(side), -(external(side) + wind.qh * wind.gcpi)));
  }
  parts.push(soffitLoads(profile, spacing, wind.windFrom, wind.soffit));
  return sumCases(...parts);
}

/** Upward soffit pressure on a side's overhang: force to the heel and the (uplifting) moment. */
function soffitLoads(profile: TrussProfile, spacing: Mm, side: RoofSide, p: KPa): CaseLoads {
  const o = profile.overhangs.find((x) => x.side === side && x.horizontal > 0);
  if (!o || !(p > 0)) return { jointLoads: [], memberLoads: [], overhangMoments: [] };
  const w = p * 1e-3 * spacing;
  return {
    jointLoads: [{ joint: o.heelJoint, fx: 0, fy: w * o.horizontal }],
    memberLoads: [],
    overhangMoments: [
      { side, heelJoint: o.heelJoint, member: o.member, moment: (-w * o.horizontal ** 2) / 2 },
    ],
  };
}

/** Horizontal distance from the ridge to a side's eave (overhang included), mm. */
export function eaveToRidge(profile: TrussProfile, side: RoofSide): Mm {
  const x0 = ridgeX(profile);
  const o = profile.overhangs.find((x) => x.side === side)?.horizontal ?? 0;
  return (side === 'left' ? x0 + o : profile.params.span - x0 + o) as Mm;
}

export { ridgeX };
