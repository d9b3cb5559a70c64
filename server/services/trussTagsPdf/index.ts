import type { TagLayout, TrussTag, TrussTags } from '../../../shared/api/shopPaper';
import { fit, textAt } from '../quotePdf/text';
import { COLORS, type Doc } from '../quotePdf/theme';
import { shopPdf } from '../shopPaper/pdf';
import { drawQr } from './qr';

const IN = 72;

/**
 * Label geometry, in points. `sheet`: US Letter with 4 × 2 in labels, 2 across and 5 down (10 a
 * sheet) — ½ in top and bottom, 5/32 in sides, 3/16 in between the columns, a common label-sheet
 * size. `label`: one 4 × 6 in label per page for a label printer.
 */
export const TAG_SHEETS = {
  sheet: {
    page: [8.5 * IN, 11 * IN] as [number, number],
    label: { w: 4 * IN, h: 2 * IN },
    across: 2,
    down: 5,
    left: (5 / 32) * IN,
    top: 0.5 * IN,
    gap: (3 / 16) * IN,
  },
  label: {
    page: [4 * IN, 6 * IN] as [number, number],
    label: { w: 4 * IN, h: 6 * IN },
    across: 1,
    down: 1,
    left: 0,
    top: 0,
    gap: 0,
  },
} as const;

interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** The warning band across the bottom of a tag, as tall as its text; returns its top. */
function warningBand(doc: Doc, warning: string, box: Box, pad: number, size: number) {
  const [first, ...rest] = warning.split('. ');
  const inner = box.w - 2 * pad - 10;
  const small = size - 1.5;
  doc.font('regular').fontSize(small);
  const restH = doc.heightOfString(rest.join('. '), { width: inner, lineGap: 0 });
  const h = 4 + (size + 1) * 1.25 + restH + 4;
  const top = box.y + box.h - pad - h;
  doc.rect(box.x + pad, top, box.w - 2 * pad, h).fill('#000000');
  doc
    .font('bold')
    .fontSize(size + 1)
    .fillColor('#ffffff');
  doc.text(`${first}.`, box.x + pad + 5, top + 4, { width: inner, lineBreak: false });
  doc.font('regular').fontSize(small).fillColor('#ffffff');
  doc.text(rest.join('. '), box.x + pad + 5, top + 4 + (size + 1) * 1.25, {
    width: inner,
    lineGap: 0,
  });
  return top;
}

/** One 4 × 2 in tag: mark and n of N, job, builder, order, truss facts, QR code, warning. */
function smallTag(doc: Doc, t: TrussTag, tags: TrussTags, box: Box) {
  const pad = 9;
  const qr = 78;
  const textW = box.w - 2 * pad - qr - 6;
  const x = box.x + pad;
  let y = box.y + pad - 1;
  textAt(doc, t.mark, x, y, { font: 'bold', size: 20 });
  doc.font('bold').fontSize(20);
  const mw = doc.widthOfString(t.mark);
  textAt(doc, `${t.n} of ${t.of}`, x + mw + 8, y + 6, { font: 'bold', size: 12 });
  y += 26;
  textAt(doc, tags.order.job.name, x, y, { font: 'medium', size: 8, width: textW });
  textAt(doc, tags.order.builder.name, x, y + 10, { size: 7.5, width: textW });
  textAt(doc, `Order ${tags.order.number} · ${tags.order.plant}`, x, y + 20, {
    size: 7,
    color: COLORS.muted,
    width: textW,
  });
  const plies = `${t.plies} ${t.plies === 1 ? 'ply' : 'plies'}`;
  textAt(doc, `Span ${t.span} · ${t.pitch} · ${plies} · ${t.weight.text}`, x, y + 31, {
    font: 'medium',
    size: 7.5,
    width: textW,
  });
  drawQr(doc, t.url, box.x + box.w - pad - qr, box.y + pad - 3, qr);
  warningBand(doc, tags.warning, box, pad - 2, 6.5);
}

/** One 4 × 6 in label: the same content, large enough to read across the yard. */
function largeTag(doc: Doc, t: TrussTag, tags: TrussTags, box: Box) {
  const pad = 18;
  const x = box.x + pad;
  const w = box.w - 2 * pad;
  let y = box.y + pad;
  textAt(doc, t.mark, x, y, { font: 'bold', size: 44 });
  textAt(doc, `${t.n} of ${t.of}`, x, y + 14, { font: 'bold', size: 24, width: w, align: 'right' });
  y += 58;
  doc
    .moveTo(x, y)
    .lineTo(x + w, y)
    .lineWidth(1)
    .strokeColor('#000000')
    .stroke();
  y += 8;
  const row = (label: string, value: string, size = 11) => {
    textAt(doc, label, x, y + 1.5, { size: 8, color: COLORS.muted });
    doc.font('medium').fontSize(size);
    textAt(doc, fit(doc, value, w - 62), x + 62, y, { font: 'medium', size });
    y += size + 7;
  };
  row('Job', tags.order.job.name);
  row('Builder', tags.order.builder.name);
  row('Order', `${tags.order.number} · ${tags.order.plant}`);
  row('Span', t.span, 13);
  row('Pitch', t.pitch, 13);
  row('Plies', String(t.plies), 13);
  row('Weight', t.weight.text, 13);
  const bandTop = warningBand(doc, tags.warning, box, pad, 10);
  const qr = Math.min(150, bandTop - y - 12);
  drawQr(doc, t.url, box.x + (box.w - qr) / 2, y + 2, qr);
}

/** Truss tags as a PDF: a sheet of 4 × 2 in labels, or one 4 × 6 in label per page. */
export function renderTrussTagsPdf(tags: TrussTags, layout: TagLayout): Promise<Buffer> {
  const g = TAG_SHEETS[layout];
  const { doc, done } = shopPdf({
    size: g.page,
    margin: 0,
    title: `Truss tags ${tags.order.number}`,
    author: tags.order.plant,
  });
  const perPage = g.across * g.down;
  tags.tags.forEach((t, i) => {
    const slot = i % perPage;
    if (i > 0 && slot === 0) doc.addPage();
    const col = slot % g.across;
    const row = Math.floor(slot / g.across);
    const box = {
      x: g.left + col * (g.label.w + g.gap),
      y: g.top + row * g.label.h,
      ...g.label,
    };
    if (layout === 'sheet') smallTag(doc, t, tags, box);
    else largeTag(doc, t, tags, box);
  });
  doc.end();
  return done;
}
