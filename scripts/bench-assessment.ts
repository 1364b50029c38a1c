// Freezing the demo rooftop (Calloway House): how long each part takes and how much is stored.
// Prints figures; asserts nothing. On the test stack (its seeded demo organisation):
//   npm run -s with-stack -- npx tsx scripts/bench-assessment.ts [gridStepM]
import { and, eq } from "drizzle-orm";
import { freezeAssessment } from "../app/features/assessments/freeze.server";
import { evaluateSite } from "../app/features/exposure/evaluate-site";
import { loadSiteInventory } from "../app/features/exposure/inventory.server";
import { mitigationInput, proposeMitigation } from "../app/features/exposure/mitigation";
import { optionsSchema } from "../app/features/exposure/options";
import { db, schema, sql } from "../app/infra/db.server";

const step = Number(process.argv[2] ?? 0.25);
const [site] = await db.select().from(schema.site).where(eq(schema.site.name, "Calloway House")).limit(1);
if (!site) throw new Error("No demo rooftop: run on the seeded test stack.");
const [member] = await db.select().from(schema.member).where(and(eq(schema.member.organizationId, site.organizationId), eq(schema.member.role, "engineer"))).limit(1);
const options = optionsSchema.parse({ standard: "fcc", tier: "general", gridStepM: step });
const ms = (t0: number) => `${(performance.now() - t0).toFixed(0)} ms`;

let t0 = performance.now();
const inventory = await loadSiteInventory(site.organizationId, site.id);
console.log(`inventory read: ${ms(t0)} (${inventory.surfaces.length} surfaces, ${inventory.emitters.length} emitters)`);
t0 = performance.now();
const exposure = evaluateSite(inventory, options);
console.log(`evaluateSite at ${step} m over 0–2 m (11 heights): ${ms(t0)}; ${exposure.runs.length} runs, ${exposure.supporting.length} supporting`);
t0 = performance.now();
const points = inventory.accessPoints.map((p) => ({ ...p }));
const plan = proposeMitigation(mitigationInput(exposure, inventory.surfaces, points, inventory.obstructions, options));
console.log(`proposeMitigation: ${ms(t0)}; ${plan.signs.length} signs, ${plan.barriers.length} barriers, ${plan.zones.length} zones`);
console.log(`runs as JSON: ${(JSON.stringify(exposure.runs).length / 1e6).toFixed(2)} MB; per-surface results: ${(JSON.stringify(exposure.surfaces).length / 1e6).toFixed(2)} MB`);
t0 = performance.now();
const row = await freezeAssessment({ organizationId: site.organizationId, role: "engineer", clientId: null, userId: member.userId, name: "Bench" }, site.id, { name: "Bench", ...options });
console.log(`freezeAssessment (read, compute, propose, store, audit): ${ms(t0)}`);
t0 = performance.now();
await db.select().from(schema.assessment).where(eq(schema.assessment.id, row.id));
console.log(`reading it back: ${ms(t0)}`);
await sql.end();
