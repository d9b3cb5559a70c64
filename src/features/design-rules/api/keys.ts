/** Query keys of the plant's design rules: one prefix a save invalidates (one set per plant). */
const all = ['design-rules'] as const;

export const designRulesKeys = {
  all,
  /** The signed-in user's plant's rules. */
  current: () => [...all, 'current'] as const,
};
