import { dressedSize, parseLumberId, specificGravity } from '../lumber';
import {
  PLY_FASTENERS,
  plyFastenerZ,
  type PlyFastener,
  type YieldMode,
} from '../fasteners/yieldLimit';
import type { TrussProfile } from '../profiles/types';
import { MM_PER_INCH, N_PER_LBF } from '../units';
import type { EnginePointLoad } from './pointLoads';

/** The ply-to-ply fastening of one chord of a multi-ply girder. Lengths mm, forces N. */
export interface PlyConnection {
  chord: 'top' | 'bottom';
  plies: number;
  fastener: PlyFastener['id'];
  /** Where the fasteners go: from one face, from each face, or through all plies. */
  faces: 'one face' | 'each face' | 'through all plies';
  rows: number;
  /** Spacing along the chord in each row, mm (a whole number of inches). */
  spacing: number;
  /** Reference lateral value Z of one fastener, N, its governing yield mode and NDS table. */
  z: number;
  mode: YieldMode;
  table: string;
  /** Governing combination and its CD (Z′ = Z·CD; CM, Ct, Cg, CΔ = 1.0 in dry service). */
  combination: string;
  cd: number;
  /** Load to pass from the loaded ply to the next per length of chord, N/mm, and Z′·rows/spacing. */
  demand: number;
  capacity: number;
  ratio: number;
  pass: boolean;
  /** E.g. "Bottom chord, 2-ply: 10d common nails (0.148 × 3 in.) in 2 rows at 9 in. o.c. …". */
  text: string;
}

/** The combinations as the fastening needs them: name, CD and case factors. */
export interface FasteningCombination {
  name: string;
  cd: number;
  terms: readonly (readonly [string, number])[];
}

/** Spacing limits along a row, in.: nails 3–12, bolts 4–24 (common practice). */
const SPACING_IN = { nail: [3, 12], bolt: [4, 24] } as const;
/** Length of chord each hung load is spread over at most, in. (a hanger's reach, common practice). */
const TRIBUTARY_MAX_IN = 24;
/** Ply thickness of 2x lumber, in. (NDS Supplement Table 1A). */
const PLY_IN = 1.5;

const OPTIONS: Record<number, PlyFastener['id'][]> = {
  2: ['nail10d', 'bolt12'],
  3: ['nail10d', 'bolt12'],
  4: ['bolt12'],
};

/** Rows that fit the chord's depth (common practice): nails 2–4, bolts 1–2. */
const rowsFor = (kind: PlyFastener['kind'], widthIn: number) =>
  kind === 'bolt' ? (widthIn < 7 ? 1 : 2) : widthIn < 5 ? 2 : widthIn < 7 ? 3 : 4;

/** Unfactored load of one point load in a combination, N. */
function combinedLoad(l: EnginePointLoad, c: FasteningCombination) {
  let f = 0;
  let d = 0;
  for (const [id, k] of c.terms) {
    if (id === 'D') d += k;
    else if (id === l.kind || (l.kind === 'S' && (id === 'SuL' || id === 'SuR'))) f += k;
  }
  return d * l.dead + f * l.live;
}

/** Length of chord each load is spread over: half-way to its neighbours, at most 24 in., mm. */
function tributaries(xs: number[], span: number) {
  const half = (TRIBUTARY_MAX_IN * MM_PER_INCH) / 2;
  const sorted = xs.map((x, i) => [x, i] as const).sort((a, b) => a[0] - b[0]);
  const out = new Array<number>(xs.length);
  sorted.forEach(([x, i], k) => {
    const left = k > 0 ? (x - sorted[k - 1][0]) / 2 : x;
    const right = k < sorted.length - 1 ? (sorted[k + 1][0] - x) / 2 : span - x;
    out[i] = Math.max(Math.min(half, left) + Math.min(half, right), MM_PER_INCH);
  });
  return out;
}

const ft = (nPerMm: number) => `${Math.round((nPerMm * 304.8) / N_PER_LBF)} lb/ft`;

