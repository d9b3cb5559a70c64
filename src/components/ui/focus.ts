/** The one visible keyboard-focus ring used by every interactive primitive. */
export const focusRing =
  'focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-focus';
