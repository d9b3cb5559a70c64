/** Money in the order's currency, e.g. "$1,234.50". */
export const formatAmount = (amount: number, currency: string) =>
  new Intl.NumberFormat('en-US', { style: 'currency', currency }).format(amount);
