/**
 * An amount of money in the shop's currency (an ISO 4217 code), written as the reader's locale writes money:
 * the currency's own symbol and its own number of decimals (none for yen, three for dinars).
 */
export function formatMoney(amount: number, currency: string, locale?: string): string {
  if (!Number.isFinite(amount)) return '—';
  try {
    return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(amount);
  } catch {
    // A code this browser cannot write still shows the amount, named by its code.
    return `${amount.toFixed(2)} ${currency}`;
  }
}
