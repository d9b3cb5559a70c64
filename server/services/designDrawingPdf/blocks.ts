import { paragraph, paragraphHeight, textAt } from '../quotePdf/text';
import { COLORS, type Doc } from '../quotePdf/theme';
import type { Rows } from './sheet';

/** Body text size of the sheet. */
export const BODY = 6.5;
/** Height a block's heading takes. */
export const HEADING_H = 14;
const LABEL_W = 66;

/** A column of the sheet: blocks stack down it from `y`. */
export interface Column {
  x: number;
  w: number;
  y: number;
  /** Lowest y a block may reach; a block that does not fit continues on a new page. */
  bottom: number;
}

/**
 * One titled block of facts: measured first (so the layout can choose where it goes and how
 * tall the drawing may be), then drawn.
 */
export interface Block {
  height: (doc: Doc, w: number) => number;
  draw: (doc: Doc, c: Column) => void;
}

function room(doc: Doc, c: Column, need: number) {
  if (c.y + need > c.bottom) {
    doc.addPage();
    c.y = doc.page.margins.top;
  }
}

/** A block's title in small accent capitals. */
export function heading(doc: Doc, c: Column, text: string) {
  room(doc, c, HEADING_H + 10);
  c.y += 4;
  textAt(doc, text.toUpperCase(), c.x, c.y, { font: 'bold', size: 7, color: COLORS.accent });
  c.y += HEADING_H - 4;
}

/** Label/value rows: the label in a fixed left column, the value wrapped beside it. */
function rowLines(doc: Doc, rows: Rows, w: number) {
  // Two short rows share a line (label, value | label, value); a long one takes the width.
  doc.font('regular').fontSize(BODY);
  const half = (w - 8) / 2;
  const short = ([label, value]: [string, string]) =>
    !value.includes('\n') &&
    doc.widthOfString(label) <= LABEL_W - 4 &&
    doc.widthOfString(value) <= half - LABEL_W;
  const lines: Rows[] = [];
  for (const r of rows) {
    const last = lines[lines.length - 1];
    if (short(r) && last?.length === 1 && short(last[0])) last.push(r);
    else lines.push([r]);
  }
  return { lines, half };
}

function rowsHeight(doc: Doc, rows: Rows, w: number) {
  const { lines } = rowLines(doc, rows, w);
  return lines.reduce(
    (h, line) =>
      h +
      (line.length === 2
        ? BODY * 1.5 + 1.5
        : paragraphHeight(doc, line[0][1], w - LABEL_W, { size: BODY }) + 1.5),
    0,
  );
}

function drawRows(doc: Doc, c: Column, rows: Rows) {
  const { lines, half } = rowLines(doc, rows, c.w);
  for (const line of lines) {
    if (line.length === 2) {
      room(doc, c, BODY * 1.5 + 1.5);
      line.forEach(([label, value], i) => {
        const x = c.x + i * (half + 8);
        textAt(doc, label, x, c.y, { size: BODY, color: COLORS.muted });
        textAt(doc, value, x + LABEL_W, c.y, { size: BODY });
      });
      c.y += BODY * 1.5 + 1.5;
      continue;
    }
    const [label, value] = line[0];
    room(doc, c, paragraphHeight(doc, value, c.w - LABEL_W, { size: BODY }) + 1.5);
    textAt(doc, label, c.x, c.y, { size: BODY, color: COLORS.muted, width: LABEL_W - 4 });
    c.y =
      paragraph(doc, value, c.x + LABEL_W, c.y, c.w - LABEL_W, { size: BODY, color: COLORS.text }) +
      1.5;
  }
}

const bulletsHeight = (doc: Doc, list: string[], w: number) =>
  list.reduce((h, t) => h + paragraphHeight(doc, t, w - 8, { size: BODY }) + 1.5, 0);

function drawBullets(doc: Doc, c: Column, list: string[], color: string) {
  for (const t of list) {
    room(doc, c, paragraphHeight(doc, t, c.w - 8, { size: BODY }) + 1.5);
    textAt(doc, '•', c.x, c.y, { size: BODY });
    c.y = paragraph(doc, t, c.x + 8, c.y, c.w - 8, { size: BODY, color }) + 1.5;
  }
}

/** A titled block of label/value rows. */
export const rowsBlock = (title: string, rows: Rows): Block => ({
  height: (doc, w) => HEADING_H + rowsHeight(doc, rows, w),
  draw: (doc, c) => {
    heading(doc, c, title);
    drawRows(doc, c, rows);
  },
});

/** A titled block of bulleted sentences. */
export const bulletsBlock = (
  title: string,
  list: string[],
  color: string = COLORS.text,
): Block => ({
  height: (doc, w) => HEADING_H + bulletsHeight(doc, list, w),
  draw: (doc, c) => {
    heading(doc, c, title);
    drawBullets(doc, c, list, color);
  },
});

/** Height of a `pdfTable` of `n` one-line rows at the sheet's body size. */
export const tableHeight = (n: number) => {
  const rowH = Math.round(BODY * 1.6);
  return rowH + 4 + n * rowH + 6;
};

/** Total height of blocks stacked in a column `w` wide. */
export const stackHeight = (doc: Doc, blocks: Block[], w: number) =>
  blocks.reduce((h, b) => h + b.height(doc, w), 0);

/** Draw blocks down a column. */
export function drawStack(doc: Doc, c: Column, blocks: Block[]) {
  for (const b of blocks) b.draw(doc, c);
}

export { drawRows, rowsHeight };
