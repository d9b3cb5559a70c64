import { formatDate } from '../quotePdf/format';
import { paragraph, paragraphHeight, textAt } from '../quotePdf/text';
import { COLORS, type Doc } from '../quotePdf/theme';
import { drawGeometry } from '../shopDrawingPdf/drawing';
import { pageFooters, shopPdf } from '../shopPaper/pdf';
import { pdfTable } from '../shopPaper/pdfTable';
import { drawExtras } from './extras';
import type { DesignDrawingSheet, Rows } from './sheet';

const M = 24;
const RIGHT_W = 236;
const GAP = 12;
const BODY = 6.5;

/** A column that flows to the next page (same x) when it runs out of room. */
interface Column {
  x: number;
  w: number;
  y: number;
}

function room(doc: Doc, c: Column, need: number) {
  const bottom = doc.page.height - M;
  if (c.y + need > bottom) {
    doc.addPage();
    c.y = M;
  }
}

function heading(doc: Doc, c: Column, text: string) {
  room(doc, c, 22);
  c.y += 4;
  textAt(doc, text.toUpperCase(), c.x, c.y, { font: 'bold', size: 7, color: COLORS.accent });
  c.y += 10;
}

/** Label/value rows: the label in a fixed left column, the value wrapped beside it. */
function rows(doc: Doc, c: Column, list: Rows, labelW = 78) {
  for (const [label, value] of list) {
    const h = paragraphHeight(doc, value, c.w - labelW, { size: BODY });
    room(doc, c, h + 2);
    textAt(doc, label, c.x, c.y, { size: BODY, color: COLORS.muted, width: labelW - 4 });
    c.y = paragraph(doc, value, c.x + labelW, c.y, c.w - labelW, {
      size: BODY,
      color: COLORS.text,
    });
    c.y += 1.5;
  }
}

function bullets(doc: Doc, c: Column, list: string[], color: string = COLORS.text) {
  for (const t of list) {
    const h = paragraphHeight(doc, t, c.w - 8, { size: BODY });
    room(doc, c, h + 2);
    textAt(doc, '•', c.x, c.y, { size: BODY });
    c.y = paragraph(doc, t, c.x + 8, c.y, c.w - 8, { size: BODY, color }) + 1.5;
  }
}

/** Title block: the plant and its contacts, the order, the line and its review status. */
function titleBlock(doc: Doc, s: DesignDrawingSheet, c: Column) {
  const p = s.plant;
  textAt(doc, p.name, c.x, c.y, { font: 'bold', size: 11, width: c.w });
  c.y += 14;
  const contact = [p.address, [p.phone, p.email].filter(Boolean).join(' · ')].filter(
    (v): v is string => Boolean(v),
  );
  for (const line of contact) c.y = paragraph(doc, line, c.x, c.y, c.w, { size: BODY }) + 1;
  c.y += 3;
  rows(doc, c, [
    ['Order', s.order.number],
    ['Job', `${s.order.job}, ${s.order.jobAddress}`],
    ['Builder', s.order.builder],
    ['Printed', formatDate(s.printedAt)],
    ['Engine', `Spanwise engine ${s.engineVersion}`],
  ]);
  const h = paragraphHeight(doc, s.review.status, c.w - 12, { size: 7, font: 'medium' }) + 8;
  doc.rect(c.x, c.y + 2, c.w, h).fill(s.review.approved ? '#e8f3ec' : COLORS.noteBg);
  paragraph(doc, s.review.status, c.x + 6, c.y + 6, c.w - 12, {
    size: 7,
    font: 'medium',
    color: COLORS.text,
  });
  c.y += h + 4;
}

/** Signature lines for the reviewer who approves the sheet. */
function approval(doc: Doc, c: Column) {
  room(doc, c, 28);
  c.y += 16;
  const half = (c.w - 12) / 2;
  for (const [i, label] of ['Design reviewer (signature)', 'Date'].entries()) {
    const x = c.x + i * (half + 12);
    doc
      .moveTo(x, c.y)
      .lineTo(x + half, c.y)
      .lineWidth(0.5)
      .strokeColor(COLORS.text)
      .stroke();
    textAt(doc, label, x, c.y + 2, { size: 6, color: COLORS.muted });
  }
  c.y += 12;
}

