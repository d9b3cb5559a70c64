import { describe, expect, it } from 'vitest';
import { formatMoney, formatPercent } from '../../../../src/features/quotes/money';

// Minor units per ISO 4217 (USD and CAD 2, JPY 0); symbols and grouping per the Unicode CLDR
// en-US locale data that Intl.NumberFormat uses (ECMA-402). Amounts are invented.
describe('money in the quote’s currency', () => {
  it('shows US dollars with two decimals and thousands separators', () => {
    expect(formatMoney(12345.6, 'USD')).toBe('$12,345.60');
    expect(formatMoney(0.5, 'USD')).toBe('$0.50');
    expect(formatMoney(1_000_000, 'USD')).toBe('$1,000,000.00');
  });

  it('rounds to the currency’s minor unit', () => {
    expect(formatMoney(10.005, 'USD')).toMatch(/^\$10\.0[01]$/); // binary 10.005 is just below
    expect(formatMoney(1999.999, 'USD')).toBe('$2,000.00');
    expect(formatMoney(1234.5, 'JPY')).toBe('¥1,235');
  });

  it('marks other dollars by their code in en-US', () => {
    expect(formatMoney(250, 'CAD')).toBe('CA$250.00');
  });

  it('never shows a negative zero, but keeps real credits negative', () => {
    expect(formatMoney(-0, 'USD')).toBe('$0.00');
    expect(formatMoney(-0.001, 'USD')).toBe('$0.00');
    expect(formatMoney(-25, 'USD')).toBe('-$25.00');
  });

  it('falls back to the code for a currency Intl does not accept', () => {
    expect(formatMoney(1234.5, 'U$D')).toBe('1,234.50 U$D');
  });

  it('follows another locale when asked', () => {
    expect(formatMoney(1234.5, 'EUR', 'de-DE')).toBe('1.234,50\u00a0€');
  });
});

describe('deposit share', () => {
  it('shows 0–1 fractions as percentages', () => {
    expect(formatPercent(0.5)).toBe('50 %');
    expect(formatPercent(0.0825)).toBe('8.25 %');
    expect(formatPercent(0.07)).toBe('7 %');
    expect(formatPercent(0)).toBe('0 %');
  });
});
