// Zod schemas of the sign-in, sign-up and password forms; used in the browser and on the server.
import { z } from "zod";

export const email = z.string({ error: "Enter your e-mail address." }).trim().toLowerCase().email("Enter a valid e-mail address.");

export const newPassword = z
  .string({ error: "Choose a password." })
  .min(10, "Use at least 10 characters.")
  .max(128, "Use at most 128 characters.")
  .refine((p) => /[A-Za-z]/.test(p) && /[^A-Za-z]/.test(p), "Mix letters with digits or symbols.")
  .refine((p) => new Set(p).size >= 5, "That password is too easy to guess.");

const passwords = { password: newPassword, confirm: z.string({ error: "Repeat the password." }) };
const samePasswords = (v: { password: string; confirm: string }) => v.password === v.confirm;
const differ = { message: "The two passwords differ.", path: ["confirm"] };

export const signInSchema = z.object({
  email,
  password: z.string({ error: "Enter your password." }),
  redirectTo: z.string().optional(),
});

export const personName = z.string({ error: "Enter your name." }).trim().min(2, "Enter your name.").max(100);

export const signUpSchema = z.object({ name: personName, email, ...passwords }).refine(samePasswords, differ);

export const forgotSchema = z.object({ email });

export const resetSchema = z.object({ token: z.string({ error: "The link is incomplete." }), ...passwords }).refine(samePasswords, differ);

export const acceptSchema = z.object({ name: personName, ...passwords }).refine(samePasswords, differ);

export const changePasswordSchema = z
  .object({ current: z.string({ error: "Enter your current password." }), ...passwords })
  .refine(samePasswords, differ);

/** Where to go after sign-in: only paths on this site. */
export function safeRedirect(to: string | null | undefined, fallback = "/") {
  if (!to || !to.startsWith("/") || to.startsWith("//") || to.startsWith("/\\")) return fallback;
  return to;
}
