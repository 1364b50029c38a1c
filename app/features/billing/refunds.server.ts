// Refunds by the billing member: all or part of what is left of a payment, through the SDK. The
// refund's row and the payment's refunded amount are written here; the charge.refunded event that
// follows (in any order) carries the cumulative amount, so the two never count a refund twice.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { stripe } from "~/infra/stripe.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import { refreshInvoice } from "./invoice-money.server";
import { formatMoney } from "./money";

const { payment, refund } = schema;

export async function refundPayment(actor: Actor, input: { paymentId: string; amount: number; reason: string }) {
  const [p] = await db.select().from(payment).where(and(eq(payment.id, input.paymentId), eq(payment.organizationId, actor.organizationId)));
  if (!p) throw new DomainError("There is no such payment.", 404);
  const left = p.amount - p.amountRefunded;
  if (left <= 0) throw new DomainError("This payment has been refunded in full.", 409, "amount");
  if (input.amount > left) throw new DomainError(`At most ${formatMoney(left, p.currency)} is left to refund.`, 400, "amount");
  let made: { id: string; amount: number };
  try {
    made = await stripe.refunds.create({ payment_intent: p.stripePaymentIntentId, amount: input.amount, metadata: { paymentId: p.id, organizationId: p.organizationId } }, { idempotencyKey: `refund-${p.id}-${randomUUID()}` });
  } catch (error) {
    console.error("[billing] refund failed:", error instanceof Error ? error.message : error);
    throw new DomainError("The payment service refused the refund; nothing was refunded.", 502);
  }
  return db.transaction(async (tx) => {
    const [locked] = await tx.select().from(payment).where(eq(payment.id, p.id)).for("update");
    const refunded = Math.min(locked.amount, Math.max(locked.amountRefunded, p.amountRefunded + made.amount));
    const state = refunded >= locked.amount ? "refunded" : "partly_refunded";
    await tx.update(payment).set({ amountRefunded: refunded, state, updatedAt: new Date() }).where(eq(payment.id, p.id));
    await tx.insert(refund).values({ organizationId: p.organizationId, paymentId: p.id, stripeRefundId: made.id, amount: made.amount, reason: input.reason, createdByUserId: actor.userId }).onConflictDoUpdate({ target: refund.stripeRefundId, set: { reason: input.reason, createdByUserId: actor.userId } });
    await auditChange(tx, actor, { action: "payment.refunded", entity: "payment", entityId: p.id, before: { amountRefunded: locked.amountRefunded, currency: locked.currency }, after: { amountRefunded: refunded, refund: made.amount, currency: locked.currency, reason: input.reason } });
    if (p.invoiceId) await refreshInvoice(tx, p.invoiceId);
    return { refunded, state };
  });
}
