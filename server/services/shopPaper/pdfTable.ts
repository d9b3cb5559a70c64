import { textAt, paragraph, paragraphHeight } from '../quotePdf/text';
import { COLORS, type Doc } from '../quotePdf/theme';

/** One column of a printed table. */
export interface PdfColumn {
  title: string;
  width: number;
  align?: 'left' | 'right';
}

/**
 * A table with a banded header, one line per row (texts cut with "…" to fit), starting a new page
 * (and repeating the header) when a row would pass `bottom`. Returns the y below the table.
 */
export function pdfTable(
  doc: Doc,
  x: number,
  y: number,
  columns: PdfColumn[],
  rows: string[][],
  bottom: number,
  newPage: () => number,
  size = 8.5,
): number {
  const width = columns.reduce((s, c) => s + c.width, 0);
  const ROW_H = Math.round(size * 1.6);
  const head = (at: number) => {
    doc.rect(x, at, width, ROW_H + 2).fill(COLORS.band);
    let cx = x;
    for (const c of columns) {
      textAt(doc, c.title, cx + 4, at + 4, {
        font: 'medium',
        size: size - 0.5,
        color: COLORS.muted,
        width: c.width - 8,
        align: c.align,
      });
      cx += c.width;
    }
    return at + ROW_H + 4;
  };
  let at = head(y);
  for (const r of rows) {
    if (at + ROW_H > bottom) at = head(newPage());
    let cx = x;
    r.forEach((cell, i) => {
      const c = columns[i];
      textAt(doc, cell, cx + 4, at + 2, {
        size,
        width: c.width - 8,
        align: c.align,
        tabular: c.align === 'right',
      });
      cx += c.width;
    });
    doc
      .moveTo(x, at + ROW_H)
      .lineTo(x + width, at + ROW_H)
      .lineWidth(0.4)
      .strokeColor(COLORS.rule)
      .stroke();
    at += ROW_H;
  }
  return at + 6;
}

/** A boxed list of cautions (DESIGN.md §4.6), on a new page when it does not fit. */
export function cautionsBox(
  doc: Doc,
  cautions: string[],
  x: number,
  y: number,
  width: number,
  bottom: number,
  newPage: () => number,
  compact = false,
): number {
  // Compact: one running paragraph, for sheets whose drawing takes most of the page.
  const text = cautions.map((c) => `•  ${c}`).join(compact ? '   ' : '\n');
  const h = paragraphHeight(doc, text, width - 20, { size: 8 }) + 30;
  const at = y + h > bottom ? newPage() : y;
  doc.rect(x, at, width, h).fillAndStroke(COLORS.noteBg, COLORS.noteRule);
  textAt(doc, 'Cautions', x + 10, at + 8, { font: 'bold', size: 9 });
  paragraph(doc, text, x + 10, at + 22, width - 20, { size: 8, color: COLORS.text });
  return at + h + 8;
}
