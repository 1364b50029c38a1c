// Zod builders for the text fields every form shares: each has a length limit whose message
// says so, refuses control characters in one-line text, and answers a wrong type plainly.
// Used in the browser and on the server (forms and better-auth's own endpoints alike).
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
function text(required: string) {
  return z.string({ error: (issue) => (issue.input === undefined || issue.input === null ? required : "Send this as text.") });
}

/** One line of text, trimmed, 1..max characters (or min..max). */
export function shortText(max: number, required: string, min = 1) {
  return text(required)
    .trim()
    .min(min, { error: (issue) => (issue.input === "" ? required : `Use at least ${min} characters.`) })
    .max(max, { error: atMost(max), abort: true })
    .refine((s) => !CONTROL.test(s), "Use one line of ordinary characters, without control characters.");
}

/** An e-mail address: at most 254 characters, at most 64 before the @, stored lower-case. */
export function emailAddress(required = "Enter your e-mail address.") {
  return text(required)
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
  return text(required).min(1, required).max(PASSWORD_MAX, atMost(PASSWORD_MAX));
}

/** A new password: 10..128 characters, letters mixed with something else, not one repeated character. */
export const newPassword = text("Choose a password.")
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(PASSWORD_MAX, { error: atMost(PASSWORD_MAX), abort: true })
  .refine((p) => /[A-Za-z]/.test(p) && /[^A-Za-z]/.test(p), "Mix letters with digits or symbols.")
  .refine((p) => new Set(p).size >= 5, "That password is too easy to guess.");

/** An opaque identifier sent back by a form (record ids, tokens). */
export const identifier = (required = "The form is incomplete. Reload the page and try again.") =>
  text(required).min(1, required).max(200, { error: required, abort: true });
