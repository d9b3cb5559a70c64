import type { TagLayout } from '../../../../shared/api/shopPaper';

/**
 * The printed documents of an order's shop paper. The browser opens them itself (links, new tab),
 * so there are no fetchers here; the session cookie authorizes them.
 */
export const shopPaperFiles = (orderId: number) => {
  const base = `/api/orders/${orderId}/shop-paper`;
  return {
    platesPdf: `${base}/plates.pdf`,
    platesCsv: `${base}/plates.csv`,
    tagsPdf: (layout: TagLayout) => `${base}/tags.pdf?layout=${layout}`,
    deliveryPdf: `${base}/delivery.pdf`,
    drawingsPdf: `${base}/drawings.pdf`,
    drawingPdf: (lineId: number) => `${base}/lines/${lineId}/pdf`,
  };
};
