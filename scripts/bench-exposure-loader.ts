// The Exposure page's server time for the demo rooftop (Calloway House) at 0.25 m over 0–2 m (11
// heights), in-process through the loader's feature function: the first opening (the engine runs;
// its stored result is dropped first), an opening whose result is in PostgreSQL (a restarted or
// another server process), and one whose result is in this process's memory. Prints figures only.
//   npm run -s with-stack -- npx tsx scripts/bench-exposure-loader.ts [runs]
import { and, eq } from "drizzle-orm";
import { clearExposureMemory } from "../app/features/exposure/result-cache.server";
import { loadExposurePage } from "../app/features/exposure/site-exposure.server";
import { scopeOf } from "../app/features/sites/scope.server";
import { db, schema, sql } from "../app/infra/db.server";

const runs = Number(process.argv[2] ?? 3);
const [site] = await db
  .select({ id: schema.site.id, organizationId: schema.site.organizationId })
  .from(schema.site)
  .innerJoin(schema.member, eq(schema.member.organizationId, schema.site.organizationId))
  .innerJoin(schema.user, eq(schema.user.id, schema.member.userId))
  .where(and(eq(schema.site.name, "Calloway House"), eq(schema.user.email, "engineer@demo.isotrope.test")))
  .limit(1);
if (!site) throw new Error("No demo rooftop: run on the seeded test stack.");
const scope = scopeOf({ organizationId: site.organizationId, role: "engineer", clientId: null });
const search = new URLSearchParams(); // the defaults: FCC, general population, 0.25 m, 0–2 m in 11 heights, average
const stats = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return `median ${s[Math.floor(s.length / 2)].toFixed(0)} ms, min ${s[0].toFixed(0)}, max ${s[s.length - 1].toFixed(0)} (n = ${s.length})`;
};
const time = async () => {
  const t0 = performance.now();
  const page = await loadExposurePage(scope, site.id, search);
  return { ms: performance.now() - t0, source: page!.source, computeMs: page!.computeMs };
};

const cold: number[] = [];
const engine: number[] = [];
const database: number[] = [];
const memory: number[] = [];
for (let r = 0; r < runs; r++) {
  clearExposureMemory();
  await db.delete(schema.exposureResult).where(eq(schema.exposureResult.siteId, site.id));
  const c = await time();
  if (c.source !== "computed") throw new Error(`expected a computation, got ${c.source}`);
  cold.push(c.ms);
  engine.push(c.computeMs);
  clearExposureMemory();
  const d = await time();
  if (d.source !== "database") throw new Error(`expected the stored result, got ${d.source}`);
  database.push(d.ms);
  const m = await time();
  if (m.source !== "memory") throw new Error(`expected the result in memory, got ${m.source}`);
  memory.push(m.ms);
}
console.log(`loader, first opening (inventory read + engine over the site + store): ${stats(cold)}; engine alone ${stats(engine)}`);
console.log(`loader, result read from PostgreSQL:                             ${stats(database)}`);
console.log(`loader, result in this process's memory:                         ${stats(memory)}`);
await sql.end();
