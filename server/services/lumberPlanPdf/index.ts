import type { LumberPlanBody, LumberPlanSection } from '../../../shared/api/lumberPlan';
import { outOfDateText, type OutOfDateReason } from '../../../shared/api/shopPlan';
import { formatFeetInches } from '../../../shared/engine/format';
import { mm, MM_PER_INCH } from '../../../shared/engine/units';
import { openDocument, pageFooters } from '../quotePdf/document';
import { contentBottom, paragraph, textAt } from '../quotePdf/text';
import { COLORS, MARGIN, type Doc } from '../quotePdf/theme';

const inches = (v: number) => formatFeetInches(mm(v * MM_PER_INCH));
const money = (v: number) =>
  `$${v.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;
const BAR_H = 16;
const ROW_H = 30;

/** The plan's headline: at most X % above the least possible cost (or proven least). */
export function boundText(p: NonNullable<LumberPlanSection['plan']>) {
  return p.optimal || p.gapPercent === 0
    ? 'the least possible cost (proven)'
    : `at most ${p.gapPercent.toFixed(2)} % above the least possible cost`;
}

function section(doc: Doc, s: LumberPlanSection, y: number, newPage: () => number) {
  const w = doc.page.width - 2 * MARGIN.side;
  if (y + 90 > contentBottom(doc)) y = newPage();
  textAt(doc, s.lumber, MARGIN.side, y, { font: 'bold', size: 12 });
  textAt(doc, `${s.pieceCount} pieces`, MARGIN.side, y + 2, {
    size: 9,
    color: COLORS.muted,
    width: w,
    align: 'right',
  });
  y += 18;
  const p = s.plan;
  if (!p) {
    return paragraph(doc, s.error?.message ?? 'No plan.', MARGIN.side, y, w) + 14;
  }
  const facts = [
    `${p.boardCount} boards`,
    `${p.boardFeet.toFixed(1)} board ft`,
    money(p.totalCost),
    `waste ${p.wastePercent.toFixed(1)} %`,
    boundText(p),
  ];
  y = paragraph(doc, facts.join('  ·  '), MARGIN.side, y, w) + 2;
  const ffd = p.firstFitDecreasing;
  if (ffd) {
    y =
      paragraph(
        doc,
        `First-fit decreasing would use ${ffd.boardCount} boards for ${money(ffd.totalCost)} (waste ${ffd.wastePercent.toFixed(1)} %): this plan saves ${money(ffd.totalCost - p.totalCost)}.`,
        MARGIN.side,
        y,
        w,
      ) + 2;
  }
  y =
    paragraph(
      doc,
      `Pull: ${p.byStock.map((b) => `${b.count} × ${b.lengthFt} ft`).join(', ')}`,
      MARGIN.side,
      y,
      w,
    ) + 8;
  const longest = Math.max(...p.boards.map((b) => b.lengthFt));
  const barW = w - 50;
  for (const b of p.boards) {
    if (y + ROW_H > contentBottom(doc)) y = newPage();
    textAt(doc, `× ${b.count}`, MARGIN.side, y + 4, { font: 'bold', size: 9 });
    const x0 = MARGIN.side + 50;
    const scale = barW / (longest * 12);
    const full = b.lengthFt * 12 * scale;
    doc.rect(x0, y, full, BAR_H).fillColor(COLORS.band).fill();
    let x = x0;
    for (const piece of b.pieces) {
      const pw = piece.lengthIn * scale;
      doc.rect(x, y, pw, BAR_H).lineWidth(0.6).fillAndStroke('#dbe7f0', COLORS.accent);
      textAt(doc, `${piece.mark} ${inches(piece.lengthIn)}`, x + 2, y + 4.5, {
        size: 6.5,
        width: pw - 4,
      });
      x += pw;
    }
    doc.rect(x0, y, full, BAR_H).lineWidth(0.6).strokeColor(COLORS.dim).stroke();
    textAt(doc, `${b.lengthFt} ft stock  ·  offcut ${inches(b.offcutIn)}`, x0, y + BAR_H + 2, {
      size: 6.5,
      color: COLORS.muted,
    });
    y += ROW_H;
  }
  return y + 10;
}

/** The lumber plan on paper: per lumber, boards to pull and what to cut, drawn to scale. */
export function renderLumberPlanPdf(
  plan: LumberPlanBody,
  meta: { plantName: string; madeAt: string | null; outOfDate: readonly OutOfDateReason[] },
): Promise<Buffer> {
  const { doc, done } = openDocument({
    size: 'LETTER',
    info: { Title: `Lumber plan ${plan.orderNumber}`, Author: meta.plantName },
  });
  const newPage = () => {
    doc.addPage();
    return MARGIN.top;
  };
  const w = doc.page.width - 2 * MARGIN.side;
  textAt(doc, `Lumber plan — order ${plan.orderNumber}`, MARGIN.side, MARGIN.top, {
    font: 'bold',
    size: 16,
  });
  let y = paragraph(
    doc,
    `${meta.plantName}  ·  kerf ${plan.kerfIn} in, end trim ${plan.trimIn} in per board  ·  ` +
      `${plan.totals.boardCount} boards, ${money(plan.totals.totalCost)} (lower bound ${money(plan.totals.lowerBound)})` +
      (meta.madeAt ? `  ·  Made ${meta.madeAt.slice(0, 16).replace('T', ' ')} UTC` : '') +
      (meta.outOfDate.length > 0 ? `  ·  OUT OF DATE: ${outOfDateText(meta.outOfDate)}` : '') +
      (plan.demoStock ? '  ·  Demo stock lengths and prices (invented).' : ''),
    MARGIN.side,
    MARGIN.top + 24,
    w,
    { color: COLORS.muted },
  );
  y += 12;
  for (const s of plan.sections) y = section(doc, s, y, newPage);
  if (y + 60 > contentBottom(doc)) y = newPage();
  for (const c of plan.cautions)
    y = paragraph(doc, c, MARGIN.side, y, w, { size: 7.5, color: COLORS.muted }) + 2;
  pageFooters(doc, `${meta.plantName}  ·  Lumber plan ${plan.orderNumber}`);
  doc.end();
  return done;
}
