// The Exposure page's loader on a copy of the demo inventory (Calloway House: three roof levels, a
// facade across the street, 14 emitters, a visit with 7 readings, one of them above its prediction):
// what the page draws, who may open it, another organisation's site, and options that cannot be used.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import { loadExposurePage, type ExposureShell } from "~/features/exposure/site-exposure.server";
import { scopeOf } from "~/features/sites/scope.server";
import { loader } from "~/routes/exposure/exposure";
import { seedInventory } from "../../scripts/demo/inventory";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";

let org: Org;
let other: Org;
let siteId = "";
const scope = () => scopeOf({ organizationId: org.id, role: "engineer", clientId: null });
const run = (person: Org["people"][keyof Org["people"]], id: string, query = "") =>
  outcome(() => loader({ request: makeRequest(`/sites/${id}/exposure${query}`, { cookie: person.cookie }), params: { siteId: id }, context: {} } as never));

beforeAll(async () => {
  org = await createOrg("exposure");
  other = await createOrg("exposure-other");
  await db.transaction((tx) => seedInventory(tx, { organizationId: org.id, engineerId: org.people.engineer.userId, clientMemberId: null }));
  const [site] = await db.select().from(schema.site).where(and(eq(schema.site.organizationId, org.id), eq(schema.site.name, "Calloway House")));
  siteId = site.id;
}, 60_000);

describe("Exposure loader data (feature function)", () => {
  // 0.5 m keeps the test quick; the page's default is 0.25 m.
  let page: NonNullable<Awaited<ReturnType<typeof loadExposurePage>>>;
  beforeAll(async () => {
    page = (await loadExposurePage(scope(), siteId, new URLSearchParams("step=0.5")))!;
  }, 60_000);

  it("maps every level and the facade, with the options it used", () => {
    const r = page.result!;
    expect(page.problem).toBeNull();
    expect(page.options).toMatchObject({ standard: "fcc", tier: "general", gridStepM: 0.5, heights: { fromM: 0, toM: 2, count: 11 }, mode: "average" });
    expect(r.areas.map((a) => a.name).sort()).toEqual(["Main roof", "Penthouse top", "West wing lower roof"]);
    expect(r.facades.map((f) => f.name)).toEqual(["Harrow Court east windows"]);
    const main = r.areas.find((a) => a.name === "Main roof")!;
    // 40 m × 28 m at 0.5 m: 81 × 57 points; the cells inside the outline add up to its 1 120 m² (within a row of cells).
    expect(main.grid).toMatchObject({ nx: 81, ny: 57, step: 0.5 });
    expect(main.percent).toHaveLength(81 * 57);
    expect(Math.abs(main.areas.totalM2 - 1120)).toBeLessThanOrEqual(40 * 0.5);
  });

  it("finds the site's worst point in front of SM-3-2100 on the west parapet, above the occupational limit", () => {
    const r = page.result!;
    expect(r.summary.worstAt).toMatchObject({ surfaceName: "Main roof" });
    expect(r.summary.worstAt!.x).toBeLessThan(3);
    expect(Math.abs(r.summary.worstAt!.y - 12)).toBeLessThan(1.5);
    expect(r.summary.worstPercent).toBeGreaterThan(500); // above the FCC occupational limit (5 × general above 1500 MHz, 47 CFR §1.1310 Table 1)
    const main = r.areas.find((a) => a.name === "Main roof")!;
    expect(main.contributions[0].id).toBe("SM-3-2100");
    expect(main.worstClass).toBeGreaterThanOrEqual(2);
    expect(main.areas.overGeneralM2).toBeGreaterThan(main.areas.overOccupationalM2);
  });

  it("gives every emitter its figures, distances for both tiers and its pattern", () => {
    const r = page.result!;
    expect(r.emitters).toHaveLength(14);
    for (const e of r.emitters) {
      expect(e.eirpW).toBeGreaterThan(0);
      expect(e.complianceDistanceM!.general).toBeGreaterThan(e.complianceDistanceM!.occupational);
      expect("libraryId" in e.pattern ? page.input.patterns.some(([id]) => id === (e.pattern as { libraryId: string }).libraryId) : Boolean(e.pattern.own)).toBe(true);
    }
    expect(page.emitterInfo[r.emitters[0].inventoryId].operator).toBe("Northwind Mobile");
    expect(page.obstructions.map((o) => o.name)).toContain("Lift motor room");
    expect(page.accessPoints.map((a) => a.name)).toContain("Stair door");
  });

  it("sets the readings against predictions: 7 readings, R6 above its prediction", () => {
    const r = page.result!;
    expect(r.readingsSummary).toMatchObject({ count: 7, compared: 7, above: 1 });
    expect(r.readingsSummary.worst!.label).toMatch(/^R6/);
    expect(r.readingsSummary.worst!.ratio).toBeGreaterThan(1);
    const r6 = r.readings.find((x) => x.label.startsWith("R6"))!;
    expect(r6).toMatchObject({ x: 30, y: 14, z: 1.5, abovePrediction: true, basis: "broadband power density" });
  });

  it("sends plain rounded numbers: three significant figures, nothing typed or infinite", () => {
    const main = page.result!.areas.find((a) => a.name === "Main roof")!;
    for (const v of main.percent) expect(v === 0 || Number(v.toPrecision(3)) === v).toBe(true);
    const json = JSON.stringify(page);
    expect(json).not.toMatch(/Infinity|NaN/);
    // At 0.5 m: about 6 000 grid values, the inventory with its two tabulated patterns (once), the tables.
    expect(json.length).toBeLessThan(200_000);
  });
});

