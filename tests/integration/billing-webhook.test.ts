// The Stripe webhook below the browser (issue 10 §5, §7): signature checks on the raw body, each
// event stored once (replays and two deliveries at once write once), refunds that arrive before
// their payment, events for sessions that are not ours, a failure that rolls back and answers 500,
// the certificate issued on payment by the report's reviewer, and gap-free invoice numbers when
// many invoices are issued at once. Events are signed with the SDK's test-header helper.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { createInvoice, discardDraft, issueInvoice } from "~/features/billing/invoices.server";
import { db, schema } from "~/infra/db.server";
import { signPayload } from "~/infra/stripe.server";
import * as webhook from "~/routes/api/stripe/webhook";
import { createOrg, type Org } from "./fixtures";

let org: Org;
let clientId = "";
let siteId = "";
let assessmentId = "";
let reportId = "";

const post = (payload: string, signature?: string | null) => {
  const headers = new Headers({ "content-type": "application/json" });
  if (signature !== null) headers.set("stripe-signature", signature ?? signPayload(payload));
  return webhook.action({ request: new Request("http://127.0.0.1/api/stripe/webhook", { method: "POST", headers, body: payload }), params: {}, context: {} } as never) as Promise<Response>;
};
const event = (type: string, object: Record<string, unknown>, id = `evt_${randomUUID().replace(/-/g, "")}`) => JSON.stringify({ id, object: "event", type, created: Math.floor(Date.now() / 1000), data: { object }, livemode: false, api_version: "2026-11-18.endive" });
const sessionObject = (sessionId: string, checkoutId: string, amount: number, pi: string, extra: Record<string, unknown> = {}) => ({ id: sessionId, object: "checkout.session", amount_total: amount, currency: "eur", payment_status: "paid", status: "complete", payment_intent: pi, metadata: { checkoutId, organizationId: org.id }, ...extra });
const storedEvent = async (id: string) => (await db.select().from(schema.stripeEvent).where(eq(schema.stripeEvent.id, id)))[0];
const idOf = (payload: string) => (JSON.parse(payload) as { id: string }).id;

async function newCheckout(purpose: "invoice" | "certificate", amount: number, invoiceId: string | null = null) {
  const sessionId = `cs_test_${randomUUID().replace(/-/g, "")}`;
  const [row] = await db.insert(schema.checkout).values({ organizationId: org.id, clientId, purpose, invoiceId, siteId: purpose === "certificate" ? siteId : null, assessmentId: purpose === "certificate" ? assessmentId : null, amount, currency: "eur", stripeSessionId: sessionId }).returning();
  return { checkout: row, sessionId, pi: `pi_${randomUUID().replace(/-/g, "")}` };
}

async function openInvoice(total: number) {
  const [inv] = await db.insert(schema.invoice).values({ organizationId: org.id, clientId, currency: "eur", total, state: "open", issuedAt: new Date() }).returning();
  return inv;
}

beforeAll(async () => {
  org = await createOrg("billing-webhook");
  const [client] = await db.insert(schema.client).values({ organizationId: org.id, name: "Webhook client" }).returning();
  clientId = client.id;
  const [site] = await db.insert(schema.site).values({ organizationId: org.id, clientId, name: "Webhook site", kind: "rooftop" }).returning();
  siteId = site.id;
  const emptyPlan = { signs: [], barriers: [], zones: [], notes: "", basis: { signSource: "47 CFR §1.1307(b)(2) and (b)(4)", powerDownThresholdPercent: 5, accessReachM: 1 } };
  const [a] = await db.insert(schema.assessment).values({
    organizationId: org.id, siteId, name: "Webhook assessment", authorName: "Fixture", standard: "fcc", tier: "general", options: { standard: "fcc", tier: "general", gridStepM: 0.25, heights: { fromM: 0, toM: 2, count: 11 }, mode: "average", reflectionFactor: 1, defaultModel: "spherical" },
    site: { site: { name: "Webhook site", address: "", city: "" }, client: null }, inventory: { surfaces: [], emitters: [], obstructions: [], accessPoints: [], patterns: [] },
    runs: [], summary: { worstPercent: 0, worstAt: null, emitters: [], areas: [] }, results: { surfaces: [], emitters: [] }, engine: "isotrope-engine/1", mitigation: emptyPlan,
  }).returning();
  assessmentId = a.id;
  const [report] = await db.insert(schema.document).values({ organizationId: org.id, siteId, assessmentId, kind: "report", state: "issued", authorUserId: org.people.engineer.userId, authorName: "Engineer", reviewerUserId: org.people.reviewer.userId, reviewerName: "Reviewer Person", issuedAt: new Date(), code: `WEBHOOK-${randomUUID()}` }).returning();
  reportId = report.id;
});

