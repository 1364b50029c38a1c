// Invoices: a draft made from a client's assessments and the price list; issuing takes the next
// number (gap-free, settings.server) in the same transaction and sends it with its pay link; the
// billing member may void it while unpaid. Its money follows the webhook (webhook.server).
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { queueMails } from "~/features/documents/jobs.server";
import { db, schema } from "~/infra/db.server";
import type { InvoiceState } from "~/infra/db/schema/billing";
import { env } from "~/infra/env.server";
import { stripe } from "~/infra/stripe.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import { canVoid } from "./invoice-state";
import { invoiceNumberText } from "./json";
export { invoiceNumberText };
import { invoiceMail } from "./mails";
import { activePrice } from "./prices.server";
import type { InvoiceCreateInput } from "./schemas";
import { billingSettingsOf, takeInvoiceNumber } from "./settings.server";

const { invoice, invoiceLine, client } = schema;
export type InvoiceRow = typeof invoice.$inferSelect;
export type InvoiceLineRow = typeof invoiceLine.$inferSelect;
/** Who reads invoices: the organisation's billing side, or one client's member. */
export type InvoiceScope = { organizationId: string; clientId: string | null; role: string };

const base = () => env.APP_URL.replace(/\/$/, "");
export const payUrl = (id: string) => `${base()}/portal/invoices/${id}`;
export const invoicePdfUrl = (id: string) => `${base()}/billing/invoices/${id}/pdf`;

function scoped(scope: InvoiceScope) {
  if (scope.role === "client") return scope.clientId ? and(eq(invoice.organizationId, scope.organizationId), eq(invoice.clientId, scope.clientId), inArray(invoice.state, ["open", "paid", "partly_refunded", "refunded", "void"])) : undefined;
  return eq(invoice.organizationId, scope.organizationId);
}

export async function listInvoices(scope: InvoiceScope, filter: { state?: InvoiceState; clientId?: string } = {}) {
  const where = scoped(scope);
  if (!where) return [];
  return db
    .select({ invoice, clientName: client.name })
    .from(invoice)
    .innerJoin(client, eq(client.id, invoice.clientId))
    .where(and(where, filter.state ? eq(invoice.state, filter.state) : undefined, filter.clientId ? eq(invoice.clientId, filter.clientId) : undefined))
    .orderBy(desc(invoice.createdAt))
    .limit(500);
}

/** The invoice with its lines and client, or 404 (another organisation's, another client's, or a client's view of a draft). */
export async function requireInvoice(scope: InvoiceScope, id: string) {
  const where = scoped(scope);
  const [row] = where ? await db.select({ invoice, client }).from(invoice).innerJoin(client, eq(client.id, invoice.clientId)).where(and(where, eq(invoice.id, id))) : [];
  if (!row) throw new DomainError("There is no such invoice.", 404);
  const lines = await db.select().from(invoiceLine).where(eq(invoiceLine.invoiceId, id)).orderBy(asc(invoiceLine.position));
  return { ...row.invoice, client: row.client, lines };
}

/** A client's assessments that may go on an invoice: newest first, with their site. */
export async function invoiceableAssessments(organizationId: string, clientId: string) {
  return db
    .select({ id: schema.assessment.id, name: schema.assessment.name, siteName: schema.site.name, createdAt: schema.assessment.createdAt })
    .from(schema.assessment)
    .innerJoin(schema.site, eq(schema.site.id, schema.assessment.siteId))
    .where(and(eq(schema.assessment.organizationId, organizationId), eq(schema.site.clientId, clientId)))
    .orderBy(desc(schema.assessment.createdAt))
    .limit(200);
}

