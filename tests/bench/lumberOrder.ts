/**
 * A realistic lumber order for the cutting bench: the pieces of real designs (the engine's own
 * profiles, auto-sized) for a mix of roofs, about 5,000 pieces in all, grouped by lumber. Stock
 * 8–20 ft in 2 ft steps priced per foot with a premium for the longer lengths (demo prices,
 * invented; a premium for long lengths is common practice). Kerf 1/8 in, end trim 1/2 in.
 */
import { designInputSchema, toEngineInput, type DesignInputDraft } from '../../shared/api/design';
import type { CuttingInput } from '../../shared/engine/cutting';
import { designTruss } from '../../shared/engine/design';
import { MM_PER_INCH } from '../../shared/engine/units';

const loads = { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 };
const SIXTEENTH = MM_PER_INCH / 16;

/** Demo base price per foot by lumber size (invented). */
const PER_FOOT: Record<string, number> = { '2x4': 0.62, '2x6': 0.94, '2x8': 1.31, '2x10': 1.72 };

/** Stock 8–20 ft in 2 ft steps, mm; per-foot price +6 % at 14–16 ft and +14 % at 18–20 ft. */
export function demoStock(size: string, onHand?: (feet: number) => number | undefined) {
  const base = PER_FOOT[size] ?? 1;
  return [8, 10, 12, 14, 16, 18, 20].map((feet) => {
    const premium = feet >= 18 ? 1.14 : feet >= 14 ? 1.06 : 1;
    const available = onHand?.(feet);
    return {
      length: feet * 12 * MM_PER_INCH,
      cost: Math.round(base * premium * feet * 100) / 100,
      ...(available !== undefined && { available }),
    };
  });
}

/** Roofs of a few subdivisions: each (design, number of trusses). */
function roofs(): [DesignInputDraft, number][] {
  const out: [DesignInputDraft, number][] = [];
  const kinds = [
    'fink',
    'howe',
    'kingPost',
    'queenPost',
    'doubleFink',
    'fan',
    'scissor',
    'mono',
  ] as const;
  let k = 0;
  for (const span of [20, 22, 24, 26, 28, 30, 32, 36, 40]) {
    for (const pitch of [4, 6, 8]) {
      const profile = kinds[k++ % kinds.length]!;
      const draft: DesignInputDraft = {
        units: 'imperial',
        profile,
        span: span * 12,
        pitch,
        heelHeight: 4,
        overhang: (k % 3) * 6 + 12,
        spacing: 24,
        maxStockLength: 238,
        loads,
        ...(profile === 'scissor' && { bottomPitch: pitch / 2 - 1 }),
      };
      out.push([draft, 13 + ((k * 7) % 18)]);
    }
  }
  return out;
}

/** The order: per lumber id, piece lengths (mm, cut to the next 1/16 in) with quantities. */
export function benchOrder(): Map<string, { length: number; quantity: number; id: string }[]> {
  const byLumber = new Map<string, Map<number, { length: number; quantity: number; id: string }>>();
  for (const [draft, trusses] of roofs()) {
    let design;
    try {
      design = designTruss(toEngineInput(designInputSchema.parse(draft)));
    } catch {
      continue; // a profile that cannot be built at this span (e.g. a king post at 40 ft)
    }
    // Pieces longer than the 20 ft stock would need longer stock: leave such roofs out.
    if (design.pieces.some((p) => p.length > 238 * MM_PER_INCH)) continue;
    for (const p of design.pieces) {
      const length = Math.ceil(p.length / SIXTEENTH - 1e-9) * SIXTEENTH;
      const lumber = byLumber.get(p.lumber) ?? new Map();
      const row = lumber.get(length) ?? { length, quantity: 0, id: p.mark };
      row.quantity += trusses;
      lumber.set(length, row);
      byLumber.set(p.lumber, lumber);
    }
  }
  return new Map([...byLumber].map(([lumber, rows]) => [lumber, [...rows.values()]]));
}

/** One cutting input per lumber id. */
export function benchInputs(onHand?: (size: string, feet: number) => number | undefined) {
  return [...benchOrder()].map(([lumber, pieces]) => {
    const size = lumber.split(' ')[0]!;
    const input: CuttingInput = {
      stocks: demoStock(size, onHand && ((feet) => onHand(size, feet))),
      kerf: MM_PER_INCH / 8,
      trim: MM_PER_INCH / 2,
      pieces,
    };
    return { lumber, input };
  });
}
