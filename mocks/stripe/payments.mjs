// What the hosted page's buttons do: a successful payment (PaymentIntent + a real charge in
// stripe-stateful-mock, so refunds work) or a declined card. Each posts its event.
import { createRequire } from "node:module";
import { newId, now } from "./util.mjs";

const require = createRequire(import.meta.url);
const { charges } = require("stripe-stateful-mock/dist/api/charges");

/** The PaymentIntent of this session, created on the first attempt and reused by the next. */
function intentFor(state, record) {
  const { session, intentData } = record;
  const existing = session.payment_intent && state.intents.get(session.payment_intent);
  if (existing) return existing;
  const intent = {
    id: newId("pi", 24),
    object: "payment_intent",
    amount: session.amount_total,
    amount_capturable: 0,
    amount_received: 0,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: "automatic_async",
    client_secret: null,
    confirmation_method: "automatic",
    created: now(),
    currency: session.currency,
    customer: session.customer,
    description: intentData.description,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    // The session's metadata, then payment_intent_data.metadata, then the session id. (On Stripe itself
    // only payment_intent_data.metadata reaches the PaymentIntent: put there what the portal needs.)
    metadata: { ...session.metadata, ...intentData.metadata, checkout_session_id: session.id },
    payment_method: null,
    payment_method_types: ["card"],
    receipt_email: intentData.receipt_email ?? session.customer_email,
    status: "requires_payment_method",
  };
  intent.client_secret = `${intent.id}_secret_${newId("x", 24).slice(2)}`;
  state.intents.set(intent.id, intent);
  session.payment_intent = intent.id;
  return intent;
}

function customerDetails(session) {
  return { address: null, email: session.customer_email, name: null, phone: null, tax_exempt: "none", tax_ids: [] };
}

/** Pays an open session with the test card; returns the delivery of checkout.session.completed. */
export function paySession(state, record) {
  const { session } = record;
  const intent = intentFor(state, record);
  const charge = charges.create("acct_default", {
    amount: String(intent.amount),
    currency: intent.currency,
    source: "tok_visa",
    description: intent.description ?? undefined,
    receipt_email: intent.receipt_email ?? undefined,
    metadata: intent.metadata,
  });
  charge.payment_intent = intent.id;
  charge.billing_details.email = session.customer_email;
  Object.assign(intent, {
    status: "succeeded",
    amount_received: intent.amount,
    latest_charge: charge.id,
    payment_method: newId("pm", 24),
    last_payment_error: null,
  });
  Object.assign(session, { status: "complete", payment_status: "paid", url: null, customer_details: customerDetails(session) });
  return state.events.emit("checkout.session.completed", session);
}

/** A declined test card: the PaymentIntent fails, the session stays open. */
export function declineSession(state, record) {
  const intent = intentFor(state, record);
  const paymentMethod = newId("pm", 24);
  Object.assign(intent, {
    status: "requires_payment_method",
    payment_method: null,
    last_payment_error: {
      code: "card_declined",
      decline_code: "generic_decline",
      doc_url: "https://docs.stripe.com/error-codes/card-declined",
      message: "Your card was declined.",
      payment_method: { id: paymentMethod, object: "payment_method", type: "card", card: { brand: "visa", last4: "0002" } },
      type: "card_error",
    },
  });
  return state.events.emit("payment_intent.payment_failed", intent);
}
