/** In-app address of an order's quotes (`/orders/:orderId/quotes`). */
export function quotesPath(orderId: number): string {
  return `/orders/${orderId}/quotes`;
}

/** In-app address of one revision (`/orders/:orderId/quotes/:number`). */
export function quotePath(orderId: number, number: number): string {
  return `${quotesPath(orderId)}/${number}`;
}

/**
 * A positive whole number from a route parameter, or undefined for anything else (junk in the
 * address shows a "no such quote" message, never a request for `/quotes/NaN`).
 */
export function positiveIntParam(value: string | undefined): number | undefined {
  if (value === undefined || !/^\d+$/.test(value)) return undefined;
  const n = Number(value);
  return Number.isSafeInteger(n) && n > 0 ? n : undefined;
}