/** A draft invoice: one assessment-fee line per assessment, one certificate-fee line per certificate, a rush surcharge if asked. */
export async function createInvoice(actor: Actor, input: InvoiceCreateInput) {
  const [owner] = await db.select().from(client).where(and(eq(client.id, input.clientId), eq(client.organizationId, actor.organizationId)));
  if (!owner) throw new DomainError("Choose one of your clients.", 400, "clientId");
  const available = new Map((await invoiceableAssessments(actor.organizationId, owner.id)).map((a) => [a.id, a]));
  const pick = (ids: string[]) => [...new Set(ids)].map((id) => {
    const a = available.get(id);
    if (!a) throw new DomainError("Choose assessments of this client's sites.", 400, "assessmentIds");
    return a;
  });
  const assessments = pick(input.assessmentIds);
  const certificates = pick(input.certificates);
  const settings = await billingSettingsOf(actor.organizationId);
  const lines: Omit<InvoiceLineRow, "id" | "invoiceId">[] = [];
  const add = async (kind: "assessment_fee" | "certificate_fee" | "rush_surcharge", what: string, assessmentId: string | null) => {
    const p = await activePrice(actor.organizationId, kind);
    if (!p) throw new DomainError(`The price list has no active ${kind.replace(/_/g, " ")}: set it on the prices page first.`, 409);
    if (p.currency !== settings.currency) throw new DomainError(`The ${p.name} is in ${p.currency.toUpperCase()}, not the organisation's ${settings.currency.toUpperCase()}: save it again.`, 409);
    lines.push({ position: lines.length + 1, description: `${p.name}: ${what}`, priceId: p.id, assessmentId, quantity: 1, unitAmount: p.amount, amount: p.amount });
  };
  for (const a of assessments) await add("assessment_fee", `${a.name} (${a.siteName})`, a.id);
  for (const a of certificates) await add("certificate_fee", `${a.name} (${a.siteName})`, a.id);
  if (input.rush) await add("rush_surcharge", "priority handling", null);
  if (lines.length === 0) throw new DomainError("Choose at least one assessment, certificate or the rush surcharge.", 400, "assessmentIds");
  const total = lines.reduce((s, l) => s + l.amount, 0);
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(invoice).values({ organizationId: actor.organizationId, clientId: owner.id, currency: settings.currency, total, notes: input.notes, createdByUserId: actor.userId }).returning();
    await tx.insert(invoiceLine).values(lines.map((l) => ({ ...l, invoiceId: row.id })));
    await auditChange(tx, actor, { action: "invoice.created", entity: "invoice", entityId: row.id, before: null, after: { clientId: owner.id, total, currency: row.currency, lines: lines.length } });
    return row;
  });
}

/** Issues a draft: the next number, state open, then the e-mail with its pay link to the client's members and contacts. */
export async function issueInvoice(actor: Actor, id: string) {
  const issued = await db.transaction(async (tx) => {
    const [row] = await tx.select().from(invoice).where(and(eq(invoice.id, id), eq(invoice.organizationId, actor.organizationId))).for("update");
    if (!row) throw new DomainError("There is no such invoice.", 404);
    if (row.state !== "draft") throw new DomainError("This invoice has been issued already.", 409);
    const number = await takeInvoiceNumber(tx, actor.organizationId);
    const [after] = await tx.update(invoice).set({ number, state: "open", issuedAt: new Date(), updatedAt: new Date() }).where(eq(invoice.id, id)).returning();
    await auditChange(tx, actor, { action: "invoice.issued", entity: "invoice", entityId: id, before: { state: "draft" }, after: { state: "open", number } });
    return after;
  });
  await sendInvoice(issued);
  return issued;
}

export async function resendInvoice(actor: Actor, id: string) {
  const [row] = await db.select().from(invoice).where(and(eq(invoice.id, id), eq(invoice.organizationId, actor.organizationId)));
  if (!row) throw new DomainError("There is no such invoice.", 404);
  if (row.state === "draft" || row.state === "void") throw new DomainError("Only an issued invoice can be sent.", 409);
  return sendInvoice(row);
}

