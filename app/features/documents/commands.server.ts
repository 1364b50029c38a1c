// The lifecycle's commands. Each checks the step (lifecycle.ts: states, roles, two-person rule)
// against the row locked in its transaction, writes the change and its audit row together, then
// queues the render and the e-mails (after the commit; a render left queued is picked up again by
// the next worker start).
import { randomBytes } from "node:crypto";
import { and, desc, eq } from "drizzle-orm";
import { requireAssessment } from "~/features/assessments/assessments.server";
import type { Scope } from "~/features/sites/scope.server";
import { db, schema, type Tx } from "~/infra/db.server";
import type { DocumentKind } from "~/infra/db/schema/documents";
import { env } from "~/infra/env.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import { requireDocument, type DocumentRow } from "./documents.server";
import { queueMails, queueRender } from "./jobs.server";
import { certificateExpiry, check, type Step } from "./lifecycle";
import { documentMail, type MailEvent } from "./mails";
import { clientAddresses, reviewerAddresses, userAddress } from "./people.server";

const { document } = schema;
export type Who = Actor & Scope & { name: string };

/** 20 characters from a 32-letter alphabet without 0/O and 1/I: 100 bits, shown in groups of four. */
export function newCode() {
  const alphabet = "ABCDEFGHJKLMNPQRSTUVWXYZ23456789";
  const bytes = randomBytes(20);
  const chars = [...bytes].map((b) => alphabet[b % 32]).join("");
  return chars.match(/.{4}/g)!.join("-");
}

export const documentUrl = (d: Pick<DocumentRow, "siteId" | "id">) => `${env.APP_URL.replace(/\/$/, "")}/sites/${d.siteId}/documents/${d.id}`;

function refuse(step: Step, doc: Pick<DocumentRow, "state" | "authorUserId">, who: Who) {
  const refusal = check(step, doc, { userId: who.userId, role: who.role });
  if (refusal) throw new DomainError(refusal.message, refusal.status);
}

async function lock(tx: Tx, id: string) {
  const [row] = await tx.select().from(document).where(eq(document.id, id)).for("update");
  return row;
}

const audit = (tx: Tx, who: Who, action: string, d: DocumentRow, before: Record<string, unknown> | null, after: Record<string, unknown>) =>
  auditChange(tx, who, { action: `document.${action}`, entity: "document", entityId: d.id, siteId: d.siteId, before, after: { kind: d.kind, version: d.version, ...after } });

async function siteName(siteId: string) {
  const [row] = await db.select({ name: schema.site.name }).from(schema.site).where(eq(schema.site.id, siteId));
  return row?.name ?? "";
}

async function notify(event: MailEvent, d: DocumentRow, who: { name: string }, to: string[], extra: { reason?: string; forClient?: boolean } = {}) {
  if (!to.length) return;
  const name = await siteName(d.siteId);
  await queueMails([...new Set(to)].map((address) => documentMail(event, address, { kind: d.kind, version: d.version, siteName: name, url: documentUrl(d), actorName: who.name, ...extra })));
}

/** A new draft of a kind from one of the site's assessments. */
export async function draftDocument(who: Who, siteId: string, input: { assessmentId: string; kind: DocumentKind }) {
  refuse("submit", { state: "draft", authorUserId: who.userId }, who); // the roles that may draft are those that may submit
  const a = await requireAssessment(who, input.assessmentId, siteId);
  const row = await db.transaction(async (tx) => {
    const [d] = await tx.insert(document).values({ organizationId: who.organizationId, siteId: a.siteId, assessmentId: a.id, kind: input.kind, authorUserId: who.userId, authorName: who.name, code: newCode() }).returning();
    await audit(tx, who, "drafted", d, null, { state: "draft", assessmentId: a.id });
    return d;
  });
  await queueRender(row.id);
  return row;
}

async function step(who: Who, id: string, name: Step, change: (d: DocumentRow, tx: Tx) => Promise<Partial<DocumentRow>>) {
  const found = await requireDocument(who, id);
  return db.transaction(async (tx) => {
    const d = await lock(tx, found.id);
    refuse(name, d, who);
    const patch = await change(d, tx);
    const [after] = await tx.update(document).set({ ...patch, updatedAt: new Date() }).where(eq(document.id, d.id)).returning();
    await audit(tx, who, { submit: "submitted", return: "returned", issue: "issued", withdraw: "withdrawn", reissue: "reissued", supersede: "superseded" }[name], after, { state: d.state }, { state: after.state, ...(patch.withdrawnReason ? { reason: patch.withdrawnReason } : {}) });
    return after;
  });
}

