/** Minor-unit digits per currency, as Intl knows them (JPY → 0, USD → 2). */
export function currencyDigits(currency: string): number {
  try {
    return (
      new Intl.NumberFormat("en", { style: "currency", currency }).resolvedOptions().maximumFractionDigits ??
      2
    );
  } catch {
    return 2;
  }
}

export function formatAmount(amount: number, currency: string): string {
  const digits = currencyDigits(currency);
  const value = amount / 10 ** digits;
  try {
    return new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() }).format(
      value,
    );
  } catch {
    return `${value.toFixed(digits)} ${currency.toUpperCase()}`;
  }
}

export function isKnownCurrency(currency: string): boolean {
  if (!/^[a-z]{3}$/.test(currency)) return false;
  try {
    new Intl.NumberFormat("en", { style: "currency", currency });
    return true;
  } catch {
    return false;
  }
}

/** Stripe's minimum charge amounts for the common settlement currencies (minor units). */
export const MINIMUM_AMOUNTS: Readonly<Record<string, number>> = {
  usd: 50,
  eur: 50,
  gbp: 30,
  cad: 50,
  aud: 50,
  chf: 50,
  jpy: 50,
};
