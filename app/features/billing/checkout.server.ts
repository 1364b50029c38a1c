// Opening a Stripe Checkout Session for what a client member buys: an open invoice of its client,
// or the certificate of an assessment whose report is issued. Our checkout row is written first
// (its id travels in the session's metadata and client_reference_id), then the session is made and
// its id stored; the webhook (webhook.server) records the payment. Nothing is issued here.
import { and, desc, eq } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { env } from "~/infra/env.server";
import { stripe } from "~/infra/stripe.server";
import { DomainError } from "~/lib/domain-error";
import { canPay } from "./invoice-state";
import { invoiceNumberText, requireInvoice } from "./invoices.server";
import { activePrice } from "./prices.server";

const { checkout } = schema;
export type CheckoutRow = typeof checkout.$inferSelect;
export type Buyer = { organizationId: string; clientId: string | null; role: string; userId: string; email: string };

const base = () => env.APP_URL.replace(/\/$/, "");

type Open = Pick<CheckoutRow, "organizationId" | "clientId" | "purpose" | "invoiceId" | "siteId" | "assessmentId" | "amount" | "currency">;

async function openSession(buyer: Buyer, row: Open, line: { name: string; price?: string }, urls: { success: string; cancel: string }) {
  const [made] = await db.insert(checkout).values({ ...row, createdByUserId: buyer.userId }).returning();
  const metadata = { checkoutId: made.id, organizationId: row.organizationId, purpose: row.purpose, ...(row.invoiceId ? { invoiceId: row.invoiceId } : {}), ...(row.assessmentId ? { assessmentId: row.assessmentId } : {}) };
  try {
    const session = await stripe.checkout.sessions.create({
      mode: "payment",
      line_items: [line.price ? { price: line.price, quantity: 1 } : { price_data: { currency: row.currency, unit_amount: row.amount, product_data: { name: line.name } }, quantity: 1 }],
      success_url: `${urls.success}${urls.success.includes("?") ? "&" : "?"}session_id={CHECKOUT_SESSION_ID}`,
      cancel_url: urls.cancel,
      client_reference_id: made.id,
      customer_email: buyer.email,
      metadata,
      payment_intent_data: { metadata },
    });
    await db.update(checkout).set({ stripeSessionId: session.id, updatedAt: new Date() }).where(eq(checkout.id, made.id));
    if (!session.url) throw new Error("the session has no URL");
    return session.url;
  } catch (error) {
    console.error("[billing] opening a checkout failed:", error instanceof Error ? error.message : error);
    await db.update(checkout).set({ state: "failed", failureMessage: "The payment page could not be opened.", updatedAt: new Date() }).where(eq(checkout.id, made.id));
    throw new DomainError("The payment service is not answering; nothing was charged. Try again in a moment.", 502);
  }
}

/** The checkout page's URL for paying an open invoice of the buyer's client. */
export async function checkoutForInvoice(buyer: Buyer, invoiceId: string) {
  const inv = await requireInvoice(buyer, invoiceId);
  if (!canPay(inv.state)) throw new DomainError(inv.state === "void" ? "This invoice was voided; there is nothing to pay." : "This invoice has been paid.", 409);
  const page = `${base()}/portal/invoices/${inv.id}`;
  return openSession(buyer, { organizationId: inv.organizationId, clientId: inv.clientId, purpose: "invoice", invoiceId: inv.id, siteId: null, assessmentId: null, amount: inv.total, currency: inv.currency }, { name: `Invoice ${invoiceNumberText(inv.number)}` }, { success: `${page}?paid=1`, cancel: `${page}?cancelled=1` });
}

/** What a client member sees before buying a certificate: the assessment, its issued report, the fee, and any certificate already issued. */
export async function certificateOffer(buyer: Pick<Buyer, "organizationId" | "clientId" | "role">, siteId: string, assessmentId: string) {
  if (buyer.role !== "client" || !buyer.clientId) throw new DomainError("No such assessment.", 404);
  const [found] = await db
    .select({ assessment: schema.assessment, site: schema.site })
    .from(schema.assessment)
    .innerJoin(schema.site, eq(schema.site.id, schema.assessment.siteId))
    .where(and(eq(schema.assessment.id, assessmentId), eq(schema.assessment.siteId, siteId), eq(schema.site.organizationId, buyer.organizationId), eq(schema.site.clientId, buyer.clientId)));
  if (!found) throw new DomainError("No such assessment.", 404);
  const docs = await db.select({ id: schema.document.id, kind: schema.document.kind, state: schema.document.state, reviewerUserId: schema.document.reviewerUserId, reviewerName: schema.document.reviewerName, renderStatus: schema.document.renderStatus, code: schema.document.code })
    .from(schema.document).where(and(eq(schema.document.assessmentId, assessmentId), eq(schema.document.state, "issued"))).orderBy(desc(schema.document.issuedAt));
  const report = docs.find((d) => d.kind === "report") ?? null;
  const certificate = docs.find((d) => d.kind === "certificate") ?? null;
  const fee = await activePrice(buyer.organizationId, "certificate_fee");
  return { assessment: { id: found.assessment.id, name: found.assessment.name, createdAt: found.assessment.createdAt }, site: { id: found.site.id, name: found.site.name }, report, certificate, fee };
}

