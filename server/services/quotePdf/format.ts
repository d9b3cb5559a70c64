/** Money, dates and numbers as the printed quote and its e-mail show them. */
import { formatDay, formatTermsDate } from '../../../shared/api/terms';

/** "$1,234.50" in the quote's currency (en-US grouping; any ISO code). */
export function formatMoney(amount: number, currency: string): string {
  try {
    return new Intl.NumberFormat('en-US', { style: 'currency', currency }).format(amount);
  } catch {
    // An unknown code still prints, with the code in front.
    return `${currency} ${amount.toFixed(2)}`;
  }
}

/** "31 December 2026" — spelled out so neither day-month order misreads it (the terms' words). */
export function formatDate(date: string | Date): string {
  return formatTermsDate(typeof date === 'string' ? date : date.toISOString());
}

/** "30 Nov 2026, 14:05 UTC": an instant in a line of history (the server knows no plant zone). */
export function formatInstantUtc(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return `${formatDay(d.toISOString())}, ${d.toISOString().slice(11, 16)} UTC`;
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
