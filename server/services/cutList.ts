import { designInputSchema, toEngineInput } from '../../shared/api/design';
import type { CutListView, ShopOrder } from '../../shared/api/shop';
import { DESIGN_CAUTIONS, type PresentedDesign } from '../../shared/engine/design';
import { isEngineError } from '../../shared/engine/errors';
import { formatFeetInches, formatMm } from '../../shared/engine/format';
import {
  buildCutList,
  cutPieces,
  describeEnd,
  type CutEnd,
  type CutList,
  type CutListTruss,
  type TrussPieces,
} from '../../shared/engine/pieces';
import { generateProfile } from '../../shared/engine/profiles';
import { ENGINE_VERSION } from '../../shared/engine/version';
import { AppError } from '../errors';
import type { OrderLine } from '../models';

/** How the cut list is sorted, said on every page and export (common practice). */
export const CUT_LIST_ORDER =
  'By lumber size and grade (each cut in one run), then longest first so offcuts can serve shorter pieces (common practice).';

/**
 * Every piece of one stored design as the shop cuts it (pieces and outlines, mm): the design's
 * line model (with the heel it was analysed with) and the lumber the reviewer approved for each
 * piece. A design whose lumber does not fit its line model answers 409 naming the truss.
 */
export function cutStoredDesign(line: {
  mark: string;
  designInput: unknown;
  designResult: unknown;
}): TrussPieces {
  const input = toEngineInput(designInputSchema.parse(line.designInput));
  const result = line.designResult as PresentedDesign;
  const pointed = result.heelHeight.analysed.value === 0;
  const profile = generateProfile({
    ...input.profile,
    heelHeight: pointed ? 0 : input.profile.heelHeight,
  });
  const lumber = Object.fromEntries(result.pieces.map((p) => [p.mark, p.lumber]));
  try {
    return cutPieces(profile, lumber);
  } catch (e) {
    if (isEngineError(e)) throw new AppError(409, e.code, `Truss ${line.mark}: ${e.message}`);
    throw e;
  }
}

/** The pieces of one approved line as the shop cuts them, with its trusses and plies. */
export function lineTruss(line: OrderLine): CutListTruss {
  return {
    mark: line.mark,
    quantity: line.quantity,
    plies: line.plies,
    pieces: cutStoredDesign(line).pieces,
  };
}

/** The order's cut list as the engine builds it (mm): what the saw cuts and the lumber plan plans. */
export const orderCutList = (lines: readonly OrderLine[]): CutList =>
  buildCutList(lines.map(lineTruss));

const round = (v: number, places: number) => Number(v.toFixed(places));

/**
 * The order's cut list in its units (the first line's): imperial lengths in inches with
 * feet-inches-sixteenths text, metric in mm. Every line must be approved (the caller checks).
 */
export function computeCutList(
  order: ShopOrder,
  lines: readonly OrderLine[],
  list: CutList = orderCutList(lines),
): CutListView {
  const units =
    (lines[0]?.designInput as { units?: string } | undefined)?.units === 'metric'
      ? 'metric'
      : 'imperial';
  const imperial = units === 'imperial';
  const length = (mm: number) =>
    imperial
      ? { value: round(mm / 25.4, 4), text: formatFeetInches(mm) }
      : { value: Math.round(mm), text: formatMm(mm) };
  const end = (e: CutEnd) => ({
    joint: e.joint,
    site: e.site,
    kind: e.kind,
    angles: e.angles.map((a) => round(a, 1)),
    ...(e.point !== undefined && {
      point: imperial ? round(e.point / 25.4, 3) : Math.round(e.point),
    }),
    text: describeEnd(e),
  });
  return {
    order,
    units,
    sortedBy: CUT_LIST_ORDER,
    groups: list.groups.map((g) => ({
      lumber: g.lumber,
      label: g.label,
      quantity: g.quantity,
      totalLength: imperial
        ? `${Math.round(g.totalLength / 304.8).toLocaleString('en-US')} ft`
        : `${(g.totalLength / 1000).toFixed(1)} m`,
      rows: g.rows.map((r) => ({
        mark: r.mark,
        truss: r.truss,
        piece: r.piece,
        role: r.role,
        length: length(r.length),
        ends: [end(r.ends[0]), end(r.ends[1])],
        referenceEdge: r.referenceEdge,
        notes: r.notes,
        perTruss: r.perTruss,
        trusses: r.trusses,
        plies: r.plies,
        quantity: r.quantity,
      })),
    })),
    quantity: list.quantity,
    engineVersion: ENGINE_VERSION,
    designEngineVersions: [...new Set(lines.map((l) => l.engineVersion))].sort(),
    cautions: [...DESIGN_CAUTIONS],
    computedAt: new Date().toISOString(),
  };
}

const CSV_HEADER = [
  'Lumber',
  'Mark',
  'Truss',
  'Piece',
  'Quantity',
  'Per truss',
  'Trusses',
  'Plies',
  'Length',
  'Length value',
  'First end',
  'Second end',
  'Notes',
];

const csvCell = (v: string | number) => {
  const s = String(v);
  // Quote anything with a separator, quote or line break; a leading =, +, - or @ is kept as
  // text so a spreadsheet never runs it as a formula.
  const safe = /^[=+\-@]/.test(s) ? `'${s}` : s;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
};

/** The cut list as CSV (RFC 4180, CRLF), one row per distinct piece. */
export function cutListCsv(view: CutListView): string {
  const unit = view.units === 'imperial' ? 'in' : 'mm';
  const header = CSV_HEADER.map((h) => (h === 'Length value' ? `Length (${unit})` : h));
  const rows = view.groups.flatMap((g) =>
    g.rows.map((r) =>
      [
        g.label,
        r.mark,
        r.truss,
        r.piece,
        r.quantity,
        r.perTruss,
        r.trusses,
        r.plies,
        r.length.text,
        r.length.value,
        r.ends[0].text,
        r.ends[1].text,
        r.notes.join(' '),
      ]
        .map(csvCell)
        .join(','),
    ),
  );
  return [header.join(','), ...rows].join('\r\n') + '\r\n';
}
