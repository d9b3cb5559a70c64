import { Op, type Transaction } from 'sequelize';
import type { CreateLineInput, ReviewInput, UpdateLineInput } from '../../shared/api/orders';
import { nextFreeMark } from '../../shared/api/marks';
import { Order, OrderLine, Plant, type Job, type User } from '../models';
import { AppError, badRequest, conflict, notFound } from '../errors';
import { computeDesign, type ComputedDesign } from '../services/design';
import { loadDesignRules } from '../services/designRules';
import { orderEvent } from './audit';
import { releaseAfterCommit } from './release';
import { queueShopPlanIfReady } from './shopPlans';
import { assertMarkFree, isNoChange } from './lineMarks';

/**
 * Lock order: every command that touches an order and its lines locks the order row first, then the
 * lines (by id), so two commands never wait on each other in opposite orders (no deadlocks).
 */
const lockOrderRow = async (orderId: number, t: Transaction) => {
  const o = await Order.findByPk(orderId, { transaction: t, lock: t.LOCK.UPDATE });
  if (!o) throw conflict('The order no longer exists.');
  return o;
};

/** The line as it is now, locked (after its order); gone in the meantime answers 404. */
const lockLine = async (orderId: number, lineId: number, t: Transaction) => {
  const l = await OrderLine.findOne({
    where: { id: lineId, orderId },
    transaction: t,
    lock: t.LOCK.UPDATE,
  });
  if (!l) throw notFound('Truss line');
  return l;
};

/**
 * Lock the order row so concurrent line writes keep positions and numbers consistent. A quoted
 * order's lines may change too: it goes back to draft (its quotes stay as written; the next quote
 * is a new revision) and its history says so.
 */
export const lockOrder = async (order: Order, t: Transaction, actor: User) => {
  const o = await lockOrderRow(order.id, t);
  if (o.status === 'quoted') {
    await o.update({ status: 'draft' }, { transaction: t });
    await orderEvent(t, actor, o, 'order.reopened', {
      from: 'quoted',
      reason: 'Lines changed after quoting; the next quote is a new revision.',
    });
  } else if (o.status !== 'draft') {
    throw conflict('Only a draft or quoted order’s lines can change.');
  }
  order.status = o.status;
  return o;
};

export const designColumns = (d: ComputedDesign) => ({
  profile: d.profile,
  designInput: d.input as unknown as Record<string, unknown>,
  // The plant's design rules the engine ran with are recorded beside the result.
  designResult: { ...d.result, designRules: d.rules } as unknown as Record<string, unknown>,
  engineVersion: d.engineVersion,
  designOk: d.ok,
  maxCsi: d.maxCsi,
  warningCount: d.warningCount,
  description: d.description,
  loadsOutOfDate: false,
  outOfDateReason: null,
});

/** Open a draft order for a job, numbered per plant ("2026-0001"). */
export async function createOrder(actor: User, job: Job) {
  return Order.sequelize!.transaction(async (t) => {
    const plant = await Plant.findByPk(job.plantId, { transaction: t, lock: t.LOCK.UPDATE });
    const n = plant!.nextOrderNumber;
    await plant!.update({ nextOrderNumber: n + 1 }, { transaction: t });
    const order = await Order.create(
      {
        plantId: job.plantId,
        customerId: job.customerId,
        jobId: job.id,
        number: `${new Date().getFullYear()}-${String(n).padStart(4, '0')}`,
        createdBy: actor.id,
      },
      { transaction: t },
    );
    await orderEvent(t, actor, order, 'order.created', { number: order.number, jobId: job.id });
    return order;
  });
}

/** Add a truss line; the server computes and stores the design snapshot. */
export async function addLine(actor: User, order: Order, input: CreateLineInput) {
  const rules = await loadDesignRules(order.plantId);
  const design = computeDesign(input.design, { plies: input.plies }, undefined, rules);
  return Order.sequelize!.transaction(async (t) => {
    await lockOrder(order, t, actor);
    await assertMarkFree(order.id, input.mark, t);
    const max = (await OrderLine.max('position', {
      where: { orderId: order.id },
      transaction: t,
    })) as number | null;
    const line = await OrderLine.create(
      {
        orderId: order.id,
        position: (max ?? 0) + 1,
        mark: input.mark,
        quantity: input.quantity,
        plies: input.plies,
        ...designColumns(design),
      },
      { transaction: t },
    );
    await orderEvent(t, actor, order, 'line.added', {
      lineId: line.id,
      mark: line.mark,
      quantity: line.quantity,
      description: line.description,
      ok: line.designOk,
    });
    return line;
  });
}

