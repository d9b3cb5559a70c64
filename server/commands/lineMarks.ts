import { Op, where, fn, col, type Transaction } from 'sequelize';
import { designInputSchema } from '../../shared/api/design';
import type { UpdateLineInput } from '../../shared/api/orders';
import { OrderLine } from '../models';
import { AppError } from '../errors';

/** The refusal of a mark already used in the order (marks go on tags and placement plans). */
export const duplicateMark = (mark: string) =>
  new AppError(409, 'duplicate_mark', `Mark ${mark} is already used in this order.`, {
    mark: `${mark} is already used in this order — pick another mark`,
  });

/**
 * Refuse a mark another line of the order already has, compared without case. The database's
 * unique index on (order_id, upper(mark)) backs this up for concurrent writers.
 */
export async function assertMarkFree(
  orderId: number,
  mark: string,
  t: Transaction,
  exceptLineId?: number,
) {
  const taken = await OrderLine.findOne({
    where: {
      orderId,
      ...(exceptLineId !== undefined && { id: { [Op.ne]: exceptLineId } }),
      [Op.and]: [where(fn('upper', col('mark')), mark.toUpperCase())],
    },
    attributes: ['id'],
    transaction: t,
  });
  if (taken) throw duplicateMark(mark);
}

/** Stable JSON for comparing design inputs whatever their key order. */
export function stableJson(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(stableJson).join(',')}]`;
  if (v && typeof v === 'object')
    return `{${Object.keys(v)
      .sort()
      .filter((k) => (v as Record<string, unknown>)[k] !== undefined)
      .map((k) => `${JSON.stringify(k)}:${stableJson((v as Record<string, unknown>)[k])}`)
      .join(',')}}`;
  return JSON.stringify(v);
}

/** An edit whose every field equals what the line already has. */
export function isNoChange(line: OrderLine, input: UpdateLineInput): boolean {
  if (input.mark !== undefined && input.mark !== line.mark) return false;
  if (input.quantity !== undefined && input.quantity !== line.quantity) return false;
  if (input.plies !== undefined && input.plies !== line.plies) return false;
  if (input.design === undefined) return true;
  // The stored input is the parsed request with defaults and the line's plies; compare like with like.
  const sent = designInputSchema.safeParse({ ...input.design, plies: input.plies ?? line.plies });
  return (
    sent.success && stableJson(sent.data) === stableJson(line.designInput) && !line.loadsOutOfDate
  );
}