/**
 * Ply-to-ply fastening of a girder's chords (2–4 plies). A hung load bears on one face ply and
 * the fasteners must carry (n − 1)/n of it into the other plies; each load is spread over the
 * chord half-way to its neighbours and at most 12 in. either side. Per chord, the first fastener
 * that fits at 3 in. (bolts 4 in.) or more is chosen, nails 10d common from one face (2-ply) or
 * from each face (3-ply, each face's nails into the middle ply), else 1/2 in. through-bolts;
 * a 4-ply girder is bolted. Z from the NDS 2018 §12.3.1 yield limit equations (the basis of
 * Tables 12N and 12A) with the load across the grain (θ = 90°, the lower bolt value) and the
 * lumber's G; Z′ = Z·CD. A chord with no point loads gets the fastener at its largest spacing.
 */
export function plyFastening(
  profile: TrussProfile,
  lumberOf: readonly string[],
  plies: number,
  pointLoads: readonly EnginePointLoad[],
  combinations: readonly FasteningCombination[],
): PlyConnection[] {
  if (plies < 2) return [];
  const out: PlyConnection[] = [];
  for (const chord of ['top', 'bottom'] as const) {
    const role = chord === 'top' ? 'topChord' : 'bottomChord';
    const lumber = lumberOf.filter((_, k) => profile.members[k].role === role);
    if (lumber.length === 0) continue;
    const g = Math.min(...lumber.map(specificGravity));
    const widthIn = Math.min(...lumber.map((id) => dressedSize(parseLumberId(id).size).widthIn));
    const loads = pointLoads.filter((l) => l.chord === chord);
    const trib = tributaries(
      loads.map((l) => l.x),
      profile.params.span,
    );
    // Demand at CD = 1 (per combination q/CD), and where it governs.
    let worst = { q: 0, perCd: 0, combo: combinations[0] };
    for (const c of combinations) {
      for (const [i, l] of loads.entries()) {
        const q = (((plies - 1) / plies) * Math.max(0, combinedLoad(l, c))) / trib[i];
        if (q / c.cd > worst.perCd) worst = { q, perCd: q / c.cd, combo: c };
      }
    }
    const options = OPTIONS[Math.min(4, plies)];
    let chosen: PlyConnection | undefined;
    for (const id of options) {
      const f = PLY_FASTENERS[id];
      const [lo, hi] = SPACING_IN[f.kind];
      const rows = rowsFor(f.kind, widthIn);
      const { z, mode } = plyFastenerZ(f, g, PLY_IN, 90);
      const cd = worst.combo?.cd ?? 1;
      const needIn = worst.perCd > 0 ? (rows * z) / worst.perCd / MM_PER_INCH : Infinity;
      const spacingIn = Math.min(hi, Math.floor(needIn));
      const fits = spacingIn >= lo;
      if (!fits && id !== options.at(-1)) continue;
      const s = Math.max(lo, spacingIn);
      const spacing = s * MM_PER_INCH;
      const capacity = (rows * z * cd) / spacing;
      const faces =
        f.kind === 'bolt' ? 'through all plies' : plies === 2 ? 'one face' : 'each face';
      const name = worst.q > 0 ? worst.combo.name : 'no point loads';
      chosen = {
        chord,
        plies,
        fastener: id,
        faces,
        rows,
        spacing,
        z,
        mode,
        table: f.table,
        combination: name,
        cd,
        demand: worst.q,
        capacity,
        ratio: worst.q / capacity,
        pass: worst.q <= capacity * (1 + 1e-9),
        text:
          `${chord === 'top' ? 'Top' : 'Bottom'} chord, ${plies}-ply: ${f.label} in ${rows} row${rows > 1 ? 's' : ''} at ${s} in. o.c. ${f.kind === 'bolt' ? 'through all plies' : `from ${faces}`}` +
          (worst.q > 0
            ? ` — carries ${ft(worst.q)} from the loaded ply (${name}), capacity ${ft(capacity)} (Z = ${Math.round(z / N_PER_LBF)} lb × CD ${cd}, ${f.table}, mode ${mode}).`
            : ` (no point loads on this chord: the largest spacing).`),
      };
      break;
    }
    if (chosen) out.push(chosen);
  }
  return out;
}
