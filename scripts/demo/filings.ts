// The demo's filing (issue 9 §8): the engineer files Calloway House's issued assessment to the demo
// regulator (regulator@demo.isotrope.test, "Osric Vey (Spectrum Safety Office)", so the authority is
// "Spectrum Safety Office"). Run after seedDocuments, through the feature's own command (audit row).
import { and, eq } from "drizzle-orm";
import { fileAssessment, fileableAssessments, regulators } from "../../app/features/filings/filings.server";
import { db, schema } from "../../app/infra/db.server";

export async function seedFilings(organizationId: string) {
  const [engineer] = await db
    .select({ userId: schema.member.userId, name: schema.user.name })
    .from(schema.member)
    .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
    .where(and(eq(schema.member.organizationId, organizationId), eq(schema.member.role, "engineer")));
  const regulator = (await regulators(organizationId)).find((r) => r.email === "regulator@demo.isotrope.test");
  const [issued] = await fileableAssessments(organizationId);
  if (!engineer || !regulator || !issued) return;
  await fileAssessment(
    { organizationId, userId: engineer.userId, role: "engineer", name: engineer.name },
    { assessmentId: issued.id, regulatorMemberId: regulator.memberId, authority: "", note: "Annual RF exposure review of the rooftop, as agreed at the site licence renewal." },
  );
}