/** The checkout page's URL for a certificate of an assessment whose report is issued. */
export async function checkoutForCertificate(buyer: Buyer, siteId: string, assessmentId: string) {
  const offer = await certificateOffer(buyer, siteId, assessmentId);
  if (!offer.report) throw new DomainError("This assessment has no issued report yet, so no certificate can be bought for it.", 409);
  if (offer.certificate) throw new DomainError("This assessment already has an issued certificate: download it below.", 409);
  // The fee goes as price_data (amount and name from our price list): a Stripe Price id would be stale after the local fake restarts.
  if (!offer.fee) throw new DomainError("Certificates are not on sale yet: the consultancy has not set a certificate fee.", 409);
  const page = `${base()}/portal/sites/${siteId}/assessments/${assessmentId}/certificate`;
  return openSession(buyer, { organizationId: buyer.organizationId, clientId: buyer.clientId!, purpose: "certificate", invoiceId: null, siteId, assessmentId, amount: offer.fee.amount, currency: offer.fee.currency }, { name: offer.fee.name }, { success: `${page}/paid`, cancel: `${page}?cancelled=1` });
}

/** A checkout as its buyer's client may see it (the success page polls this). */
export async function checkoutStatus(buyer: Pick<Buyer, "organizationId" | "clientId">, sessionId: string) {
  if (!buyer.clientId) return null;
  const [row] = await db.select().from(checkout).where(and(eq(checkout.stripeSessionId, sessionId), eq(checkout.organizationId, buyer.organizationId), eq(checkout.clientId, buyer.clientId)));
  return row ?? null;
}

/** The client's assessments whose report is issued, with the certificate issued for each (if any). */
export async function certificateList(buyer: Pick<Buyer, "organizationId" | "clientId" | "role">) {
  if (buyer.role !== "client" || !buyer.clientId) return [];
  const rows = await db
    .select({ assessmentId: schema.assessment.id, assessmentName: schema.assessment.name, siteId: schema.site.id, siteName: schema.site.name, kind: schema.document.kind, documentId: schema.document.id, issuedAt: schema.document.issuedAt })
    .from(schema.document)
    .innerJoin(schema.assessment, eq(schema.assessment.id, schema.document.assessmentId))
    .innerJoin(schema.site, eq(schema.site.id, schema.assessment.siteId))
    .where(and(eq(schema.site.organizationId, buyer.organizationId), eq(schema.site.clientId, buyer.clientId), eq(schema.document.state, "issued")))
    .orderBy(desc(schema.document.issuedAt));
  const byAssessment = new Map<string, { assessmentId: string; assessmentName: string; siteId: string; siteName: string; reportIssuedAt: Date | null; certificateId: string | null }>();
  for (const r of rows) {
    const entry = byAssessment.get(r.assessmentId) ?? { assessmentId: r.assessmentId, assessmentName: r.assessmentName, siteId: r.siteId, siteName: r.siteName, reportIssuedAt: null, certificateId: null };
    if (r.kind === "report" && !entry.reportIssuedAt) entry.reportIssuedAt = r.issuedAt;
    if (r.kind === "certificate" && !entry.certificateId) entry.certificateId = r.documentId;
    byAssessment.set(r.assessmentId, entry);
  }
  return [...byAssessment.values()].filter((e) => e.reportIssuedAt);
}

/** The newest checkout of this assessment by the buyer's client (what the cancel page reports). */
export async function latestCertificateCheckout(buyer: Pick<Buyer, "organizationId" | "clientId">, assessmentId: string) {
  if (!buyer.clientId) return null;
  const [row] = await db.select().from(checkout).where(and(eq(checkout.organizationId, buyer.organizationId), eq(checkout.clientId, buyer.clientId), eq(checkout.assessmentId, assessmentId))).orderBy(desc(checkout.createdAt)).limit(1);
  return row ?? null;
}
