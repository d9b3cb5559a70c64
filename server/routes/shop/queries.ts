import { Op, literal } from 'sequelize';
import type { ShopOrder } from '../../../shared/api/shop';
import { Order, OrderLine, type User } from '../../models';
import { orderAttributes, orderIncludes } from '../orders/queries';
import { presentOrderSummary } from '../../presenters/order';

/** Orders with at least one line whose every line's design is approved: ready for the shop. */
const allApproved = literal(
  `EXISTS (SELECT 1 FROM order_lines ol WHERE ol.order_id = "Order"."id") AND NOT EXISTS ` +
    `(SELECT 1 FROM order_lines ol WHERE ol.order_id = "Order"."id" AND ol.review_state <> 'approved')`,
);

/** The plant's orders ready for the shop, newest change first (cancelled ones left out). */
export const readyOrders = (actor: User) =>
  Order.findAll({
    where: {
      [Op.and]: [{ plantId: actor.plantId }, { status: { [Op.ne]: 'cancelled' } }, allApproved],
    },
    attributes: orderAttributes,
    include: orderIncludes,
    order: [
      ['updatedAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: 200,
  });

/** An order as the shop lists it. */
export const presentShopOrder = (o: Order): ShopOrder => {
  const { id, number, status, job, customer, lineCount, trussCount, updatedAt } =
    presentOrderSummary(o as Parameters<typeof presentOrderSummary>[0]);
  return { id, number, status, job, customer, lineCount, trussCount, updatedAt };
};

/** Every line of an order with its design snapshot, in order. */
export const linesForShop = (orderId: number) =>
  OrderLine.findAll({
    where: { orderId },
    order: [
      ['position', 'ASC'],
      ['id', 'ASC'],
    ],
  });
