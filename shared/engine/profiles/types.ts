import type { Joint, Support } from '../analysis/types';

export type ProfileKind =
  'kingPost' | 'queenPost' | 'fink' | 'howe' | 'fan' | 'doubleFink' | 'scissor' | 'mono' | 'flat';

export type MemberRole = 'topChord' | 'bottomChord' | 'web';

/** Profile parameters, lengths in mm. */
export interface ProfileParams {
  kind: ProfileKind;
  /** Out-to-out of bearings, mm (the line model's heel joints sit at x = 0 and x = span). */
  span: number;
  /** Rise per 12 of run (top chord). Ignored by `flat`. */
  pitch: number;
  /** Vertical height at the heel, mm; 0 is the pointed heel of the line model. */
  heelHeight: number;
  /** Horizontal length of the top-chord cantilever beyond each heel, mm. */
  overhangLeft: number;
  overhangRight: number;
  /** Scissor only: rise per 12 of the bottom chord. */
  bottomPitch?: number;
  /** Flat only: out-to-out depth, mm, and an even panel count. */
  depth?: number;
  panels?: number;
  /** Longest stock length available for chords, mm (default 20 ft = 6096 mm). */
  maxStockLength?: number;
}

export interface ProfileMember {
  id: string;
  from: string;
  to: string;
  role: MemberRole;
  /** Centre-line length, mm. */
  length: number;
}

/** A physical piece of lumber: a chord runs across several members; each web is its own piece. */
export interface Piece {
  /** Piece mark, e.g. "TC1", "BC1", "W1". */
  id: string;
  role: MemberRole;
  /** Analysis members this piece carries, in order along the piece. */
  members: string[];
  /** Centre-line length including any overhang it carries, mm. */
  length: number;
  /** True where this piece ends at a splice (joint id where it meets the next piece). */
  spliceAt?: string[];
}

/** Top-chord cantilever beyond a heel: not in the axial model; its load goes to `heelJoint`. */
export interface Overhang {
  side: 'left' | 'right';
  heelJoint: string;
  /** Horizontal projection and length along the slope, mm. */
  horizontal: number;
  slopeLength: number;
  /** The top-chord member it continues (for the cantilever-moment check). */
  member: string;
}

export interface TrussProfile {
  params: ProfileParams;
  joints: Joint[];
  members: ProfileMember[];
  /** Left heel: pin; right heel: roller (normal y). */
  supports: Support[];
  pieces: Piece[];
  overhangs: Overhang[];
  /** Joint ids along the top chord and the bottom chord, left to right. */
  topChordJoints: string[];
  bottomChordJoints: string[];
  /** Height of the peak above the bearing line, mm. */
  rise: number;
}
