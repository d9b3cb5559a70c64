import { Op, literal } from 'sequelize';
import { AuditEvent, Customer, Job, Order, OrderLine, Plant, User } from '../../models';
import { orderPolicy } from '../../policies/order';
import { presentHistory, presentOrder } from '../../presenters/order';
import { builderView, orderMoneyParts } from '../portal/orderParts';

const lineCount = literal('(SELECT COUNT(*) FROM order_lines ol WHERE ol.order_id = "Order"."id")');
const trussCount = literal(
  '(SELECT COALESCE(SUM(ol.quantity), 0) FROM order_lines ol WHERE ol.order_id = "Order"."id")',
);
export const orderAttributes = {
  include: [
    [lineCount, 'lineCount'],
    [trussCount, 'trussCount'],
  ] as [typeof lineCount, string][],
};
export const orderIncludes = [
  { model: Job, as: 'job' },
  { model: Customer, as: 'customer' },
];
/** Summary columns only: the stored design snapshots stay out of list-sized reads. */
const SUMMARY_COLUMNS = { exclude: ['designInput', 'designResult'] };

/** Find an order within the actor's scope. */
export const findOrder = (id: number, actor: User) =>
  Order.findOne({
    where: { [Op.and]: [{ id }, orderPolicy.scope(actor)] },
    attributes: orderAttributes,
    include: orderIncludes,
  });

/** Find a line of an already loaded (and so already scoped) order. */
export const findLine = (orderId: number, lineId: number) =>
  OrderLine.findOne({ where: { id: lineId, orderId }, include: [{ model: User, as: 'reviewer' }] });

/**
 * The order page: lines with design summaries and review state, and its history. Pass the order
 * when it is already loaded (with `orderAttributes` and `orderIncludes`), its id after a write.
 */
export async function orderPage(orderOrId: Order | number, actor: User) {
  const order = typeof orderOrId === 'number' ? await findOrder(orderOrId, actor) : orderOrId;
  const orderId = order!.id;
  const [lines, events, plant] = await Promise.all([
    OrderLine.findAll({
      where: { orderId },
      attributes: SUMMARY_COLUMNS,
      include: [{ model: User, as: 'reviewer' }],
      order: [
        ['position', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    AuditEvent.findAll({
      where: { subjectType: 'order', subjectId: orderId, plantId: actor.plantId },
      include: [{ model: User, as: 'actor' }],
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
      limit: 200,
    }),
    Plant.findByPk(actor.plantId),
  ]);
  const builder = actor.role === 'builder';
  const page = presentOrder(
    order as never,
    lines,
    builder ? builderView.history(events) : presentHistory(events),
    plant!.units,
  );
  return {
    ...(builder ? builderView.page(page) : page),
    ...(await orderMoneyParts(orderId, actor)),
  };
}
