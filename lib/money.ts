/**
 * Money for people: the one place amounts are formatted and typed amounts are read. Amounts are
 * integer cents (minor units) everywhere else; the currency is always the shop's (its price book)
 * or the one an order was placed in, never a constant at the call site. Pure: used by the
 * browser, the server, e-mails and exports alike.
 */

const LOCALE = "en-US";

/** The demo shop's currency (the default price book's); a shop sets its own in its price book. */
export const DEFAULT_CURRENCY = "USD";
const formatters = new Map<string, Intl.NumberFormat>();

function formatter(currency: string, whole: boolean): Intl.NumberFormat {
  const key = `${currency}:${whole ? 0 : 2}`;
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.NumberFormat(LOCALE, {
      style: "currency",
      currency,
      ...(whole ? { maximumFractionDigits: 0, minimumFractionDigits: 0 } : {}),
    });
    formatters.set(key, f);
  }
  return f;
}

/** Cents for people, e.g. 123456 USD → "$1,234.56", −2500 → "-$25.00" (a refund). */
export function formatMoney(cents: number, currency: string): string {
  return formatter(currency, false).format(cents / 100);
}

/** Whole units for charts and summaries, e.g. 123456 USD → "$1,235". */
export function formatMoneyWhole(cents: number, currency: string): string {
  return formatter(currency, true).format(cents / 100);
}

/** Cents as a plain decimal for inputs and CSV cells, e.g. 123456 → "1234.56", −5 → "-0.05". */
export function centsToDecimal(cents: number): string {
  const sign = cents < 0 ? "-" : "";
  const abs = Math.abs(Math.round(cents));
  return `${sign}${Math.floor(abs / 100)}.${String(abs % 100).padStart(2, "0")}`;
}

/** What `parseMoney` answers: cents, or the words to show beside the field. */
export type ParsedMoney = { ok: true; cents: number } | { ok: false; message: string };

const AMOUNT = /^(\d{1,9})(?:\.(\d{1,2}))?$/;

/**
 * A typed amount in cents: "12.50" → 1250, "12" → 1200, "1,234.5" → 123450 (a leading currency
 * sign and thousands commas are allowed). Refuses anything else — "abc", "12.345" (more than
 * cents), negative amounts — with a message, never a guess. Done on the digits, not with floats.
 */
export function parseMoney(text: string): ParsedMoney {
  const t = text
    .trim()
    .replace(/^[$€£]/, "")
    .replace(/,(?=\d{3}(\D|$))/g, "");
  if (t === "") return { ok: false, message: "Enter an amount." };
  const m = AMOUNT.exec(t);
  if (!m) {
    if (/^\d+\.\d{3,}$/.test(t))
      return { ok: false, message: "Enter the amount to the cent (two decimals at most)." };
    if (/^-/.test(t)) return { ok: false, message: "Enter an amount above zero." };
    return { ok: false, message: "Enter an amount such as 125.00." };
  }
  const cents = Number(m[1]) * 100 + Number((m[2] ?? "").padEnd(2, "0"));
  return { ok: true, cents };
}
