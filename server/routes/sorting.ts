import type { Order } from 'sequelize';
import { badRequest } from '../errors';

/** `sort=name` or `sort=-createdAt` against a whitelist of columns → Sequelize order. */
export function orderFrom(
  sort: string | undefined,
  allowed: Record<string, string | string[]>,
  fallback: Order,
): Order {
  if (!sort) return fallback;
  const desc = sort.startsWith('-');
  const key = desc ? sort.slice(1) : sort;
  // Own keys only: `sort=constructor` or `toString` must not find Object.prototype's members.
  const column = Object.hasOwn(allowed, key) ? allowed[key] : undefined;
  if (!column)
    throw badRequest(`Cannot sort by "${key}".`, {
      sort: `One of: ${Object.keys(allowed).join(', ')}`,
    });
  const dir = desc ? 'DESC' : 'ASC';
  // An array names a column of an included association, e.g. ['customer', 'name'].
  return [
    (Array.isArray(column) ? [...column, dir] : [column, dir]) as [string, string],
    ['id', 'ASC'],
  ];
}
