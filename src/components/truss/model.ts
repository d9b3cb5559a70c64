import type { Joint } from '../../../shared/engine/analysis/types';
import type { MemberRole, TrussProfile } from '../../../shared/engine/profiles/types';

/** A member as the drawing shows it; results are absent while only the geometry is known. */
export interface DrawingMember {
  id: string;
  from: string;
  to: string;
  role: MemberRole;
  /** Piece mark of the lumber that carries it, e.g. "TC1". */
  piece?: string;
  /** Lumber id, e.g. "2x4 SPF-1/2". */
  lumber?: string;
  /** Axial force of the governing combination, N, tension positive. */
  force?: number;
  csi?: number;
  combination?: string;
  check?: string;
  braced?: boolean;
}

/** A top-chord cantilever beyond a heel, outside the axial model. */
export interface DrawingOverhang {
  side: 'left' | 'right';
  heelJoint: string;
  /** Horizontal projection, mm. */
  horizontal: number;
  /** The top-chord member it continues; the cantilever runs along that member's line. */
  member: string;
}

/** Everything the truss drawing needs, in mm with y up (bearings on y = 0). */
export interface DrawingModel {
  joints: Joint[];
  members: DrawingMember[];
  supports: { joint: string; type: 'pin' | 'roller' }[];
  overhangs: DrawingOverhang[];
  span: number;
  rise: number;
  /** Rise per 12 of the top chord; absent for flat trusses. */
  pitch?: number;
  /** Requested heel height, mm. */
  heelHeight: number;
  /** Point loads to mark with an arrow: where they act on the chord (mm) and their value. */
  pointLoads?: { x: number; y: number; chord: 'top' | 'bottom'; text: string }[];
}

/** The geometry-only drawing of a generated profile (no forces yet). */
export function drawingFromProfile(profile: TrussProfile): DrawingModel {
  const pieceOf = new Map<string, string>();
  for (const piece of profile.pieces) for (const m of piece.members) pieceOf.set(m, piece.id);
  return {
    joints: profile.joints,
    members: profile.members.map((m) => ({
      id: m.id,
      from: m.from,
      to: m.to,
      role: m.role,
      piece: pieceOf.get(m.id),
    })),
    supports: profile.supports.map((s) => ({ joint: s.joint, type: s.type })),
    overhangs: profile.overhangs.map((o) => ({
      side: o.side,
      heelJoint: o.heelJoint,
      horizontal: o.horizontal,
      member: o.member,
    })),
    span: profile.params.span,
    rise: profile.rise,
    pitch: profile.params.kind === 'flat' ? undefined : profile.params.pitch,
    heelHeight: profile.params.heelHeight,
  };
}
