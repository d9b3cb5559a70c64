import { formatDate } from '../quotePdf/format';
import { paragraph, paragraphHeight, textAt } from '../quotePdf/text';
import { COLORS, type Doc } from '../quotePdf/theme';
import { drawGeometry } from '../shopDrawingPdf/drawing';
import { pageFooters, shopPdf } from '../shopPaper/pdf';
import { pdfTable, type PdfColumn } from '../shopPaper/pdfTable';
import {
  BODY,
  bulletsBlock,
  drawRows,
  drawStack,
  heading,
  HEADING_H,
  rowsBlock,
  rowsHeight,
  stackHeight,
  tableHeight,
  type Block,
  type Column,
} from './blocks';
import { drawExtras } from './extras';
import type { DesignDrawingSheet, Rows } from './sheet';

const M = 24;
const RIGHT_W = 296;
const GAP = 12;
const HEADER_H = 40;
const APPROVAL_H = 30;
/**
 * The drawing's height on the sheet: as tall as the facts leave room for, within min…max; a truss
 * with many members may go down to `tight` to stay on one sheet.
 */
const DRAWING_H = { tight: 90, min: 120, max: 210 };

/** A table under a heading, as a block. */
function tableBlock(title: string, columns: PdfColumn[], rows: string[][]): Block {
  return {
    height: () => HEADING_H + tableHeight(rows.length),
    draw: (doc, c) => {
      heading(doc, c, title);
      c.y = pdfTable(doc, c.x, c.y, columns, rows, c.bottom, () => newPage(doc), BODY);
    },
  };
}

function newPage(doc: Doc) {
  doc.addPage();
  return M;
}

/** Title block: the plant and its contacts, the order, the line and its review status. */
function titleBlock(s: DesignDrawingSheet): Block {
  const p = s.plant;
  const contact = [p.address, [p.phone, p.email].filter(Boolean).join(' · ')].filter(
    (v): v is string => Boolean(v),
  );
  const rows: Rows = [
    ['Order', s.order.number],
    ['Printed', formatDate(s.printedAt)],
    ['Builder', s.order.builder],
    ['Engine', `Spanwise engine ${s.engineVersion}`],
    ['Job', `${s.order.job}, ${s.order.jobAddress}`],
  ];
  const contactH = (doc: Doc, w: number) =>
    contact.reduce((h, line) => h + paragraphHeight(doc, line, w, { size: BODY }) + 1, 0);
  const statusH = (doc: Doc, w: number) =>
    paragraphHeight(doc, s.review.status, w - 12, { size: 7, font: 'medium' }) + 8;
  return {
    height: (doc, w) => 14 + contactH(doc, w) + 3 + rowsHeight(doc, rows, w) + statusH(doc, w) + 4,
    draw: (doc, c) => {
      textAt(doc, p.name, c.x, c.y, { font: 'bold', size: 11, width: c.w });
      c.y += 14;
      for (const line of contact) c.y = paragraph(doc, line, c.x, c.y, c.w, { size: BODY }) + 1;
      c.y += 3;
      drawRows(doc, c, rows);
      const h = statusH(doc, c.w);
      doc.rect(c.x, c.y + 2, c.w, h).fill(s.review.approved ? '#e8f3ec' : COLORS.noteBg);
      paragraph(doc, s.review.status, c.x + 6, c.y + 6, c.w - 12, {
        size: 7,
        font: 'medium',
        color: COLORS.text,
      });
      c.y += h + 4;
    },
  };
}

/** Signature lines for the reviewer who approves the sheet, at the foot of the column. */
function approval(doc: Doc, c: Column) {
  const y = Math.max(c.y + 16, c.bottom - APPROVAL_H + 16);
  const half = (c.w - 12) / 2;
  for (const [i, label] of ['Design reviewer (signature)', 'Date'].entries()) {
    const x = c.x + i * (half + 12);
    doc
      .moveTo(x, y)
      .lineTo(x + half, y)
      .lineWidth(0.5)
      .strokeColor(COLORS.text)
      .stroke();
    textAt(doc, label, x, y + 2, { size: 6, color: COLORS.muted });
  }
}

/** Mark, description and count over the drawing. */
function header(doc: Doc, s: DesignDrawingSheet, w: number) {
  textAt(doc, 'TRUSS DESIGN DRAWING', M, M, { font: 'medium', size: 7, color: COLORS.accent });
  textAt(doc, s.title.mark, M, M + 9, { font: 'bold', size: 18 });
  doc.font('bold').fontSize(18);
  const mw = doc.widthOfString(s.title.mark) + 10;
  textAt(doc, s.title.description, M + mw, M + 12, { font: 'medium', size: 9, width: w - mw });
  textAt(
    doc,
    `${s.title.quantity} · dimensions to panel points along the chords (centre lines), feet-inches-sixteenths; plates at their joints`,
    M + mw,
    M + 24,
    { size: 7, color: COLORS.muted, width: w - mw },
  );
}

