import { EngineError } from '../errors';
import type { TrussProfile } from '../profiles/types';
import { layBoards, type Board } from './boards';
import { readBoard } from './ends';
import { cutAtJoints } from './joints';
import { groupPieces } from './marks';
import { overlapArea, signedArea } from './polygon';
import type { PieceLumber, PieceOutline, TrussPieces, XY } from './types';

/** Overlap below this is floating-point noise along a shared edge, mm². */
const NOISE = 0.01;

/**
 * Boards that do not meet at a joint can still run into each other where the truss is too
 * shallow for the lumber (a raised heel on a steep scissor); such a truss cannot be built.
 */
const checkNoOverlap = (boards: Board[]): void => {
  for (let i = 0; i < boards.length; i++) {
    for (let j = i + 1; j < boards.length; j++) {
      if (overlapArea(boards[i].ring, boards[j].ring) > NOISE) {
        const [a, b] = [boards[i].piece.id, boards[j].piece.id];
        throw new EngineError(
          'geometry',
          `Pieces ${a} and ${b} run into each other with this lumber: the truss is too shallow ` +
            `there for boards this deep. Use a taller heel, a steeper pitch or shallower lumber.`,
          { pieces: [a, b] },
        );
      }
    }
  }
};

/**
 * Every piece of one truss as it is cut, from its line model and the lumber of each piece:
 * (1) lay each piece out as a board on its design line, cutting the truss ends; (2) cut the boards
 * where they meet at each joint; (3) read each board's long-point length and end cuts; (4) group
 * the same boards into distinct pieces with their marks and notes. Pure; mm and degrees.
 * Throws EngineError('geometry') when the lumber does not fit the line model (a raised heel too
 * low for its chords, a piece cut away entirely).
 */
export const cutPieces = (profile: TrussProfile, lumber: PieceLumber): TrussPieces => {
  const joints = new Map(profile.joints.map((j) => [j.id, [j.x, j.y] as XY]));
  const boards = layBoards(profile, lumber);
  cutAtJoints(boards, joints);
  const read = boards.map((board) => {
    if (board.ring.length < 3 || signedArea(board.ring) < 1) {
      throw new EngineError(
        'geometry',
        `Piece ${board.piece.id} has no room between the pieces around it with this lumber: ` +
          `the truss is too shallow there for boards this deep. Use a raised heel tall enough ` +
          `for its chords, a steeper pitch (less bottom-chord pitch on a scissor) or shallower lumber.`,
        { piece: board.piece.id },
      );
    }
    return { board, read: readBoard(board) };
  });
  checkNoOverlap(boards);
  const { pieces, markOf } = groupPieces(read);
  const outlines = boards.map((b): PieceOutline => ({
    piece: b.piece.id,
    mark: markOf.get(b.piece.id)!,
    role: b.piece.role,
    lumber: b.lumber,
    polygon: b.ring.map(([x, y]): XY => [x, y]),
    members: [...b.piece.members],
    joints: [...b.joints],
  }));
  return { pieces, outlines };
};
