/**
 * Stage 1: lay each profile piece out as a board of real lumber. A board is a straight strip
 * along its piece's design line, as deep as the lumber's dressed width, placed the way the trade
 * lays trusses out (common practice): a top chord with its top edge on the design line, a bottom
 * chord with its bottom edge on it, webs centred on their panel points, and a vertical at either
 * end of the truss flush with the end (its outside face on the line). The strip starts far longer
 * than the piece; the truss ends (tail, heel and bearing cuts) are cut here, the joints in stage 2.
 */
import { EngineError } from '../errors';
import { dressedSize } from '../lumber/sizes';
import { parseLumberId } from '../lumber/ids';
import type { Piece, TrussProfile } from '../profiles/types';
import { clip, sideOf, type HalfPlane, type Ring } from './polygon';
import type { EndSite, PieceLumber, XY } from './types';

/** A piece as a board: its line, its strip across that line and its outline so far. */
export interface Board {
  piece: Piece;
  lumber: string;
  /** Joints along the piece, first to last (left to right; bottom to top for a vertical). */
  joints: string[];
  /** Design-line ends: the first and last joint, mm. */
  start: XY;
  end: XY;
  /** Unit vector along the piece and its left normal. */
  u: XY;
  n: XY;
  /** Distance between its end joints along the line, mm. */
  span: number;
  /** The strip: t (along n from the line) from `t0` to `t1`; depth = t1 − t0. */
  t0: number;
  t1: number;
  /** Who cuts whom at a joint: the higher runs through, the lower is cut to it; equals mitre. */
  rank: number;
  /** True for a vertical at either end of the truss. */
  endVertical: boolean;
  /** Where each end sits (first joint, last joint). */
  sites: [EndSite, EndSite];
  ring: Ring;
}

/** Ranks (common practice): chords run through webs, verticals through diagonals; a top chord over a bottom chord at a heel. */
const RANK = { topChord: 4, bottomChord: 3, endVertical: 2, vertical: 1.5, web: 1 } as const;

/** How far the uncut strip reaches past each end joint, mm: beyond any cut at a 3° joint. */
const REACH = 100_000;

/** Depth (dressed width) of a lumber id, mm. */
export const lumberDepth = (lumber: string): number =>
  dressedSize(parseLumberId(lumber).size).width;

/** The joints of a piece in order along it. */
const pieceJoints = (profile: TrussProfile, piece: Piece): string[] => {
  const byId = new Map(profile.members.map((m) => [m.id, m]));
  const members = piece.members.map((id) => byId.get(id)!);
  if (members.length === 1) return [members[0].from, members[0].to];
  const first = members[0];
  const second = members[1];
  const shared = [second.from, second.to];
  const chain = shared.includes(first.to) ? [first.from, first.to] : [first.to, first.from];
  for (const m of members.slice(1)) chain.push(m.from === chain[chain.length - 1] ? m.to : m.from);
  return chain;
};

/** Lays out every profile piece as a board with its truss-end cuts (stage 1). */
export const layBoards = (profile: TrussProfile, lumber: PieceLumber): Board[] => {
  const at = new Map(profile.joints.map((j) => [j.id, [j.x, j.y] as XY]));
  const { span, overhangLeft, overhangRight } = profile.params;
  const top = profile.topChordJoints;
  const bottom = profile.bottomChordJoints;
  const leftEnds = new Set([top[0], bottom[0]]);
  const rightEnds = new Set([top[top.length - 1], bottom[bottom.length - 1]]);

  return profile.pieces.map((piece) => {
    const id = lumber[piece.id];
    if (!id)
      throw new EngineError('invalid', `No lumber given for piece ${piece.id}.`, {
        piece: piece.id,
      });
    const depth = lumberDepth(id);
    let joints = pieceJoints(profile, piece);
    let [start, end] = [at.get(joints[0])!, at.get(joints[joints.length - 1])!];
    // Left to right, or bottom to top for a vertical, so a piece reads the same way as the truss.
    if (end[0] < start[0] - 1e-6 || (Math.abs(end[0] - start[0]) <= 1e-6 && end[1] < start[1])) {
      joints = [...joints].reverse();
      [start, end] = [end, start];
    }
    const length = Math.hypot(end[0] - start[0], end[1] - start[1]);
    const u: XY = [(end[0] - start[0]) / length, (end[1] - start[1]) / length];
    const n: XY = [-u[1], u[0]];
    const vertical = piece.role === 'web' && Math.abs(u[0]) < 1e-9;
    const endVertical = vertical && (Math.abs(start[0]) < 1e-6 || Math.abs(start[0] - span) < 1e-6);

    // The strip across the line: t along n (n points up for a chord drawn left to right).
    let t0: number;
    if (piece.role === 'topChord') t0 = n[1] > 0 ? -depth : 0;
    else if (piece.role === 'bottomChord') t0 = n[1] > 0 ? 0 : -depth;
    else if (endVertical) t0 = n[0] * (span / 2 - start[0]) > 0 ? 0 : -depth;
    else t0 = -depth / 2;
    const t1 = t0 + depth;

    const rank =
      piece.role === 'web'
        ? endVertical
          ? RANK.endVertical
          : vertical
            ? RANK.vertical
            : RANK.web
        : RANK[piece.role];

    const point = (s: number, t: number): XY => [
      start[0] + s * u[0] + t * n[0],
      start[1] + s * u[1] + t * n[1],
    ];
    let ring: Ring = [
      point(-REACH, t0),
      point(length + REACH, t0),
      point(length + REACH, t1),
      point(-REACH, t1),
    ];

    // The truss ends: a tail ends in a plumb cut at the overhang; a chord without one ends plumb
    // over the outside of the bearing, and a top chord is cut off along the bearing line too.
    const cuts: HalfPlane[] = [];
    const sites: [EndSite, EndSite] = ['panelPoint', 'panelPoint'];
    const first = joints[0];
    const last = joints[joints.length - 1];
    if (piece.role !== 'web') {
      if (leftEnds.has(first)) {
        const tail = piece.role === 'topChord' && overhangLeft > 0;
        cuts.push(sideOf([tail ? -overhangLeft : 0, 0], [1, 0], [span, 0]));
        if (piece.role === 'topChord' && !tail) cuts.push({ a: 0, b: 1, c: 0 });
        sites[0] = tail ? 'tail' : 'heel';
      }
      if (rightEnds.has(last)) {
        const tail = piece.role === 'topChord' && overhangRight > 0;
        cuts.push(sideOf([tail ? span + overhangRight : span, 0], [1, 0], [0, 0]));
        if (piece.role === 'topChord' && !tail) cuts.push({ a: 0, b: 1, c: 0 });
        sites[1] = tail ? 'tail' : 'heel';
      }
      const splices = piece.spliceAt ?? [];
      if (splices.includes(first)) sites[0] = 'splice';
      if (splices.includes(last)) sites[1] = 'splice';
      if (sites[0] === 'panelPoint') sites[0] = 'peak';
      if (sites[1] === 'panelPoint') sites[1] = 'peak';
    }
    for (const h of cuts) ring = clip(ring, h);

    return {
      piece,
      lumber: id,
      joints,
      start,
      end,
      u,
      n,
      span: length,
      t0,
      t1,
      rank,
      endVertical,
      sites,
      ring,
    };
  });
};