function drawing(
  doc: Doc,
  s: DesignDrawingSheet,
  box: { x: number; y: number; w: number; h: number },
) {
  doc.rect(box.x, box.y, box.w, box.h).lineWidth(0.5).strokeColor(COLORS.rule).stroke();
  const map = drawGeometry(doc, s.geometry, {
    x: box.x + 8,
    y: box.y + 6,
    w: box.w - 16,
    h: box.h - 12,
  });
  drawExtras(doc, s.geometry, map, {
    overhangs: s.overhangs,
    heel: s.heights.heel,
    heelText: s.heights.heelText,
    overall: s.heights.overall,
    overallText: s.heights.overallText,
    bearings: s.reactions.map((r) => ({
      x: s.geometry.jointLabels.find((j) => j.text === r[0])?.at[0] ?? 0,
      label: `${r[0]}: ${r[1]} brg`,
    })),
    frame: [box.x + 3, box.x + box.w - 3],
  });
}

function memberColumns(w: number): PdfColumn[] {
  return [
    { title: 'Member', width: 38 },
    { title: 'Piece', width: 32 },
    { title: 'Lumber (size, species, grade)', width: w - 38 - 32 - 62 - 58 - 58 - 30 },
    { title: 'Length', width: 62, align: 'right' },
    { title: 'Max compr.', width: 58, align: 'right' },
    { title: 'Max tension', width: 58, align: 'right' },
    { title: 'CSI', width: 30, align: 'right' },
  ];
}

function jointColumns(w: number): PdfColumn[] {
  return [
    { title: 'Joint', width: 30 },
    { title: 'x from left', width: 46, align: 'right' },
    { title: 'y above brg', width: 46, align: 'right' },
    { title: 'Connector', width: 112 },
    { title: 'Plate size', width: 58 },
    { title: 'Plate position', width: w - 30 - 46 - 46 - 112 - 58 - 74 },
    // Teeth on a member, or the steel in tension, shear or both combined; and its ratio.
    { title: 'Governs', width: 74 },
  ];
}

/** The foot band: the cautions, and (when the sheet is full) the adjustments after them. */
interface FootBand {
  /** Each part with the height its paragraph takes. */
  parts: { title: string; text: string; height: number }[];
  height: number;
}

function footBand(doc: Doc, s: DesignDrawingSheet, fullW: number, adjustments: boolean): FootBand {
  const texts = [{ title: 'CAUTIONS', text: s.cautions.join('  •  ') }];
  if (adjustments)
    texts.push({ title: 'ADJUSTMENTS FOR CONDITIONS OF USE', text: s.adjustments.join('  •  ') });
  const parts = texts.map((t) => ({
    ...t,
    height: paragraphHeight(doc, t.text, fullW - 16, { size: BODY }),
  }));
  return { parts, height: parts.reduce((h, p) => h + p.height + 12, 8) };
}

/**
 * Where each block goes: the right column while a block fits, else under the tables (one block
 * across, more in two columns split where the heights come closest), and the drawing's height.
 */
function plan(doc: Doc, s: DesignDrawingSheet, adjustmentsInFoot: boolean) {
  const fullW = doc.page.width - 2 * M;
  const leftW = fullW - RIGHT_W - GAP;
  const band = footBand(doc, s, fullW, adjustmentsInFoot);
  const foot = doc.page.height - M - band.height - 6;
  const title = titleBlock(s);
  const right: Block[] = [
    rowsBlock('Geometry', s.criteria),
    rowsBlock('Design loads (confirm with the building designer)', s.loads),
    tableBlock(
      'Reactions and bearings',
      [
        { title: 'Jt', width: 26 },
        { title: 'Bearing', width: 50, align: 'right' },
        { title: 'Min. req.', width: 50, align: 'right' },
        { title: 'Down', width: 58, align: 'right' },
        { title: 'Uplift', width: 56, align: 'right' },
        { title: 'Horiz.', width: 56, align: 'right' },
      ],
      s.reactions,
    ),
    rowsBlock('Deflection', s.deflection),
  ];
  const flexible: Block[] = [
    rowsBlock('Connections', s.connections),
    bulletsBlock('Web compression and bracing', [s.webCompression, ...s.bracing]),
    ...(s.warnings.length ? [bulletsBlock('Warnings', s.warnings)] : []),
    ...(adjustmentsInFoot
      ? []
      : [bulletsBlock('Adjustments for conditions of use', s.adjustments, COLORS.muted)]),
  ];
  let rightRoom =
    foot - M - APPROVAL_H - title.height(doc, RIGHT_W) - stackHeight(doc, right, RIGHT_W);
  const under: Block[] = [];
  for (const b of flexible) {
    const h = b.height(doc, RIGHT_W);
    if (h <= rightRoom) {
      right.push(b);
      rightRoom -= h;
    } else under.push(b);
  }
  const halfW = (leftW - GAP) / 2;
  let split = under.length;
  if (under.length > 1) {
    let best = Infinity;
    for (let i = 1; i < under.length; i++) {
      const h = Math.max(
        stackHeight(doc, under.slice(0, i), halfW),
        stackHeight(doc, under.slice(i), halfW),
      );
      if (h < best) [best, split] = [h, i];
    }
  }
  const bandH =
    split < under.length
      ? Math.max(
          stackHeight(doc, under.slice(0, split), halfW),
          stackHeight(doc, under.slice(split), halfW),
        )
      : stackHeight(doc, under, leftW);
  const tablesH = tableHeight(s.members.length) + 2 + tableHeight(s.joints.length);
  const room = foot - (M + HEADER_H) - 8 - tablesH - bandH - 2;
  return { fullW, leftW, halfW, band, foot, title, right, under, split, room };
}

