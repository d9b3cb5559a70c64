import type { PlateSchedule } from '../../../shared/api/shopPaper';
import { paragraph, textAt } from '../quotePdf/text';
import { COLORS } from '../quotePdf/theme';
import { pageFooters, shopPage, shopPdf } from '../shopPaper/pdf';
import { cautionsBox, pdfTable } from '../shopPaper/pdfTable';

const M = 40;

const size = (p: { widthIn: number; lengthIn: number }) => `${p.widthIn} × ${p.lengthIn} in`;

/**
 * The plate schedule on US Letter: the order's totals to pick from the rack first, then per
 * truss mark each joint's plate (size, gauge, both faces, position), the rule and the cautions.
 */
export function renderPlateSchedulePdf(s: PlateSchedule): Promise<Buffer> {
  const { doc, done } = shopPdf({
    size: 'LETTER',
    margin: M,
    title: `Plate schedule ${s.order.number}`,
    author: s.order.plant,
  });
  const { w, bottom, newPage } = shopPage(doc, M, 10);

  textAt(doc, 'Plate schedule', M, M, { font: 'bold', size: 16 });
  textAt(doc, `Order ${s.order.number}`, M, M + 2, {
    font: 'bold',
    size: 12,
    width: w,
    align: 'right',
  });
  textAt(doc, `${s.order.job.name} · ${s.order.builder.name}`, M, M + 24, {
    size: 9.5,
    color: COLORS.muted,
    width: w,
  });
  let y = paragraph(doc, s.rule, M, M + 40, w, { size: 8 }) + 10;
  if (s.demoPlates)
    y =
      paragraph(
        doc,
        'Demo plate catalog: its design values are invented (not a supplier’s evaluation report).',
        M,
        y,
        w,
        { size: 8, color: COLORS.text },
      ) + 8;

  textAt(doc, `Pick from the rack — ${s.totalPlates} plates`, M, y, { font: 'bold', size: 11 });
  y = pdfTable(
    doc,
    M,
    y + 16,
    [
      { title: 'Plate', width: 120 },
      { title: 'Gauge', width: 60, align: 'right' },
      { title: 'Size', width: 120 },
      { title: 'Count', width: 70, align: 'right' },
    ],
    s.totals.map((t) => [t.plate, String(t.gauge), size(t), String(t.count)]),
    bottom,
    newPage,
    9,
  );

  for (const m of s.marks) {
    if (y + 60 > bottom) y = newPage();
    y += 8;
    textAt(doc, m.mark, M, y, { font: 'bold', size: 11 });
    textAt(
      doc,
      `${m.description} · ${m.quantity} truss${m.quantity === 1 ? '' : 'es'} × ${m.plies} ${m.plies === 1 ? 'ply' : 'plies'} · per truss: ${m.perTruss.map((c) => `${c.count} × ${c.plate}`).join(', ')}`,
      M + 48,
      y + 1.5,
      { size: 8.5, color: COLORS.muted, width: w - 48 },
    );
    y = pdfTable(
      doc,
      M,
      y + 16,
      [
        { title: 'Joint', width: 34 },
        { title: 'Kind', width: 40 },
        { title: 'Plate', width: 52 },
        { title: 'Ga.', width: 26, align: 'right' },
        { title: 'Size', width: 66 },
        { title: 'Faces', width: 34, align: 'right' },
        { title: 'Line', width: 34, align: 'right' },
        { title: 'Axis', width: 40, align: 'right' },
        { title: 'Position', width: w - 326 },
      ],
      m.joints.map((j) => [
        j.joint,
        j.kind,
        j.plate,
        String(j.gauge),
        size(j),
        String(j.faces),
        String(j.faces * m.plies * m.quantity),
        j.angleDeg === null ? '—' : `${j.angleDeg.toFixed(1)}°`,
        j.position,
      ]),
      bottom,
      newPage,
    );
  }
  cautionsBox(doc, s.cautions, M, y + 6, w, bottom, newPage);
  pageFooters(doc, `${s.order.plant} · Plate schedule · Order ${s.order.number}`, M);
  doc.end();
  return done;
}
