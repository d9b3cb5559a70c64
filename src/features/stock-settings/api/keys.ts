/** Query keys of the plant's stock settings: one prefix that a save invalidates. */
const all = ['stock-settings'] as const;

export const stockSettingsKeys = {
  all,
  /** The signed-in user's plant's settings. */
  current: () => [...all, 'current'] as const,
};
