import { randomBytes } from "node:crypto";

const alphabet = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";
/** Stripe-looking ids: `cs_test_a1B2…`, `pi_3Q…`. */
export function newId(prefix, length = 24) {
  const bytes = randomBytes(length);
  let out = "";
  for (const b of bytes) out += alphabet[b % alphabet.length];
  return `${prefix}_${out}`;
}

export const now = () => Math.floor(Date.now() / 1000);

export const clone = (value) => structuredClone(value);

/** Stripe's list envelope with limit / starting_after / ending_before over newest-first data. */
export function paginate(items, query, url, invalid) {
  const limit = query.limit === undefined ? 10 : Number(query.limit);
  if (!Number.isInteger(limit) || limit < 1 || limit > 100) throw invalid("Invalid integer: limit must be between 1 and 100.", "limit");
  let data = items;
  if (query.starting_after) {
    const i = data.findIndex((x) => x.id === query.starting_after);
    data = i < 0 ? [] : data.slice(i + 1);
  } else if (query.ending_before) {
    const i = data.findIndex((x) => x.id === query.ending_before);
    data = i < 0 ? [] : data.slice(Math.max(0, i - limit), i);
    return { object: "list", data, has_more: i - limit > 0, url };
  }
  return { object: "list", data: data.slice(0, limit), has_more: data.length > limit, url };
}

/** Names in `expand[]` (qs gives an array, or a string for a single value). */
export function expandList(value) {
  if (value === undefined) return [];
  return (Array.isArray(value) ? value : typeof value === "object" ? Object.values(value) : [value]).map(String);
}
