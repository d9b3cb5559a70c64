import { Op } from 'sequelize';
import { queueShopPlan } from '../server/commands/shopPlans';
import { Order, ShopPlan, type Plant } from '../server/models';
import { runShopPlan } from '../server/services/shopPlan/job';

/**
 * Every demo order whose designs are all approved gets its stored shop plan (cut list and lumber
 * plan) at seed time, made by the same job the queue runs, so the foreman's pages show paper at
 * once. Orders that already have a plan are left alone.
 */
export async function seedShopPlans(plant: Plant) {
  const orders = await Order.findAll({
    where: { plantId: plant.id, status: { [Op.ne]: 'cancelled' } },
    include: [{ association: 'lines', attributes: ['reviewState'] }],
    order: [['id', 'ASC']],
  });
  for (const order of orders) {
    const lines = (order as Order & { lines?: { reviewState: string }[] }).lines ?? [];
    if (lines.length === 0 || lines.some((l) => l.reviewState !== 'approved')) continue;
    if (await ShopPlan.findOne({ where: { orderId: order.id, madeAt: { [Op.ne]: null } } }))
      continue;
    await Order.sequelize!.transaction((t) => queueShopPlan(t, order, null));
    await runShopPlan(order.id);
  }
}
