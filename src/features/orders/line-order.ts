import type { LineSummary } from '../../../shared/api/orders';

/**
 * The order's line ids after moving `lineId` one place up (-1) or down (+1), for
 * `POST …/lines/reorder`, which takes every line id in the new order. `null` when the move is not
 * possible (first line up, last line down, unknown id), so the caller sends nothing.
 */
export function movedLineIds(
  lines: readonly Pick<LineSummary, 'id' | 'position'>[],
  lineId: number,
  step: -1 | 1,
): number[] | null {
  const ids = [...lines].sort((a, b) => a.position - b.position).map((line) => line.id);
  const from = ids.indexOf(lineId);
  const to = from + step;
  if (from < 0 || to < 0 || to >= ids.length) return null;
  [ids[from], ids[to]] = [ids[to], ids[from]];
  return ids;
}

/** Text of a line's design state: "Passes · max CSI 0.87", "Fails · 2 warnings". */
export function designStateText(
  line: Pick<LineSummary, 'designOk' | 'maxCsi' | 'warningCount'>,
): string {
  const parts = [line.designOk ? 'Passes' : 'Fails'];
  if (line.warningCount > 0) {
    parts.push(`${line.warningCount} warning${line.warningCount === 1 ? '' : 's'}`);
  }
  // CSI (combined stress index, demand / capacity) shown to two decimals, as the checks report it.
  if (line.maxCsi !== null) parts.push(`max CSI ${line.maxCsi.toFixed(2)}`);
  return parts.join(' · ');
}
