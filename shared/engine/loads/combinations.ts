import { EngineError } from '../errors';
import type { AsceEdition } from './snow';

/**
 * Load cases: dead, bottom-chord/attic live, roof live, snow, wind (uplift, net upward).
 */
export const LOAD_CASES = ['D', 'L', 'Lr', 'S', 'W'] as const;

/** One of LOAD_CASES. */
export type LoadCaseId = (typeof LOAD_CASES)[number];

/**
 * CD of each case's duration (NDS 2018 Table 2.3.2; engineering.md §1): dead permanent, occupancy
 * live ten years, snow two months, roof live seven days (as in the MST solutions), wind ten minutes.
 */
export const CASE_LOAD_DURATION: Record<LoadCaseId, number> = {
  D: 0.9,
  L: 1.0,
  S: 1.15,
  Lr: 1.25,
  W: 1.6,
};

/** A factored sum of load cases with the CD of its shortest-duration load. */
export interface LoadCombination {
  /** Readable and unique, e.g. "D + 0.75L + 0.75S". */
  name: string;
  factors: Partial<Record<LoadCaseId, number>>;
  cd: number;
}

/** Options of the combination list. */
export interface CombinationOptions {
  edition?: AsceEdition;
  /**
   * L is the 10 psf attic load of IRC R301.5 that "need not act concurrently with other live
   * loads": it appears only in its own combination "D + L(bc)".
   */
  nonConcurrentBottomChordLive?: boolean;
}

type Terms = Partial<Record<LoadCaseId, number>>;

// ASCE 7-16 §2.4.1 basic ASD combinations without R and E (engineering.md §3, V2); the 7-22
// variants multiply S by 0.7 (structuremag.org, V). 0.75(0.6W) is written 0.45W.
function basicCombinations(s: number): Terms[] {
  return [
    { D: 1 }, // 1
    { D: 1, L: 1 }, // 2
    { D: 1, Lr: 1 }, // 3
    { D: 1, S: s },
    { D: 1, L: 0.75, Lr: 0.75 }, // 4
    { D: 1, L: 0.75, S: 0.75 * s },
    { D: 1, W: 0.6 }, // 5
    { D: 1, L: 0.75, W: 0.45, Lr: 0.75 }, // 6a
    { D: 1, L: 0.75, W: 0.45, S: 0.75 * s },
    { D: 0.6, W: 0.6 }, // 7
  ];
}

const round = (x: number) => Math.round(x * 1e6) / 1e6;

function nameOf(terms: Terms, bottomChordLabel: boolean): string {
  const order: LoadCaseId[] = ['D', 'L', 'W', 'Lr', 'S'];
  return order
    .filter((c) => terms[c] !== undefined)
    .map((c) => {
      const f = round(terms[c]!);
      const label = c === 'L' && bottomChordLabel ? 'L(bc)' : c;
      return f === 1 ? label : `${f}${label}`;
    })
    .join(' + ');
}

const cdOf = (terms: Terms) =>
  Math.max(...(Object.keys(terms) as LoadCaseId[]).map((c) => CASE_LOAD_DURATION[c]));

/**
 * ASD load combinations (ASCE 7-16 §2.4.1, or 7-22 with 0.7S) over the cases present. Absent
 * cases drop out; a combination whose variable loads are all absent is skipped, as are repeats.
 * D is always included (a truss always carries its own weight).
 */
export function loadCombinations(
  present: Iterable<LoadCaseId>,
  options: CombinationOptions = {},
): LoadCombination[] {
  const has = new Set<LoadCaseId>(present);
  for (const c of has) {
    if (!(LOAD_CASES as readonly string[]).includes(c)) {
      throw new EngineError('invalid', `Unknown load case "${c}".`, {
        loadCase: c,
        known: [...LOAD_CASES],
      });
    }
  }
  has.add('D');
  const { edition = '7-16', nonConcurrentBottomChordLive = false } = options;
  const concurrentL = has.has('L') && !nonConcurrentBottomChordLive;

  const out: LoadCombination[] = [];
  const seen = new Set<string>();
  const push = (terms: Terms, bcLabel = false) => {
    const name = nameOf(terms, bcLabel);
    if (seen.has(name)) return;
    seen.add(name);
    out.push({ name, factors: terms, cd: cdOf(terms) });
  };

  for (const combo of basicCombinations(edition === '7-22' ? 0.7 : 1)) {
    const kept: Terms = {};
    let variable = 0;
    let variablePresent = 0;
    for (const [c, f] of Object.entries(combo) as [LoadCaseId, number][]) {
      if (c === 'D') {
        kept.D = f;
        continue;
      }
      variable += 1;
      if (has.has(c) && (c !== 'L' || concurrentL)) {
        kept[c] = round(f);
        variablePresent += 1;
      }
    }
    if (variable > 0 && variablePresent === 0) continue;
    push(kept);
  }
  if (has.has('L') && nonConcurrentBottomChordLive) push({ D: 1, L: 1 }, true);
  return out;
}
