import type { MemberRole } from '../profiles/types';
import type { Mm, Newton } from '../units';

/**
 * One connector-plate size of a plant's catalog, in the units of the supplier's evaluation
 * report (inches, lbf): the plant copies them as printed, the engine converts.
 */
export interface PlateSpec {
  /** Catalog id, e.g. "4x6-20". */
  id: string;
  /** US Standard Gauge of the steel (20 is thinner than 18). */
  gauge: number;
  /** Across the plate, in; lies across the chord the plate is aligned with. */
  width: number;
  /** Along the plate, in; lies along that chord. */
  length: number;
  /** Tooth-holding value, lbf per in² of plate–wood contact per plate face. */
  lateralValue: {
    /** Load parallel to the grain. */
    parallel: number;
    /** Load perpendicular to the grain (the reduced value). */
    perpendicular: number;
  };
  /** Steel tension, lbf per inch of steel width per plate. */
  tensionValue: number;
  /** Steel shear, lbf per inch of steel length per plate. */
  shearValue: number;
}

/** A plant's plate catalog. `demo` catalogs carry invented values and must say so on screen. */
export interface PlateCatalog {
  id: string;
  /** Shown wherever the catalog's results are shown. */
  label: string;
  demo: boolean;
  plates: PlateSpec[];
}

/** A 2-D unit vector (any length is accepted; the engine normalizes). */
export interface Direction {
  x: number;
  y: number;
}

/** A member as it meets the joint being plated. */
export interface PlateJointMember {
  id: string;
  role: MemberRole;
  /** Along the member, away from the joint. */
  direction: Direction;
  /** Lumber depth (the dressed width of the board in the truss plane), mm. */
  depth: Mm;
  /** Axial force, N: the envelope magnitude (sign is ignored). */
  force: Newton;
  /**
   * The force the plate steel carries, N, when it differs from `force`: a design passes tooth
   * demands as |F|/CD (tooth values scale with CD), but steel capacities take no load-duration
   * factor, so the steel sees the full |F|. Default `force`.
   */
  steelForce?: Newton;
  /**
   * Angle between this member's load on the plate and its grain, radians; 0 (the default) for
   * the axial force of a member, which runs along its grain.
   */
  loadToGrain?: number;
}

/** `heel` and `splice` joints also check the steel across the joint line. */
export type PlateJointKind = 'heel' | 'splice' | 'panel';

/** A joint to plate: position (for the report), kind and the members meeting there. */
export interface PlateJoint {
  id: string;
  x: number;
  y: number;
  kind?: PlateJointKind;
  members: PlateJointMember[];
}

/** Options of `designJointPlate`. */
export interface PlateDesignOptions {
  /** Load-duration factor CD applied to tooth holding (NDS Table 2.3.2 values). Default 1.0. */
  cd?: number;
  /** Teeth this close to a lumber end do not count, mm. Default ½ in (common practice). */
  endExclusion?: Mm;
  /** Teeth this close to a lumber edge do not count, mm. Default ¼ in (common practice). */
  edgeExclusion?: Mm;
  /** Plate length axis; default the bottom chord (or the chord at a splice). */
  orientation?: Direction;
}

/** Tooth holding of one member: per plate face, both faces counted in `capacity`. */
export interface MemberPlateCheck {
  member: string;
  /** Effective contact area on this member, per plate face, mm². */
  area: number;
  /** |F|, N. */
  demand: number;
  /** 2 · area · lateral value · CD, N. */
  capacity: number;
  ratio: number;
}

/** Steel across the joint line at a heel or splice, both plates counted. */
export interface SteelCheck {
  kind: 'tension' | 'shear';
  /** The chord whose force crosses the joint line. */
  member: string;
  /** Steel width (tension) or length (shear) crossing the joint line, per plate, mm. */
  section: number;
  demand: number;
  capacity: number;
  ratio: number;
}

/** The plate chosen for a joint and every check that chose it. */
export interface JointPlateDesign {
  joint: string;
  plate: PlateSpec;
  /** Plates per joint: one on each face. */
  count: 2;
  /** Angle of the plate length axis from +x, radians. */
  angle: number;
  /**
   * Slide of the plate centre from the joint across its length axis, mm (+ toward the axis
   * turned +90°); 0 is centred on the joint.
   */
  offset: number;
  members: MemberPlateCheck[];
  steel: SteelCheck[];
  /** Largest ratio of all checks (≤ 1). */
  ratio: number;
  /** Copied from the catalog so every screen can say the values are invented. */
  demo: boolean;
}
