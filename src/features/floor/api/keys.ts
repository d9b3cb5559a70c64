/** Query keys of the shop floor. */
const all = ['floor'] as const;

export const floorKeys = {
  all,
  day: (date: string | undefined) => [...all, 'day', date ?? 'today'] as const,
};
