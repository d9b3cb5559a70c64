/**
 * Query keys of quote revisions, built like `src/lib/query-keys.ts`: `all / lists / list / details
 * / detail`, keyed by the order (a quote's number counts within its order).
 */
const all = ['quotes'] as const;

/** Query keys of quotes. */
export const quoteKeys = {
  all,
  lists: () => [...all, 'list'] as const,
  /** The revisions of one order. */
  list: (orderId: number) => [...all, 'list', orderId] as const,
  details: () => [...all, 'detail'] as const,
  /** One revision: order id and revision number. */
  detail: (orderId: number, number: number) => [...all, 'detail', orderId, number] as const,
};
