// Reading assessments (always through the site's scope: another organisation's is not found) and
// editing the one part that stays editable, the mitigation plan, under its own version.
import { and, desc, eq } from "drizzle-orm";
import type { MitigationPlan, Sign } from "~/features/exposure/mitigation";
import { siteScope, type Scope } from "~/features/sites/scope.server";
import { db, schema } from "~/infra/db.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import { compareAssessments } from "./compare";
import type { MitigationEdit, SignAdd } from "./schemas";

const { assessment, site } = schema;
export type AssessmentRow = typeof assessment.$inferSelect;

/** Everything but the runs and per-cell results, for lists. */
const listColumns = {
  id: assessment.id,
  siteId: assessment.siteId,
  name: assessment.name,
  authorUserId: assessment.authorUserId,
  authorName: assessment.authorName,
  standard: assessment.standard,
  tier: assessment.tier,
  options: assessment.options,
  summary: assessment.summary,
  mitigationVersion: assessment.mitigationVersion,
  createdAt: assessment.createdAt,
};
export type AssessmentListRow = { [K in keyof typeof listColumns]: AssessmentRow[K] };

/** A site's assessments, newest first. The caller has checked the site is in scope. */
export function listAssessments(siteId: string): Promise<AssessmentListRow[]> {
  return db.select(listColumns).from(assessment).where(eq(assessment.siteId, siteId)).orderBy(desc(assessment.createdAt)).limit(500);
}

/** An assessment's name and freezing time, to title what was drawn from it. The caller has checked the site is in scope. */
export async function assessmentTitle(siteId: string, id: string): Promise<{ name: string; createdAt: Date } | null> {
  const [row] = await db.select({ name: assessment.name, createdAt: assessment.createdAt }).from(assessment).where(and(eq(assessment.siteId, siteId), eq(assessment.id, id)));
  return row ?? null;
}

/** One assessment within the scope (and the site, when the address names one), or null. */
export async function findAssessment(scope: Scope, id: string, siteId?: string): Promise<AssessmentRow | null> {
  const [row] = await db
    .select({ assessment })
    .from(assessment)
    .innerJoin(site, eq(site.id, assessment.siteId))
    .where(and(siteScope(scope), eq(assessment.id, id), siteId ? eq(assessment.siteId, siteId) : undefined));
  return row?.assessment ?? null;
}

export async function requireAssessment(scope: Scope, id: string, siteId?: string) {
  const row = await findAssessment(scope, id, siteId);
  if (!row) throw new DomainError("No such assessment.", 404);
  return row;
}

async function changePlan(who: Actor & Scope, id: string, version: number, change: (plan: MitigationPlan, found: AssessmentRow) => MitigationPlan) {
  const found = await requireAssessment(who, id);
  return db.transaction(async (tx) => {
    const [current] = await tx.select().from(assessment).where(eq(assessment.id, found.id)).for("update");
    if (current.mitigationVersion !== version) throw new DomainError("Someone else saved this plan after you opened it. Your change was not saved: review their version, then apply yours again.", 409, undefined, { current: { mitigation: current.mitigation, mitigationVersion: current.mitigationVersion } });
    const before = current.mitigation as MitigationPlan;
    const after = change(before, current);
    const [row] = await tx.update(assessment).set({ mitigation: after, mitigationVersion: current.mitigationVersion + 1, updatedAt: new Date() }).where(eq(assessment.id, found.id)).returning();
    await auditChange(tx, who, { action: "assessment.mitigation-updated", entity: "assessment", entityId: found.id, siteId: found.siteId, before: { signs: before.signs.length, barriers: before.barriers.length, notes: before.notes }, after: { signs: after.signs.length, barriers: after.barriers.length, notes: after.notes } });
    return row;
  });
}

/** Saves an edit of the plan: signs moved, re-categorised or removed, barriers removed, notes (what is not given stays). */
export function updateMitigation(who: Actor & Scope, id: string, edit: MitigationEdit) {
  return changePlan(who, id, edit.mitigationVersion, (plan) => {
    const edited = new Map((edit.signs ?? []).filter((s) => s.id).map((s) => [s.id!, s]));
    const signs: Sign[] = [];
    for (const sign of plan.signs) {
      const e = edited.get(sign.id);
      if (!e) {
        signs.push(sign);
        continue;
      }
      if (e.remove) continue;
      signs.push({ ...sign, category: e.category, x: e.x, y: e.y, where: e.where, note: e.note });
    }
    const drop = new Set(edit.removeBarriers ?? []);
    return { ...plan, signs, barriers: plan.barriers.filter((b) => !drop.has(b.id)), notes: edit.notes ?? plan.notes };
  });
}

export function addSign(who: Actor & Scope, id: string, input: SignAdd) {
  return changePlan(who, id, input.mitigationVersion, (plan, found) => {
    const next = Math.max(0, ...plan.signs.map((s) => Number(s.id.replace(/\D/g, "")) || 0)) + 1;
    const surfaces = ((found.inventory as { surfaces?: { id: string; kind: string; elevationM?: number | null }[] }).surfaces ?? []).filter((s) => s.kind === "area");
    const surface = input.surfaceId ? surfaces.find((s) => s.id === input.surfaceId) : undefined;
    if (input.surfaceId && !surface) throw new DomainError("Choose one of the assessment's surfaces.", 400, "surfaceId");
    const sign: Sign = { id: `s${next}`, category: input.category, x: input.x, y: input.y, z: surface?.elevationM ?? 0, surfaceId: surface?.id ?? null, origin: "engineer", accessPointId: null, where: input.where, note: input.note };
    return { ...plan, signs: [...plan.signs, sign] };
  });
}

/** Two assessments of one site, both within the scope, and what changed from the first to the second. */
export async function compareById(scope: Scope, aId: string, bId: string) {
  const [a, b] = await Promise.all([requireAssessment(scope, aId), requireAssessment(scope, bId)]);
  if (a.siteId !== b.siteId) throw new DomainError("Compare two assessments of the same site.", 400);
  const side = (r: AssessmentRow) => ({ options: r.options, inventory: r.inventory, summary: r.summary, results: r.results }) as unknown as Parameters<typeof compareAssessments>[0];
  return { a, b, comparison: compareAssessments(side(a), side(b)) };
}
