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
  /**
   * Tooth-holding (lateral resistance) values, lbf per in² of plate–wood contact per plate face,
   * for the four tested orientations of ANSI/TPI 1-2014 (the plate's length axis taken as its
   * slot direction): the engine interpolates between them (`lateralValue`).
   */
  lateralValue: {
    /** AA: plate length axis parallel to the load, load parallel to the grain. */
    aa: number;
    /** EA: plate length axis perpendicular to the load, load parallel to the grain. */
    ea: number;
    /** AE: plate length axis parallel to the load, load perpendicular to the grain. */
    ae: number;
    /** EE: plate length axis perpendicular to the load, load perpendicular to the grain. */
    ee: number;
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
   * Signed full force per load case, N (tension +), for the plate steel: with them, forces that
   * cross one steel section add as vectors case by case; without, their magnitudes add (a bound).
   */
  steelForces?: readonly number[];
  /**
   * Angle between this member's load on the plate and its grain, radians; 0 (the default) for
   * the axial force of a member, which runs along its grain.
   */
  loadToGrain?: number;
  /**
   * The member's tooth loads case by case, when its load is not along its grain: each the
   * magnitude (N, already over the case's CD like `force`) and direction to the grain of the
   * vector sum of its axial force and its end shear at this joint. The check takes the case
   * with the largest demand over tooth value; `force` and `loadToGrain` are then unused.
   */
  toothCases?: readonly { force: number; loadToGrain: number }[];
  /**
   * The id of the member whose board this is the far side of: the top chord's overhang beyond a
   * heel is the same board as the top chord, so the teeth it takes hold the top chord's force.
   * Such a part has no check or steel section of its own; its wood (up to `length`) joins that
   * member's contact area.
   */
  partOf?: string;
  /** How far this lumber runs from the joint, mm, when it ends within the plate (default: beyond). */
  length?: Mm;
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

/** Where a steel section runs: see `steelSections`. */
export type SteelLine = 'heel' | 'splice' | 'chordFace' | 'joint';

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
  /** 2 · area · lateral value · CD (· heel reduction), N. */
  capacity: number;
  ratio: number;
  /** Angle between the load and the plate's length axis, radians (0…π/2). */
  plateToLoad: number;
  /** Angle between the load and the grain, radians (0…π/2). */
  loadToGrain: number;
  /** Lateral value at those angles, MPa (N/mm²) per face, before CD and the heel reduction. */
  lateralValue: number;
  /** Heel-joint reduction factor HR on the top chord at a heel; 1 elsewhere. */
  heelFactor: number;
}

/**
 * Plate steel across one section (both plates counted), full forces. `combined`: demand is the
 * resultant crossing force, capacity the resultant the section holds at its angle, ratio
 * √((T/Tc)² + (V/Vc)²).
 */
export interface SteelCheck {
  kind: 'tension' | 'shear' | 'combined';
  /** Which section: the heel or splice line, a chord's face, or a line through the joint. */
  line: SteelLine;
  /** The members whose forces cross the section, e.g. "W2, W3". */
  member: string;
  /** Steel length along the section, per plate, mm. */
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
  /** The check with that ratio: teeth on a member, or the steel of a section. */
  governs: { check: 'teeth' | SteelCheck['kind']; member: string; ratio: number };
  /** Copied from the catalog so every screen can say the values are invented. */
  demo: boolean;
}