/**
 * Change a line. A new design resets its review and raises its design version; an approved design
 * is locked — decided on the line as it is under its lock, not as it was loaded.
 */
export async function updateLine(
  actor: User,
  order: Order,
  loaded: OrderLine,
  input: UpdateLineInput,
) {
  if (isNoChange(loaded, input)) return loaded; // a save that changes nothing records nothing
  const redesignOf = (l: OrderLine) =>
    input.design !== undefined || (input.plies !== undefined && input.plies !== l.plies);
  const rules = await loadDesignRules(order.plantId);
  const designFor = (l: OrderLine) =>
    computeDesign(
      input.design ?? l.designInput,
      { plies: input.plies ?? l.plies },
      undefined,
      rules,
    );
  if (redesignOf(loaded) && loaded.reviewState === 'approved') throw conflictLocked();
  // The engine runs outside the locks; it runs again inside only if the line changed meanwhile.
  const early = redesignOf(loaded) ? designFor(loaded) : null;
  return Order.sequelize!.transaction(async (t) => {
    await lockOrder(order, t, actor);
    const line = await lockLine(order.id, loaded.id, t);
    const redesign = redesignOf(line);
    if (redesign && line.reviewState === 'approved') throw conflictLocked();
    const plies = input.plies ?? line.plies;
    const unchanged = line.designVersion === loaded.designVersion && line.plies === loaded.plies;
    const design = !redesign ? null : early && unchanged ? early : designFor(line);
    if (input.mark !== undefined && input.mark.toUpperCase() !== line.mark.toUpperCase())
      await assertMarkFree(order.id, input.mark, t, line.id);
    const changes: Partial<OrderLine> = {};
    if (input.mark !== undefined) changes.mark = input.mark;
    if (input.quantity !== undefined) changes.quantity = input.quantity;
    if (design) {
      Object.assign(changes, designColumns(design), {
        plies,
        designVersion: line.designVersion + 1,
        reviewState: 'pending',
        reviewComment: null,
        reviewedBy: null,
        reviewedAt: null,
      });
    }
    const before = {
      mark: line.mark,
      quantity: line.quantity,
      plies: line.plies,
      description: line.description,
    };
    await line.update(changes, { transaction: t });
    await orderEvent(t, actor, order, 'line.updated', {
      lineId: line.id,
      mark: line.mark,
      before,
      after: {
        mark: line.mark,
        quantity: line.quantity,
        plies: line.plies,
        description: line.description,
      },
      redesigned: !!design,
    });
    return line;
  });
}

const conflictLocked = () =>
  new AppError(
    409,
    'locked',
    'This design is approved and locked. Copy the line to make a new design; it will need a new review.',
  );

/** Remove a line from a draft order (an approved one takes its approval with it, on record). */
export async function deleteLine(actor: User, order: Order, loaded: OrderLine) {
  return Order.sequelize!.transaction(async (t) => {
    await lockOrder(order, t, actor);
    const line = await lockLine(order.id, loaded.id, t);
    await line.destroy({ transaction: t });
    await orderEvent(t, actor, order, 'line.deleted', {
      lineId: line.id,
      mark: line.mark,
      description: line.description,
      reviewState: line.reviewState,
      designVersion: line.designVersion,
    });
  });
}

/** Next free mark "T<n>" of the order (the shared rule, on its marks as the transaction sees them). */
async function nextMark(orderId: number, t: Transaction) {
  const lines = await OrderLine.findAll({
    where: { orderId },
    attributes: ['mark'],
    transaction: t,
  });
  return nextFreeMark(lines.map((l) => l.mark));
}

