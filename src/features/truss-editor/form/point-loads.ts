import { POINT_LOAD_KINDS, type DesignInputDraft } from '../../../../shared/api/design';
import { formatFeetInches, isParseError, parseLength } from '../../../../shared/engine/format';
import { MM_PER_INCH } from '../../../../shared/engine/units';
import type { PointLoadRow, TrussFormErrors } from './values';

type Units = 'imperial' | 'metric';

/** A new row of the point-load table: a roof-live load on the bottom chord, empty values. */
export const newPointLoadRow = (): PointLoadRow => ({
  x: '',
  chord: 'bottom',
  dead: '',
  live: '',
  kind: 'roofLive',
});

/**
 * The point-load rows as request numbers (inches or mm, lb or kN). A row that cannot be read
 * puts its message, with its row number, under `pointLoads`; an empty table sends none.
 */
export function pointLoadsOf(
  rows: readonly PointLoadRow[],
  units: Units,
  errors: TrussFormErrors,
): Pick<DesignInputDraft, 'pointLoads'> {
  if (rows.length === 0) return {};
  const out: NonNullable<DesignInputDraft['pointLoads']> = [];
  rows.forEach((row, i) => {
    const fail = (message: string) => {
      errors.pointLoads ??= `Point load ${i + 1}: ${message}`;
    };
    const x = parseLength(row.x.trim(), units);
    if (row.x.trim() === '') return fail('enter its position from the left heel');
    if (isParseError(x)) return fail(x.error);
    const load = (text: string, label: string) => {
      if (text.trim() === '') return 0;
      const n = Number(text.trim());
      if (!Number.isFinite(n)) fail(`${label} must be a number`);
      return n;
    };
    out.push({
      x: Math.round((units === 'imperial' ? x / MM_PER_INCH : x) * 1e6) / 1e6,
      chord: row.chord,
      dead: load(row.dead, 'the dead load'),
      live: load(row.live, 'the live load'),
      kind: row.kind,
    });
  });
  return { pointLoads: out };
}

/** Stored point loads (user units) back as table rows; anything unreadable is left out. */
export function pointLoadRows(stored: unknown, units: Units): PointLoadRow[] {
  if (!Array.isArray(stored)) return [];
  return stored.flatMap((v): PointLoadRow[] => {
    const l = v as Record<string, unknown>;
    if (typeof l.x !== 'number') return [];
    const kind = POINT_LOAD_KINDS.find((k) => k === l.kind) ?? 'roofLive';
    return [
      {
        x: units === 'imperial' ? formatFeetInches(l.x * MM_PER_INCH) : String(Math.round(l.x)),
        chord: l.chord === 'top' ? 'top' : 'bottom',
        dead: typeof l.dead === 'number' ? String(l.dead) : '',
        live: typeof l.live === 'number' ? String(l.live) : '',
        kind,
      },
    ];
  });
}
