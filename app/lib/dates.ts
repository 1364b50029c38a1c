// Dates as people read them on a report: "2 Dec 2026", never 02/12/2026 (which is 12 Feb in half the
// world). Always in UTC, so the server's and the browser's rendering agree; the ISO date goes in a
// title or datetime attribute. Month names are spelt here rather than taken from Intl, whose
// English abbreviations vary between ICU versions ("Sep" or "Sept").
const months = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"] as const;

export type DateInput = Date | string | number;

function toDate(value: DateInput): Date {
  const date = value instanceof Date ? value : new Date(value);
  if (Number.isNaN(date.getTime())) throw new RangeError(`Not a date: ${String(value)}`);
  return date;
}

/** "2 Dec 2026" (UTC). */
export function formatDate(value: DateInput): string {
  const date = toDate(value);
  return `${date.getUTCDate()} ${months[date.getUTCMonth()]} ${date.getUTCFullYear()}`;
}

/** "2026-12-02" (UTC), for datetime and title attributes and machine-readable files. */
export function isoDate(value: DateInput): string {
  return toDate(value).toISOString().slice(0, 10);
}

/** "2 Dec 2026, 14:05 UTC": when something happened. */
export function formatDateTime(value: DateInput): string {
  const date = toDate(value);
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${formatDate(date)}, ${pad(date.getUTCHours())}:${pad(date.getUTCMinutes())} UTC`;
}

/** The full ISO timestamp, for <time dateTime> of an event. */
export function isoDateTime(value: DateInput): string {
  return toDate(value).toISOString();
}
