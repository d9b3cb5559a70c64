import type { ProfileKind } from './types';

/** A profile family as the user picks it. */
export interface ProfileKindInfo {
  kind: ProfileKind;
  label: string;
  description: string;
}

/** Every profile family, in the order a picker shows them. */
export const PROFILE_KINDS: readonly ProfileKindInfo[] = [
  {
    kind: 'kingPost',
    label: 'King post',
    description: 'One vertical web from mid-span to the peak; short spans.',
  },
  {
    kind: 'queenPost',
    label: 'Queen post',
    description: 'Two vertical posts at the third-points, each strutted to the peak.',
  },
  { kind: 'fink', label: 'Fink (W)', description: 'Four webs in a W; the everyday common truss.' },
  {
    kind: 'howe',
    label: 'Howe',
    description: 'Verticals at the quarter-points and mid-span with diagonals toward the heels.',
  },
  {
    kind: 'fan',
    label: 'Fan',
    description: 'Three webs fan out from each bottom-chord third-point.',
  },
  {
    kind: 'doubleFink',
    label: 'Double Fink (WW)',
    description: "Eight webs in two W's for longer spans.",
  },
  { kind: 'scissor', label: 'Scissor', description: 'Sloped bottom chord for a vaulted ceiling.' },
  {
    kind: 'mono',
    label: 'Mono-pitch',
    description: 'One sloping top chord from a low heel to a tall end.',
  },
  {
    kind: 'flat',
    label: 'Flat',
    description: 'Parallel chords with Pratt diagonals and a vertical at every panel point.',
  },
];

/** Human label per kind, for messages. */
export const PROFILE_KIND_LABELS = Object.fromEntries(
  PROFILE_KINDS.map((k) => [k.kind, k.label]),
) as Record<ProfileKind, string>;