/**
 * One truss design drawing on one US Letter landscape sheet. Left: the drawing, members and
 * joints, then notes; right: title block and the facts; across the foot: the cautions. The facts
 * that do not fit the right column move under the tables (two columns there), and the drawing
 * takes the height that is left; a truss with many members moves the adjustments into the foot
 * band rather than onto a second sheet.
 */
function sheet(doc: Doc, s: DesignDrawingSheet) {
  let p = plan(doc, s, false);
  if (p.room < DRAWING_H.min) p = plan(doc, s, true);
  const { fullW, leftW, halfW, band, foot, title, right, under, split } = p;
  const top = M + HEADER_H;
  // No taller than the truss drawn across the full width needs.
  const b = s.geometry.bounds;
  const natural = ((b.maxY - b.minY) / (b.maxX - b.minX || 1)) * (leftW - 16) + 12;
  const drawingH = Math.min(DRAWING_H.max, natural, Math.max(DRAWING_H.tight, p.room));

  const first = doc.bufferedPageRange().start + doc.bufferedPageRange().count - 1;
  header(doc, s, leftW);
  drawing(doc, s, { x: M, y: top, w: leftW, h: drawingH });
  let y = top + drawingH + 8;
  y = pdfTable(doc, M, y, memberColumns(leftW), s.members, foot, () => newPage(doc), BODY);
  y = pdfTable(doc, M, y + 2, jointColumns(leftW), s.joints, foot, () => newPage(doc), BODY);
  const bandPage = doc.bufferedPageRange().start + doc.bufferedPageRange().count - 1;
  if (split < under.length) {
    drawStack(doc, { x: M, w: halfW, y, bottom: foot }, under.slice(0, split));
    doc.switchToPage(bandPage);
    drawStack(doc, { x: M + halfW + GAP, w: halfW, y, bottom: foot }, under.slice(split));
  } else drawStack(doc, { x: M, w: leftW, y, bottom: foot }, under);

  // The cautions (and maybe the adjustments) in a shaded band across the foot of the sheet.
  doc.switchToPage(first);
  doc.rect(M, foot + 6, fullW, band.height).fillAndStroke(COLORS.noteBg, COLORS.noteRule);
  let by = foot + 11;
  for (const part of band.parts) {
    textAt(doc, part.title, M + 8, by, { font: 'bold', size: 7 });
    paragraph(doc, part.text, M + 8, by + 9, fullW - 16, { size: BODY, color: COLORS.text });
    by += part.height + 12;
  }

  const c: Column = {
    x: doc.page.width - M - RIGHT_W,
    w: RIGHT_W,
    y: M,
    bottom: foot - APPROVAL_H,
  };
  drawStack(doc, c, [title, ...right]);
  c.bottom = foot;
  approval(doc, c);
}

/** A truss design drawing as a PDF: one US Letter landscape sheet per truss line. */
export function renderDesignDrawingPdf(sheets: DesignDrawingSheet[]): Promise<Buffer> {
  const first = sheets[0];
  const { doc, done } = shopPdf({
    size: 'LETTER',
    layout: 'landscape',
    margin: M,
    title: `Truss design drawing ${first.order.number} ${first.title.mark}`,
    author: first.plant.name,
  });
  sheets.forEach((s, i) => {
    if (i > 0) doc.addPage();
    sheet(doc, s);
  });
  pageFooters(
    doc,
    `${first.plant.name} · Truss design drawing · Order ${first.order.number} · Engine ${first.engineVersion}`,
    M,
  );
  doc.end();
  return done;
}
