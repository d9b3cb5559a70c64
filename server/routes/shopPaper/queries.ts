import type { PresentedDesign } from '../../../shared/engine/design';
import { OrderLine, Plant, type Order } from '../../models';
import { AppError } from '../../errors';
import type { ShopOrderPaper } from '../../services/shopPaper/lines';

/**
 * The order's shop paper source: its heading and every line with the stored design. Shop paper
 * is printed only from approved designs: an order with no lines, or any line not approved,
 * answers 409 naming the marks still waiting.
 */
export async function shopOrderPaper(order: Order): Promise<ShopOrderPaper> {
  const [lines, plant] = await Promise.all([
    OrderLine.findAll({
      where: { orderId: order.id },
      order: [
        ['position', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    Plant.findByPk(order.plantId),
  ]);
  if (lines.length === 0)
    throw new AppError(409, 'not_approved', 'This order has no trusses to print shop paper for.');
  const waiting = lines.filter((l) => l.reviewState !== 'approved').map((l) => l.mark);
  if (waiting.length > 0)
    throw new AppError(
      409,
      'not_approved',
      `Shop paper prints once every design is approved; still waiting: ${waiting.join(', ')}.`,
    );
  return {
    order: {
      id: order.id,
      number: order.number,
      status: order.status,
      plant: plant?.name ?? '',
      job: { id: order.job!.id, name: order.job!.name, address: order.job!.address },
      builder: { id: order.customer!.id, name: order.customer!.name },
      units: plant?.units ?? 'imperial',
    },
    lines: lines.map((l) => ({
      id: l.id,
      mark: l.mark,
      description: l.description,
      quantity: l.quantity,
      plies: l.plies,
      engineVersion: l.engineVersion,
      designInput: l.designInput,
      design: l.designResult as unknown as PresentedDesign,
    })),
  };
}
