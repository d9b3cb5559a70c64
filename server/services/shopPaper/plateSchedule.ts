import type {
  JointPlateRow,
  PlateCount,
  PlateSchedule,
  PlateSize,
} from '../../../shared/api/shopPaper';
import { ENGINE_VERSION } from '../../../shared/engine/version';
import { computeDesign } from '../design';
import type { DesignRules } from '../../../shared/api/plant';
import { PLATES_PER_JOINT } from '../pricing';
import { shortLengthText, type ShopLine, type ShopOrderPaper } from './lines';

/**
 * The counting rule. Plates go on both faces of every joint (DESIGN.md §4.5); a multi-ply girder
 * is built as its plies, each assembled and plated on both faces on the table like a single
 * truss, then fastened together as the drawing says (common practice) — so plates per joint =
 * 2 × plies, and per line × quantity (the number of girders or trusses ordered).
 */
export const PLATE_RULE =
  'Two plates per joint (one on each face) on every ply: a multi-ply girder is plated ply by ' +
  'ply, then its plies are fastened together per the drawing. Line count = joints × 2 × plies × ' +
  'trusses.';

// Slides smaller than this (1/32 in) print as centred.
const CENTRED_MM = 25.4 / 32;

type Position = { angleDeg: number; offset: number };

/**
 * Plate positions of a stored design. Designs stored before positions were kept are recomputed
 * by the engine of the same version (deterministic), and a position is used only where the
 * recomputed plate is the stored one; otherwise the position is unknown (null).
 */
function positions(line: ShopLine): Map<string, Position | null> {
  const stored = new Map<string, Position | null>();
  for (const p of line.design.plates) {
    stored.set(
      p.joint,
      p.angleDeg !== undefined && p.offset !== undefined
        ? { angleDeg: p.angleDeg, offset: p.offset }
        : null,
    );
  }
  if (![...stored.values()].includes(null) || line.engineVersion !== ENGINE_VERSION) return stored;
  try {
    // Recomputed with the rules the stored design was made with (recorded beside its result).
    const rules = (line.design as { designRules?: DesignRules }).designRules;
    const again = computeDesign(line.designInput, { plies: line.plies }, undefined, rules).result;
    for (const p of again.plates) {
      const was = line.design.plates.find((s) => s.joint === p.joint);
      if (stored.get(p.joint) === null && was?.plate === p.plate && p.angleDeg !== undefined)
        stored.set(p.joint, { angleDeg: p.angleDeg, offset: p.offset ?? 0 });
    }
  } catch {
    // An input the current schema refuses keeps its positions unknown.
  }
  return stored;
}

const sizeOf = (p: ShopLine['design']['plates'][number]): PlateSize | null =>
  p.plate && p.gauge !== undefined && p.widthIn !== undefined && p.lengthIn !== undefined
    ? { plate: p.plate, gauge: p.gauge, widthIn: p.widthIn, lengthIn: p.lengthIn }
    : null;

/** Each joint's plate of one truss mark, with its position relative to the joint. */
export function jointPlateRows(line: ShopLine): JointPlateRow[] {
  const design = line.design;
  const at = positions(line);
  const rows: JointPlateRow[] = [];
  for (const p of design.plates) {
    const size = sizeOf(p);
    if (!size) continue; // an approved design plates every joint; nothing to pick otherwise
    const pos = at.get(p.joint) ?? null;
    const mmPerUnit = design.units.length === 'mm' ? 1 : 25.4;
    let dx = null;
    let dy = null;
    let position = 'Position not stored: centre on the joint and check the design drawing';
    if (pos) {
      const a = (pos.angleDeg * Math.PI) / 180;
      // The slide is square to the length axis: the axis turned +90°.
      const x = -pos.offset * Math.sin(a) + 0;
      const y = pos.offset * Math.cos(a) + 0;
      const r = (v: number) => Math.round(v * 1000) / 1000 + 0;
      dx = { value: r(x), text: shortLengthText(design, Math.abs(x)) };
      dy = { value: r(y), text: shortLengthText(design, Math.abs(y)) };
      const parts = [
        Math.abs(x) * mmPerUnit >= CENTRED_MM ? `${dx.text} ${x < 0 ? 'left' : 'right'}` : '',
        Math.abs(y) * mmPerUnit >= CENTRED_MM ? `${dy.text} ${y < 0 ? 'down' : 'up'}` : '',
      ].filter(Boolean);
      position = parts.length ? `Centre ${parts.join(', ')} of the joint` : 'Centred on the joint';
    }
    rows.push({
      ...size,
      joint: p.joint,
      kind: p.kind,
      faces: PLATES_PER_JOINT,
      angleDeg: pos ? pos.angleDeg : null,
      dx,
      dy,
      position,
    });
  }
  return rows;
}

