import type { QuoteSnapshot } from '../pricing';
import { acceptance, designCriteria } from './criteria';
import { drawTruss } from './drawing';
import { openDocument, pageFooters } from './document';
import { header, linesTable, notes, parties, totals, type PrintMeta } from './sections';
import { contentBottom, paragraph, textAt } from './text';
import { COLORS, MARGIN, type Doc } from './theme';

/** What printing needs of a stored quote revision. */
export interface PrintableQuote extends PrintMeta {
  snapshot: Record<string, unknown>;
}

const CARD_H = 158;
const CARD_GAP = 16;

/** One card per line: mark, quantity and description above the drawing, pitch and plies below. */
function drawings(doc: Doc, s: QuoteSnapshot, y: number, newPage: () => number) {
  const w = doc.page.width - 2 * MARGIN.side;
  const cardW = (w - CARD_GAP) / 2;
  let at = y + 24 + CARD_H > contentBottom(doc) ? newPage() : y;
  textAt(doc, 'Truss drawings', MARGIN.side, at, { font: 'bold', size: 11 });
  at = paragraph(
    doc,
    'Line diagrams to identify each truss; the reviewed truss design drawings govern.',
    MARGIN.side,
    at + 15,
    w,
  );
  at += 8;
  s.designs.forEach((d, i) => {
    const col = i % 2;
    if (col === 0 && i > 0) at += CARD_H + CARD_GAP;
    if (col === 0 && at + CARD_H > contentBottom(doc)) at = newPage();
    const x = MARGIN.side + col * (cardW + CARD_GAP);
    const line = s.price.lines[i];
    doc.roundedRect(x, at, cardW, CARD_H, 4).lineWidth(0.6).strokeColor(COLORS.rule).stroke();
    textAt(doc, d.mark, x + 10, at + 9, { font: 'bold', size: 10.5 });
    doc.font('bold').fontSize(10.5);
    const mw = doc.widthOfString(d.mark);
    textAt(doc, d.description, x + 16 + mw, at + 10.5, {
      size: 8.5,
      color: COLORS.muted,
      width: cardW - 80 - mw,
    });
    textAt(doc, `× ${line?.quantity ?? ''}`, x, at + 10, {
      font: 'medium',
      size: 9,
      width: cardW - 10,
      align: 'right',
    });
    drawTruss(doc, d, { x: x + 10, y: at + 26, w: cardW - 20, h: CARD_H - 50 });
    const facts = [
      d.pitch ? `Pitch ${d.pitch}` : 'Flat',
      d.bottomPitch ? `bottom chord ${d.bottomPitch}` : '',
      `Rise ${d.rise}`,
      d.criteria ? `Heel ${d.criteria.heel}` : '',
      line ? `${line.plies} ${line.plies === 1 ? 'ply' : 'plies'}` : '',
    ].filter(Boolean);
    textAt(doc, facts.join(' · '), x + 10, at + CARD_H - 15, {
      size: 7.5,
      color: COLORS.muted,
      width: cardW - 20,
    });
  });
  return at + CARD_H + CARD_GAP;
}

/**
 * The quote as a PDF a builder can read and print: Letter for imperial plants, A4 for metric;
 * Inter embedded from the app's own files. Everything printed comes from the frozen snapshot.
 */
export function renderQuotePdf(quote: PrintableQuote): Promise<Buffer> {
  const s = quote.snapshot as unknown as QuoteSnapshot;
  const { doc, done } = openDocument({
    size: s.units === 'imperial' ? 'LETTER' : 'A4',
    info: { Title: `Quote ${quote.reference}`, Author: s.plant.name, Subject: s.job.name },
  });
  const newPage = () => {
    doc.addPage();
    return MARGIN.top;
  };
  let y = header(doc, s, quote);
  y = parties(doc, s, y);
  y = linesTable(doc, s, y, newPage);
  if (y + 110 > contentBottom(doc)) y = newPage();
  y = totals(doc, s, y);
  y = designCriteria(doc, s, y, newPage);
  y = notes(doc, s, y, newPage);
  y = drawings(doc, s, y, newPage);
  acceptance(doc, s, quote.reference, y, newPage);
  pageFooters(doc, `${s.plant.name}  ·  Quote ${quote.reference}`);
  doc.end();
  return done;
}