describe("Exposure route", () => {
  it("opens for the consultancy's staff and refuses clients and regulators", async () => {
    expect((await run(org.people.engineer, siteId, "?step=1")).status).toBe(200);
    expect((await run(org.people.billing, siteId, "?step=1")).status).toBe(200);
    expect((await run(org.people.client, siteId)).status).toBe(403);
    expect((await run(org.people.regulator, siteId)).status).toBe(403);
  }, 60_000);

  it("answers 404 for another organisation's site", async () => {
    expect((await run(other.people.owner, siteId)).status).toBe(404);
  });

  it("falls back to the defaults, field by field, with a message for each refused option", async () => {
    const got = await run(org.people.engineer, siteId, "?standard=nope&step=0.01&reflection=3&tier=occupational");
    expect(got.status).toBe(200);
    const body = got.body as ExposureShell;
    expect(body!.options).toMatchObject({ standard: "fcc", gridStepM: 0.25, reflectionFactor: 1, tier: "occupational" });
    expect(Object.keys(body!.errors).sort()).toEqual(["gridStepM", "reflectionFactor", "standard"]);
    expect(body!.errors.gridStepM).toBe("Use a grid step from 0.1 to 5 m.");
  }, 60_000);

  it("says so, never a 500, when the engine cannot compute the inventory under the options", async () => {
    // IEEE C95.1-2019 is implemented from 100 MHz only (app/engine/README.md, Limits): a 50 MHz emitter is refused.
    const [site] = await db.insert(schema.site).values({ organizationId: org.id, name: "Low band", kind: "tower" }).returning();
    await db.insert(schema.surface).values({ organizationId: org.id, siteId: site.id, name: "Pad", kind: "area", polygon: [[0, 0], [4, 0], [4, 4], [0, 4]], elevationM: 0 });
    await db.insert(schema.emitter).values({ organizationId: org.id, siteId: site.id, label: "VHF", frequencyMHz: 50, powerPerCarrierW: 10, carriers: 1, lossDb: 0, gainDbi: 2, x: 2, y: 2, z: 5 });
    const got = await run(org.people.engineer, site.id, "?standard=ieee-c95.1-2019");
    expect(got.status).toBe(200);
    // The route defers the computation: the page's shell, then the outcome.
    const body = got.body as ExposureShell;
    const outcome = await body.exposure;
    expect(outcome.result).toBeNull();
    expect(outcome.problem).toMatch(/cannot be computed/);
  });
});
