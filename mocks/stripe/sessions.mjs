// Checkout Sessions (mode=payment): creation with Stripe's checks, lazy expiry at expires_at,
// and the state changes the hosted page makes. Kept in memory by the fake's state object.
import { createRequire } from "node:module";
import { invalid, missingParam, noSuch, RestError } from "./errors.mjs";
import { resolveLineItems } from "./line-items.mjs";
import { currency as currencyParam, email, integer, isObject, metadata, rejectUnknown, string, url } from "./params.mjs";
import { newId, now } from "./util.mjs";

const require = createRequire(import.meta.url);
const { verify } = require("stripe-stateful-mock/dist/api/verify");
const { customers } = require("stripe-stateful-mock/dist/api/customers");

// Parameters Stripe accepts on create. The ones the fake acts on are read below; the rest are
// accepted (so portal code that works against Stripe works here) and have no effect.
const KNOWN = [
  "mode", "line_items", "success_url", "cancel_url", "customer_email", "customer", "client_reference_id",
  "metadata", "payment_intent_data", "expires_at", "expand", "currency", "locale", "submit_type",
  "payment_method_types", "billing_address_collection", "customer_creation", "allow_promotion_codes",
  "invoice_creation", "phone_number_collection", "custom_text", "ui_mode", "after_expiration", "automatic_tax",
  "consent_collection", "payment_method_options", "tax_id_collection", "custom_fields",
];
const PI_DATA = ["metadata", "description", "receipt_email", "statement_descriptor", "statement_descriptor_suffix", "capture_method", "setup_future_usage"];

// Stripe's minimum charge amounts in minor units ("Minimum and maximum charge amounts", Stripe docs); others: 50.
const MINIMUM = { usd: 50, eur: 50, gbp: 30, aud: 50, cad: 50, chf: 50, jpy: 50, nzd: 50, sgd: 50, brl: 50, inr: 50, dkk: 250, nok: 300, sek: 300, hkd: 400, pln: 200, czk: 1500, huf: 17500, mxn: 1000, ron: 200, bgn: 100, aed: 200, thb: 1000, myr: 200 };

export function createSession(state, params) {
  if (!isObject(params)) params = {};
  rejectUnknown(params, KNOWN);
  if (params.mode === undefined) throw missingParam("mode");
  if (params.mode !== "payment") throw invalid(`The local payment fake supports mode=payment only (got '${params.mode}').`, "mode");
  if (params.ui_mode !== undefined && params.ui_mode !== "hosted") throw invalid("The local payment fake supports ui_mode=hosted only.", "ui_mode");
  if (params.success_url === undefined) throw missingParam("success_url");
  const successUrl = url(params.success_url, "success_url");
  const cancelUrl = params.cancel_url === undefined ? null : url(params.cancel_url, "cancel_url");
  const items = resolveLineItems(params.line_items);
  const currency = items[0].currency;
  if (params.currency !== undefined && currencyParam(params.currency, "currency") !== currency) throw invalid("`currency` does not match the line items' currency.", "currency");
  if (!verify.validCurrencies.includes(currency)) throw invalid(`Invalid currency: ${currency}.`, "line_items[0][price_data][currency]");
  const amount = items.reduce((sum, item) => sum + item.amount_total, 0);
  const minimum = MINIMUM[currency] ?? 50;
  if (amount < minimum) throw invalid(`The Checkout Session's total amount due must add up to at least ${minimum} ${currency} (minor units).`, "line_items", "amount_too_small");
  if (amount > 99_999_999) throw invalid("The Checkout Session's total amount due must be no more than 99999999 (minor units).", "line_items", "amount_too_large");

  let customer = null;
  if (params.customer !== undefined) {
    try {
      customer = customers.retrieve("acct_default", String(params.customer), "customer").id;
    } catch (error) {
      if (error instanceof RestError) throw noSuch("customer", params.customer, "customer", 400);
      throw error;
    }
    if (params.customer_email !== undefined) throw invalid("You may only specify one of these parameters: customer, customer_email.", "customer_email");
  }
  const customerEmail = params.customer_email === undefined ? null : email(params.customer_email, "customer_email");
  const clientReferenceId = params.client_reference_id === undefined ? null : string(params.client_reference_id, "client_reference_id", 200);
  const created = now();
  let expiresAt = created + 24 * 3600;
  if (params.expires_at !== undefined) {
    expiresAt = integer(params.expires_at, "expires_at");
    if (expiresAt < created + 30 * 60 - 5) throw invalid("The `expires_at` timestamp must be at least 30 minutes from Checkout Session creation.", "expires_at");
    if (expiresAt > created + 24 * 3600) throw invalid("The `expires_at` timestamp must be less than 24 hours from Checkout Session creation.", "expires_at");
  }
  const piData = params.payment_intent_data ?? {};
  if (!isObject(piData)) throw invalid("Invalid object", "payment_intent_data");
  rejectUnknown(piData, PI_DATA, "payment_intent_data[");
  const piMetadata = metadata(piData.metadata, "payment_intent_data[metadata]");

  const id = newId("cs_test", 58);
  const session = {
    id,
    object: "checkout.session",
    after_expiration: null,
    allow_promotion_codes: null,
    amount_subtotal: amount,
    amount_total: amount,
    automatic_tax: { enabled: false, liability: null, status: null },
    billing_address_collection: null,
    cancel_url: cancelUrl,
    client_reference_id: clientReferenceId,
    client_secret: null,
    created,
    currency,
    custom_fields: [],
    customer,
    customer_creation: customer ? null : "if_required",
    customer_details: null,
    customer_email: customerEmail,
    expires_at: expiresAt,
    invoice: null,
    livemode: false,
    locale: typeof params.locale === "string" ? params.locale : null,
    metadata: metadata(params.metadata),
    mode: "payment",
    payment_intent: null,
    payment_link: null,
    payment_method_collection: "if_required",
    payment_method_types: ["card"],
    payment_status: "unpaid",
    status: "open",
    submit_type: typeof params.submit_type === "string" ? params.submit_type : null,
    success_url: successUrl,
    total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
    ui_mode: "hosted",
    url: `${state.config.publicBase}/checkout/pay/${id}`,
  };
  const intentData = {
    metadata: piMetadata,
    description: typeof piData.description === "string" ? piData.description : null,
    receipt_email: typeof piData.receipt_email === "string" ? piData.receipt_email : null,
  };
  state.sessions.set(id, { session, items, intentData });
  return session;
}

/** The stored record, after expiring it if its time has passed (Stripe expires sessions on its own). */
export function findSession(state, id) {
  const record = state.sessions.get(String(id));
  if (!record) return null;
  if (record.session.status === "open" && now() >= record.session.expires_at) expireSession(state, record);
  return record;
}

export function requireSession(state, id, param) {
  const record = findSession(state, id);
  if (!record) throw noSuch("checkout.session", id, param);
  return record;
}

/** open → expired, and posts checkout.session.expired. */
export function expireSession(state, record) {
  record.session.status = "expired";
  record.session.url = null;
  return state.events.emit("checkout.session.expired", record.session);
}

export function allSessions(state) {
  return [...state.sessions.keys()].map((id) => findSession(state, id).session).reverse();
}
