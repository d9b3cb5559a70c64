import { openDocument, pageFooters as footers } from '../quotePdf/document';
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
 * A pdfkit document with the app's own fonts (Inter from @fontsource, as the quote), one margin
 * all round, and a promise of its bytes once `doc.end()` is called.
 */
export function shopPdf(o: ShopPdfOptions): { doc: Doc; done: Promise<Buffer> } {
  return openDocument({
    size: o.size,
    layout: o.layout,
    margin: o.margin,
    info: { Title: o.title, Author: o.author },
  });
}

/** "Page n of N" and a left text on every page, inside the bottom margin. */
export function pageFooters(doc: Doc, left: string, margin: number) {
  footers(doc, left, { side: margin, fromFoot: margin - 14, rule: false });
}

/**
 * The writing area of a shop document with margin `m`: its width, the lowest y a row may reach
 * (`footRoom` above the margin) and a new page that returns the y to continue at.
 */
export function shopPage(doc: Doc, m: number, footRoom: number) {
  return {
    w: doc.page.width - 2 * m,
    bottom: doc.page.height - m - footRoom,
    newPage: () => {
      doc.addPage();
      return m;
    },
  };
}