/** The client's members and its contacts with an address. */
async function invoiceRecipients(organizationId: string, clientId: string) {
  const members = await db
    .select({ email: schema.user.email })
    .from(schema.clientMember)
    .innerJoin(schema.member, and(eq(schema.member.id, schema.clientMember.memberId), eq(schema.member.organizationId, organizationId), eq(schema.member.role, "client")))
    .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
    .where(eq(schema.clientMember.clientId, clientId));
  const contacts = await db.select({ email: schema.clientContact.email }).from(schema.clientContact).where(and(eq(schema.clientContact.clientId, clientId), eq(schema.clientContact.organizationId, organizationId)));
  return [...new Set([...members, ...contacts].map((r) => r.email.trim().toLowerCase()).filter(Boolean))];
}

async function sendInvoice(row: InvoiceRow) {
  const to = await invoiceRecipients(row.organizationId, row.clientId);
  if (!to.length) return 0;
  const [c] = await db.select({ name: client.name }).from(client).where(eq(client.id, row.clientId));
  const [org] = await db.select({ name: schema.organization.name }).from(schema.organization).where(eq(schema.organization.id, row.organizationId));
  const facts = { number: invoiceNumberText(row.number), clientName: c?.name ?? "", total: row.total, currency: row.currency, payUrl: payUrl(row.id), pdfUrl: invoicePdfUrl(row.id), organizationName: org?.name ?? "Isotrope" };
  await queueMails(to.map((address) => invoiceMail(address, facts)));
  return to.length;
}

/** A draft was never numbered nor sent, so it can go altogether (lines with it); the audit keeps what it was. */
export async function discardDraft(actor: Actor, id: string) {
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(invoice).where(and(eq(invoice.id, id), eq(invoice.organizationId, actor.organizationId))).for("update");
    if (!row) throw new DomainError("There is no such invoice.", 404);
    if (row.state !== "draft") throw new DomainError("Only a draft can be discarded; void an issued invoice instead.", 409);
    const lines = await tx.select({ description: invoiceLine.description, amount: invoiceLine.amount }).from(invoiceLine).where(eq(invoiceLine.invoiceId, id));
    await tx.delete(invoice).where(eq(invoice.id, id));
    await auditChange(tx, actor, { action: "invoice.discarded", entity: "invoice", entityId: id, before: { state: "draft", clientId: row.clientId, total: row.total, currency: row.currency, lines }, after: null });
    return row;
  });
}

export async function voidInvoice(actor: Actor, id: string) {
  const voided = await db.transaction(async (tx) => {
    const [row] = await tx.select().from(invoice).where(and(eq(invoice.id, id), eq(invoice.organizationId, actor.organizationId))).for("update");
    if (!row) throw new DomainError("There is no such invoice.", 404);
    if (!canVoid(row.state)) throw new DomainError("Only an unpaid invoice can be voided.", 409);
    const [open] = await tx.select({ id: schema.checkout.id }).from(schema.checkout).where(and(eq(schema.checkout.invoiceId, id), eq(schema.checkout.state, "open"))).limit(1);
    const [after] = await tx.update(invoice).set({ state: "void", voidedAt: new Date(), updatedAt: new Date() }).where(eq(invoice.id, id)).returning();
    await auditChange(tx, actor, { action: "invoice.voided", entity: "invoice", entityId: id, before: { state: row.state }, after: { state: "void", openCheckout: Boolean(open) } });
    return after;
  });
  // Close the payment pages still open for it, so a void invoice cannot be paid (best effort: a
  // payment that still lands is recorded and the invoice stays void, for the billing member to refund).
  const open = await db.select({ sessionId: schema.checkout.stripeSessionId }).from(schema.checkout).where(and(eq(schema.checkout.invoiceId, id), eq(schema.checkout.state, "open")));
  for (const c of open) if (c.sessionId) await stripe.checkout.sessions.expire(c.sessionId).catch((e) => console.error("[billing] expiring a checkout failed:", e instanceof Error ? e.message : e));
  return voided;
}
