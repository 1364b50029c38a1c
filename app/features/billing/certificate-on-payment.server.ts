// A paid certificate: made and issued in the webhook's transaction, signed by the reviewer who
// issued the assessment's report, with the audit event "document.issued-on-payment". The render
// job (queued after the commit) stores the PDF and then e-mails the client's members with it.
import { and, desc, eq } from "drizzle-orm";
import { newCode } from "~/features/documents/commands.server";
import { certificateExpiry } from "~/features/documents/lifecycle";
import { schema, type Tx } from "~/infra/db.server";

const { document } = schema;

export type IssuedOnPayment = { documentId: string } | { documentId: null; note: string };

export async function issueCertificateOnPayment(tx: Tx, c: { organizationId: string; siteId: string; assessmentId: string; checkoutId: string; paymentId: string }): Promise<IssuedOnPayment> {
  const docs = await tx.select().from(document).where(and(eq(document.assessmentId, c.assessmentId), eq(document.organizationId, c.organizationId), eq(document.state, "issued"))).orderBy(desc(document.issuedAt)).for("update");
  if (docs.some((d) => d.kind === "certificate")) return { documentId: null, note: "a certificate was already issued for this assessment" };
  const report = docs.find((d) => d.kind === "report");
  if (!report) return { documentId: null, note: "the assessment has no issued report" };
  const now = new Date();
  const [cert] = await tx
    .insert(document)
    .values({
      organizationId: c.organizationId,
      siteId: c.siteId,
      assessmentId: c.assessmentId,
      kind: "certificate",
      state: "issued",
      authorUserId: report.authorUserId,
      authorName: report.authorName,
      reviewerUserId: report.reviewerUserId,
      reviewerName: report.reviewerName,
      code: newCode(),
      issuedAt: now,
      expiresAt: certificateExpiry(now),
      renderStatus: "queued",
    })
    .returning();
  await tx.insert(schema.auditEvent).values({
    organizationId: c.organizationId,
    actorUserId: report.reviewerUserId,
    action: "document.issued-on-payment",
    subjectType: "document",
    subjectId: cert.id,
    siteId: c.siteId,
    before: null,
    after: { kind: "certificate", version: 1, state: "issued", reportId: report.id, checkoutId: c.checkoutId, paymentId: c.paymentId, issuer: report.reviewerName },
  });
  return { documentId: cert.id };
}
