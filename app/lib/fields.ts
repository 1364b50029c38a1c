// Zod field builders shared by every form and JSON body, so each limit and its message
// is written once: "Use at most 120 characters.", "Enter a number from 0 to 360."
// Forms go through Conform, which turns empty strings into undefined and numeric text
// into numbers before these run; JSON bodies must send numbers as numbers.
import { z } from "zod";

const atMost = (max: number) => `Use at most ${max} characters.`;

/** Required one-line text: trimmed, 1…max characters. */
export function requiredText(what: string, max: number) {
  return z
    .string({ error: `Enter ${what}.` })
    .trim()
    .min(1, `Enter ${what}.`)
    .max(max, atMost(max));
}

/** Text that may be empty (one line or several): trimmed, at most max characters. Add `.default("")` where absent means empty. */
export function text(max: number) {
  return z.string({ error: "Enter text." }).trim().max(max, atMost(max));
}

type NumberRule = { min?: number; max?: number; integer?: boolean; exclusiveMin?: boolean };

function describeRange(what: string, rule: NumberRule) {
  const { min, max } = rule;
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

/** An e-mail address as mailboxes accept it: at most 254 characters, at most 64 before the @. */
export const emailAddress = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .max(254, atMost(254))
  .email("Enter a valid e-mail address.")
  .refine((v) => v.split("@")[0].length <= 64, "Use at most 64 characters before the @.");
