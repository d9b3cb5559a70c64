import type { Joint, Support } from '../analysis/types';

/**
 * A beam-column of a plane frame: E (MPa), A (mm²) and I (mm⁴) of its section, and a moment
 * release (hinge) at either end. A member released at both ends is a two-force member for the
 * joints (it still carries its own transverse load as a simple beam).
 */
export interface FrameMember {
  id: string;
  from: string;
  to: string;
  e: number;
  a: number;
  i: number;
  /** Moment release at the `from` / `to` end (the member end turns freely on the joint). */
  releaseStart?: boolean;
  releaseEnd?: boolean;
}

/** A plane frame: joints (mm), members and pin/roller supports (which restrain no rotation). */
export interface FrameModel {
  joints: Joint[];
  members: FrameMember[];
  supports: Support[];
}

/** A load at a joint: forces along +x/+y (N), moment counter-clockwise + (N·mm). */
export interface FrameJointLoad {
  joint: string;
  fx?: number;
  fy?: number;
  m?: number;
}

/**
 * A load on a member. `uniform`: a line load over the whole member, either as global components
 * (`wx`, `wy`, N per mm of `per`: the member's own length, or its horizontal projection, as roof
 * live and snow loads are given) or across and along the member (`transverse`, N/mm of length,
 * + along the member's downward normal; `axial`, + from `from` toward `to`). `point`: a force
 * (global components, N) at distance `at` (mm) from the `from` end.
 */
export type FrameMemberLoad =
  | {
      kind: 'uniform';
      member: string;
      wx?: number;
      wy?: number;
      per?: 'length' | 'horizontal';
      transverse?: number;
      axial?: number;
    }
  | { kind: 'point'; member: string; at: number; fx?: number; fy?: number };

/** The loads of one load case or combination. */
export interface FrameLoads {
  joints?: readonly FrameJointLoad[];
  members?: readonly FrameMemberLoad[];
}

/**
 * What one member carries. Moments are signed sagging + about the member's downward normal
 * side (tension on the lower face for a chord), N·mm; shears and axial force in N.
 */
export interface FrameMemberResult {
  id: string;
  /** Axial force at mid-length, tension + (a load along the member changes it linearly). */
  axial: number;
  /** Bending moment at the `from` and `to` ends (0 at a released end). */
  startMoment: number;
  endMoment: number;
  /** Largest |M| strictly inside the member (at zero shear or under a point load); 0 if none. */
  spanMoment: number;
  /** Largest |M| anywhere along the member. */
  maxMoment: number;
  /** Transverse shear at the ends, N (magnitudes), and the largest |V| along the member. */
  startShear: number;
  endShear: number;
  maxShear: number;
}

/** Force a support exerts on the frame, N. */
export interface FrameReaction {
  joint: string;
  rx: number;
  ry: number;
}

/** Displacement of a joint: ux, uy in mm, rotation rz in rad (0 where no member is continuous). */
export interface FrameDisplacement {
  joint: string;
  ux: number;
  uy: number;
  rz: number;
}

/** The solution of one load set. */
export interface FrameResult {
  members: FrameMemberResult[];
  reactions: FrameReaction[];
  displacements: FrameDisplacement[];
  /** max |ΣF| (and |ΣM| / model size) at any free degree of freedom / max(1, largest load). */
  residual: number;
}
