// The demo's billing (issue 10): a price list in EUR (synced to the payment service when it answers),
// a second assessment of Calloway House whose report is issued but whose certificate is not yet
// bought (the client can buy it), an issued invoice to Larchmont Estates and a draft.
import { and, eq } from "drizzle-orm";
import { freezeAssessment } from "../../app/features/assessments/freeze.server";
import { createInvoice, issueInvoice } from "../../app/features/billing/invoices.server";
import { savePrice } from "../../app/features/billing/prices.server";
import { draftDocument, issueDocument, submitDocument, type Who } from "../../app/features/documents/commands.server";
import { db, schema } from "../../app/infra/db.server";
import { stopSender } from "../../app/infra/jobs.server";

const demoPrices = [
  { kind: "assessment_fee", name: "RF exposure assessment", amount: 45000 },
  { kind: "certificate_fee", name: "Compliance certificate", amount: 9500 },
  { kind: "rush_surcharge", name: "Rush surcharge (5 working days)", amount: 15000 },
] as const;

export async function seedBilling(organizationId: string) {
  const person = async (role: "engineer" | "reviewer" | "billing"): Promise<Who> => {
    const [m] = await db.select({ userId: schema.member.userId, name: schema.user.name }).from(schema.member).innerJoin(schema.user, eq(schema.user.id, schema.member.userId)).where(and(eq(schema.member.organizationId, organizationId), eq(schema.member.role, role)));
    return { organizationId, userId: m.userId, role, clientId: null, name: m.name };
  };
  const billing = await person("billing");
  for (const p of demoPrices) {
    try {
      await savePrice(billing, { ...p, active: true });
    } catch {
      // The payment service is not answering (a real account without network): keep the price list here only.
      await db.insert(schema.price).values({ organizationId, kind: p.kind, name: p.name, amount: p.amount, currency: "eur" }).onConflictDoNothing();
    }
  }
  const [site] = await db.select().from(schema.site).where(and(eq(schema.site.organizationId, organizationId), eq(schema.site.name, "Calloway House")));
  if (!site) return;
  const engineer = await person("engineer");
  const reviewer = await person("reviewer");
  const check = await freezeAssessment(engineer, site.id, { name: "Roof works check", standard: "fcc", tier: "general", gridStepM: 1 });
  const report = await draftDocument(engineer, site.id, { assessmentId: check.id, kind: "report" });
  await submitDocument(engineer, report.id);
  await issueDocument(reviewer, report.id);
  const [annual] = await db.select().from(schema.assessment).where(and(eq(schema.assessment.siteId, site.id), eq(schema.assessment.name, "Annual review")));
  if (site.clientId && annual) {
    const issued = await createInvoice(billing, { clientId: site.clientId, assessmentIds: [annual.id], certificates: [annual.id], rush: false, notes: "Annual review of Calloway House, as agreed." });
    await issueInvoice(billing, issued.id);
    await createInvoice(billing, { clientId: site.clientId, assessmentIds: [check.id], certificates: [], rush: true, notes: "" });
  }
  await stopSender();
}
