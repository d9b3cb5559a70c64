/**
 * The words of payment and quote terms: one set for the desk, the builder's portal, the quote PDF
 * and the e-mails, so a builder reads the same term wherever they meet it.
 */
export const TERMS = {
  /** A builder company that pays on its credit account (no deposit). */
  account: 'Credit account',
  /** A builder company that pays a deposit on acceptance. */
  deposit: 'Deposit required',
  validUntil: 'Valid until',
  depositDue: 'Deposit due',
  onAcceptance: 'on acceptance',
  noDeposit: 'No deposit (credit account)',
  balanceOnDelivery: 'Balance due on delivery',
} as const;

/** The name of a builder's payment terms. */
export const termsName = (terms: 'account' | 'deposit'): string =>
  terms === 'account' ? TERMS.account : TERMS.deposit;

/** The label of a quote's deposit line: "Deposit due (30 %)" or "No deposit (credit account)". */
export const depositDueLabel = (rate: number, percent: (rate: number) => string): string =>
  rate > 0 ? `${TERMS.depositDue} (${percent(rate)})` : TERMS.noDeposit;

/** A quote's deposit as a sentence (e-mail, portal). */
export const depositSentence = (amount: number, money: (v: number) => string): string =>
  amount > 0
    ? `${TERMS.depositDue} ${TERMS.onAcceptance}: ${money(amount)}.`
    : `${TERMS.noDeposit}: your account terms apply.`;

/**
 * How a calendar day is spelled: "1 January 2027", "9 Dec 2026", "Wed 9 Dec 2026", and within the
 * coming weeks (a board's headings, a chart's weeks) "Wed 9 Dec" and "9 Dec".
 */
export type DayStyle = 'long' | 'short' | 'weekday' | 'weekdayNoYear' | 'noYear';

const DAY_OPTIONS: Record<DayStyle, Intl.DateTimeFormatOptions> = {
  long: { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' },
  short: { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' },
  weekday: { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' },
  weekdayNoYear: { weekday: 'short', day: 'numeric', month: 'short', timeZone: 'UTC' },
  noYear: { day: 'numeric', month: 'short', timeZone: 'UTC' },
};

// Built on first use, not when the module loads: the first formatter of a page loads the
// locale's calendar data (tens of ms), which should not add to the task that starts the app.
const dayFormats: Partial<Record<DayStyle, Intl.DateTimeFormat>> = {};
const dayFormat = (style: DayStyle) =>
  (dayFormats[style] ??= new Intl.DateTimeFormat('en-GB', DAY_OPTIONS[style]));

/**
 * A calendar day ("2027-01-01", or the day of an ISO timestamp), day first as every date the app
 * prints, read as a UTC day so no reader's zone shifts it; the input itself when unreadable.
 */
export function formatDay(isoDate: string, style: DayStyle = 'short'): string {
  const d = new Date(`${isoDate.slice(0, 10)}T00:00:00Z`);
  return Number.isNaN(d.getTime()) ? isoDate : dayFormat(style).format(d);
}

/** A calendar date of the terms ("1 January 2027"). */
export const formatTermsDate = (isoDate: string): string => formatDay(isoDate, 'long');

/** "Valid until 1 January 2027". */
export const validUntilText = (isoDate: string): string =>
  `${TERMS.validUntil} ${formatTermsDate(isoDate)}`;