/** One truss design drawing (US Letter landscape): drawing and tables left, facts right. */
function sheet(doc: Doc, s: DesignDrawingSheet) {
  const pageW = doc.page.width;
  const leftW = pageW - 2 * M - RIGHT_W - GAP;
  const bottom = doc.page.height - M;

  // Heading over the drawing: mark, description and count.
  textAt(doc, 'TRUSS DESIGN DRAWING', M, M, { font: 'medium', size: 7, color: COLORS.accent });
  textAt(doc, s.title.mark, M, M + 9, { font: 'bold', size: 18 });
  doc.font('bold').fontSize(18);
  const mw = doc.widthOfString(s.title.mark) + 10;
  textAt(doc, s.title.description, M + mw, M + 12, {
    font: 'medium',
    size: 9,
    width: leftW - mw,
  });
  textAt(
    doc,
    `${s.title.quantity} · dimensions to panel points along the chords (centre lines), feet-inches-sixteenths; plates at their joints`,
    M + mw,
    M + 24,
    { size: 7, color: COLORS.muted, width: leftW - mw },
  );

  const box = { x: M, y: M + 40, w: leftW, h: 176 };
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
  });

  // Left, under the drawing: members (lumber per member), then joints (location and plates).
  const first = doc.bufferedPageRange().start + doc.bufferedPageRange().count - 1;
  const newPage = () => {
    doc.addPage();
    return M;
  };
  let y = box.y + box.h + 8;
  y = pdfTable(
    doc,
    M,
    y,
    [
      { title: 'Member', width: 38 },
      { title: 'Piece', width: 32 },
      { title: 'Lumber (size, species, grade)', width: leftW - 38 - 32 - 62 - 58 - 58 - 30 },
      { title: 'Length', width: 62, align: 'right' },
      { title: 'Max compr.', width: 58, align: 'right' },
      { title: 'Max tension', width: 58, align: 'right' },
      { title: 'CSI', width: 30, align: 'right' },
    ],
    s.members,
    bottom,
    newPage,
    BODY,
  );
  y = pdfTable(
    doc,
    M,
    y + 2,
    [
      { title: 'Joint', width: 30 },
      { title: 'x from left', width: 46, align: 'right' },
      { title: 'y above brg', width: 46, align: 'right' },
      { title: 'Connector', width: 112 },
      { title: 'Plate size', width: 58 },
      { title: 'Plate position', width: leftW - 30 - 46 - 46 - 112 - 58 - 74 },
      // Teeth on a member, or the steel in tension, shear or both combined; and its ratio.
      { title: 'Governs', width: 74 },
    ],
    s.joints,
    bottom,
    newPage,
    BODY,
  );

  // Left again, under the tables: adjustments, then the cautions at the foot of the sheet.
  const a: Column = { x: M, w: leftW, y };
  heading(doc, a, 'Adjustments for conditions of use');
  bullets(doc, a, s.adjustments, COLORS.muted);
  if (s.warnings.length) {
    heading(doc, a, 'Warnings');
    bullets(doc, a, s.warnings);
  }
  // The cautions in a shaded band at the foot of the sheet (on the next page when no room).
  const cautionText = s.cautions.join('  •  ');
  const cautionH = paragraphHeight(doc, cautionText, leftW - 16, { size: BODY }) + 22;
  const cy = Math.max(a.y + 4, bottom - cautionH);
  const at = cy + cautionH > bottom ? newPage() : cy;
  doc.rect(M, at, leftW, cautionH).fillAndStroke(COLORS.noteBg, COLORS.noteRule);
  textAt(doc, 'CAUTIONS', M + 8, at + 6, { font: 'bold', size: 7 });
  paragraph(doc, cautionText, M + 8, at + 16, leftW - 16, { size: BODY, color: COLORS.text });

  // Right column: title block and every other item of the list.
  doc.switchToPage(first);
  const c: Column = { x: pageW - M - RIGHT_W, w: RIGHT_W, y: M };
  titleBlock(doc, s, c);
  heading(doc, c, 'Geometry');
  rows(doc, c, s.criteria);
  heading(doc, c, 'Design loads (confirm with the building designer)');
  rows(doc, c, s.loads);
  heading(doc, c, 'Reactions and bearings');
  c.y = pdfTable(
    doc,
    c.x,
    c.y,
    [
      { title: 'Jt', width: 20 },
      { title: 'Bearing', width: 38, align: 'right' },
      { title: 'Min. req.', width: 38, align: 'right' },
      { title: 'Down', width: 48, align: 'right' },
      { title: 'Uplift', width: 46, align: 'right' },
      { title: 'Horiz.', width: 46, align: 'right' },
    ],
    s.reactions,
    bottom,
    () => {
      doc.addPage();
      return M;
    },
    BODY,
  );
  heading(doc, c, 'Deflection');
  rows(doc, c, s.deflection);
  heading(doc, c, 'Web compression and bracing');
  bullets(doc, c, [s.webCompression, ...s.bracing]);
  heading(doc, c, 'Connections');
  rows(doc, c, s.connections);
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
