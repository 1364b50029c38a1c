// An invoice's paid and refunded amounts, summed from its payments, and the state they give.
import { eq, sql } from "drizzle-orm";
import { schema, type Tx } from "~/infra/db.server";
import { stateAfterPayment } from "./invoice-state";

const { invoice, payment } = schema;

/** Recomputes the invoice's money and state from its payments (a void invoice stays void). */
export async function refreshInvoice(tx: Tx, invoiceId: string) {
  const [inv] = await tx.select().from(invoice).where(eq(invoice.id, invoiceId)).for("update");
  if (!inv) return null;
  const [sums] = await tx
    .select({ paid: sql<number>`coalesce(sum(${payment.amount}), 0)::int`, refunded: sql<number>`coalesce(sum(${payment.amountRefunded}), 0)::int`, last: sql<Date | null>`max(${payment.paidAt})` })
    .from(payment)
    .where(eq(payment.invoiceId, invoiceId));
  const state = inv.state === "void" || inv.state === "draft" ? inv.state : stateAfterPayment(inv.total, sums.paid, sums.refunded);
  const paidAt = sums.paid >= inv.total && sums.last ? new Date(sums.last) : inv.paidAt;
  const [after] = await tx.update(invoice).set({ amountPaid: sums.paid, amountRefunded: sums.refunded, state, paidAt, updatedAt: new Date() }).where(eq(invoice.id, invoiceId)).returning();
  return { before: inv, after };
}
