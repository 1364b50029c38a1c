// better-auth's endpoints that stay open, and the same Zod limits as our forms for their bodies,
// so a direct call to /api/auth/... accepts exactly what the pages accept.
import { z } from "zod";
import { emailAddress, newPassword, personName, typedPassword, identifier } from "~/lib/fields";
import { safeRedirect } from "./safe-redirect";

/** A same-site path for better-auth's callback and redirect fields. */
const sitePath = z
  .string({ error: "Send this as text." })
  .max(2000, "Use at most 2000 characters.")
  .refine((to) => safeRedirect(to, "") !== "", "Use a path on this site, such as /verified.");

const email = emailAddress();

/** Request bodies by endpoint path. Unknown fields are refused (`strict`). */
export const apiBodyRules: Record<string, z.ZodType> = {
  "/sign-up/email": z.strictObject({ name: personName, email, password: newPassword, callbackURL: sitePath.optional(), rememberMe: z.boolean().optional() }),
  "/sign-in/email": z.strictObject({ email, password: typedPassword(), callbackURL: sitePath.optional(), rememberMe: z.boolean().optional() }),
  "/request-password-reset": z.strictObject({ email, redirectTo: sitePath.optional() }),
  "/reset-password": z.strictObject({ newPassword, token: identifier("The link is incomplete.").optional() }),
  "/change-password": z.strictObject({
    currentPassword: typedPassword("Enter your current password."),
    newPassword,
    revokeOtherSessions: z.boolean().optional(),
  }),
  "/send-verification-email": z.strictObject({ email, callbackURL: sitePath.optional() }),
  "/sign-out": z.strictObject({}),
};

/** The endpoints the pages and e-mailed links use; every other path under /api/auth answers 404. */
const open: { method: "GET" | "POST"; path: RegExp }[] = [
  { method: "POST", path: /^\/sign-in\/email$/ },
  { method: "POST", path: /^\/sign-up\/email$/ },
  { method: "POST", path: /^\/sign-out$/ },
  { method: "GET", path: /^\/get-session$/ },
  { method: "GET", path: /^\/verify-email$/ },
  { method: "POST", path: /^\/send-verification-email$/ },
  { method: "POST", path: /^\/request-password-reset$/ },
  { method: "GET", path: /^\/reset-password\/[^/]+$/ },
  { method: "POST", path: /^\/reset-password$/ },
  { method: "POST", path: /^\/change-password$/ },
];

/** Whether `path` (below /api/auth) with `method` is one of the open endpoints. */
export function isOpenAuthEndpoint(method: string, path: string) {
  return open.some((e) => e.method === method.toUpperCase() && e.path.test(path));
}

/** The first problem of a refused body, naming its field: "name: Use at most 100 characters." */
export function describeIssues(error: z.ZodError): string {
  const issue = error.issues[0];
  if (!issue) return "The request is not valid.";
  if (issue.code === "unrecognized_keys") return `Unknown field${issue.keys.length > 1 ? "s" : ""}: ${issue.keys.join(", ")}.`;
  const field = issue.path.join(".");
  return field ? `${field}: ${issue.message}` : "Send a JSON object with the fields of this form.";
}
