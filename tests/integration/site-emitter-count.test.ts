// A site's emitter count is kept by triggers on the emitter table (migration 0005): inserts in
// bulk, deletes, moves between sites and a site's removal all leave it equal to a real count,
// and the sites list sorts by it.
import { randomUUID } from "node:crypto";
import { eq, inArray, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { scopeOf } from "~/features/sites/scope.server";
import { listSites } from "~/features/sites/sites.server";
import { db, schema } from "~/infra/db.server";
import { createOrg, type Org } from "./fixtures";

let org: Org;
beforeAll(async () => {
  org = await createOrg("emitter-count");
});

async function newSite(name: string) {
  const id = randomUUID();
  await db.insert(schema.site).values({ id, organizationId: org.id, name, kind: "rooftop" });
  return id;
}

function emitters(siteId: string, n: number) {
  return Array.from({ length: n }, (_, i) => ({ id: randomUUID(), organizationId: org.id, siteId, label: `E${i}`, frequencyMHz: 1900, powerPerCarrierW: 20, gainDbi: 15, x: i, y: 0, z: 3 }));
}

async function stored(siteIds: string[]) {
  const rows = await db
    .select({ id: schema.site.id, kept: schema.site.emitterCount, real: sql<number>`(select count(*)::int from emitter e where e.site_id = site.id)` })
    .from(schema.site)
    .where(inArray(schema.site.id, siteIds));
  return Object.fromEntries(rows.map((r) => [r.id, [r.kept, r.real]]));
}

describe("the stored emitter count", () => {
  it("follows inserts, deletes and moves, each statement at once", async () => {
    const a = await newSite("Count A");
    const b = await newSite("Count B");
    const rowsA = emitters(a, 40);
    await db.insert(schema.emitter).values(rowsA);
    await db.insert(schema.emitter).values(emitters(b, 3));
    expect(await stored([a, b])).toEqual({ [a]: [40, 40], [b]: [3, 3] });

    await db.delete(schema.emitter).where(inArray(schema.emitter.id, rowsA.slice(0, 5).map((r) => r.id)));
    await db.update(schema.emitter).set({ siteId: b }).where(inArray(schema.emitter.id, rowsA.slice(5, 12).map((r) => r.id)));
    await db.update(schema.emitter).set({ azimuthDeg: 90 }).where(eq(schema.emitter.siteId, a));
    expect(await stored([a, b])).toEqual({ [a]: [28, 28], [b]: [10, 10] });

    await db.transaction(async (tx) => {
      await tx.delete(schema.emitter).where(eq(schema.emitter.siteId, b));
      await tx.insert(schema.emitter).values(emitters(b, 2));
    });
    expect(await stored([a, b])).toEqual({ [a]: [28, 28], [b]: [2, 2] });
  });

  it("is what the sites list shows and sorts by", async () => {
    const few = await newSite("Sort few");
    const many = await newSite("Sort many");
    await db.insert(schema.emitter).values([...emitters(few, 1), ...emitters(many, 7)]);
    const { sites } = await listSites(scopeOf({ organizationId: org.id, role: "engineer", clientId: null }), { q: "Sort", kind: null, clientId: null, sort: "emitters", dir: "desc", page: 1, pageSize: 10 } as never);
    expect(sites.map((s) => [s.name, s.emitterCount])).toEqual([["Sort many", 7], ["Sort few", 1]]);
  });
});