describe("POST /api/stripe/webhook", () => {
  it("refuses a missing or wrong signature with 400 and stores nothing", async () => {
    const payload = event("checkout.session.completed", { id: "cs_nothing" });
    expect((await post(payload, null)).status).toBe(400);
    expect((await post(payload, "t=1,v1=deadbeef")).status).toBe(400);
    expect((await post(payload, signPayload(payload, "whsec_someone_else"))).status).toBe(400);
    // Signed over other bytes than those sent.
    expect((await post(payload.replace("cs_nothing", "cs_changed"), signPayload(payload))).status).toBe(400);
    expect(await storedEvent(idOf(payload))).toBeUndefined();
  });

  it("records a certificate payment and issues the certificate signed by the report's reviewer; a replay changes nothing", async () => {
    const { checkout, sessionId, pi } = await newCheckout("certificate", 4900);
    const payload = event("checkout.session.completed", sessionObject(sessionId, checkout.id, 4900, pi));
    const first = await post(payload);
    expect(first.status).toBe(200);
    expect(await first.json()).toMatchObject({ replay: false, outcome: "applied" });
    const payments = await db.select().from(schema.payment).where(eq(schema.payment.checkoutId, checkout.id));
    expect(payments).toHaveLength(1);
    expect(payments[0]).toMatchObject({ amount: 4900, currency: "eur", stripePaymentIntentId: pi, purpose: "certificate", state: "succeeded" });
    const [after] = await db.select().from(schema.checkout).where(eq(schema.checkout.id, checkout.id));
    expect(after.state).toBe("paid");
    const [cert] = await db.select().from(schema.document).where(eq(schema.document.id, after.documentId!));
    expect(cert).toMatchObject({ kind: "certificate", state: "issued", reviewerUserId: org.people.reviewer.userId, reviewerName: "Reviewer Person", assessmentId });
    expect(cert.expiresAt!.getTime()).toBeGreaterThan(cert.issuedAt!.getTime());
    const audits = await db.select().from(schema.auditEvent).where(and(eq(schema.auditEvent.subjectId, cert.id), eq(schema.auditEvent.action, "document.issued-on-payment")));
    expect(audits).toHaveLength(1);
    expect(audits[0].after).toMatchObject({ reportId, checkoutId: checkout.id });

    const replay = await post(payload);
    expect(replay.status).toBe(200);
    expect(await replay.json()).toMatchObject({ replay: true });
    expect(await db.select().from(schema.payment).where(eq(schema.payment.checkoutId, checkout.id))).toHaveLength(1);
    expect(await db.select().from(schema.document).where(and(eq(schema.document.assessmentId, assessmentId), eq(schema.document.kind, "certificate")))).toHaveLength(1);
  });

  it("a second paid checkout for the same assessment records the payment but issues no second certificate", async () => {
    const { checkout, sessionId, pi } = await newCheckout("certificate", 4900);
    const res = await post(event("checkout.session.completed", sessionObject(sessionId, checkout.id, 4900, pi)));
    expect(await res.json()).toMatchObject({ outcome: "applied", note: expect.stringContaining("already issued") });
    expect(await db.select().from(schema.document).where(and(eq(schema.document.assessmentId, assessmentId), eq(schema.document.kind, "certificate")))).toHaveLength(1);
  });

  it("applies a refund that arrives before its payment once the payment is recorded", async () => {
    const inv = await openInvoice(10000);
    const { checkout, sessionId, pi } = await newCheckout("invoice", 10000, inv.id);
    const refund = event("charge.refunded", { id: `ch_${randomUUID().slice(0, 8)}`, object: "charge", amount: 10000, amount_refunded: 4000, payment_intent: pi, refunds: { object: "list", data: [{ id: `re_${randomUUID().slice(0, 12)}`, amount: 4000, status: "succeeded" }] } });
    const early = await post(refund);
    expect(early.status).toBe(200);
    expect((await storedEvent(idOf(refund)))).toMatchObject({ outcome: "waiting", paymentIntentId: pi });

    expect((await post(event("checkout.session.completed", sessionObject(sessionId, checkout.id, 10000, pi)))).status).toBe(200);
    const [p] = await db.select().from(schema.payment).where(eq(schema.payment.checkoutId, checkout.id));
    expect(p).toMatchObject({ amount: 10000, amountRefunded: 4000, state: "partly_refunded" });
    expect(await db.select().from(schema.refund).where(eq(schema.refund.paymentId, p.id))).toHaveLength(1);
    const [invAfter] = await db.select().from(schema.invoice).where(eq(schema.invoice.id, inv.id));
    expect(invAfter).toMatchObject({ state: "partly_refunded", amountPaid: 10000, amountRefunded: 4000 });
    expect((await storedEvent(idOf(refund))).outcome).toBe("applied");

    // The full refund, then an older event with a smaller cumulative amount: the larger stands.
    await post(event("charge.refunded", { id: "ch_full", object: "charge", amount: 10000, amount_refunded: 10000, payment_intent: pi, refunds: { object: "list", data: [] } }));
    await post(event("charge.refunded", { id: "ch_old", object: "charge", amount: 10000, amount_refunded: 4000, payment_intent: pi, refunds: { object: "list", data: [] } }));
    const [invRefunded] = await db.select().from(schema.invoice).where(eq(schema.invoice.id, inv.id));
    expect(invRefunded).toMatchObject({ state: "refunded", amountRefunded: 10000 });
  });

  it("stores an event for an unknown session and an unknown type, and changes nothing", async () => {
    const unknown = event("checkout.session.completed", sessionObject("cs_not_ours", "no-such-checkout", 100, "pi_not_ours"));
    const res = await post(unknown);
    expect(res.status).toBe(200);
    expect(await storedEvent(idOf(unknown))).toMatchObject({ outcome: "ignored", note: expect.stringContaining("no checkout") });
    expect(await db.select().from(schema.payment).where(eq(schema.payment.stripePaymentIntentId, "pi_not_ours"))).toHaveLength(0);
    const other = event("customer.created", { id: "cus_1", object: "customer" });
    expect((await post(other)).status).toBe(200);
    expect(await storedEvent(idOf(other))).toMatchObject({ type: "customer.created", outcome: "ignored" });
  });

  it("writes once when the same event is delivered twice at once", async () => {
    const inv = await openInvoice(2500);
    const { checkout, sessionId, pi } = await newCheckout("invoice", 2500, inv.id);
    const payload = event("checkout.session.completed", sessionObject(sessionId, checkout.id, 2500, pi));
    const answers = await Promise.all([post(payload), post(payload), post(payload)]);
    expect(answers.map((r) => r.status)).toEqual([200, 200, 200]);
    const bodies = (await Promise.all(answers.map((r) => r.json()))) as { replay: boolean }[];
    expect(bodies.filter((b) => !b.replay)).toHaveLength(1);
    expect(await db.select().from(schema.payment).where(eq(schema.payment.checkoutId, checkout.id))).toHaveLength(1);
    const [after] = await db.select().from(schema.invoice).where(eq(schema.invoice.id, inv.id));
    expect(after).toMatchObject({ state: "paid", amountPaid: 2500 });
  });

  it("answers 500 and writes nothing when handling fails, so the event can be sent again", async () => {
    const inv = await openInvoice(3000);
    const used = await newCheckout("invoice", 3000, inv.id);
    await post(event("checkout.session.completed", sessionObject(used.sessionId, used.checkout.id, 3000, used.pi)));
    // A second checkout whose session names the same payment intent: the payment insert breaks its unique index.
    const clash = await newCheckout("invoice", 3000, inv.id);
    const payload = event("checkout.session.completed", sessionObject(clash.sessionId, clash.checkout.id, 3000, used.pi));
    const res = await post(payload);
    expect(res.status).toBe(500);
    expect(await storedEvent(idOf(payload))).toBeUndefined();
    const [c] = await db.select().from(schema.checkout).where(eq(schema.checkout.id, clash.checkout.id));
    expect(c.state).toBe("open");
  });

  it("marks a declined card's checkout failed and issues nothing", async () => {
    const { checkout, sessionId, pi } = await newCheckout("certificate", 4900);
    const payload = event("payment_intent.payment_failed", { id: pi, object: "payment_intent", status: "requires_payment_method", metadata: { checkoutId: checkout.id, organizationId: org.id, checkout_session_id: sessionId }, last_payment_error: { message: "Your card was declined." } });
    expect((await post(payload)).status).toBe(200);
    const [c] = await db.select().from(schema.checkout).where(eq(schema.checkout.id, checkout.id));
    expect(c).toMatchObject({ state: "failed", failureMessage: "Your card was declined.", documentId: null });
    expect(await db.select().from(schema.payment).where(eq(schema.payment.checkoutId, checkout.id))).toHaveLength(0);
  });

  it("finds a declined card's checkout from our own metadata alone, as Stripe sends it (no session id on the intent)", async () => {
    const { checkout, pi } = await newCheckout("invoice", 2500);
    const payload = event("payment_intent.payment_failed", { id: pi, object: "payment_intent", status: "requires_payment_method", metadata: { checkoutId: checkout.id, organizationId: org.id }, last_payment_error: { message: "Insufficient funds." } });
    expect((await post(payload)).status).toBe(200);
    const [c] = await db.select().from(schema.checkout).where(eq(schema.checkout.id, checkout.id));
    expect(c).toMatchObject({ state: "failed", failureMessage: "Insufficient funds." });
    // Another organisation's checkout id in the metadata finds nothing.
    const other = await newCheckout("invoice", 2500);
    const foreign = event("payment_intent.payment_failed", { id: other.pi, object: "payment_intent", status: "requires_payment_method", metadata: { checkoutId: other.checkout.id, organizationId: "another-organisation" } });
    expect((await post(foreign)).status).toBe(200);
    const [untouched] = await db.select().from(schema.checkout).where(eq(schema.checkout.id, other.checkout.id));
    expect(untouched.state).toBe("open");
  });
});

