// Zod schemas of the sign-in, sign-up and password forms; used in the browser and on the server.
import { z } from "zod";
import { emailAddress, newPassword, personName, typedPassword, identifier, PASSWORD_MAX, atMost } from "~/lib/fields";

export { safeRedirect } from "./safe-redirect";

export const email = emailAddress();

const repeat = z.string({ error: "Repeat the password." }).min(1, "Repeat the password.").max(PASSWORD_MAX, atMost(PASSWORD_MAX));
const passwords = { password: newPassword, confirm: repeat };
const samePasswords = (v: { password: string; confirm: string }) => v.password === v.confirm;
const differ = { message: "The two passwords differ.", path: ["confirm"] };

export const signInSchema = z.object({
  email,
  password: typedPassword(),
  redirectTo: z.string().max(2000).optional(),
});

export const signUpSchema = z.object({ name: personName, email, ...passwords }).refine(samePasswords, differ);

export const forgotSchema = z.object({ email });

export const resendSchema = z.object({ email: email.optional() });

export const resetSchema = z
  .object({ token: identifier("The link is incomplete. Open it again from the e-mail."), ...passwords })
  .refine(samePasswords, differ);

export const acceptSchema = z.object({ name: personName, ...passwords }).refine(samePasswords, differ);

export const changePasswordSchema = z
  .object({ intent: z.literal("change-password"), current: typedPassword("Enter your current password."), ...passwords })
  .refine(samePasswords, differ)
  .refine((v) => v.password !== v.current, { message: "Choose a password different from the current one.", path: ["password"] });

export const switchOrganizationSchema = z.object({ intent: z.literal("switch-organization"), organizationId: identifier() });
