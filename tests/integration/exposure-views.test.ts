// The elevation, 3D and planner pages' loaders: staff of the site's organisation get the site's
// engine emitters (active ones, converted once), surfaces and obstructions with the options from
// the address; another organisation's site is a 404; client and regulator members get 403.
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import * as planner from "~/routes/exposure/planner";
import * as section from "~/routes/exposure/section";
import * as solid from "~/routes/exposure/solid";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";

let a: Org;
let b: Org;
let siteId = "";
const pages = { section, solid, planner } as const;
const load = (page: keyof typeof pages, org: Org, role: keyof Org["people"], search = "") =>
  outcome(() => pages[page].loader({ request: makeRequest(`/sites/${siteId}/exposure/${page}${search}`, { cookie: org.people[role].cookie }), params: { siteId }, context: {} } as never));

beforeAll(async () => {
  a = await createOrg("views-a");
  b = await createOrg("views-b");
  const [site] = await db.insert(schema.site).values({ organizationId: a.id, name: "Views <site> ✓", kind: "rooftop" }).returning();
  siteId = site.id;
  await db.insert(schema.surface).values({ organizationId: a.id, siteId, name: "Roof", kind: "area", polygon: [[0, 0], [20, 0], [20, 10], [0, 10]], elevationM: 0, access: "workers" });
  await db.insert(schema.obstruction).values({ organizationId: a.id, siteId, name: "Plant room", polygon: [[1, 1], [3, 1], [3, 3], [1, 3]], baseM: 0, heightM: 2.5 });
  await db.insert(schema.emitter).values([
    { organizationId: a.id, siteId, position: 0, label: "S1", operator: "Op One", band: "AWS", frequencyMHz: 2130, powerPerCarrierW: 20, carriers: 4, lossDb: 1, gainDbi: 17, azimuthDeg: 90, mechanicalTiltDeg: 2, electricalTiltDeg: 3, x: 2, y: 5, z: 3 },
    { organizationId: a.id, siteId, position: 1, label: "S2", frequencyMHz: 881, powerPerCarrierW: 10, gainDbi: 15, x: 5, y: 5, z: 3, active: false },
  ]);
});

describe("exposure views' loaders", () => {
  it("give staff the active emitters as the engine takes them, the layout and the options from the address", async () => {
    for (const page of ["section", "solid", "planner"] as const) {
      const got = await load(page, a, "engineer", "?standard=icnirp-2020&reflection=2.56");
      expect(got.status).toBe(200);
      const body = got.body as Awaited<ReturnType<typeof section.loader>>;
      expect(body.site.name).toBe("Views <site> ✓");
      expect(body.options).toMatchObject({ standard: "icnirp-2020", reflectionFactor: 2.56 });
      expect(body.emitters.map((e) => e.id)).toEqual(["S1"]); // S2 is off air
      expect(body.emitters[0]).toMatchObject({ powerW: 80, tiltDeg: 5, reflectionFactor: 2.56, position: { x: 2, y: 5, z: 3 } }); // 4 carriers × 20 W; 2° + 3° tilt
      expect(body.emitterInfo).toEqual([{ id: "S1", operator: "Op One", band: "AWS" }]);
      expect(body.surfaces.map((s) => s.name)).toEqual(["Roof"]);
      expect(body.obstructions).toMatchObject([{ name: "Plant room", baseM: 0, heightM: 2.5 }]);
    }
  });

  it("fall back to the defaults for options they cannot read, and say so", async () => {
    const got = await load("section", a, "billing", "?standard=nope&step=0.5");
    expect(got.status).toBe(200);
    const body = got.body as Awaited<ReturnType<typeof section.loader>>;
    expect(body.options).toMatchObject({ standard: "fcc", gridStepM: 0.5 });
    expect(body.optionErrors).toHaveLength(1);
  });

  it("answer 404 for another organisation's site, whatever the role", async () => {
    for (const page of ["section", "solid", "planner"] as const) {
      for (const role of ["owner", "engineer", "billing"] as const) expect((await load(page, b, role)).status, `${page} ${role}`).toBe(404);
    }
  });

  it("answer 403 to client and regulator members", async () => {
    for (const page of ["section", "solid", "planner"] as const) {
      for (const role of ["client", "regulator"] as const) expect((await load(page, a, role)).status, `${page} ${role}`).toBe(403);
    }
  });
});
