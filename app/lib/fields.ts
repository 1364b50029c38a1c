// Zod builders for the fields every form and JSON body shares: each has a limit whose message
// says so ("Use at most 120 characters.", "Enter a latitude from -90 to 90."), one-line text
// refuses control characters, and a wrong type gets a plain answer. Used in the browser and on
// the server (forms, the JSON API and better-auth's own endpoints alike). Forms go through
// Conform, which turns empty strings into undefined and numeric text into numbers first.
import { z } from "zod";

export const atMost = (max: number) => `Use at most ${max} characters.`;

export const EMAIL_MAX = 254;
export const EMAIL_LOCAL_MAX = 64;
export const NAME_MAX = 100;
export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 128;

// C0 and C1 controls, DEL, and the line and paragraph separators: none belongs in a one-line field.
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u2028\u2029]/;

/** A string field: `required` when missing or empty, a plain message when it is not text at all. */
function textOf(required: string) {
  return z.string({ error: (issue) => (issue.input === undefined || issue.input === null ? required : "Send this as text.") });
}

/** One line of text, trimmed, 1..max characters (or min..max). */
export function shortText(max: number, required: string, min = 1) {
  return textOf(required)
    .trim()
    .min(min, { error: (issue) => (issue.input === "" ? required : `Use at least ${min} characters.`) })
    .max(max, { error: atMost(max), abort: true })
    .refine((s) => !CONTROL.test(s), "Use one line of ordinary characters, without control characters.");
}

/** An e-mail address: at most 254 characters, at most 64 before the @, stored lower-case. */
export function emailAddress(required = "Enter your e-mail address.") {
  return textOf(required)
    .trim()
    .min(1, required)
    .max(EMAIL_MAX, { error: atMost(EMAIL_MAX), abort: true })
    .refine((s) => s.lastIndexOf("@") <= EMAIL_LOCAL_MAX, { error: `Use at most ${EMAIL_LOCAL_MAX} characters before the @.`, abort: true })
    .toLowerCase()
    .pipe(z.email("Enter a valid e-mail address."));
}

/** A person's name as they want it shown. */
export const personName = shortText(NAME_MAX, "Enter your name.");

/** A password typed to prove who one is: any characters, bounded. */
export function typedPassword(required = "Enter your password.") {
  return textOf(required).min(1, required).max(PASSWORD_MAX, atMost(PASSWORD_MAX));
}

/** A new password: 10..128 characters, letters mixed with something else, not one repeated character. */
export const newPassword = textOf("Choose a password.")
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(PASSWORD_MAX, { error: atMost(PASSWORD_MAX), abort: true })
  .refine((p) => /[A-Za-z]/.test(p) && /[^A-Za-z]/.test(p), "Mix letters with digits or symbols.")
  .refine((p) => new Set(p).size >= 5, "That password is too easy to guess.");

/** An opaque identifier sent back by a form (record ids, tokens). */
export const identifier = (required = "The form is incomplete. Reload the page and try again.") =>
  textOf(required).min(1, required).max(200, { error: required, abort: true });

/** Required one-line text naming what is missing: "Enter the site's name." */
export function requiredText(what: string, max: number) {
  return shortText(max, `Enter ${what}.`);
}

/** Text that may be empty and may span lines (notes, addresses): trimmed, at most max characters. Add `.default("")` where absent means empty. */
export function text(max: number) {
  return z
    .string({ error: "Send this as text." })
    .trim()
    .max(max, atMost(max))
    .refine((s) => !/\u0000/.test(s), "Remove the NUL character from the text.");
}

type NumberRule = { min?: number; max?: number; integer?: boolean; exclusiveMin?: boolean };

/** A bound as people write it in a message: "300,000", "-10,000", "0.5". */
const bound = (n: number) => n.toLocaleString("en-GB", { maximumFractionDigits: 6 });

function describeRange(what: string, rule: NumberRule) {
  const [min, max] = [rule.min === undefined ? undefined : bound(rule.min), rule.max === undefined ? undefined : bound(rule.max)];
  if (min !== undefined && max !== undefined) return `Enter ${what} from ${min} to ${max}.`;
  if (min !== undefined) return rule.exclusiveMin ? `Enter ${what} above ${min}.` : `Enter ${what} of at least ${min}.`;
  if (max !== undefined) return `Enter ${what} of at most ${max}.`;
  return `Enter ${what}.`;
}

/** A finite number within a range, with one message that states the range. */
export function numberIn(what: string, rule: NumberRule = {}) {
  const message = describeRange(what, rule);
  let schema = z.number({ error: message }).refine(Number.isFinite, message);
  if (rule.integer) schema = schema.refine(Number.isInteger, `Enter ${what} as a whole number.`);
  if (rule.min !== undefined) {
    const min = rule.min;
    schema = schema.refine((v) => (rule.exclusiveMin ? v > min : v >= min), message);
  }
  if (rule.max !== undefined) {
    const max = rule.max;
    schema = schema.refine((v) => v <= max, message);
  }
  return schema;
}

/** One of a fixed set of values, with a message listing them. */
export function oneOf<const T extends readonly [string, ...string[]]>(what: string, values: T) {
  return z.enum(values, { error: `Choose ${what}: ${values.join(", ")}.` });
}

/** A record id from a URL or a body: non-empty, short, printable. */
export const recordId = z
  .string({ error: "Give the record's id." })
  .min(1, "Give the record's id.")
  .max(64, "That is not an id.")
  .regex(/^[A-Za-z0-9_-]+$/, "That is not an id.");
