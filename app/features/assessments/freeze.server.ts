// Freezing an assessment: the site locked (no inventory edit can land half way), its inventory read,
// every surface run through the engine, the mitigation proposed, and all of it stored with an audit
// row in one transaction. The computation runs in this request: the demo rooftop at 0.25 m over
// 0–2 m takes a few seconds (see decision record 0017).
import { and, eq, inArray } from "drizzle-orm";
import { EngineInputError } from "~/engine";
import { evaluateSite } from "~/features/exposure/evaluate-site";
import { loadSiteInventory } from "~/features/exposure/inventory.server";
import { mitigationInput, proposeMitigation } from "~/features/exposure/mitigation";
import { optionsSchema } from "~/features/exposure/options";
import { emitterJson } from "~/features/emitters/json";
import { surfaceJson } from "~/features/layout/json";
import { siteJson } from "~/features/sites/json";
import type { Scope } from "~/features/sites/scope.server";
import { lockSite } from "~/features/sites/sites.server";
import { db, schema } from "~/infra/db.server";
import { auditChange, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import type { FreezeInput } from "./schemas";

export type Author = Actor & Scope & { name: string };

export async function freezeAssessment(who: Author, siteId: string, input: FreezeInput) {
  const { name, ...fields } = input;
  const options = optionsSchema.parse(fields);
  return db.transaction(async (tx) => {
    const site = await lockSite(tx, who, siteId);
    const inventory = await loadSiteInventory(who.organizationId, site.id);
    let exposure;
    try {
      exposure = evaluateSite(inventory, options);
    } catch (error) {
      if (error instanceof EngineInputError) throw new DomainError(`The inventory cannot be evaluated with these options: ${error.message}`, 422);
      throw error;
    }
    const accessPoints = inventory.accessPoints.map((p) => ({ id: p.id, name: p.name, kind: p.kind, x: p.x, y: p.y, z: p.z, locked: p.locked }));
    const obstructions = inventory.obstructions.map((o) => ({ id: o.id, name: o.name, polygon: o.polygon, baseM: o.baseM, heightM: o.heightM }));
    const mitigation = proposeMitigation(mitigationInput(exposure, inventory.surfaces, accessPoints, obstructions, options));
    const [client] = site.clientId ? await tx.select().from(schema.client).where(and(eq(schema.client.id, site.clientId), eq(schema.client.organizationId, who.organizationId))) : [];
    const patternIds = [...inventory.patterns.keys()];
    const patterns = patternIds.length ? await tx.select({ id: schema.antennaPattern.id, name: schema.antennaPattern.name, pattern: schema.antennaPattern.pattern }).from(schema.antennaPattern).where(inArray(schema.antennaPattern.id, patternIds)) : [];
    const [row] = await tx
      .insert(schema.assessment)
      .values({
        organizationId: who.organizationId,
        siteId: site.id,
        name,
        authorUserId: who.userId,
        authorName: who.name,
        standard: options.standard,
        tier: options.tier,
        options,
        site: { site: siteJson(site), client: client ? { id: client.id, name: client.name, billingAddress: client.billingAddress } : null },
        inventory: {
          // surfaceJson reads only the layout fields, which a LayoutSurface has.
          surfaces: inventory.surfaces.map((s) => surfaceJson(s as Parameters<typeof surfaceJson>[0])),
          obstructions,
          accessPoints,
          emitters: inventory.emitterRows.map(emitterJson),
          patterns,
        },
        runs: exposure.runs,
        summary: exposure.summary,
        results: { surfaces: exposure.surfaces, emitters: exposure.emitters },
        engine: exposure.runs[0]?.response.engine ?? "",
        mitigation,
      })
      .returning();
    await auditChange(tx, who, { action: "assessment.created", entity: "assessment", entityId: row.id, siteId: site.id, before: null, after: { name, ...options, worstPercent: exposure.summary.worstPercent } });
    return row;
  });
}
