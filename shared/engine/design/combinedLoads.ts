import type { EngineDesignInput } from './input';
import type { JointLoad } from '../analysis/types';
import {
  LOAD_CASES as LOAD_CASE_IDS,
  areaLoadCases,
  designRoofSnowLoad,
  loadCombinations,
  type AreaLoads,
  type AsceEdition,
  type CaseLoads,
  type LoadCaseId,
} from '../loads';
import type { TrussProfile } from '../profiles/types';
import { KPA_PER_PSF, kpa, type KPa } from '../units';
import { expandCombinations, extraCaseLabel, extraCases, type ExtraCaseId } from './extraCases';
import { addPointLoads, type MemberPointLoad } from './pointLoads';

/** A load case of the design: the five ASCE cases, plus the non-concurrent attic live load. */
export type DesignCaseId = LoadCaseId | 'Lbc' | ExtraCaseId;

/** A combination ready to solve: factored case loads summed, per member and per joint. */
export interface CombinedLoads {
  name: string;
  cd: number;
  terms: [DesignCaseId, number][];
  jointLoads: JointLoad[];
  /** Transverse line load per member index, N/mm (+ along the downward normal). */
  transverse: Float64Array;
  /** Overhang cantilever moment per member index (the heel panel it continues), N·mm. */
  overhangMoment: Float64Array;
  /** Factored concentrated loads inside chord members. */
  points?: MemberPointLoad[];
}

/** Cases and combinations of one design, and what the analysis needs from them. */
export interface DesignLoads {
  cases: Partial<Record<DesignCaseId, CaseLoads>>;
  combinations: CombinedLoads[];
  /** Sloped-roof snow ps used, kPa, when ground snow was given. */
  snow?: KPa;
  edition: AsceEdition;
  /** What the loads assumed beyond the basic cases (minimum snow, unbalanced snow, wind). */
  notes: string[];
}

// The engine input carries area loads in N/mm²; the loads module speaks kPa (1 N/mm² = 1000 kPa).
const toKpa = (nPerMm2: number | undefined) =>
  nPerMm2 === undefined ? undefined : kpa(nPerMm2 * 1000);

/** Roof slope in degrees for the snow slope factor: the top-chord pitch (0 for a flat truss). */
const roofSlopeDeg = (profile: TrussProfile) =>
  profile.params.kind === 'flat' ? 0 : (Math.atan(profile.params.pitch / 12) * 180) / Math.PI;

const LABEL: Record<LoadCaseId | 'Lbc', string> = {
  D: 'D',
  L: 'L',
  Lr: 'Lr',
  S: 'S',
  W: 'W',
  Lbc: 'L(bc)',
};

/** Name of a combination from its terms, in the order the loads module writes them. */
const nameOf = (terms: [DesignCaseId, number][]) =>
  terms
    .map(([c, f]) => {
      const label = c in LABEL ? LABEL[c as keyof typeof LABEL] : extraCaseLabel(c as ExtraCaseId);
      return f === 1 ? label : `${f}${label}`;
    })
    .join(' + ');

/**
 * Area loads × spacing to per-case truss loads, snow from ground snow (ASCE 7 ps with the
 * pitch's slope), and the ASD combinations of the cases present. A non-concurrent bottom-chord
 * live load (IRC R301.5) is its own case in its own combination "D + L(bc)".
 */
