/** Money, dates and numbers as the printed quote and its e-mail show them. */

/** "$1,234.50" in the quote's currency (en-US grouping; any ISO code). */
export function formatMoney(amount: number, currency: string): string {
  try {
    return new Intl.NumberFormat('en-US', { style: 'currency', currency }).format(amount);
  } catch {
    // An unknown code still prints, with the code in front.
    return `${currency} ${amount.toFixed(2)}`;
  }
}

/** "December 31, 2026" — spelled out so neither day-month order misreads it. */
export function formatDate(date: string | Date): string {
  const d = typeof date === 'string' ? new Date(`${date.slice(0, 10)}T00:00:00Z`) : date;
  return d.toLocaleDateString('en-US', {
    year: 'numeric',
    month: 'long',
    day: 'numeric',
    timeZone: 'UTC',
  });
}

/** A plain number with grouping and at most (`fixed`: exactly) `digits` decimals, e.g. "1,234.5". */
export function formatNumber(v: number, digits = 1, fixed = false): string {
  return new Intl.NumberFormat('en-US', {
    maximumFractionDigits: digits,
    minimumFractionDigits: fixed ? digits : 0,
  }).format(v);
}

/** "12 %" from 0.12. */
export const formatPercent = (fraction: number) => `${formatNumber(fraction * 100, 2)} %`;
