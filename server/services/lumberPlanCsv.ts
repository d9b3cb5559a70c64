import type { LumberPlanBody } from '../../shared/api/lumberPlan';

const cell = (v: string | number) => {
  const s = String(v);
  return /[",\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
};

/**
 * The lumber plan as CSV, one row per group of boards cut alike: lumber, row number, stock
 * length (ft), how many boards, the pieces cut from each (marks and lengths in inches, longest
 * first) and the offcut (in).
 */
export function lumberPlanCsv(plan: LumberPlanBody): string {
  const rows: (string | number)[][] = [
    [
      'lumber',
      'board',
      'stock_ft',
      'count',
      'pieces',
      'piece_marks',
      'piece_lengths_in',
      'offcut_in',
    ],
  ];
  for (const section of plan.sections) {
    section.plan?.boards.forEach((b, i) => {
      rows.push([
        section.lumber,
        i + 1,
        b.lengthFt,
        b.count,
        b.pieces.length,
        b.pieces.map((p) => p.mark).join(' '),
        b.pieces.map((p) => p.lengthIn).join(' '),
        b.offcutIn,
      ]);
    });
  }
  return `${rows.map((r) => r.map(cell).join(',')).join('\r\n')}\r\n`;
}
