// The local payment fake (mocks/stripe/), driven with the official SDK against the instance the
// stack started (STRIPE_API_BASE), with a small local HTTP server standing in for the portal's
// webhook. Signatures are checked with the SDK's own stripe.webhooks.constructEvent.
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";

const base = process.env.STRIPE_API_BASE;
if (!base) throw new Error("STRIPE_API_BASE is not set: run through `npm run with-stack -- npx vitest run …`.");
const secretKey = process.env.STRIPE_SECRET_KEY || "sk_test_isotrope_local";
const webhookSecret = process.env.STRIPE_WEBHOOK_SECRET || "whsec_isotrope_local";
const api = new URL(base);
const stripe = new Stripe(secretKey, {
  host: api.hostname,
  port: Number(api.port),
  protocol: api.protocol === "https:" ? "https" : "http",
  maxNetworkRetries: 0,
});

// ---------- the stand-in webhook receiver ----------

type Received = { headers: Record<string, string | string[] | undefined>; body: string; event: Stripe.Event };
const received: Received[] = [];
/** Deliveries to answer with another status than 200, once each (the first matching rule is used up). */
const answers: { match: (r: Received) => boolean; status: number }[] = [];
let receiver: Server;
let receiverUrl = "";
let previousUrl: string | null = null;

async function setWebhook(url: string | null) {
  const response = await fetch(`${base}/_fake/webhook`, { method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify({ url }) });
  expect(response.status).toBe(200);
}

beforeAll(async () => {
  receiver = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      const body = Buffer.concat(chunks).toString("utf8");
      const delivery: Received = { headers: req.headers, body, event: JSON.parse(body) };
      received.push(delivery);
      const rule = answers.findIndex((a) => a.match(delivery));
      const status = rule < 0 ? 200 : answers.splice(rule, 1)[0].status;
      res.writeHead(status, { "content-type": "application/json" }).end('{"received":true}');
    });
  });
  await new Promise<void>((resolve) => receiver.listen(0, "127.0.0.1", resolve));
  receiverUrl = `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/api/stripe/webhook`;
  previousUrl = (await (await fetch(`${base}/_fake/webhook`)).json()).url;
  await setWebhook(receiverUrl);
});

afterAll(async () => {
  await setWebhook(previousUrl);
  await new Promise((resolve) => receiver.close(resolve));
});

beforeEach(() => {
  answers.length = 0;
});

/** Waits until the receiver holds `count` deliveries matching; fails after 15 s. */
async function deliveries(match: (r: Received) => boolean, count = 1): Promise<Received[]> {
  for (let i = 0; i < 150; i++) {
    const found = received.filter(match);
    if (found.length >= count) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`expected ${count} matching webhook deliveries, got ${received.filter(match).length}`);
}

const forSession = (type: string, sessionId: string) => (r: Received) =>
  r.event.type === type && (r.event.data.object as { id?: string; metadata?: Record<string, string> }).id === sessionId;

function verify(r: Received): Stripe.Event {
  return stripe.webhooks.constructEvent(r.body, String(r.headers["stripe-signature"]), webhookSecret);
}

// ---------- helpers ----------

async function newSession(extra: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
  return stripe.checkout.sessions.create({
    mode: "payment",
    success_url: "http://127.0.0.1:9/done?session={CHECKOUT_SESSION_ID}",
    cancel_url: "http://127.0.0.1:9/cancelled",
    line_items: [{ quantity: 1, price_data: { currency: "eur", unit_amount: 12_000, product_data: { name: "Compliance certificate" } } }],
    customer_email: "client@example.test",
    client_reference_id: "assessment-42",
    metadata: { organization_id: "org-1", purpose: "certificate" },
    payment_intent_data: { metadata: { assessment_id: "42" } },
    ...extra,
  });
}

