/** The review page of a line; the order id rides along because a line is addressed by both. */
export function reviewPath(lineId: number, orderId: number): string {
  return `/reviews/${lineId}?order=${orderId}`;
}

/** The order id of a review page URL (`?order=`), or undefined when absent or not an id. */
export function orderIdFromSearch(search: URLSearchParams): number | undefined {
  const n = Number(search.get('order'));
  return Number.isInteger(n) && n > 0 ? n : undefined;
}