/** An organisation of its own with one client, billing in euros, and a rush surcharge of €50 on its price list. */
async function billingOrg(name: string) {
  const other = await createOrg(name);
  const [client] = await db.insert(schema.client).values({ organizationId: other.id, name: `${name} client` }).returning();
  await db.insert(schema.billingSettings).values({ organizationId: other.id, currency: "eur" });
  await db.insert(schema.price).values({ organizationId: other.id, kind: "rush_surcharge", name: "Rush surcharge", amount: 5000, currency: "eur" });
  return { other, client, actor: { organizationId: other.id, userId: other.people.billing.userId } };
}

describe("invoice numbers", () => {
  it("are gap-free and unique when many invoices are issued at once", async () => {
    const { other, client, actor } = await billingOrg("billing-numbers");
    const drafts = [];
    for (let i = 0; i < 12; i++) drafts.push(await createInvoice(actor, { clientId: client.id, assessmentIds: [], certificates: [], rush: true, notes: "" }));
    await Promise.all(drafts.map((d) => issueInvoice(actor, d.id)));
    const rows = await db.select({ number: schema.invoice.number }).from(schema.invoice).where(eq(schema.invoice.organizationId, other.id));
    expect(rows.map((r) => r.number).sort((x, y) => x! - y!)).toEqual(Array.from({ length: 12 }, (_, i) => i + 1));
    // Issuing twice is refused, and takes no number.
    await expect(issueInvoice(actor, drafts[0].id)).rejects.toMatchObject({ status: 409 });
    const [settings] = await db.select().from(schema.billingSettings).where(eq(schema.billingSettings.organizationId, other.id));
    expect(settings.lastInvoiceNumber).toBe(12);
  });
});

