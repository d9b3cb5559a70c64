import type { MemberRole } from '../profiles/types';

/** A point in truss coordinates [x, y], mm (x along the span from the left bearing, y up). */
export type XY = [number, number];

/**
 * How one end of a piece is cut: square (90° to the edges), a single bevel (one cut at another
 * angle) or a double bevel (two cuts meeting at a point); `multiple` for three or more cuts.
 */
export type CutKind = 'square' | 'single' | 'double' | 'multiple';

/** Where an end sits in the truss, for the saw operator's notes. */
export type EndSite = 'heel' | 'tail' | 'peak' | 'splice' | 'panelPoint';

/** One end of a piece as cut. */
export interface CutEnd {
  /** The joint (panel point) this end sits at. */
  joint: string;
  site: EndSite;
  kind: CutKind;
  /**
   * Angle of each cut to the board's long edges, degrees (90 = square; a heel cut on a bottom
   * chord is the pitch angle), in order across the board from its reference edge.
   */
  angles: number[];
  /** Double bevel: distance of the point from the reference edge, mm. */
  point?: number;
}

/**
 * A distinct piece of one truss as the saw cuts it. Pieces of the same lumber, long-point length
 * (to 1/16 in) and end cuts are the same piece, even when they sit in mirror-image places.
 */
export interface CutPiece {
  /** Piece mark: the profile mark of the first piece it stands for, e.g. "W1". */
  mark: string;
  /** Profile piece marks it stands for, e.g. ["W1", "W4"]. */
  pieces: string[];
  /** Analysis members those pieces carry. */
  members: string[];
  role: MemberRole;
  /** Lumber id, e.g. "2x4 SPF-1/2". */
  lumber: string;
  /** Overall long-point length rounded to 1/16 in, mm. */
  length: number;
  /** The same length as a whole number of sixteenths of an inch. */
  sixteenths: number;
  /** The two ends, first the one nearer the left (or lower) end of the truss. */
  ends: [CutEnd, CutEnd];
  /** How many of this piece one truss (one ply) needs. */
  perTruss: number;
  /** What the reference edge is: "top edge" (top chord, on the design line), "bottom edge" … */
  referenceEdge: string;
  /** Notes for the saw operator. */
  notes: string[];
}

/** The outline of one profile piece in truss coordinates, for drawings. */
export interface PieceOutline {
  /** Profile piece mark (unique in the truss), e.g. "W4". */
  piece: string;
  /** Mark of the cut piece it is cut as (shared by identical pieces), e.g. "W1". */
  mark: string;
  role: MemberRole;
  lumber: string;
  /** Convex outline, counter-clockwise, mm. */
  polygon: XY[];
  /** Analysis members it carries. */
  members: string[];
  /** Joints along the piece, first to last. */
  joints: string[];
}

/** Every piece of one truss: distinct cut pieces and each profile piece's outline. */
export interface TrussPieces {
  pieces: CutPiece[];
  outlines: PieceOutline[];
}

/** Lumber per profile piece mark, e.g. { TC1: "2x4 SPF-1/2", W1: "2x4 SPF-3" }. */
export type PieceLumber = Readonly<Record<string, string>>;
