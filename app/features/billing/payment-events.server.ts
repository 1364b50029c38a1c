// What each Stripe event we handle changes, inside the webhook's one transaction. Each answers
// its outcome: applied, ignored (not ours, already done, or a type we do not handle) or waiting
// (a refund whose payment has not been recorded yet: applied when checkout.session.completed
// arrives, since a charge carries its cumulative amount_refunded the order does not matter).
import { and, eq } from "drizzle-orm";
import type Stripe from "stripe";
import { schema, type Tx } from "~/infra/db.server";
import type { StripeEventOutcome } from "~/infra/db/schema/billing";
import { issueCertificateOnPayment } from "./certificate-on-payment.server";
import { refreshInvoice } from "./invoice-money.server";

const { checkout, payment, refund, stripeEvent } = schema;

export type Applied = { outcome: StripeEventOutcome; note?: string; paymentIntentId?: string | null; renderDocumentId?: string };
const idOf = (v: string | { id: string } | null | undefined) => (v == null ? null : typeof v === "string" ? v : v.id);

/** Our checkout for a session: by its id, else by the checkoutId we put in its metadata (same organisation). */
async function lockCheckout(tx: Tx, session: { id: string; metadata?: Stripe.Metadata | null }) {
  const [bySession] = await tx.select().from(checkout).where(eq(checkout.stripeSessionId, session.id)).for("update");
  if (bySession) return bySession;
  const meta = session.metadata ?? {};
  if (!meta.checkoutId || !meta.organizationId) return null;
  const [byMeta] = await tx.select().from(checkout).where(and(eq(checkout.id, meta.checkoutId), eq(checkout.organizationId, meta.organizationId))).for("update");
  if (!byMeta || (byMeta.stripeSessionId && byMeta.stripeSessionId !== session.id)) return null;
  return byMeta;
}

export async function sessionCompleted(tx: Tx, event: Stripe.Event, session: Stripe.Checkout.Session): Promise<Applied> {
  const c = await lockCheckout(tx, session);
  if (!c) return { outcome: "ignored", note: "no checkout of ours has this session" };
  if (c.state === "paid") return { outcome: "ignored", note: "this checkout is already paid" };
  if (session.payment_status !== "paid") return { outcome: "ignored", note: `payment status ${session.payment_status}` };
  const intentId = idOf(session.payment_intent);
  if (!intentId) return { outcome: "ignored", note: "the session names no payment intent" };
  if (session.amount_total !== c.amount || session.currency !== c.currency) return { outcome: "ignored", note: `amount ${session.amount_total} ${session.currency} is not the checkout's ${c.amount} ${c.currency}` };
  const [paid] = await tx
    .insert(payment)
    .values({ organizationId: c.organizationId, clientId: c.clientId, checkoutId: c.id, purpose: c.purpose, invoiceId: c.invoiceId, stripePaymentIntentId: intentId, amount: c.amount, currency: c.currency, paidAt: new Date(event.created * 1000) })
    .returning();
  let documentId: string | null = null;
  let note = "";
  if (c.purpose === "certificate" && c.siteId && c.assessmentId) {
    const issued = await issueCertificateOnPayment(tx, { organizationId: c.organizationId, siteId: c.siteId, assessmentId: c.assessmentId, checkoutId: c.id, paymentId: paid.id });
    documentId = issued.documentId;
    if (issued.documentId === null) note = `paid; no certificate issued: ${issued.note}`;
  }
  await tx.update(checkout).set({ state: "paid", stripeSessionId: session.id, documentId, failureMessage: null, updatedAt: new Date() }).where(eq(checkout.id, c.id));
  await tx.insert(schema.auditEvent).values({ organizationId: c.organizationId, actorUserId: c.createdByUserId, action: "payment.received", subjectType: "payment", subjectId: paid.id, before: null, after: { amount: c.amount, currency: c.currency, purpose: c.purpose, invoiceId: c.invoiceId, assessmentId: c.assessmentId, event: event.id } });
  // Refunds that arrived before this payment was known.
  const waiting = await tx.select().from(stripeEvent).where(and(eq(stripeEvent.paymentIntentId, intentId), eq(stripeEvent.outcome, "waiting"))).for("update");
  for (const w of waiting) {
    const charge = (w.payload as { data: { object: Stripe.Charge } }).data.object;
    await chargeRefunded(tx, charge);
    await tx.update(stripeEvent).set({ outcome: "applied", note: `applied after ${event.id}`, appliedAt: new Date() }).where(eq(stripeEvent.id, w.id));
  }
  if (c.invoiceId) await refreshInvoice(tx, c.invoiceId);
  return { outcome: "applied", note, paymentIntentId: intentId, renderDocumentId: documentId ?? undefined };
}

