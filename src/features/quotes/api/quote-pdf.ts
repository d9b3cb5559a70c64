/**
 * `GET /api/orders/:id/quotes/:number/pdf`: the printed quote. The browser opens it itself
 * (a link, new tab), so there is no fetcher or query here; the session cookie authorizes it.
 */
export function quotePdfPath(orderId: number, number: number): string {
  return `/api/orders/${orderId}/quotes/${number}/pdf`;
}
