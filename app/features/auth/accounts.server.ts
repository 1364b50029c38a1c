// Accounts by e-mail address, and the state of password-reset links.
import { and, eq, gt } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";

const { user, verification } = schema;

export async function accountExists(email: string) {
  const [row] = await db.select({ id: user.id }).from(user).where(eq(user.email, email.toLowerCase()));
  return Boolean(row);
}

/** Whether a password-reset token is one better-auth issued and has neither used nor let expire. */
export async function resetLinkIsLive(token: string) {
  if (!token || token.length > 200) return false;
  const [row] = await db
    .select({ id: verification.id })
    .from(verification)
    .where(and(eq(verification.identifier, `reset-password:${token}`), gt(verification.expiresAt, new Date())));
  return Boolean(row);
}
