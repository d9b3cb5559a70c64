/**
 * An order's cut list: every distinct piece of every truss line, grouped by lumber, with the
 * quantity to cut (pieces per truss × trusses × plies). Sorted the way a saw operator works
 * (common practice): by lumber, so each size and grade is cut in one run, smallest size first;
 * then longest first, so the offcut of a long board can still serve a shorter piece.
 */
import { GRADE_DATA } from '../lumber/referenceValues';
import { parseLumberId } from '../lumber/ids';
import { LUMBER_SIZES } from '../lumber/sizes';
import type { CutEnd, CutPiece } from './types';
import type { MemberRole } from '../profiles/types';

/** One truss line of an order, with its pieces as cut (from `cutPieces`). */
export interface CutListTruss {
  /** Truss mark, e.g. "T1". */
  mark: string;
  /** Trusses of this line. */
  quantity: number;
  /** Plies per truss (each ply is a full set of pieces). */
  plies: number;
  pieces: CutPiece[];
}

/** One row of the cut list: one distinct piece and how many to cut. */
export interface CutListRow {
  /** Mark printed on the piece: truss mark and piece mark, e.g. "T1-W2". */
  mark: string;
  truss: string;
  piece: string;
  role: MemberRole;
  lumber: string;
  /** Long-point length rounded to 1/16 in, mm, and in sixteenths. */
  length: number;
  sixteenths: number;
  ends: [CutEnd, CutEnd];
  referenceEdge: string;
  notes: string[];
  perTruss: number;
  trusses: number;
  plies: number;
  /** perTruss × trusses × plies. */
  quantity: number;
  /** Profile pieces and analysis members the row stands for (per truss). */
  pieces: string[];
  members: string[];
}

/** The rows of one lumber size and grade. */
export interface CutListGroup {
  lumber: string;
  /** Human label, e.g. "2x4 SPF No.1/No.2". */
  label: string;
  rows: CutListRow[];
  /** Pieces to cut in this lumber, and their total long-point length (mm). */
  quantity: number;
  totalLength: number;
}

export interface CutList {
  groups: CutListGroup[];
  /** Pieces to cut in all. */
  quantity: number;
}

const sizeRank = (lumber: string): number => LUMBER_SIZES.indexOf(parseLumberId(lumber).size);

/** Same mark, lumber, length and cuts: the same piece (one row). */
const rowKey = (r: CutListRow) =>
  JSON.stringify([
    r.mark,
    r.lumber,
    r.sixteenths,
    r.ends.map((e) => [e.kind, e.angles.map((a) => a.toFixed(1))]),
  ]);

/** The order's cut list from its truss lines (pure). */
export const buildCutList = (trusses: readonly CutListTruss[]): CutList => {
  const rows = new Map<string, CutListRow>();
  for (const t of trusses) {
    for (const p of t.pieces) {
      const row: CutListRow = {
        mark: `${t.mark}-${p.mark}`,
        truss: t.mark,
        piece: p.mark,
        role: p.role,
        lumber: p.lumber,
        length: p.length,
        sixteenths: p.sixteenths,
        ends: p.ends,
        referenceEdge: p.referenceEdge,
        notes: p.notes,
        perTruss: p.perTruss,
        trusses: t.quantity,
        plies: t.plies,
        quantity: p.perTruss * t.quantity * t.plies,
        pieces: p.pieces,
        members: p.members,
      };
      const key = rowKey(row);
      const same = rows.get(key);
      if (same) {
        // The same truss mark on two lines: one row, the trusses added up.
        same.trusses += t.quantity;
        same.quantity += row.quantity;
      } else rows.set(key, row);
    }
  }
  const byLumber = new Map<string, CutListRow[]>();
  for (const r of rows.values()) byLumber.set(r.lumber, [...(byLumber.get(r.lumber) ?? []), r]);
  const groups = [...byLumber.entries()]
    .sort(([a], [b]) => sizeRank(a) - sizeRank(b) || a.localeCompare(b))
    .map(([lumber, list]): CutListGroup => {
      const sorted = list.sort(
        (a, b) =>
          b.sixteenths - a.sixteenths || a.mark.localeCompare(b.mark, 'en', { numeric: true }),
      );
      const { size, grade } = parseLumberId(lumber);
      return {
        lumber,
        label: `${size} ${GRADE_DATA[grade].label}`,
        rows: sorted,
        quantity: sorted.reduce((s, r) => s + r.quantity, 0),
        totalLength: sorted.reduce((s, r) => s + r.quantity * r.length, 0),
      };
    });
  return { groups, quantity: groups.reduce((s, g) => s + g.quantity, 0) };
};