/** Copy a line (design recomputed by the current engine) under the next free mark; it needs its own review. */
export async function copyLine(actor: User, order: Order, loaded: OrderLine) {
  const rules = await loadDesignRules(order.plantId);
  const early = computeDesign(loaded.designInput, { plies: loaded.plies }, undefined, rules);
  return Order.sequelize!.transaction(async (t) => {
    await lockOrder(order, t, actor);
    // The copy is of the design as it is now (recomputed only if it changed since it was loaded).
    const line = await lockLine(order.id, loaded.id, t);
    const design =
      line.designVersion === loaded.designVersion && line.plies === loaded.plies
        ? early
        : computeDesign(line.designInput, { plies: line.plies }, undefined, rules);
    const max = (await OrderLine.max('position', {
      where: { orderId: order.id },
      transaction: t,
    })) as number | null;
    const copy = await OrderLine.create(
      {
        orderId: order.id,
        position: (max ?? 0) + 1,
        mark: await nextMark(order.id, t),
        quantity: line.quantity,
        plies: line.plies,
        ...designColumns(design),
      },
      { transaction: t },
    );
    await orderEvent(t, actor, order, 'line.copied', {
      lineId: copy.id,
      from: line.mark,
      mark: copy.mark,
    });
    return copy;
  });
}

/** Put the order's lines in the given order (every line id exactly once). */
export async function reorderLines(actor: User, order: Order, lineIds: number[]) {
  return Order.sequelize!.transaction(async (t) => {
    await lockOrder(order, t, actor);
    const lines = await OrderLine.findAll({
      where: { orderId: order.id },
      order: [['id', 'ASC']],
      transaction: t,
      lock: t.LOCK.UPDATE,
    });
    const ids = new Set(lines.map((l) => l.id));
    if (
      lineIds.length !== ids.size ||
      new Set(lineIds).size !== ids.size ||
      !lineIds.every((id) => ids.has(id))
    ) {
      throw badRequest('Send every line of this order exactly once.', {
        lineIds: 'Must list each line of the order once',
      });
    }
    for (const [i, id] of lineIds.entries()) {
      await OrderLine.update(
        { position: i + 1 },
        { where: { id, orderId: order.id, position: { [Op.ne]: i + 1 } }, transaction: t },
      );
    }
    const byId = new Map(lines.map((l) => [l.id, l.mark]));
    await orderEvent(t, actor, order, 'lines.reordered', {
      marks: lineIds.map((id) => byId.get(id)),
    });
  });
}

/**
 * The design reviewer approves (locks) or sends back a line's design — the version they looked at.
 * Decided under the order's then the line's lock, so an edit cannot slip in between.
 */
export async function reviewLine(actor: User, order: Order, loaded: OrderLine, input: ReviewInput) {
  return Order.sequelize!.transaction(async (t) => {
    await lockOrderRow(order.id, t);
    const line = await lockLine(order.id, loaded.id, t);
    if (line.reviewState === 'approved') throw conflictLocked();
    if (line.designVersion !== input.designVersion) {
      throw new AppError(
        409,
        'stale',
        `The design of ${line.mark} changed since you opened it (now version ${line.designVersion}). Reload it and review the current design.`,
        { designVersion: `Current version is ${line.designVersion}` },
      );
    }
    if (input.decision === 'approve' && !line.designOk) {
      throw conflict(
        'A design that fails its checks cannot be approved; send it back with a comment.',
      );
    }
    await line.update(
      {
        reviewState: input.decision === 'approve' ? 'approved' : 'returned',
        reviewComment: input.comment || null,
        reviewedBy: actor.id,
        reviewedAt: new Date(),
      },
      { transaction: t },
    );
    await orderEvent(
      t,
      actor,
      order,
      input.decision === 'approve' ? 'line.approved' : 'line.returned',
      {
        lineId: line.id,
        mark: line.mark,
        comment: input.comment || undefined,
        engineVersion: line.engineVersion,
        designVersion: line.designVersion,
      },
    );
    // An approval may complete the release gate and the order's shop plan.
    if (input.decision === 'approve') {
      releaseAfterCommit(t, order.id, actor);
      await queueShopPlanIfReady(t, order, actor);
    }
    return line;
  });
}
