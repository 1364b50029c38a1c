// The demo's documents (issue 9 §8): an assessment of Calloway House (0.5 m grid, to keep the seed
// quick), its issued report, landlord letter and certificate, and version 2 of the report waiting
// for review. Made through the lifecycle's own commands (audit rows, e-mails queued); the PDFs are
// queued and rendered by the first worker that starts (the app server's own, by default).
import { and, eq } from "drizzle-orm";
import { freezeAssessment } from "../../app/features/assessments/freeze.server";
import { draftDocument, issueDocument, reissueDocument, submitDocument, type Who } from "../../app/features/documents/commands.server";
import { db, schema } from "../../app/infra/db.server";
import { stopSender } from "../../app/infra/jobs.server";

export async function seedDocuments(organizationId: string) {
  const person = async (role: "engineer" | "reviewer"): Promise<Who> => {
    const [m] = await db.select({ userId: schema.member.userId, name: schema.user.name }).from(schema.member).innerJoin(schema.user, eq(schema.user.id, schema.member.userId)).where(and(eq(schema.member.organizationId, organizationId), eq(schema.member.role, role)));
    return { organizationId, userId: m.userId, role, clientId: null, name: m.name };
  };
  const engineer = await person("engineer");
  const reviewer = await person("reviewer");
  const [site] = await db.select().from(schema.site).where(and(eq(schema.site.organizationId, organizationId), eq(schema.site.name, "Calloway House")));
  if (!site) return;
  const assessment = await freezeAssessment(engineer, site.id, { name: "Annual review", standard: "fcc", tier: "general", gridStepM: 0.5 });
  for (const kind of ["report", "letter", "certificate"] as const) {
    const d = await draftDocument(engineer, site.id, { assessmentId: assessment.id, kind });
    await submitDocument(engineer, d.id);
    await issueDocument(reviewer, d.id);
    if (kind === "report") {
      const next = await reissueDocument(engineer, d.id, assessment.id);
      await submitDocument(engineer, next.id);
    }
  }
  await stopSender();
}
