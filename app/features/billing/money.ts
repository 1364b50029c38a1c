// Money as integer minor units (cents) with an ISO 4217 currency code. Pure: shared by the pages,
// the PDFs and the CSV export. Every currency we offer has two decimals (no zero-decimal ones).
export const currencies = ["eur", "usd", "gbp", "chf", "cad", "aud"] as const;
export type Currency = (typeof currencies)[number];
export const DEFAULT_CURRENCY: Currency = "eur";
/** The largest amount one line or one invoice may carry: 1 000 000.00 in any currency. */
export const MAX_AMOUNT = 100_000_000;

/** "€1,234.50" (en-GB grouping; the currency's own symbol). */
export function formatMoney(amount: number, currency: string) {
  return new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() }).format(amount / 100);
}

/** "1234.50": the plain decimal for CSV and form fields. */
export function decimalOf(amount: number) {
  const sign = amount < 0 ? "-" : "";
  const abs = Math.abs(amount);
  return `${sign}${Math.floor(abs / 100)}.${String(abs % 100).padStart(2, "0")}`;
}

/** "12", "12.5", "12.50", "1,234.50" → minor units; null when it is not an amount with at most two decimals. */
export function parseAmount(input: string): number | null {
  const text = input.trim().replace(/,/g, "");
  const m = /^(\d{1,9})(?:\.(\d{1,2}))?$/.exec(text);
  if (!m) return null;
  const cents = Number(m[1]) * 100 + Number((m[2] ?? "").padEnd(2, "0"));
  return Number.isSafeInteger(cents) ? cents : null;
}