export async function chargeRefunded(tx: Tx, charge: Stripe.Charge): Promise<Applied> {
  const intentId = idOf(charge.payment_intent);
  if (!intentId) return { outcome: "ignored", note: "the charge names no payment intent" };
  const [p] = await tx.select().from(payment).where(eq(payment.stripePaymentIntentId, intentId)).for("update");
  if (!p) return { outcome: "waiting", note: "no payment recorded for this payment intent yet", paymentIntentId: intentId };
  const refunded = Math.min(p.amount, Math.max(p.amountRefunded, charge.amount_refunded));
  const state = refunded <= 0 ? "succeeded" : refunded >= p.amount ? "refunded" : "partly_refunded";
  await tx.update(payment).set({ amountRefunded: refunded, state, updatedAt: new Date() }).where(eq(payment.id, p.id));
  for (const r of charge.refunds?.data ?? []) {
    if (r.status === "failed" || r.status === "canceled") continue;
    await tx.insert(refund).values({ organizationId: p.organizationId, paymentId: p.id, stripeRefundId: r.id, amount: r.amount }).onConflictDoNothing();
  }
  if (p.invoiceId) await refreshInvoice(tx, p.invoiceId);
  return { outcome: "applied", paymentIntentId: intentId };
}

export async function sessionExpired(tx: Tx, session: Stripe.Checkout.Session): Promise<Applied> {
  const c = await lockCheckout(tx, session);
  if (!c) return { outcome: "ignored", note: "no checkout of ours has this session" };
  if (c.state === "paid") return { outcome: "ignored", note: "the checkout was paid" };
  await tx.update(checkout).set({ state: "expired", updatedAt: new Date() }).where(eq(checkout.id, c.id));
  return { outcome: "applied" };
}

/** A failed payment's checkout: Stripe puts only payment_intent_data.metadata (our checkoutId) on the
 * PaymentIntent; the local fake also names the session (checkout_session_id). */
async function checkoutOfIntent(tx: Tx, meta: Stripe.Metadata) {
  if (meta.checkout_session_id) {
    const bySession = await lockCheckout(tx, { id: meta.checkout_session_id, metadata: meta });
    if (bySession) return bySession;
  }
  if (!meta.checkoutId || !meta.organizationId) return null;
  const [byMeta] = await tx.select().from(checkout).where(and(eq(checkout.id, meta.checkoutId), eq(checkout.organizationId, meta.organizationId))).for("update");
  return byMeta ?? null;
}

export async function paymentFailed(tx: Tx, intent: Stripe.PaymentIntent): Promise<Applied> {
  const c = await checkoutOfIntent(tx, intent.metadata ?? {});
  if (!c) return { outcome: "ignored", note: "no checkout of ours has this payment intent" };
  if (c.state === "paid") return { outcome: "ignored", note: "the checkout was paid" };
  const message = intent.last_payment_error?.message ?? "The card was declined.";
  await tx.update(checkout).set({ state: "failed", failureMessage: message.slice(0, 300), updatedAt: new Date() }).where(eq(checkout.id, c.id));
  return { outcome: "applied", paymentIntentId: intent.id };
}
