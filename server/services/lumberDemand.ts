/**
 * What an order asks of the saw, per lumber: the rows of its cut list (`buildCutList` over each
 * line's `cutPieces`), so the lumber plan cuts exactly the pieces the cut list lists — long-point
 * lengths as cut (to 1/16 in), with each row's quantity (per truss × trusses × plies).
 */
import type { CutList } from '../../shared/engine/pieces';

/** One distinct piece to cut: mark, lumber id, long-point length in mm, how many. */
export interface PieceDemandRow {
  mark: string;
  lumber: string;
  lengthMm: number;
  quantity: number;
}

/** The cut list's rows by lumber, in the cut list's order (smallest size first, longest first). */
export function lumberDemand(list: CutList): Map<string, PieceDemandRow[]> {
  return new Map(
    list.groups.map((g) => [
      g.lumber,
      g.rows.map((r) => ({
        mark: r.mark,
        lumber: r.lumber,
        lengthMm: r.length,
        quantity: r.quantity,
      })),
    ]),
  );
}