/** Presses a button of the hosted page the way the browser submits its form. */
async function press(session: Stripe.Checkout.Session, outcome: "pay" | "decline" | "cancel") {
  const page = await fetch(session.url!);
  expect(page.status).toBe(200);
  const html = await page.text();
  expect(html).toContain(`value="${outcome}"`);
  const action = new URL(html.match(/<form method="post"(?: action="([^"]*)")?/)?.[1] ?? session.url!, session.url!);
  return fetch(action, { method: "POST", body: new URLSearchParams({ outcome }), redirect: "manual" });
}

async function paid() {
  const session = await newSession();
  const answer = await press(session, "pay");
  expect(answer.status).toBe(303);
  const [delivery] = await deliveries(forSession("checkout.session.completed", session.id));
  const completed = verify(delivery).data.object as Stripe.Checkout.Session;
  return { session, completed, paymentIntentId: completed.payment_intent as string };
}

// ---------- tests ----------

describe("payment fake: Checkout Sessions", () => {
  it("creates a session shaped as Stripe's, with a hosted page URL on loopback", async () => {
    const session = await newSession();
    expect(session.id).toMatch(/^cs_test_[A-Za-z0-9]+$/);
    expect(session).toMatchObject({
      object: "checkout.session",
      mode: "payment",
      status: "open",
      payment_status: "unpaid",
      amount_total: 12_000,
      currency: "eur",
      customer_email: "client@example.test",
      client_reference_id: "assessment-42",
      metadata: { organization_id: "org-1", purpose: "certificate" },
      payment_intent: null,
      livemode: false,
      success_url: "http://127.0.0.1:9/done?session={CHECKOUT_SESSION_ID}",
    });
    expect(session.url).toBe(`${base}/checkout/pay/${session.id}`);
    expect(session.expires_at - session.created).toBe(24 * 3600);

    const again = await stripe.checkout.sessions.retrieve(session.id, { expand: ["line_items"] });
    expect(again.id).toBe(session.id);
    expect(again.line_items?.data).toHaveLength(1);
    expect(again.line_items?.data[0]).toMatchObject({ object: "item", description: "Compliance certificate", quantity: 1, amount_total: 12_000, currency: "eur" });
    const items = await stripe.checkout.sessions.listLineItems(session.id);
    expect(items.data.map((i) => i.price?.unit_amount)).toEqual([12_000]);
  });

  it("takes line items from prices stored in the fake (product names included) and sums quantities", async () => {
    const product = await stripe.products.create({ name: "Site assessment" });
    const price = await stripe.prices.create({ product: product.id, currency: "eur", unit_amount: 45_000 });
    const session = await newSession({
      line_items: [
        { price: price.id, quantity: 2 },
        { quantity: 1, price_data: { currency: "eur", unit_amount: 2_500, product_data: { name: "Rush surcharge" } } },
      ],
    });
    expect(session.amount_total).toBe(92_500);
    const items = await stripe.checkout.sessions.listLineItems(session.id);
    expect(items.data.map((i) => [i.description, i.price?.id === price.id, i.amount_total])).toEqual([
      ["Site assessment", true, 90_000],
      ["Rush surcharge", false, 2_500],
    ]);
  });

  it("serves the hosted page: items as text, the total, the three buttons, labelled as a local test page", async () => {
    const session = await newSession({
      line_items: [{ quantity: 3, price_data: { currency: "eur", unit_amount: 1_050, product_data: { name: "Fee <script>alert(1)</script> Ω" } } }],
    });
    const response = await fetch(session.url!);
    expect(response.headers.get("content-type")).toMatch(/^text\/html/);
    const html = await response.text();
    expect(html).toContain("Local test payment page");
    expect(html).toContain("Fee &lt;script&gt;alert(1)&lt;/script&gt; Ω");
    expect(html).not.toContain("<script>");
    expect(html).toContain("€31.50");
    expect(html).toContain("Pay with test card");
    expect(html).toContain("Card declined");
    expect(html).toContain(">Cancel<");
  });

  it("lists sessions, filtered by payment_intent", async () => {
    const { session, paymentIntentId } = await paid();
    const list = await stripe.checkout.sessions.list({ payment_intent: paymentIntentId });
    expect(list.data.map((s) => s.id)).toEqual([session.id]);
    const withItems = await stripe.checkout.sessions.list({ payment_intent: paymentIntentId, expand: ["data.line_items"] });
    expect(withItems.data[0].line_items?.data[0].description).toBe("Compliance certificate");
    const recent = await stripe.checkout.sessions.list({ limit: 2 });
    expect(recent.data).toHaveLength(2);
    expect(recent.has_more).toBe(true);
  });

  it("replays a POST with the same Idempotency-Key", async () => {
    const params: Stripe.Checkout.SessionCreateParams = {
      mode: "payment",
      success_url: "http://127.0.0.1:9/done",
      line_items: [{ quantity: 1, price_data: { currency: "eur", unit_amount: 500, product_data: { name: "Once" } } }],
    };
    const key = `test-${Date.now()}-${Math.random()}`;
    const a = await stripe.checkout.sessions.create(params, { idempotencyKey: key });
    const b = await stripe.checkout.sessions.create(params, { idempotencyKey: key });
    expect(b.id).toBe(a.id);
  });
});

describe("payment fake: products and prices for a price list", () => {
  it("creates, renames and archives products and prices; filters by active and lookup key", async () => {
    const tag = `t${Date.now()}${Math.random().toString(36).slice(2, 6)}`;
    const product = await stripe.products.create({ name: "Certificate fee", metadata: { kind: "certificate" } });
    expect(product.active).toBe(true);
    const price = await stripe.prices.create({ product: product.id, currency: "eur", unit_amount: 12_000, lookup_key: `${tag}-certificate` });
    expect(price).toMatchObject({ active: true, unit_amount: 12_000, currency: "eur", product: product.id, type: "one_time" });
    expect((await stripe.prices.list({ lookup_keys: [`${tag}-certificate`] })).data.map((p) => p.id)).toEqual([price.id]);

    const renamed = await stripe.products.update(product.id, { name: "Certificate of compliance", metadata: { version: "2" } });
    expect(renamed).toMatchObject({ name: "Certificate of compliance", metadata: { kind: "certificate", version: "2" } });
    const replacement = await stripe.prices.create({ product: product.id, currency: "eur", unit_amount: 13_000 });
    await stripe.prices.update(price.id, { active: false });
    const live = await stripe.prices.list({ product: product.id, active: true });
    expect(live.data.map((p) => p.id)).toEqual([replacement.id]);

    await stripe.products.update(product.id, { active: false });
    const activeProducts = await stripe.products.list({ active: true, limit: 100 });
    expect(activeProducts.data.map((p) => p.id)).not.toContain(product.id);
    await expect(
      stripe.checkout.sessions.create({ mode: "payment", success_url: "http://127.0.0.1:9/done", line_items: [{ price: price.id, quantity: 1 }] }),
    ).rejects.toMatchObject({ statusCode: 400, param: "line_items[0][price]" });
  });
});

describe("payment fake: paying, declining, cancelling, expiring", () => {
  it("pay: completes the session, posts a signed checkout.session.completed, redirects to success_url", async () => {
    const session = await newSession();
    const answer = await press(session, "pay");
    expect(answer.status).toBe(303);
    expect(answer.headers.get("location")).toBe(`http://127.0.0.1:9/done?session=${session.id}`);

    const [delivery] = await deliveries(forSession("checkout.session.completed", session.id));
    expect(delivery.headers["content-type"]).toMatch(/^application\/json/);
    const event = verify(delivery);
    expect(event.id).toMatch(/^evt_/);
    expect(event).toMatchObject({ object: "event", type: "checkout.session.completed", livemode: false });
    expect(typeof event.api_version).toBe("string");
    expect(typeof event.created).toBe("number");
    const completed = event.data.object as Stripe.Checkout.Session;
    expect(completed).toMatchObject({ id: session.id, status: "complete", payment_status: "paid", amount_total: 12_000, metadata: session.metadata });
    expect(completed.payment_intent).toMatch(/^pi_/);

    const stored = await stripe.checkout.sessions.retrieve(session.id);
    expect(stored).toMatchObject({ status: "complete", payment_status: "paid", payment_intent: completed.payment_intent, url: null });
    const expanded = await stripe.checkout.sessions.retrieve(session.id, { expand: ["payment_intent.latest_charge"] });
    expect(((expanded.payment_intent as Stripe.PaymentIntent).latest_charge as Stripe.Charge).amount).toBe(12_000);

    const intent = await stripe.paymentIntents.retrieve(completed.payment_intent as string);
    expect(intent).toMatchObject({ object: "payment_intent", status: "succeeded", amount: 12_000, amount_received: 12_000, currency: "eur" });
    expect(intent.metadata).toEqual({ organization_id: "org-1", purpose: "certificate", assessment_id: "42", checkout_session_id: session.id });
    const charge = await stripe.charges.retrieve(intent.latest_charge as string);
    expect(charge).toMatchObject({ amount: 12_000, currency: "eur", paid: true, payment_intent: intent.id });

    // The page of a paid session says so; paying it again only redirects, with no second event.
    expect(await (await fetch(`${base}/checkout/pay/${session.id}`)).text()).toContain("Payment complete");
    const again = await fetch(`${base}/checkout/pay/${session.id}`, { method: "POST", body: new URLSearchParams({ outcome: "pay" }), redirect: "manual" });
    expect(again.status).toBe(303);
    const sent = (await (await fetch(`${base}/_fake/events?type=checkout.session.completed`)).json()) as { data: { event: Stripe.Event }[] };
    expect(sent.data.filter((e) => (e.event.data.object as { id: string }).id === session.id)).toHaveLength(1);
  });

  it("signs exactly as the SDK's test header helper does, and a wrong secret fails verification", async () => {
    const { session } = await paid();
    const [delivery] = await deliveries(forSession("checkout.session.completed", session.id));
    const header = String(delivery.headers["stripe-signature"]);
    const timestamp = Number(/t=(\d+)/.exec(header)?.[1]);
    expect(header).toBe(stripe.webhooks.generateTestHeaderString({ payload: delivery.body, secret: webhookSecret, timestamp }));
    expect(() => stripe.webhooks.constructEvent(delivery.body, header, "whsec_some_other_secret")).toThrow(/signature/i);
    expect(() => stripe.webhooks.constructEvent(delivery.body.replace('"paid"', '"unpaid"'), header, webhookSecret)).toThrow(/signature/i);
  });

  it("card declined: posts payment_intent.payment_failed, leaves the session open, redirects to cancel_url; paying later reuses the intent", async () => {
    const session = await newSession();
    const answer = await press(session, "decline");
    expect(answer.status).toBe(303);
    expect(answer.headers.get("location")).toBe("http://127.0.0.1:9/cancelled");

    const [delivery] = await deliveries((r) => r.event.type === "payment_intent.payment_failed" && (r.event.data.object as Stripe.PaymentIntent).metadata.checkout_session_id === session.id);
    const failed = verify(delivery).data.object as Stripe.PaymentIntent;
    expect(failed.id).toMatch(/^pi_/);
    expect(failed).toMatchObject({ status: "requires_payment_method", amount: 12_000, last_payment_error: { code: "card_declined", type: "card_error" } });
    expect(failed.metadata).toMatchObject({ assessment_id: "42", checkout_session_id: session.id });

    const stored = await stripe.checkout.sessions.retrieve(session.id);
    expect(stored).toMatchObject({ status: "open", payment_status: "unpaid" });
    expect((await stripe.checkout.sessions.list({ payment_intent: failed.id })).data.map((s) => s.id)).toEqual([session.id]);

    await press(stored, "pay");
    const [done] = await deliveries(forSession("checkout.session.completed", session.id));
    expect((verify(done).data.object as Stripe.Checkout.Session).payment_intent).toBe(failed.id);
    expect((await stripe.paymentIntents.retrieve(failed.id)).status).toBe("succeeded");
  });

  it("cancel: redirects to cancel_url and posts nothing", async () => {
    const session = await newSession();
    const answer = await press(session, "cancel");
    expect(answer.status).toBe(303);
    expect(answer.headers.get("location")).toBe("http://127.0.0.1:9/cancelled");
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe("open");
    const sent = (await (await fetch(`${base}/_fake/events`)).json()) as { data: { event: Stripe.Event }[] };
    const mentions = sent.data.filter((e) => JSON.stringify(e.event.data.object).includes(session.id));
    expect(mentions).toEqual([]);
  });

  it("expire: marks the session expired, posts checkout.session.expired; the page and a second expire refuse", async () => {
    const session = await newSession();
    const expired = await stripe.checkout.sessions.expire(session.id);
    expect(expired).toMatchObject({ id: session.id, status: "expired", payment_status: "unpaid", url: null });
    const [delivery] = await deliveries(forSession("checkout.session.expired", session.id));
    expect((verify(delivery).data.object as Stripe.Checkout.Session).status).toBe("expired");

    await expect(stripe.checkout.sessions.expire(session.id)).rejects.toMatchObject({ statusCode: 400, type: "StripeInvalidRequestError" });
    const page = await fetch(`${base}/checkout/pay/${session.id}`);
    expect(page.status).toBe(410);
    expect(await page.text()).toContain("expired");
    const pay = await fetch(`${base}/checkout/pay/${session.id}`, { method: "POST", body: new URLSearchParams({ outcome: "pay" }), redirect: "manual" });
    expect(pay.status).toBe(410);
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe("unpaid");
  });
});

describe("payment fake: refunds", () => {
  it("refunds part then the rest by payment_intent, posting charge.refunded each time", async () => {
    const { paymentIntentId } = await paid();
    const intent = await stripe.paymentIntents.retrieve(paymentIntentId);
    const chargeId = intent.latest_charge as string;
    const byCharge = (amountRefunded: number) => (r: Received) =>
      r.event.type === "charge.refunded" && (r.event.data.object as Stripe.Charge).id === chargeId && (r.event.data.object as Stripe.Charge).amount_refunded === amountRefunded;

    const half = await stripe.refunds.create({ payment_intent: paymentIntentId, amount: 6_000, metadata: { invoice: "INV-7" } });
    expect(half).toMatchObject({ object: "refund", amount: 6_000, currency: "eur", status: "succeeded", payment_intent: paymentIntentId, charge: chargeId, metadata: { invoice: "INV-7" } });
    const [first] = await deliveries(byCharge(6_000));
    const charge1 = verify(first).data.object as Stripe.Charge;
    expect(charge1).toMatchObject({ amount: 12_000, amount_refunded: 6_000, refunded: false, payment_intent: paymentIntentId });
    expect(charge1.metadata).toMatchObject({ assessment_id: "42" });

    const rest = await stripe.refunds.create({ payment_intent: paymentIntentId });
    expect(rest.amount).toBe(6_000);
    const [second] = await deliveries(byCharge(12_000));
    expect(verify(second).data.object).toMatchObject({ amount_refunded: 12_000, refunded: true });

    const listed = await stripe.refunds.list({ payment_intent: paymentIntentId });
    expect(listed.data.map((r) => r.id).sort()).toEqual([half.id, rest.id].sort());
    expect((await stripe.refunds.retrieve(half.id)).payment_intent).toBe(paymentIntentId);

    await expect(stripe.refunds.create({ payment_intent: paymentIntentId })).rejects.toMatchObject({ statusCode: 400, code: "charge_already_refunded" });
  });

  it("refunds by charge, and refuses more than what is left", async () => {
    const { paymentIntentId } = await paid();
    const chargeId = (await stripe.paymentIntents.retrieve(paymentIntentId)).latest_charge as string;
    await expect(stripe.refunds.create({ charge: chargeId, amount: 12_001 })).rejects.toMatchObject({ statusCode: 400, param: "amount" });
    const refund = await stripe.refunds.create({ charge: chargeId, amount: 100 });
    expect(refund).toMatchObject({ amount: 100, payment_intent: paymentIntentId });
    const charge = await stripe.charges.retrieve(chargeId);
    expect(charge).toMatchObject({ amount_refunded: 100, refunded: false });
  });
});

describe("payment fake: webhook delivery", () => {
  it("retries after a 5xx answer, with the same event", async () => {
    const session = await newSession();
    answers.push({ match: forSession("checkout.session.completed", session.id), status: 503 });
    await press(session, "pay");
    const both = await deliveries(forSession("checkout.session.completed", session.id), 2);
    expect(both[1].event.id).toBe(both[0].event.id);
    verify(both[1]);
    const log = (await (await fetch(`${base}/_fake/events/${both[0].event.id}`)).json()) as { deliveries: { status: number | null }[] };
    expect(log.deliveries.map((d) => d.status)).toEqual([503, 200]);
  });

  it("retries while the portal is unreachable, then delivers", async () => {
    const closed = createServer();
    await new Promise<void>((resolve) => closed.listen(0, "127.0.0.1", resolve));
    const deadUrl = `http://127.0.0.1:${(closed.address() as AddressInfo).port}/api/stripe/webhook`;
    await new Promise((resolve) => closed.close(resolve));
    await setWebhook(deadUrl);
    let session: Stripe.Checkout.Session;
    try {
      session = await newSession();
      await press(session, "pay");
    } finally {
      await setWebhook(receiverUrl);
    }
    const [delivery] = await deliveries(forSession("checkout.session.completed", session.id));
    const log = (await (await fetch(`${base}/_fake/events/${delivery.event.id}`)).json()) as { deliveries: { status: number | null; error: string | null }[] };
    expect(log.deliveries[0]).toMatchObject({ status: null, error: "ECONNREFUSED" });
    expect(log.deliveries.at(-1)?.status).toBe(200);
  });

  it("resends an event on request (same id and body, a fresh valid signature), and serves it on /v1/events", async () => {
    const { session } = await paid();
    const [first] = await deliveries(forSession("checkout.session.completed", session.id));
    const response = await fetch(`${base}/_fake/events/${first.event.id}/resend`, { method: "POST" });
    expect(response.status).toBe(200);
    expect(await response.json()).toMatchObject({ id: first.event.id, delivered: true });
    const both = await deliveries(forSession("checkout.session.completed", session.id), 2);
    expect(both[1].body).toBe(first.body);
    expect(verify(both[1]).id).toBe(first.event.id);

    const fetched = await stripe.events.retrieve(first.event.id);
    expect(fetched).toMatchObject({ id: first.event.id, type: "checkout.session.completed" });
    expect((await fetch(`${base}/_fake/events/evt_missing/resend`, { method: "POST" })).status).toBe(404);
  });
});

describe("payment fake: errors as Stripe's", () => {
  const line = { quantity: 1, price_data: { currency: "eur", unit_amount: 1_000, product_data: { name: "Fee" } } };
  const base0 = { mode: "payment" as const, success_url: "http://127.0.0.1:9/done" };
  const rejects = (params: unknown, match: Record<string, unknown>) =>
    expect(stripe.checkout.sessions.create(params as Stripe.Checkout.SessionCreateParams)).rejects.toMatchObject({ type: "StripeInvalidRequestError", statusCode: 400, ...match });

  it("refuses a wrong API key with 401", async () => {
    const other = new Stripe("sk_test_not_the_right_key", { host: api.hostname, port: Number(api.port), protocol: "http", maxNetworkRetries: 0 });
    await expect(other.checkout.sessions.list()).rejects.toMatchObject({ type: "StripeAuthenticationError", statusCode: 401 });
    await expect(other.customers.list()).rejects.toMatchObject({ statusCode: 401 });
  });

  it("answers 400 with the parameter for bad session parameters", async () => {
    await rejects({ success_url: "http://127.0.0.1:9/done", line_items: [line] }, { param: "mode", code: "parameter_missing" });
    await rejects({ ...base0, mode: "subscription", line_items: [line] }, { param: "mode" });
    await rejects({ ...base0 }, { param: "line_items" });
    await rejects({ ...base0, line_items: [line], colour: "red" }, { param: "colour" });
    await rejects({ ...base0, success_url: "not a url", line_items: [line] }, { param: "success_url" });
    await rejects({ ...base0, line_items: [{ ...line, price: "price_x" }] }, { param: "line_items[0]" });
    await rejects({ ...base0, line_items: [{ quantity: 1, price: "price_missing" }] }, { param: "line_items[0][price]", code: "resource_missing" });
    await rejects({ ...base0, line_items: [{ price_data: line.price_data }] }, { param: "line_items[0][quantity]" });
    await rejects({ ...base0, line_items: [{ ...line, quantity: 0 }] }, { param: "line_items[0][quantity]" });
    await rejects({ ...base0, line_items: [{ quantity: 1, price_data: { currency: "eur", unit_amount: 1_000, product_data: { name: "" } } }] }, { param: "line_items[0][price_data][product_data][name]" });
    await rejects({ ...base0, line_items: [line, { quantity: 1, price_data: { ...line.price_data, currency: "usd" } }] }, { param: "line_items" });
    await rejects({ ...base0, line_items: [{ quantity: 1, price_data: { ...line.price_data, unit_amount: 10 } }] }, { code: "amount_too_small" });
    await rejects({ ...base0, line_items: [line], customer_email: "nobody" }, { param: "customer_email" });
    await rejects({ ...base0, line_items: [line], metadata: { ["k".repeat(41)]: "v" } }, { param: `metadata[${"k".repeat(41)}]` });
    await rejects({ ...base0, line_items: [line], expires_at: Math.floor(Date.now() / 1000) + 60 }, { param: "expires_at" });
    await rejects({ ...base0, line_items: [line], expires_at: Math.floor(Date.now() / 1000) + 25 * 3600 }, { param: "expires_at" });
  });

  it("answers 404 for unknown ids, 400 for refunds of unknown or unpaid payments", async () => {
    await expect(stripe.checkout.sessions.retrieve("cs_test_missing")).rejects.toMatchObject({ statusCode: 404, code: "resource_missing" });
    await expect(stripe.checkout.sessions.listLineItems("cs_test_missing")).rejects.toMatchObject({ statusCode: 404 });
    await expect(stripe.paymentIntents.retrieve("pi_missing")).rejects.toMatchObject({ statusCode: 404, code: "resource_missing" });
    await expect(stripe.refunds.create({ payment_intent: "pi_missing" })).rejects.toMatchObject({ statusCode: 400, code: "resource_missing", param: "payment_intent" });
    await expect(stripe.refunds.create({ amount: 100 } as Stripe.RefundCreateParams)).rejects.toMatchObject({ statusCode: 400 });

    const session = await newSession();
    await press(session, "decline");
    const failed = (await stripe.checkout.sessions.retrieve(session.id)).payment_intent as string;
    await expect(stripe.refunds.create({ payment_intent: failed })).rejects.toMatchObject({ statusCode: 400, param: "payment_intent" });
    expect((await fetch(`${base}/checkout/pay/cs_test_missing`)).status).toBe(404);
  });
});

describe("payment fake: expiry at expires_at", () => {
  it("expires an open session once its time has passed, posting checkout.session.expired", async () => {
    // A second fake in this process, so that its clock can be moved forward.
    const { createFakeStripeApp } = await import("../../mocks/stripe/app.mjs");
    const { app } = createFakeStripeApp({ secretKey, webhookSecret, webhookUrl: receiverUrl, publicBase: "http://127.0.0.1:0", retryDelaysMs: [], redirectWaitMs: 0 });
    const server = await new Promise<Server>((resolve) => {
      const s = app.listen(0, "127.0.0.1", () => resolve(s));
    });
    const port = (server.address() as AddressInfo).port;
    const local = new Stripe(secretKey, { host: "127.0.0.1", port, protocol: "http", maxNetworkRetries: 0 });
    const realNow = Date.now;
    try {
      const session = await local.checkout.sessions.create({
        mode: "payment",
        success_url: "http://127.0.0.1:9/done",
        line_items: [{ quantity: 1, price_data: { currency: "eur", unit_amount: 900, product_data: { name: "Soon gone" } } }],
        expires_at: Math.floor(realNow() / 1000) + 31 * 60,
      });
      expect((await local.checkout.sessions.retrieve(session.id)).status).toBe("open");
      Date.now = () => realNow() + 32 * 60 * 1000;
      const later = await local.checkout.sessions.retrieve(session.id);
      expect(later).toMatchObject({ status: "expired", url: null });
      const [delivery] = await deliveries(forSession("checkout.session.expired", session.id));
      expect(verify(delivery).type).toBe("checkout.session.expired");
    } finally {
      Date.now = realNow;
      await new Promise((resolve) => server.close(resolve));
    }
  });
});
