/** Query keys of the demo inbox (the local mail fake), built like `src/lib/query-keys.ts`. */
const all = ['dev-mail'] as const;

/** Query keys of the demo inbox. */
export const mailKeys = {
  all,
  lists: () => [...all, 'list'] as const,
  /** Everything the fake holds (it has no paging). */
  list: () => [...all, 'list', 'all'] as const,
};
