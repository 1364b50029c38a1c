// Accounts by e-mail address.
import { eq } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";

const { user } = schema;

export async function accountExists(email: string) {
  const [row] = await db.select({ id: user.id }).from(user).where(eq(user.email, email.toLowerCase()));
  return Boolean(row);
}
