// The Exposure page's kept results (result-cache.server.ts) on a copy of the demo inventory: the
// first opening computes and stores the result, the next ones read it (from this process's memory,
// else from PostgreSQL) and get exactly what the engine gives; an edit of the inventory or of the
// options is a new input, computed again; each site keeps only its newest few; rows belong to
// the site's organisation and go with the site.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { computeExposure } from "~/features/exposure/exposure-result";
import { clearExposureMemory, exposureKey, exposureOutcome } from "~/features/exposure/result-cache.server";
import { loadExposurePage } from "~/features/exposure/site-exposure.server";
import { scopeOf } from "~/features/sites/scope.server";
import { db, schema } from "~/infra/db.server";
import { seedInventory } from "../../scripts/demo/inventory";
import { createOrg, type Org } from "./fixtures";

let org: Org;
let siteId = "";
const scope = () => scopeOf({ organizationId: org.id, role: "engineer", clientId: null });
const open = (query = "step=1") => loadExposurePage(scope(), siteId, new URLSearchParams(query)).then((p) => p!);
const rows = () => db.select().from(schema.exposureResult).where(eq(schema.exposureResult.siteId, siteId));

beforeAll(async () => {
  org = await createOrg("exposure-cache");
  await db.transaction((tx) => seedInventory(tx, { organizationId: org.id, engineerId: org.people.engineer.userId, clientMemberId: null }));
  const [site] = await db.select().from(schema.site).where(and(eq(schema.site.organizationId, org.id), eq(schema.site.name, "Calloway House")));
  siteId = site.id;
}, 60_000);

describe("kept Exposure results", () => {
  it("computes once, then reads the same result from memory and from PostgreSQL, equal to the engine's", async () => {
    const first = await open();
    expect(first.source).toBe("computed");
    const stored = await rows();
    expect(stored).toHaveLength(1);
    expect(stored[0]).toMatchObject({ organizationId: org.id, key: exposureKey(first.input), computeMs: first.computeMs });

    const again = await open();
    expect(again.source).toBe("memory");
    expect(again.result).toEqual(first.result);

    clearExposureMemory();
    const fromDb = await open();
    expect(fromDb.source).toBe("database");
    expect(fromDb.computeMs).toBe(first.computeMs);
    // What was stored is what the engine gives for this input, number for number.
    expect(fromDb.result).toEqual(computeExposure(fromDb.input));
    expect(JSON.stringify(fromDb.result)).toBe(JSON.stringify(computeExposure(fromDb.input)));
  }, 60_000);

  it("computes again after an emitter is edited (a new input), and for other options", async () => {
    const before = await open();
    await db.update(schema.emitter).set({ powerPerCarrierW: 20 }).where(and(eq(schema.emitter.siteId, siteId), eq(schema.emitter.label, "SM-3-2100")));
    const after = await open();
    expect(after.source).toBe("computed");
    expect(exposureKey(after.input)).not.toBe(exposureKey(before.input));
    expect(after.result!.summary.worstPercent).toBeLessThan(before.result!.summary.worstPercent);
    expect((await open("step=1&tier=occupational")).source).toBe("computed");
  }, 60_000);

  it("keeps only the newest six results of a site", async () => {
    for (const step of [1.1, 1.2, 1.3, 1.4, 1.5, 1.6, 1.7]) await open(`step=${step}`);
    expect((await rows()).length).toBe(6);
  }, 120_000);

  it("computes the same input concurrently only once", async () => {
    const { input } = await open("step=2");
    clearExposureMemory();
    await db.delete(schema.exposureResult).where(eq(schema.exposureResult.siteId, siteId));
    const a = exposureOutcome(org.id, siteId, input);
    const b = exposureOutcome(org.id, siteId, input);
    expect(a).toBeInstanceOf(Promise);
    expect(b).toBe(a); // the second caller waits for the first one's computation
    expect((await a).source).toBe("computed");
    expect(await rows()).toHaveLength(1);
    expect(exposureOutcome(org.id, siteId, input)).toMatchObject({ source: "memory" }); // at once, no promise
  }, 60_000);
});
