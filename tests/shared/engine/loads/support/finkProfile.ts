import type { TrussProfile } from '../../../../../shared/engine/profiles/types';

// A small Fink-style profile built by hand (demo geometry): span 6000 mm, rise 1000 mm
// (4:12), pointed heels at A and E, 600 mm horizontal overhang each side.
export const cos = 3 / Math.sqrt(10); // 4:12 slope
export const overhangSlope = 600 / cos;
export const profile: TrussProfile = {
  params: {
    kind: 'fink',
    span: 6000,
    pitch: 4,
    heelHeight: 0,
    overhangLeft: 600,
    overhangRight: 600,
  },
  joints: [
    { id: 'A', x: 0, y: 0 },
    { id: 'B', x: 1500, y: 500 },
    { id: 'C', x: 3000, y: 1000 },
    { id: 'D', x: 4500, y: 500 },
    { id: 'E', x: 6000, y: 0 },
    { id: 'F', x: 2000, y: 0 },
    { id: 'G', x: 4000, y: 0 },
  ],
  members: [
    ['A', 'B', 'topChord'],
    ['B', 'C', 'topChord'],
    ['C', 'D', 'topChord'],
    ['D', 'E', 'topChord'],
    ['A', 'F', 'bottomChord'],
    ['F', 'G', 'bottomChord'],
    ['G', 'E', 'bottomChord'],
    ['B', 'F', 'web'],
    ['C', 'F', 'web'],
    ['C', 'G', 'web'],
    ['D', 'G', 'web'],
  ].map(([from, to, role]) => ({
    id: from + to,
    from,
    to,
    role: role as 'topChord' | 'bottomChord' | 'web',
    length: 0,
  })),
  supports: [
    { joint: 'A', type: 'pin' },
    { joint: 'E', type: 'roller', normal: 'y' },
  ],
  pieces: [],
  overhangs: [
    { side: 'left', heelJoint: 'A', horizontal: 600, slopeLength: overhangSlope, member: 'AB' },
    { side: 'right', heelJoint: 'E', horizontal: 600, slopeLength: overhangSlope, member: 'DE' },
  ],
  topChordJoints: ['A', 'B', 'C', 'D', 'E'],
  bottomChordJoints: ['A', 'F', 'G', 'E'],
  rise: 1000,
};

/** The same profile with real member lengths (for line loads that depend on them). */
export const finkWithLengths: TrussProfile = {
  ...profile,
  members: profile.members.map((m) => {
    const a = profile.joints.find((j) => j.id === m.from)!;
    const b = profile.joints.find((j) => j.id === m.to)!;
    return { ...m, length: Math.hypot(b.x - a.x, b.y - a.y) };
  }),
};