/** Largest plates first (by area), then by id, so the rack is walked in one order. */
const byRack = (a: PlateSize, b: PlateSize) =>
  b.widthIn * b.lengthIn - a.widthIn * a.lengthIn || a.plate.localeCompare(b.plate);

/** Count plates by size: each row stands for `times` plates. */
export function countPlates(rows: { size: PlateSize; times: number }[]): PlateCount[] {
  const by = new Map<string, PlateCount>();
  for (const { size, times } of rows) {
    const c = by.get(size.plate) ?? { ...size, count: 0 };
    c.count += times;
    by.set(size.plate, c);
  }
  return [...by.values()].sort(byRack);
}

const sizeOnly = ({ plate, gauge, widthIn, lengthIn }: PlateSize): PlateSize => ({
  plate,
  gauge,
  widthIn,
  lengthIn,
});

/**
 * The plate schedule of an order: per truss mark each joint's plate and the plates of one truss
 * and of the line; per order the totals by plate to pick from the rack (PLATE_RULE).
 */
export function plateSchedule(paper: ShopOrderPaper): PlateSchedule {
  const marks = paper.lines.map((line) => {
    const joints = jointPlateRows(line);
    const perTruss = countPlates(
      joints.map((j) => ({ size: sizeOnly(j), times: j.faces * line.plies })),
    );
    return {
      lineId: line.id,
      mark: line.mark,
      description: line.description,
      quantity: line.quantity,
      plies: line.plies,
      joints,
      perTruss,
      line: perTruss.map((c) => ({ ...c, count: c.count * line.quantity })),
    };
  });
  const totals = countPlates(
    marks.flatMap((m) => m.line.map((c) => ({ size: sizeOnly(c), times: c.count }))),
  );
  return {
    order: paper.order,
    rule: PLATE_RULE,
    marks,
    totals,
    totalPlates: totals.reduce((s, c) => s + c.count, 0),
    demoPlates: paper.lines.some((l) => l.design.demoPlates),
    cautions: paper.lines[0]?.design.cautions ?? [],
  };
}

/** The schedule as CSV: one row per joint plate, then the order's totals (RFC 4180 quoting). */
export function plateScheduleCsv(s: PlateSchedule): string {
  const q = (v: string | number | null) => {
    const t = v === null ? '' : String(v);
    return /[",\r\n]/.test(t) ? `"${t.replace(/"/g, '""')}"` : t;
  };
  const row = (cells: (string | number | null)[]) => cells.map(q).join(',');
  const out = [
    row([
      'section',
      'mark',
      'joint',
      'plate',
      'gauge',
      'width_in',
      'length_in',
      'faces',
      'plies',
      'per_truss',
      'trusses',
      'count',
      'angle_deg',
      'dx',
      'dy',
      'position',
    ]),
  ];
  for (const m of s.marks) {
    for (const j of m.joints) {
      const perTruss = j.faces * m.plies;
      out.push(
        row([
          'joint',
          m.mark,
          j.joint,
          j.plate,
          j.gauge,
          j.widthIn,
          j.lengthIn,
          j.faces,
          m.plies,
          perTruss,
          m.quantity,
          perTruss * m.quantity,
          j.angleDeg,
          j.dx?.value ?? null,
          j.dy?.value ?? null,
          j.position,
        ]),
      );
    }
  }
  for (const t of s.totals) {
    out.push(
      row([
        'total',
        '',
        '',
        t.plate,
        t.gauge,
        t.widthIn,
        t.lengthIn,
        '',
        '',
        '',
        '',
        t.count,
        '',
        '',
        '',
        '',
      ]),
    );
  }
  return `${out.join('\r\n')}\r\n`;
}
