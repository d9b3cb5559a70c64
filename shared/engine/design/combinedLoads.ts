import type { EngineDesignInput } from './input';
import type { JointLoad } from '../analysis/types';
import {
  areaLoadCases,
  loadCombinations,
  slopedRoofSnowLoad,
  type AreaLoads,
  type AsceEdition,
  type CaseLoads,
  type LoadCaseId,
} from '../loads';
import type { TrussProfile } from '../profiles/types';
import { kpa, type KPa } from '../units';

/** A load case of the design: the five ASCE cases, plus the non-concurrent attic live load. */
export type DesignCaseId = LoadCaseId | 'Lbc';

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
}

/** Cases and combinations of one design, and what the analysis needs from them. */
export interface DesignLoads {
  cases: Partial<Record<DesignCaseId, CaseLoads>>;
  combinations: CombinedLoads[];
  /** Sloped-roof snow ps used, kPa, when ground snow was given. */
  snow?: KPa;
  edition: AsceEdition;
}

// The engine input carries area loads in N/mm²; the loads module speaks kPa (1 N/mm² = 1000 kPa).
const toKpa = (nPerMm2: number | undefined) =>
  nPerMm2 === undefined ? undefined : kpa(nPerMm2 * 1000);

/** Roof slope in degrees for the snow slope factor: the top-chord pitch (0 for a flat truss). */
const roofSlopeDeg = (profile: TrussProfile) =>
  profile.params.kind === 'flat' ? 0 : (Math.atan(profile.params.pitch / 12) * 180) / Math.PI;

const LABEL: Record<DesignCaseId, string> = {
  D: 'D',
  L: 'L',
  Lr: 'Lr',
  S: 'S',
  W: 'W',
  Lbc: 'L(bc)',
};

/** Name of a combination from its terms, in the order the loads module writes them. */
const nameOf = (terms: [DesignCaseId, number][]) =>
  terms.map(([c, f]) => (f === 1 ? LABEL[c] : `${f}${LABEL[c]}`)).join(' + ');

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
  const snow = loads.snow
    ? slopedRoofSnowLoad({
        pg: toKpa(loads.snow.pg)!,
        ce: loads.snow.ce,
        ct: loads.snow.ct,
        is: loads.snow.is,
        edition,
        slopeDeg: roofSlopeDeg(profile),
        slippery: loads.snow.slippery,
      })
    : undefined;
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
  const present = (Object.keys(cases) as DesignCaseId[]).filter(
    (c): c is LoadCaseId => c !== 'Lbc',
  );
  const combos = loadCombinations(present, { edition }).map((c) => ({
    name: c.name,
    cd: c.cd,
    terms: Object.entries(c.factors) as [DesignCaseId, number][],
  }));
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
  }
  return { ...combo, jointLoads: [...joints.values()], transverse, overhangMoment };
}
