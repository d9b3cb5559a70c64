import type { Joint } from '../analysis/types';
import type { AdditionalChecks } from './additionalChecks';
import type { AsceEdition } from '../loads/snow';
import type { GoverningCheck } from '../members/checkMember';
import type { JointPlateDesign, PlateCatalog, PlateJointKind } from '../plates/types';
import type { MemberRole } from '../profiles/types';
import type { PlyConnection } from './plyFastening';

/** Lumber lists per role for auto-sizing (lumber ids such as "2x4 SPF-1/2"). */
export interface LumberChoices {
  topChord?: string[];
  bottomChord?: string[];
  webs?: string[];
}

/** Options of `designTruss` that are plant settings rather than parts of the request. */
export interface DesignOptions {
  /** Plate catalog; default the demo catalog (invented values, says so). */
  plateCatalog?: PlateCatalog;
  /** Lumber tried when the request allows none for a role; default DEFAULT_LUMBER. */
  defaultLumber?: LumberChoices;
  /** ASCE 7 edition of the load combinations when the snow input names none (default 7-16). */
  edition?: AsceEdition;
  /**
   * Check the chord's panel-point moment with the NDS 2018 §3.9.2 amplifier too (stricter than
   * common practice, which checks it unamplified: the chord is held in plane there).
   */
  amplifyPanelPointMoment?: boolean;
}

/** One load combination as designed: name (e.g. "D + S") and its load-duration factor CD. */
export interface DesignCombination {
  name: string;
  cd: number;
}

/** A member as designed. Forces in N (tension +), lengths in mm. */
export interface DesignMember {
  id: string;
  from: string;
  to: string;
  role: MemberRole;
  /** Piece mark of the piece that carries it. */
  piece: string;
  /** Centre-line length, mm. */
  length: number;
  /** Lumber id of its piece, e.g. "2x4 SPF-1/2". */
  lumber: string;
  /** True when a lateral brace at mid-length is required (webs only). */
  braced: boolean;
  /** Axial force per combination, N, tension positive; same order as `TrussDesign.combinations`. */
  forces: number[];
  /** Largest tension, N (≥ 0). */
  maxTension: number;
  /** Largest compression, N, as a positive magnitude (≥ 0). */
  maxCompression: number;
  /** Largest in-plane bending moment (in a span or at a panel point) over the combinations, N·mm (≥ 0; chords only). */
  maxMoment: number;
  /** Largest transverse shear along the member over the combinations, N (≥ 0; chords only). */
  maxShear: number;
  /** Combined stress index of the governing combination (≤ 1 passes). */
  csi: number;
  /** Name of the governing combination. */
  governingCombination: string;
  governingCheck: GoverningCheck;
  /** What holds the member laterally, in words. */
  bracing: string;
  /** Any note of the member check (slenderness, buckling). */
  note?: string;
}

/** A physical piece of lumber as designed. Lengths in mm. */
export interface DesignPiece {
  /** Piece mark, e.g. "TC1", "W3". */
  mark: string;
  role: MemberRole;
  lumber: string;
  /** Centre-line length including any overhang, mm. */
  length: number;
  members: string[];
  /** Joints where this piece is spliced to the next one. */
  splices: string[];
  /** Worst CSI of its members. */
  csi: number;
  /** True when no allowed lumber passes (the strongest is kept). */
  failing: boolean;
}

/** Reactions at one support. N, positive magnitudes. */
export interface DesignReaction {
  joint: string;
  /** Largest force the truss presses down on the bearing, N (≥ 0). */
  maxDown: number;
  /** Largest uplift the connection must hold, N (≥ 0). */
  maxUp: number;
  /** Largest horizontal reaction magnitude, N (0 at the roller). */
  maxHorizontal: number;
  /** Vertical reaction per combination, N, + up (the support pushing the truss up). */
  vertical: number[];
  /** Horizontal reaction per combination, N, + toward +x. */
  horizontal: number[];
}

/** Deflection of one load set. Δ in mm (downward +). */
export interface DeflectionCheck {
  /** Load set, e.g. "S" or "D + S". */
  load: string;
  /** Largest downward displacement of a bottom-chord joint, mm. */
  max: number;
  /** Joint where it occurs. */
  joint: string;
  /** span / Δ (Infinity when Δ ≤ 0). */
  ratio: number;
  /** Required span / Δ, e.g. 240. */
  limit: number;
  pass: boolean;
}

/** Live and total-load deflection, from the stiffness solution with the chosen lumber. */
export interface DesignDeflection {
  /** Unfactored live case used: "Lr", "S", "L", "L(bc)" or none when no live load. */
  liveCase?: string;
  live?: DeflectionCheck;
  total: DeflectionCheck;
  /** Vertical displacement of every bottom-chord joint under the total load, mm (down +). */
  bottomChord: { joint: string; total: number; live: number }[];
}

/** The plate at one joint; `design` is absent when no catalog plate fits. */
export interface DesignPlate {
  joint: string;
  kind: PlateJointKind;
  design?: JointPlateDesign;
  ok: boolean;
  /** Why no plate fits, when none does. */
  message?: string;
}

/** Bearing check at one support: reaction on the bottom chord's narrow face. */
export interface DesignBearing {
  joint: string;
  /** Bottom-chord lumber id bearing on the support. */
  lumber: string;
  /** Bearing length along the chord, mm. */
  width: number;
  /** Envelope down reaction, N. */
  reaction: number;
  /** Bearing stress and Fc⊥′, MPa. */
  stress: number;
  capacity: number;
  ratio: number;
  pass: boolean;
}

/** The full design of one truss, SI (mm, N, N·mm, MPa). */
export interface TrussDesign {
  /** Joints of the analysed line model, mm. */
  joints: Joint[];
  /** Span out-to-out of bearings and rise of the analysed model, mm. */
  span: number;
  rise: number;
  /** Heel height as requested and as analysed (0: pointed line-model heel), mm. */
  heelHeight: { requested: number; analysed: number };
  members: DesignMember[];
  pieces: DesignPiece[];
  reactions: DesignReaction[];
  combinations: DesignCombination[];
  deflection: DesignDeflection;
  plates: DesignPlate[];
  /** True when the plates come from a demo catalog with invented values. */
  demoPlates: boolean;
  bearing: DesignBearing[];
  /** Chord shear and the other checks of `AdditionalChecks`. */
  additional: AdditionalChecks;
  /** Things that fail or need attention (failing checks, ignored input); empty when all is well. */
  warnings: string[];
  /** Assumptions made, in words. */
  notes: string[];
  /** The cautions every screen, quote and printout carries (DESIGN.md §4.6). */
  cautions: string[];
  engineVersion: string;
  /** Ply-to-ply fastening per chord of a multi-ply girder (absent for one ply). */
  plyConnections?: PlyConnection[];
  /** Every member, bearing, deflection and plate check passes. */
  ok: boolean;
}
