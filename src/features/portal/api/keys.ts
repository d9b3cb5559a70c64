/** Query keys of the builder's portal (home, orders, sent quotes), built like src/lib/query-keys.ts. */
const all = ['portal'] as const;

export const portalKeys = {
  all,
  home: () => [...all, 'home'] as const,
  orders: () => [...all, 'order'] as const,
  order: (id: number) => [...all, 'order', id] as const,
  quote: (orderId: number, number: number) => [...all, 'order', orderId, 'quote', number] as const,
};
