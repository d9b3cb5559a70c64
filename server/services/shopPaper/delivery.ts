import type { Bundle, DeliveryTicket } from '../../../shared/api/shopPaper';
import type { ShopOrderPaper } from './lines';
import { trussLumberMassKg } from '../../../shared/engine/design';
import { weightIn } from './weight';

/** Trusses per bundle: one mark per bundle, banded in tens at most (the plant's default). */
export const BUNDLE_SIZE = 10;

export const BUNDLE_RULE =
  `Trusses of one mark are banded together, at most ${BUNDLE_SIZE} to a bundle; ` +
  'bundles load in order of the marks.';

/** The delivery ticket of an order: bundles, marks and counts, site and builder. */
export function deliveryTicket(paper: ShopOrderPaper): DeliveryTicket {
  const units = paper.order.units;
  const bundles: Bundle[] = [];
  let totalKg = 0;
  for (const line of paper.lines) {
    const each = trussLumberMassKg(line.design, line.plies);
    totalKg += each * line.quantity;
    for (let first = 1; first <= line.quantity; first += BUNDLE_SIZE) {
      const last = Math.min(line.quantity, first + BUNDLE_SIZE - 1);
      const count = last - first + 1;
      bundles.push({
        number: bundles.length + 1,
        mark: line.mark,
        description: line.description,
        count,
        trusses:
          first === last ? `${first} of ${line.quantity}` : `${first}–${last} of ${line.quantity}`,
        weight: weightIn(each * count, units),
      });
    }
  }
  return {
    order: paper.order,
    bundles,
    marks: paper.lines.map((l) => ({
      mark: l.mark,
      description: l.description,
      count: l.quantity,
    })),
    totalTrusses: paper.lines.reduce((s, l) => s + l.quantity, 0),
    totalWeight: weightIn(totalKg, units),
    bundleRule: BUNDLE_RULE,
    cautions: paper.lines[0]?.design.cautions ?? [],
  };
}
