// The organisation's billing settings row: its currency (default "eur") and the invoice counter.
import { eq } from "drizzle-orm";
import { db, schema, type Tx } from "~/infra/db.server";
import { DEFAULT_CURRENCY } from "./money";

const { billingSettings } = schema;

/** The settings row, made on first use. */
export async function billingSettingsOf(organizationId: string, tx: Tx | typeof db = db) {
  await tx.insert(billingSettings).values({ organizationId, currency: DEFAULT_CURRENCY }).onConflictDoNothing();
  const [row] = await tx.select().from(billingSettings).where(eq(billingSettings.organizationId, organizationId));
  return row;
}

/** The next invoice number, taken in the issuing transaction: the row stays locked until it commits, so numbers have no gaps. */
export async function takeInvoiceNumber(tx: Tx, organizationId: string) {
  await tx.insert(billingSettings).values({ organizationId, currency: DEFAULT_CURRENCY }).onConflictDoNothing();
  const [locked] = await tx.select().from(billingSettings).where(eq(billingSettings.organizationId, organizationId)).for("update");
  const next = locked.lastInvoiceNumber + 1;
  await tx.update(billingSettings).set({ lastInvoiceNumber: next, updatedAt: new Date() }).where(eq(billingSettings.organizationId, organizationId));
  return next;
}
