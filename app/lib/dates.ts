// Dates as people read them, unambiguous in any country: "2 Dec 2026" (and "2 Dec 2026, 14:05").
const day = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const dayTime = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", timeZone: "UTC" });

const toDate = (value: Date | string | number) => (value instanceof Date ? value : new Date(value));

export function formatDate(value: Date | string | number) {
  return day.format(toDate(value));
}

/** Date and time in UTC, marked as such. */
export function formatDateTime(value: Date | string | number) {
  return `${dayTime.format(toDate(value))} UTC`;
}

/** The ISO form for <time dateTime>. */
export function isoDate(value: Date | string | number) {
  return toDate(value).toISOString();
}
