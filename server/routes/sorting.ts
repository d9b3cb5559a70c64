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
  const column = allowed[key];
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
