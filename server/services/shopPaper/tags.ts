import type { TrussTag, TrussTags } from '../../../shared/api/shopPaper';
import { pitchText, type ShopLine, type ShopOrderPaper } from './lines';
import { trussLumberMassKg } from '../../../shared/engine/design';
import { LUMBER_WEIGHT_BASIS } from '../../../shared/engine/lumber';
import { weightIn } from './weight';

/** Printed on every tag (DESIGN.md §4.6). */
export const DO_NOT_CUT =
  'DO NOT CUT OR ALTER THIS TRUSS. No cut, notch, hole or change without a written repair from ' +
  'the truss designer. Brace per the drawings and the industry’s bracing guide.';

/** The truss line's page in Spanwise (its shop drawing), the `n`th truss of the mark. */
export const trussPageUrl = (publicUrl: string, orderId: number, lineId: number, n: number) =>
  `${publicUrl}/orders/${orderId}/shop-paper/lines/${lineId}?truss=${n}`;

/**
 * One tag per truss built: each line's `quantity` trusses numbered 1…N within the mark. A
 * multi-ply girder is fastened together at the plant and ships as one truss (one tag; its
 * plies and the weight of all of them printed on it).
 */
export function trussTags(paper: ShopOrderPaper, publicUrl: string): TrussTags {
  const tags: TrussTag[] = [];
  const tagsOf = (line: ShopLine) => {
    const weight = weightIn(trussLumberMassKg(line.design, line.plies), paper.order.units);
    for (let n = 1; n <= line.quantity; n++) {
      tags.push({
        lineId: line.id,
        mark: line.mark,
        n,
        of: line.quantity,
        span: line.design.span.text,
        pitch: pitchText(line),
        plies: line.plies,
        weight,
        url: trussPageUrl(publicUrl, paper.order.id, line.id, n),
      });
    }
  };
  paper.lines.forEach(tagsOf);
  return { order: paper.order, tags, warning: DO_NOT_CUT, weightBasis: LUMBER_WEIGHT_BASIS };
}