export async function submitDocument(who: Who, id: string) {
  const d = await step(who, id, "submit", async () => ({ state: "in_review", submittedAt: new Date() }));
  await notify("submitted", d, who, await reviewerAddresses(d.organizationId, d.authorUserId));
  return d;
}

export async function returnDocument(who: Who, id: string) {
  const d = await step(who, id, "return", async () => ({ state: "draft" }));
  const author = await userAddress(d.authorUserId);
  await notify("returned", d, who, author ? [author] : []);
  return d;
}

/** Issues: the reviewer signs, the PDF is rendered afresh without the draft mark and then fixed; the version it replaces is superseded. */
export async function issueDocument(who: Who, id: string) {
  const d = await step(who, id, "issue", async (doc, tx) => {
    const now = new Date();
    if (doc.previousId) {
      const previous = await lock(tx, doc.previousId);
      if (previous?.state === "issued") {
        await tx.update(document).set({ state: "superseded", supersededAt: now, supersededById: doc.id, updatedAt: now }).where(eq(document.id, previous.id));
        await audit(tx, who, "superseded", previous, { state: "issued" }, { state: "superseded", by: doc.id });
      }
    }
    return { state: "issued", reviewerUserId: who.userId, reviewerName: who.name, issuedAt: now, expiresAt: doc.kind === "certificate" ? certificateExpiry(now) : null, pdf: null, sha256: null, byteSize: null, renderStatus: "queued", renderAttempts: 0, renderError: null };
  });
  await queueRender(d.id);
  return d;
}

/** After an issued document's PDF is stored: tell the author and the client's members (letters and certificates attached). */
export async function announceIssued(documentId: string) {
  const [d] = await db.select().from(document).where(eq(document.id, documentId));
  if (!d || d.state !== "issued") return;
  const who = { name: d.reviewerName ?? "A reviewer" };
  const author = await userAddress(d.authorUserId);
  await notify("issued", d, who, author ? [author] : []);
  const clients = await clientAddresses(d.organizationId, d.siteId);
  if (!clients.length) return;
  const name = await siteName(d.siteId);
  const attach = d.kind !== "report";
  // Clients open the PDF itself, and the site's page on their portal.
  const base = env.APP_URL.replace(/\/$/, "");
  const pdfUrl = `${base}/documents/${d.id}/pdf`;
  const portalUrl = `${base}/portal/sites/${d.siteId}`;
  await queueMails(clients.map((to) => ({ ...documentMail("issued", to, { kind: d.kind, version: d.version, siteName: name, url: pdfUrl, portalUrl, actorName: who.name, forClient: true }), ...(attach ? { attachDocumentId: d.id, attachName: `${d.kind}-v${d.version}-${d.code}.pdf` } : {}) })));
}

export async function withdrawDocument(who: Who, id: string, reason: string) {
  const d = await step(who, id, "withdraw", async () => ({ state: "withdrawn", withdrawnAt: new Date(), withdrawnReason: reason }));
  const author = await userAddress(d.authorUserId);
  await notify("withdrawn", d, who, [...(author ? [author] : []), ...(await clientAddresses(d.organizationId, d.siteId))], { reason });
  return d;
}

/** A new draft, version n + 1, of an issued document, from the site's newest assessment (or the one named). */
export async function reissueDocument(who: Who, id: string, assessmentId?: string) {
  const found = await requireDocument(who, id);
  refuse("reissue", found, who);
  const a = assessmentId ? await requireAssessment(who, assessmentId, found.siteId) : (await db.select().from(schema.assessment).where(eq(schema.assessment.siteId, found.siteId)).orderBy(desc(schema.assessment.createdAt)).limit(1))[0];
  const row = await db.transaction(async (tx) => {
    const old = await lock(tx, found.id);
    refuse("reissue", old, who);
    const [pending] = await tx.select({ id: document.id }).from(document).where(and(eq(document.previousId, old.id)));
    if (pending) throw new DomainError("This document already has a newer version in progress.", 409);
    const [d] = await tx.insert(document).values({ organizationId: who.organizationId, siteId: old.siteId, assessmentId: a.id, kind: old.kind, version: old.version + 1, previousId: old.id, authorUserId: who.userId, authorName: who.name, code: newCode() }).returning();
    await audit(tx, who, "drafted", d, null, { state: "draft", assessmentId: a.id, replaces: old.id });
    return d;
  });
  await queueRender(row.id);
  return row;
}
