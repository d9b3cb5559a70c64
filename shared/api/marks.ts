/** A plain truss mark: "T" and a number, any case ("T4", "t9"); other marks ("G1") are the user's own. */
const T_MARK = /^T(\d+)$/i;

/**
 * The next unused "T<n>" mark of an order: one past the highest T-number among its marks (gaps
 * left by deleted lines are not reused, so a mark never names two different trusses in one
 * order's history). Used by the server (new and copied lines), the editor and the test factory.
 */
export function nextFreeMark(marks: readonly string[]): string {
  const n = Math.max(0, ...marks.map((m) => Number(T_MARK.exec(m)?.[1] ?? 0)));
  return `T${n + 1}`;
}
