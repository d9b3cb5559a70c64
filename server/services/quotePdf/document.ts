import PDFDocument from 'pdfkit';
import { FONTS } from './fonts';
import { rule, textAt } from './text';
import { COLORS, MARGIN, type Doc } from './theme';

/**
 * A buffered pdfkit document with the app's margins and Inter registered, and a promise of its
 * bytes once `doc.end()` is called. Shared by every printed document (quote, cut list).
 */
export function openDocument(options: {
  size: [number, number] | 'LETTER' | 'A4';
  layout?: 'portrait' | 'landscape';
  info: PDFKit.DocumentInfo;
  /** One margin all round (shop paper); the app's margins when absent. */
  margin?: number;
}): { doc: Doc; done: Promise<Buffer> } {
  const m = options.margin;
  const doc = new PDFDocument({
    size: options.size,
    layout: options.layout ?? 'portrait',
    margins:
      m === undefined
        ? { top: MARGIN.top, left: MARGIN.side, right: MARGIN.side, bottom: MARGIN.bottom }
        : { top: m, left: m, right: m, bottom: m },
    bufferPages: true,
    font: FONTS.regular,
    info: options.info,
  });
  for (const [name, path] of Object.entries(FONTS)) doc.registerFont(name, path);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  return { doc, done };
}

/** Where the footer sits: its side margin, its baseline's distance from the page foot. */
export interface FooterPlace {
  side: number;
  fromFoot: number;
  /** A thin rule above it (the desk's documents; shop paper has none). */
  rule: boolean;
}

const APP_FOOTER: FooterPlace = { side: MARGIN.side, fromFoot: 34, rule: true };

/** `left` and "Page n of N" on every page, inside the bottom margin. */
export function pageFooters(doc: Doc, left: string, place: FooterPlace = APP_FOOTER) {
  const range = doc.bufferedPageRange();
  for (let i = 0; i < range.count; i++) {
    doc.switchToPage(range.start + i);
    // Writing inside the margin must not start a new page.
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    const y = doc.page.height - place.fromFoot;
    const w = doc.page.width - 2 * place.side;
    if (place.rule) rule(doc, y - 8, COLORS.rule);
    textAt(doc, left, place.side, y, { size: 7.5, color: COLORS.faint, width: w * 0.7 });
    textAt(doc, `Page ${i + 1} of ${range.count}`, place.side, y, {
      size: 7.5,
      color: COLORS.faint,
      width: w,
      align: 'right',
    });
    doc.page.margins.bottom = bottom;
  }
}
