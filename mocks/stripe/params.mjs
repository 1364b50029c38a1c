// Parameter checks with Stripe's messages, for form-encoded bodies parsed by qs (`a[b][0]=…`).
import { invalid } from "./errors.mjs";

export function isObject(value) {
  return value !== null && typeof value === "object" && !Array.isArray(value);
}

/** qs turns `x[0]=…` into an array, but into an object past its array limit: accept both. */
export function asArray(value, param) {
  if (Array.isArray(value)) return value;
  if (isObject(value) && Object.keys(value).every((k) => /^\d+$/.test(k))) {
    return Object.keys(value).sort((a, b) => Number(a) - Number(b)).map((k) => value[k]);
  }
  throw invalid(`Invalid array: ${param}.`, param);
}

export function rejectUnknown(params, known, prefix = "") {
  for (const key of Object.keys(params)) {
    if (!known.includes(key)) throw invalid(`Received unknown parameter: ${prefix}${key}`, `${prefix}${key}`);
  }
}

export function integer(value, param, { min = Number.MIN_SAFE_INTEGER, max = Number.MAX_SAFE_INTEGER } = {}) {
  const n = typeof value === "number" ? value : /^-?\d+$/.test(String(value)) ? Number(value) : NaN;
  if (!Number.isSafeInteger(n)) throw invalid(`Invalid integer: ${value}`, param, "parameter_invalid_integer");
  if (n < min) throw invalid(`This value must be greater than or equal to ${min}.`, param, "parameter_invalid_integer");
  if (n > max) throw invalid(`This value must be less than or equal to ${max}.`, param, "parameter_invalid_integer");
  return n;
}

export function string(value, param, maxLength = 5000) {
  if (typeof value !== "string") throw invalid(`Invalid string: ${param}.`, param);
  if (value.length > maxLength) throw invalid(`Invalid string: ${param} is longer than ${maxLength} characters.`, param, "parameter_invalid_string");
  return value;
}

export function url(value, param) {
  const text = string(value, param, 5000);
  // `{CHECKOUT_SESSION_ID}` is a template Stripe fills in on redirect; it is not valid in a URL as such.
  let parsed;
  try {
    parsed = new URL(text.replaceAll("{CHECKOUT_SESSION_ID}", "x"));
  } catch {
    throw invalid("Not a valid URL", param, "url_invalid");
  }
  if (parsed.protocol !== "http:" && parsed.protocol !== "https:") throw invalid("Not a valid URL", param, "url_invalid");
  return text;
}

export function email(value, param) {
  const text = string(value, param, 800);
  if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(text)) throw invalid(`Invalid email address: ${text}`, param, "email_invalid");
  return text;
}

export function currency(value, param) {
  const text = String(value ?? "").toLowerCase();
  if (!/^[a-z]{3}$/.test(text)) throw invalid(`Invalid currency: ${value}.`, param);
  return text;
}

/** Stripe's metadata rules: up to 50 keys, keys up to 40 characters, values up to 500; "" clears. */
export function metadata(value, param = "metadata") {
  if (value === undefined || value === "") return {};
  if (!isObject(value)) throw invalid("Invalid object", param);
  const keys = Object.keys(value);
  if (keys.length > 50) throw invalid("Metadata can have up to 50 keys.", param);
  const out = {};
  for (const key of keys) {
    if (key.length > 40) throw invalid(`Metadata keys can have up to 40 characters; \`${key}\` has ${key.length}.`, `${param}[${key}]`);
    const v = value[key];
    if (isObject(v) || Array.isArray(v)) throw invalid("Metadata values must be strings.", `${param}[${key}]`);
    const text = String(v ?? "");
    if (text.length > 500) throw invalid(`Metadata values can have up to 500 characters; \`${key}\` has ${text.length}.`, `${param}[${key}]`);
    if (text !== "") out[key] = text;
  }
  return out;
}
