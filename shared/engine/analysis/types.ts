/** A joint of a plane truss. Coordinates in any consistent length unit (the engine uses mm). */
export interface Joint {
  id: string;
  x: number;
  y: number;
}

/** A two-force member between two joints. `id` defaults to `from + to`; `ea` is axial stiffness E·A. */
export interface Member {
  id?: string;
  from: string;
  to: string;
  ea?: number;
}

/** Pin: reactions along x and y. Roller: one reaction along its normal (default "y"). */
export interface Support {
  joint: string;
  type: 'pin' | 'roller';
  normal?: 'x' | 'y';
}

/** A point load at a joint, components along +x and +y. */
export interface JointLoad {
  joint: string;
  fx?: number;
  fy?: number;
}

/** A whole plane truss: geometry, supports and (optionally) the loads of one load case. */
export interface TrussModel {
  joints: Joint[];
  members: Member[];
  supports: Support[];
  loads?: JointLoad[];
}

/** Statically determinate (m + r = 2j, solved by equilibrium alone) or indeterminate (m + r > 2j). */
export type Classification = 'determinate' | 'indeterminate';

/** The axial force in one member, by member id. */
export interface MemberForce {
  id: string;
  /** Axial force, tension positive. */
  force: number;
}

/** Force the support exerts on the truss, positive along +x and +y. */
export interface Reaction {
  joint: string;
  rx: number;
  ry: number;
}

/** Displacement of a joint, positive along +x and +y, in the model's length unit. */
export interface Displacement {
  joint: string;
  ux: number;
  uy: number;
}

/** Everything one load case gives: member forces, reactions and, with `ea`, displacements. */
export interface AnalysisResult {
  classification: Classification;
  /** Degree of static indeterminacy m + r − 2j (0 when determinate). */
  redundants?: number;
  members: MemberForce[];
  reactions: Reaction[];
  /** Present when every member has `ea`. */
  displacements?: Displacement[];
  /** max |ΣF| at any joint / max(1, largest applied load). */
  residual: number;
}
