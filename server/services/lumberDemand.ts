/**
 * What an order asks of the saw, per lumber: every piece of every line's stored design (mark,
 * lumber, length) × trusses on the line × plies. This is the one place that decides the cut
 * lengths a lumber plan uses — today each piece's centre-line length from the design, rounded up
 * to the next 1/16 in; the exact long-point lengths of the cut outlines replace it here.
 */
import { MM_PER_INCH } from '../../shared/engine/units';
import type { OrderLine } from '../models';

/** One distinct piece to cut: mark, lumber id, length in mm, how many. */
export interface PieceDemandRow {
  mark: string;
  lumber: string;
  lengthMm: number;
  quantity: number;
}

interface StoredPiece {
  mark: string;
  lumber: string;
  length: { value: number } | number;
}

const SIXTEENTH_MM = MM_PER_INCH / 16;

/** Stored designs keep lengths in their own units (inches or mm): back to mm, up to 1/16 in. */
function pieceLengthMm(piece: StoredPiece, units: unknown): number {
  const value = typeof piece.length === 'number' ? piece.length : piece.length.value;
  const mm = units === 'metric' ? value : value * MM_PER_INCH;
  return Math.ceil(mm / SIXTEENTH_MM - 1e-6) * SIXTEENTH_MM;
}

/** The order's pieces by lumber, equal mark + lumber + length merged (line marks prefix piece marks). */
export function lumberDemand(lines: readonly OrderLine[]): Map<string, PieceDemandRow[]> {
  const rows = new Map<string, PieceDemandRow>();
  for (const line of lines) {
    const pieces = (line.designResult as { pieces?: StoredPiece[] }).pieces ?? [];
    const units = (line.designInput as { units?: unknown }).units;
    for (const p of pieces) {
      const lengthMm = pieceLengthMm(p, units);
      const mark = `${line.mark}-${p.mark}`;
      const key = `${p.lumber}|${mark}|${lengthMm.toFixed(4)}`;
      const row = rows.get(key) ?? { mark, lumber: p.lumber, lengthMm, quantity: 0 };
      row.quantity += line.quantity * Math.max(1, line.plies);
      rows.set(key, row);
    }
  }
  const byLumber = new Map<string, PieceDemandRow[]>();
  for (const row of rows.values()) {
    byLumber.set(row.lumber, [...(byLumber.get(row.lumber) ?? []), row]);
  }
  return new Map([...byLumber].sort(([a], [b]) => a.localeCompare(b)));
}