describe("a draft invoice", () => {
  it("can be discarded, lines and all, with an audit record; an issued one cannot, nor another organisation's", async () => {
    const { client, actor } = await billingOrg("billing-discard");
    const [draft, kept] = [await createInvoice(actor, { clientId: client.id, assessmentIds: [], certificates: [], rush: true, notes: "typo" }), await createInvoice(actor, { clientId: client.id, assessmentIds: [], certificates: [], rush: true, notes: "" })];
    // Not from another organisation (404), and nothing changes.
    await expect(discardDraft({ organizationId: org.id, userId: org.people.billing.userId }, draft.id)).rejects.toMatchObject({ status: 404 });
    await discardDraft(actor, draft.id);
    expect(await db.select().from(schema.invoice).where(eq(schema.invoice.id, draft.id))).toEqual([]);
    expect(await db.select().from(schema.invoiceLine).where(eq(schema.invoiceLine.invoiceId, draft.id))).toEqual([]);
    const [audit] = await db.select().from(schema.auditEvent).where(and(eq(schema.auditEvent.subjectId, draft.id), eq(schema.auditEvent.action, "invoice.discarded")));
    expect(audit.before).toMatchObject({ state: "draft", total: 5000, lines: [{ description: "Rush surcharge: priority handling", amount: 5000 }] });
    // Issued: refused, and it stays.
    await issueInvoice(actor, kept.id);
    await expect(discardDraft(actor, kept.id)).rejects.toMatchObject({ status: 409 });
    expect(await db.select({ id: schema.invoice.id }).from(schema.invoice).where(eq(schema.invoice.id, kept.id))).toHaveLength(1);
  });
});
