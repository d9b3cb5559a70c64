/**
 * Query keys of the plant's price book, built like `src/lib/query-keys.ts`: one prefix (`all`)
 * that a save invalidates. A plant has one price book, so there is no list or id.
 */
const all = ['price-book'] as const;

/** Query keys of the price book. */
export const priceBookKeys = {
  all,
  /** The signed-in user's plant's book. */
  current: () => [...all, 'current'] as const,
};
