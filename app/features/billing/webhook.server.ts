// POST /api/stripe/webhook: the signature is checked over the raw body (none or a wrong one: 400,
// nothing written); the event is stored once by its id in the same transaction that applies it,
// so a replay finds it and changes nothing (200), two deliveries at once wait on the id's unique
// index and only one writes, and a failure rolls everything back and answers 500 (Stripe retries).
import { eq } from "drizzle-orm";
import type Stripe from "stripe";
import { queueRender } from "~/features/documents/jobs.server";
import { db, schema, type Tx } from "~/infra/db.server";
import { verifiedEvent } from "~/infra/stripe.server";
import { chargeRefunded, paymentFailed, sessionCompleted, sessionExpired, type Applied } from "./payment-events.server";

export type WebhookAnswer = { status: number; body: Record<string, unknown> };

export async function receiveWebhook(raw: Buffer, signature: string | null): Promise<WebhookAnswer> {
  if (!signature) return { status: 400, body: { error: { message: "The Stripe-Signature header is missing." } } };
  let event: Stripe.Event;
  try {
    event = verifiedEvent(raw, signature);
  } catch {
    return { status: 400, body: { error: { message: "The signature does not match this body." } } };
  }
  const result = await handleEvent(event);
  return { status: 200, body: { received: true, id: event.id, ...result } };
}

/** Stores and applies one verified event; answers whether it was new and what came of it. */
export async function handleEvent(event: Stripe.Event) {
  const result = await db.transaction(async (tx) => {
    const stored = await tx
      .insert(schema.stripeEvent)
      .values({ id: event.id, type: event.type, outcome: "ignored", payload: event as unknown as Record<string, unknown> })
      .onConflictDoNothing()
      .returning({ id: schema.stripeEvent.id });
    if (!stored.length) return { replay: true as const };
    const applied = await apply(tx, event);
    await tx
      .update(schema.stripeEvent)
      .set({ outcome: applied.outcome, note: applied.note ?? "", paymentIntentId: applied.paymentIntentId ?? null, appliedAt: applied.outcome === "applied" ? new Date() : null })
      .where(eq(schema.stripeEvent.id, event.id));
    return { replay: false as const, ...applied };
  });
  if (!result.replay && result.renderDocumentId) {
    // After the commit; a render left queued (the enqueue failed) is queued again by the workers' sweep (requeueStranded).
    await queueRender(result.renderDocumentId).catch((e) => console.error("[billing] queueing the certificate render failed:", e));
  }
  return result.replay ? { replay: true } : { replay: false, outcome: result.outcome, note: result.note ?? "" };
}

function apply(tx: Tx, event: Stripe.Event): Promise<Applied> {
  switch (event.type) {
    case "checkout.session.completed":
      return sessionCompleted(tx, event, event.data.object);
    case "checkout.session.expired":
      return sessionExpired(tx, event.data.object);
    case "charge.refunded":
      return chargeRefunded(tx, event.data.object);
    case "payment_intent.payment_failed":
      return paymentFailed(tx, event.data.object);
    default:
      return Promise.resolve({ outcome: "ignored", note: "a type we do not handle" });
  }
}
