/**
 * Stage 4: one truss's boards become its distinct cut pieces. Two boards are the same piece when
 * their lumber is the same and their outlines match in the board's own frame, allowing the board
 * to be turned end for end or face over (a mirror-image web of a symmetric truss is the same
 * piece). Each distinct piece takes the mark of the first board it stands for, and carries the
 * notes the saw operator needs.
 */
import type { Board } from './boards';
import { toSixteenths, type ReadBoard } from './ends';
import type { CutEnd, CutPiece, XY } from './types';

/** Two outlines are the same cut when every corner matches within this, mm (1/50 in). */
const SAME_WITHIN = 0.5;

/** The outline turned end for end and/or face over, centred across the board. */
const variants = (frame: XY[], length: number, middle: number): XY[][] => {
  const centred = frame.map(([s, t]): XY => [s, t - middle]);
  return [
    centred,
    centred.map(([s, t]): XY => [length - s, t]),
    centred.map(([s, t]): XY => [s, -t]),
    centred.map(([s, t]): XY => [length - s, -t]),
  ];
};

const sameCorners = (a: XY[], b: XY[]): boolean =>
  a.length === b.length &&
  a.every((p) =>
    b.some((q) => Math.abs(p[0] - q[0]) < SAME_WITHIN && Math.abs(p[1] - q[1]) < SAME_WITHIN),
  );

const SITE_WORDS: Record<CutEnd['site'], string> = {
  heel: 'Heel',
  tail: 'Tail',
  peak: 'Peak',
  splice: 'Splice',
  panelPoint: 'Panel point',
};

const degrees = (a: number) => `${a.toFixed(1)}°`;

/** A saw operator's line for one end, e.g. "Heel (A): single bevel 26.6°". */
export const describeEnd = (end: CutEnd): string => {
  const where = `${SITE_WORDS[end.site]} (${end.joint})`;
  if (end.kind === 'square') return `${where}: square cut`;
  const cut =
    end.kind === 'single' ? 'single bevel' : end.kind === 'double' ? 'double bevel' : 'cuts';
  return `${where}: ${cut} ${end.angles.map(degrees).join(' / ')}`;
};

const noteLines = (ends: [CutEnd, CutEnd], count: number): string[] => {
  const notes: string[] = [];
  for (const e of ends) {
    if (e.site === 'tail') notes.push('Tail: plumb cut for the fascia; mark the bearing line.');
    if (e.site === 'splice') notes.push(`Splice at ${e.joint}: butt tight; plated both faces.`);
    if (e.kind === 'double') notes.push('Double bevel: cut the longer face first.');
  }
  if (count > 1) notes.push('Mirror pieces: the same board turned over.');
  return notes;
};

const referenceWords = (b: Board): string =>
  b.piece.role === 'topChord'
    ? 'top edge'
    : b.piece.role === 'bottomChord'
      ? 'bottom edge'
      : 'near edge';

/** Groups read boards into distinct cut pieces (stage 4), in profile order. */
export const groupPieces = (
  boards: Array<{ board: Board; read: ReadBoard }>,
): { pieces: CutPiece[]; markOf: Map<string, string> } => {
  const groups: Array<{
    first: { board: Board; read: ReadBoard };
    marks: string[];
    members: string[];
  }> = [];
  for (const item of boards) {
    const { board, read } = item;
    const mine = variants(read.frame, read.length, (board.t0 + board.t1) / 2)[0];
    const group = groups.find(({ first }) => {
      if (first.board.lumber !== board.lumber || first.board.piece.role !== board.piece.role)
        return false;
      if (toSixteenths(first.read.length).sixteenths !== toSixteenths(read.length).sixteenths)
        return false;
      const theirs = variants(
        first.read.frame,
        first.read.length,
        (first.board.t0 + first.board.t1) / 2,
      );
      return theirs.some((v) => sameCorners(mine, v));
    });
    if (group) {
      group.marks.push(board.piece.id);
      group.members.push(...board.piece.members);
    } else groups.push({ first: item, marks: [board.piece.id], members: [...board.piece.members] });
  }
  const markOf = new Map<string, string>();
  const pieces = groups.map(({ first: { board, read }, marks, members }): CutPiece => {
    for (const m of marks) markOf.set(m, board.piece.id);
    const { length, sixteenths } = toSixteenths(read.length);
    return {
      mark: board.piece.id,
      pieces: marks,
      members,
      role: board.piece.role,
      lumber: board.lumber,
      length,
      sixteenths,
      ends: read.ends,
      perTruss: marks.length,
      referenceEdge: referenceWords(board),
      notes: noteLines(read.ends, marks.length),
    };
  });
  return { pieces, markOf };
};
