import PDFDocument from 'pdfkit';
import { FONTS } from '../quotePdf/fonts';
import type { Doc } from '../quotePdf/theme';

/** Page size and margins of one shop document, in points (72 per inch). */
export interface ShopPdfOptions {
  size: [number, number] | 'LETTER' | 'A4';
  layout?: 'portrait' | 'landscape';
  margin: number;
  title: string;
  author: string;
}

/**
 * A pdfkit document with the app's own fonts (Inter from @fontsource, as the quote) and a
 * promise of its bytes once `doc.end()` is called.
 */
export function shopPdf(o: ShopPdfOptions): { doc: Doc; done: Promise<Buffer> } {
  const doc = new PDFDocument({
    size: o.size,
    layout: o.layout ?? 'portrait',
    margin: o.margin,
    bufferPages: true,
    autoFirstPage: true,
    font: FONTS.regular,
    info: { Title: o.title, Author: o.author },
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

/** "Page n of N" and a left text on every page, inside the bottom margin. */
export function pageFooters(doc: Doc, left: string, margin: number, color = '#8a929c') {
  const range = doc.bufferedPageRange();
  for (let i = 0; i < range.count; i++) {
    doc.switchToPage(range.start + i);
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0; // writing inside the margin must not start a page
    const y = doc.page.height - margin + 14;
    const w = doc.page.width - 2 * margin;
    doc.font('regular').fontSize(7.5).fillColor(color);
    doc.text(left, margin, y, { lineBreak: false, width: w * 0.7 });
    const right = `Page ${i + 1} of ${range.count}`;
    doc.text(right, margin + w - doc.widthOfString(right), y, { lineBreak: false });
    doc.page.margins.bottom = bottom;
  }
}
