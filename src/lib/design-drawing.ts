/**
 * `GET /api/orders/:id/lines/:lineId/design-drawing.pdf` (by line) and
 * `GET /api/orders/:id/design-drawings/:mark.pdf` (by mark, for pages that know only marks): one
 * line's truss design drawing. The browser opens it itself (a link, new tab), so the session
 * cookie authorizes it and there is no fetcher here.
 */
export function designDrawingPath(orderId: number, line: { id: number } | { mark: string }) {
  return 'id' in line
    ? `/api/orders/${orderId}/lines/${line.id}/design-drawing.pdf`
    : `/api/orders/${orderId}/design-drawings/${encodeURIComponent(line.mark)}.pdf`;
}
