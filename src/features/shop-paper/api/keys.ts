/**
 * Query keys of shop paper, built like `src/lib/query-keys.ts`, keyed by the order: its index,
 * plate schedule, delivery ticket and each mark's shop drawing.
 */
const all = ['shop-paper'] as const;

/** Query keys of shop paper. */
export const shopPaperKeys = {
  all,
  order: (orderId: number) => [...all, orderId] as const,
  index: (orderId: number) => [...all, orderId, 'index'] as const,
  plates: (orderId: number) => [...all, orderId, 'plates'] as const,
  delivery: (orderId: number) => [...all, orderId, 'delivery'] as const,
  drawing: (orderId: number, lineId: number) => [...all, orderId, 'line', lineId] as const,
};
