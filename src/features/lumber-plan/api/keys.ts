/** Query keys of lumber plans: one per order, under one prefix. */
const all = ['lumber-plan'] as const;

export const lumberPlanKeys = {
  all,
  order: (orderId: number) => [...all, 'order', orderId] as const,
};