export function designLoads(
  input: EngineDesignInput,
  profile: TrussProfile,
  defaultEdition: AsceEdition,
): DesignLoads {
  const { loads } = input;
  const edition = loads.snow?.edition ?? defaultEdition;
  const slopeDeg = roofSlopeDeg(profile);
  const notes: string[] = [];
  const roofSnow = loads.snow
    ? designRoofSnowLoad({
        pg: toKpa(loads.snow.pg)!,
        ce: loads.snow.ce,
        ct: loads.snow.ct,
        is: loads.snow.is,
        edition,
        slopeDeg,
        slippery: loads.snow.slippery,
      })
    : undefined;
  const snow = roofSnow && kpa(Math.max(roofSnow.ps, roofSnow.pm));
  if (roofSnow?.governs === 'pm') {
    notes.push(
      `Minimum roof snow pm = ${(roofSnow.pm / KPA_PER_PSF).toFixed(1)} psf governs over ps = ${(roofSnow.ps / KPA_PER_PSF).toFixed(1)} psf (ASCE ${edition} minimum snow load, slope under 15°).`,
    );
  }
  const area: AreaLoads = {
    tcll: toKpa(loads.tcll),
    tcdl: toKpa(loads.tcdl),
    bcll: toKpa(loads.bcll),
    bcdl: toKpa(loads.bcdl),
    snow,
    windUplift: toKpa(loads.windUplift),
  };
  const cases: Partial<Record<DesignCaseId, CaseLoads>> = areaLoadCases(
    profile,
    input.spacing,
    area,
  );
  const nonConcurrent = loads.bcllNonConcurrent ?? 0;
  if (nonConcurrent > 0) {
    cases.Lbc = areaLoadCases(profile, input.spacing, { bcll: toKpa(nonConcurrent) }).L;
  }
  const extra = extraCases(input, profile, roofSnow?.ps, slopeDeg);
  Object.assign(cases, extra.cases);
  notes.push(...extra.notes);
  notes.push(...addPointLoads(cases, profile, input.pointLoads));
  const present = (Object.keys(cases) as DesignCaseId[]).filter((c): c is LoadCaseId =>
    (LOAD_CASE_IDS as readonly string[]).includes(c),
  );
  if (extra.wind.length > 0) present.push('W');
  const basic = loadCombinations(present, { edition }).map((c) => ({
    name: c.name,
    cd: c.cd,
    terms: Object.entries(c.factors) as [DesignCaseId, number][],
  }));
  const combos = expandCombinations(basic, extra, cases.W !== undefined).map((c) =>
    c.terms.some(([k]) => !(k in LABEL)) ? { ...c, name: nameOf(c.terms) } : c,
  );
  if (cases.Lbc) {
    // Attic live, ten-year duration (NDS 2018 Table 2.3.2): CD 1.0, alone with dead load.
    const terms: [DesignCaseId, number][] = [
      ['D', 1],
      ['Lbc', 1],
    ];
    combos.push({ name: nameOf(terms), cd: 1.0, terms });
  }
  const memberIndex = new Map(profile.members.map((m, k) => [m.id, k]));
  return {
    cases,
    combinations: combos.map((c) => combine(c, cases, memberIndex, profile.members.length)),
    ...(snow !== undefined && { snow }),
    edition,
    notes,
  };
}

/** Sums the factored cases of one combination into joint loads, line loads and moments. */
function combine(
  combo: { name: string; cd: number; terms: [DesignCaseId, number][] },
  cases: Partial<Record<DesignCaseId, CaseLoads>>,
  memberIndex: ReadonlyMap<string, number>,
  memberCount: number,
): CombinedLoads {
  const joints = new Map<string, JointLoad>();
  const transverse = new Float64Array(memberCount);
  const overhangMoment = new Float64Array(memberCount);
  const points: MemberPointLoad[] = [];
  for (const [id, factor] of combo.terms) {
    const c = cases[id];
    if (!c) continue;
    for (const l of c.jointLoads) {
      const cur = joints.get(l.joint);
      const fx = factor * (l.fx ?? 0);
      const fy = factor * (l.fy ?? 0);
      if (cur) {
        cur.fx = (cur.fx ?? 0) + fx;
        cur.fy = (cur.fy ?? 0) + fy;
      } else joints.set(l.joint, { joint: l.joint, fx, fy });
    }
    for (const l of c.memberLoads) transverse[memberIndex.get(l.member)!] += factor * l.transverse;
    for (const o of c.overhangMoments)
      overhangMoment[memberIndex.get(o.member)!] += factor * o.moment;
    for (const p of c.pointLoads ?? []) points.push({ ...p, fy: factor * p.fy });
  }
  // Fields written out, not spread from `combo`: the spread cost more than the sums above.
  return {
    name: combo.name,
    cd: combo.cd,
    terms: combo.terms,
    jointLoads: [...joints.values()],
    transverse,
    overhangMoment,
    points,
  };
}
