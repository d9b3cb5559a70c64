import type { CutListGroupView, CutListView } from '../../../shared/api/shop';
import { outOfDateText, type OutOfDateReason } from '../../../shared/api/shopPlan';
import { openDocument, pageFooters } from '../quotePdf/document';
import { contentBottom, paragraph, paragraphHeight, rule, textAt } from '../quotePdf/text';
import { COLORS, MARGIN, type Doc } from '../quotePdf/theme';

/** Columns of the table: share of the content width, and alignment. */
const COLUMNS = [
  { key: 'mark', title: 'Mark', share: 0.1 },
  { key: 'qty', title: 'Qty', share: 0.06, align: 'right' as const },
  { key: 'length', title: 'Length', share: 0.11, align: 'right' as const },
  { key: 'first', title: 'First end', share: 0.25 },
  { key: 'second', title: 'Second end', share: 0.25 },
  { key: 'notes', title: 'Notes', share: 0.23 },
] as const;
const ROW_PAD = 4;
const GAP = 8;

const contentWidth = (doc: Doc) => doc.page.width - 2 * MARGIN.side;

function header(doc: Doc, v: CutListView, outOfDate: readonly OutOfDateReason[]) {
  const x = MARGIN.side;
  const w = contentWidth(doc);
  const y = MARGIN.top;
  textAt(doc, 'CUT LIST', x, y, { font: 'medium', size: 8, color: COLORS.accent });
  textAt(doc, `Order ${v.order.number}`, x, y + 11, { font: 'bold', size: 16, width: w * 0.6 });
  textAt(doc, `${v.order.job.name}  ·  ${v.order.customer.name}`, x, y + 32, {
    size: 9,
    color: COLORS.muted,
    width: w * 0.6,
  });
  const right = { width: w * 0.4, align: 'right' as const, size: 9 };
  const rx = x + w * 0.6;
  textAt(doc, `${v.quantity.toLocaleString('en-US')} pieces`, rx, y + 12, {
    ...right,
    font: 'bold',
    size: 12,
  });
  const made = v.computedAt.slice(0, 16).replace('T', ' ');
  textAt(doc, `Made ${made} UTC  ·  engine ${v.engineVersion}`, rx, y + 30, {
    ...right,
    color: COLORS.muted,
  });
  rule(doc, y + 48, COLORS.text);
  const top =
    outOfDate.length === 0
      ? y + 56
      : paragraph(doc, `OUT OF DATE: ${outOfDateText(outOfDate)}`, x, y + 56, w, {
          font: 'bold',
          size: 9,
          color: COLORS.danger,
        }) + 4;
  return (
    paragraph(
      doc,
      `Sorted ${v.sortedBy.charAt(0).toLowerCase()}${v.sortedBy.slice(1)}`,
      x,
      top,
      w,
      { size: 8 },
    ) + 10
  );
}

function columnXs(doc: Doc) {
  const w = contentWidth(doc);
  let at = MARGIN.side;
  return COLUMNS.map((c) => {
    const col = { ...c, x: at, width: c.share * w - GAP };
    at += c.share * w;
    return col;
  });
}

function tableHead(doc: Doc, g: CutListGroupView, y: number) {
  const w = contentWidth(doc);
  doc.rect(MARGIN.side, y, w, 20).fillColor(COLORS.band).fill();
  textAt(doc, g.label, MARGIN.side + 6, y + 5, { font: 'bold', size: 10.5 });
  textAt(doc, `${g.quantity} pieces  ·  ${g.totalLength}`, MARGIN.side, y + 6, {
    size: 9,
    color: COLORS.muted,
    width: w - 6,
    align: 'right',
  });
  let at = y + 26;
  for (const c of columnXs(doc)) {
    textAt(doc, c.title.toUpperCase(), c.x, at, {
      font: 'medium',
      size: 7,
      color: COLORS.muted,
      width: c.width,
      align: 'align' in c ? c.align : 'left',
    });
  }
  at += 12;
  rule(doc, at - 2);
  return at + 2;
}

/**
 * The stored cut list as the saw operator prints it (marked when out of date): landscape Letter (imperial) or A4 (metric), one
 * table per lumber size and grade, longest first, the cautions at the end; Inter embedded.
 */
export function renderCutListPdf(
  v: CutListView,
  meta: { outOfDate: readonly OutOfDateReason[] } = { outOfDate: [] },
): Promise<Buffer> {
  const { doc, done } = openDocument({
    size: v.units === 'imperial' ? 'LETTER' : 'A4',
    layout: 'landscape',
    info: { Title: `Cut list ${v.order.number}`, Subject: v.order.job.name },
  });

  let y = header(doc, v, meta.outOfDate);
  const cols = columnXs(doc);
  for (const g of v.groups) {
    if (y + 70 > contentBottom(doc)) {
      doc.addPage();
      y = MARGIN.top;
    }
    y = tableHead(doc, g, y);
    for (const r of g.rows) {
      const cells: Record<(typeof COLUMNS)[number]['key'], string> = {
        mark: r.mark,
        qty: String(r.quantity),
        length: r.length.text,
        first: r.ends[0].text,
        second: r.ends[1].text,
        notes: [
          `${r.perTruss} per truss × ${r.trusses} × ${r.plies} ${r.plies === 1 ? 'ply' : 'plies'}.`,
          ...r.notes,
        ].join(' '),
      };
      const h =
        Math.max(...cols.map((c) => paragraphHeight(doc, cells[c.key], c.width, { size: 8.5 }))) +
        2 * ROW_PAD;
      if (y + h > contentBottom(doc)) {
        doc.addPage();
        y = tableHead(doc, g, MARGIN.top);
      }
      for (const c of cols) {
        const strong = c.key === 'mark' || c.key === 'qty' || c.key === 'length';
        if (c.key === 'first' || c.key === 'second' || c.key === 'notes') {
          paragraph(doc, cells[c.key], c.x, y + ROW_PAD, c.width, {
            size: 8.5,
            color: c.key === 'notes' ? COLORS.muted : COLORS.text,
          });
        } else {
          textAt(doc, cells[c.key], c.x, y + ROW_PAD, {
            font: strong ? 'bold' : 'regular',
            size: 9.5,
            width: c.width,
            align: 'align' in c ? c.align : 'left',
            tabular: true,
          });
        }
      }
      y += h;
      rule(doc, y, COLORS.rule);
    }
    y += 14;
  }

  const w = contentWidth(doc);
  const cautions = v.cautions.join(' ');
  if (y + paragraphHeight(doc, cautions, w - 20) + 30 > contentBottom(doc)) {
    doc.addPage();
    y = MARGIN.top;
  }
  const boxH = paragraphHeight(doc, cautions, w - 20) + 26;
  doc.rect(MARGIN.side, y, w, boxH).fillColor(COLORS.noteBg).fill();
  textAt(doc, 'Cautions', MARGIN.side + 10, y + 7, { font: 'bold', size: 9 });
  paragraph(doc, cautions, MARGIN.side + 10, y + 20, w - 20);

  pageFooters(doc, `Cut list  ·  Order ${v.order.number}  ·  ${v.order.job.name}`);
  doc.end();
  return done;
}
