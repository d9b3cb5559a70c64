/** Formatters by locale and currency: building an Intl.NumberFormat is slow, tables call this a lot. */
const formatters = new Map<string, Intl.NumberFormat>();

/** The locale money is shown in; plants quote in US English number style. */
export const MONEY_LOCALE = 'en-US';

/**
 * An amount in the quote's currency ("$12,345.60"), with the currency's own minor units
 * (ISO 4217: two for USD, none for JPY). A code Intl does not know shows as "1,234.50 XYZ"
 * rather than breaking the page.
 */
export function formatMoney(amount: number, currency: string, locale = MONEY_LOCALE): string {
  const key = `${locale}|${currency}`;
  let format = formatters.get(key);
  if (!format) {
    try {
      // 'negative' drops the sign of a negative zero (a tiny credit rounded away): no "-$0.00".
      format = new Intl.NumberFormat(locale, {
        style: 'currency',
        currency,
        signDisplay: 'negative',
      });
    } catch {
      const plain = new Intl.NumberFormat(locale, {
        minimumFractionDigits: 2,
        maximumFractionDigits: 2,
      });
      return `${plain.format(amount)} ${currency}`;
    }
    formatters.set(key, format);
  }
  return format.format(amount);
}

/** A 0–1 fraction as a whole or decimal percentage ("50 %", "8.25 %"). */
export function formatPercent(fraction: number): string {
  const percent = Math.round(fraction * 100 * 1e6) / 1e6;
  return `${percent.toLocaleString(MONEY_LOCALE, { maximumFractionDigits: 2 })} %`;
}
