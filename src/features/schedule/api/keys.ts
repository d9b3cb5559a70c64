/** Query keys of the production schedule: one prefix a move invalidates. */
const all = ['schedule'] as const;

export const scheduleKeys = {
  all,
  board: (from: string | undefined, days: number) =>
    [...all, 'board', from ?? 'today', days] as const,
  load: (from: string | undefined, days: number) =>
    [...all, 'load', from ?? 'today', days] as const,
};
