// The layout API: PUT /api/v1/sites/:id/surfaces (with a session and with a token), every
// validation error, the site's version (stale → 409 with the current layout), tenant isolation,
// roles, audit rows in the same transaction, and the roof drawing upload.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import * as siteApi from "~/routes/api/v1/site";
import * as backdropApi from "~/routes/api/v1/site-backdrop";
import * as surfacesApi from "~/routes/api/v1/site-surfaces";
import * as tokensApi from "~/routes/api/v1/tokens";
import { callApi, type Auth } from "./api-client";
import { createOrg, type Org } from "./fixtures";
import { createSiteWithSurfaces, generatedUpload, makePng, multipart } from "./visit-fixtures";

let a: Org;
let b: Org;
let token = "";

const eng = (org = a): Auth => ({ cookie: org.people.engineer.cookie });
const put = (siteId: string, json: unknown, auth: Auth = eng()) => callApi(surfacesApi, "PUT", `/api/v1/sites/${siteId}/surfaces`, { auth, json, params: { siteId } });
const events = (siteId: string) => db.select().from(schema.auditEvent).where(eq(schema.auditEvent.siteId, siteId));
const rows = async (siteId: string) => ({
  surfaces: await db.select().from(schema.surface).where(eq(schema.surface.siteId, siteId)),
  obstructions: await db.select().from(schema.obstruction).where(eq(schema.obstruction.siteId, siteId)),
  accessPoints: await db.select().from(schema.accessPoint).where(eq(schema.accessPoint.siteId, siteId)),
});

const mainRoof = { name: "Main roof", kind: "area", polygon: [[0, 0], [20, 0], [20, 12], [0, 12]], elevationM: 0, access: "public" };
const lowerRoof = { name: "Lower roof", kind: "area", polygon: [[20, 0], [30, 0], [30, 12], [20, 12]], elevationM: -3.5, access: "workers" };
const facade = { name: "Flats opposite", kind: "facade", line: [[0, -15], [30, -15]], bottomM: -20, topM: 2, access: "public" };

beforeAll(async () => {
  a = await createOrg("layout-a");
  b = await createOrg("layout-b");
  token = (await callApi(tokensApi, "POST", "/api/v1/tokens", { auth: eng(), json: { name: "layout script" } })).body.token;
});

describe("PUT /api/v1/sites/:id/surfaces", () => {
  it("replaces the lists with a session, keeps the ids of kept rows, and writes one audit event per change", async () => {
    const { site, surfaces } = await createSiteWithSurfaces(a, "Layout replace");
    const [main, penthouse] = surfaces;
    const got = await put(site.id, {
      version: site.version,
      surfaces: [{ ...mainRoof, id: main.id, name: "Main roof slab" }, lowerRoof, facade],
      obstructions: [{ name: "Plant room", polygon: [[8, 4], [12, 4], [12, 8], [8, 8]], heightM: 3 }],
      accessPoints: [{ name: "Stair door", kind: "door", x: 1, y: 1, z: 0, locked: true }],
    });
    expect(got.status).toBe(200);
    expect(got.body.version).toBe(site.version + 1);
    expect(got.body.surfaces.map((s: { name: string }) => s.name)).toEqual(["Main roof slab", "Lower roof", "Flats opposite"]);
    expect(got.body.surfaces[0].id).toBe(main.id);
    expect(got.body.surfaces[2]).toMatchObject({ kind: "facade", line: [[0, -15], [30, -15]], bottomM: -20, topM: 2 });
    expect(got.body.obstructions[0]).toMatchObject({ name: "Plant room", baseM: 0, heightM: 3 });
    expect(got.body.accessPoints[0]).toMatchObject({ name: "Stair door", kind: "door", locked: true });
    const stored = await rows(site.id);
    expect(stored.surfaces.map((s) => s.id)).toContain(main.id);
    expect(stored.surfaces.map((s) => s.id)).not.toContain(penthouse.id);
    const audit = await events(site.id);
    const actions = audit.map((e) => `${e.action} ${e.subjectId === main.id ? "main" : e.subjectId === penthouse.id ? "penthouse" : "new"}`).sort();
    expect(actions).toEqual(["access-point.created new", "obstruction.created new", "surface.created new", "surface.created new", "surface.deleted penthouse", "surface.updated main"].sort());
    const updated = audit.find((e) => e.action === "surface.updated")!;
    expect(updated.before).toEqual({ name: "Main roof" });
    expect(updated.after).toEqual({ name: "Main roof slab" });
    expect(updated.actorUserId).toBe(a.people.engineer.userId);
  });

  it("works with a bearer token and records the token's member; leaves obstructions alone when not sent", async () => {
    const { site } = await createSiteWithSurfaces(a, "Layout token");
    await db.insert(schema.obstruction).values({ organizationId: a.id, siteId: site.id, name: "Tank", polygon: [[0, 0], [2, 0], [2, 2]], heightM: 2 });
    const got = await put(site.id, { surfaces: [mainRoof] }, { token });
    expect(got.status).toBe(200);
    expect(got.body.obstructions).toHaveLength(1);
    const [created] = (await events(site.id)).filter((e) => e.action === "surface.created");
    expect(created.actorUserId).toBe(a.people.engineer.userId);
  });

  it("answers the site GET with obstructions, access points and the drawing", async () => {
    const { site } = await createSiteWithSurfaces(a, "Layout read");
    await put(site.id, { surfaces: [mainRoof], accessPoints: [{ name: "Hatch", kind: "hatch", x: 3, y: 3 }] });
    const read = await callApi(siteApi, "GET", `/api/v1/sites/${site.id}`, { auth: { token }, params: { siteId: site.id } });
    expect(read.body.site.surfaces).toHaveLength(1);
    expect(read.body.site.obstructions).toEqual([]);
    expect(read.body.site.accessPoints[0]).toMatchObject({ name: "Hatch", kind: "hatch", x: 3, y: 3, z: 0, locked: false });
    expect(read.body.site.backdrop).toBeNull();
    expect(read.body.site.version).toBe(site.version + 1);
  });

  const invalid: [string, unknown, number, string, string][] = [
    ["fewer than 3 points", { surfaces: [mainRoof, { ...lowerRoof, polygon: [[0, 0], [1, 1]] }] }, 422, "surfaces[1].polygon", "Area “Lower roof”: the outline has 2 points; it needs at least 3."],
    ["zero area", { surfaces: [{ ...mainRoof, polygon: [[0, 0], [5, 0], [10, 0]] }] }, 422, "surfaces[0].polygon", "Area “Main roof”: the outline encloses no area"],
    ["self-intersection", { surfaces: [{ ...mainRoof, polygon: [[0, 0], [10, 10], [10, 0], [0, 10]] }] }, 422, "surfaces[0].polygon", "Area “Main roof”: edge 1–2 meets edge 3–4 at (5, 5)"],
    ["a corner touching an edge", { surfaces: [{ ...mainRoof, polygon: [[0, 0], [10, 0], [10, 10], [5, 0], [0, 10]] }] }, 422, "surfaces[0].polygon", "must not cross or touch itself"],
    ["top below bottom", { surfaces: [{ ...facade, bottomM: 5, topM: 2 }] }, 422, "surfaces[0].topM", "Facade “Flats opposite”: the top (2 m) must be above the bottom (5 m)."],
    ["a facade of zero length", { surfaces: [{ ...facade, line: [[3, 3], [3, 3]] }] }, 422, "surfaces[0].line", "the segment has no length"],
    ["a coordinate beyond 10 km", { surfaces: [{ ...mainRoof, polygon: [[0, 0], [20_000, 0], [0, 5]] }] }, 422, "surfaces[0].polygon", "point 2: x = 20000 m lies beyond"],
    ["an obstruction of no height", { surfaces: [], obstructions: [{ name: "Slab", polygon: [[0, 0], [1, 0], [1, 1]], heightM: 0 }] }, 422, "obstructions[0].heightM", "the height must be above 0 m"],
    ["an access point far away", { surfaces: [], accessPoints: [{ name: "Gate", kind: "gate", x: 0, y: -12_000 }] }, 422, "accessPoints[0].y", "beyond ±10 000 m"],
    ["a coordinate that is not a number", { surfaces: [{ ...mainRoof, polygon: [[0, 0], ["ten", 0], [0, 5]] }] }, 400, "surfaces[0].polygon[1][0]", "Enter x in metres, as a number."],
    ["an unknown kind", { surfaces: [{ ...mainRoof, kind: "roof" }] }, 400, "surfaces[0].kind", "Choose the kind: area or facade."],
    ["a missing name", { surfaces: [{ ...mainRoof, name: "" }] }, 400, "surfaces[0].name", "Enter the surface's name."],
    ["an unknown access", { surfaces: [{ ...mainRoof, access: "everyone" }] }, 400, "surfaces[0].access", "public, workers, none"],
    ["an unknown field", { surfaces: [{ ...mainRoof, colour: "red" }] }, 400, "surfaces[0]", "colour"],
    ["a repeated id", { surfaces: [{ ...mainRoof, id: "same" }, { ...lowerRoof, id: "same" }] }, 400, "surfaces[1].id", "sent twice"],
    ["an id of no record of this site", { surfaces: [{ ...mainRoof, id: "not-a-surface-here" }] }, 422, "surfaces[0].id", "No such record on this site"],
    ["no surfaces list", { obstructions: [] }, 400, "surfaces", ""],
  ];
  for (const [what, body, status, field, message] of invalid) {
    it(`refuses ${what} (${status}, ${field}) and writes nothing`, async () => {
      const { site } = await createSiteWithSurfaces(a, `Invalid ${what}`);
      const before = await rows(site.id);
      const got = await put(site.id, body);
      expect(got.status).toBe(status);
      expect(got.body.error.message).toBeTruthy();
      expect(got.body.error.fields?.[field]).toContain(message);
      expect(await rows(site.id)).toEqual(before);
      expect(await events(site.id)).toEqual([]);
      const [again] = await db.select().from(schema.site).where(eq(schema.site.id, site.id));
      expect(again.version).toBe(site.version);
    });
  }

  it("rolls back the surfaces already replaced, and their audit rows, when a later list is refused inside the transaction", async () => {
    const { site } = await createSiteWithSurfaces(a, "Layout rollback");
    const before = await rows(site.id);
    // The surfaces are written first; the obstruction's foreign id is found only afterwards.
    const got = await put(site.id, { surfaces: [mainRoof], obstructions: [{ id: "someone-elses", name: "Tank", polygon: [[0, 0], [2, 0], [2, 2]], heightM: 2 }] });
    expect(got.status).toBe(422);
    expect(got.body.error.fields["obstructions[0].id"]).toContain("No such record");
    expect(await rows(site.id)).toEqual(before);
    expect(await events(site.id)).toEqual([]);
  });

  it("refuses a stale version with 409 and the layout as it now stands, writing nothing", async () => {
    const { site } = await createSiteWithSurfaces(a, "Layout stale");
    const first = await put(site.id, { version: site.version, surfaces: [mainRoof] });
    expect(first.status).toBe(200);
    const stale = await put(site.id, { version: site.version, surfaces: [lowerRoof] }, { cookie: a.people.owner.cookie });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toContain("Someone else saved");
    expect(stale.body.current.version).toBe(site.version + 1);
    expect(stale.body.current.surfaces.map((s: { name: string }) => s.name)).toEqual(["Main roof"]);
    expect((await rows(site.id)).surfaces.map((s) => s.name)).toEqual(["Main roof"]);
    expect(await events(site.id)).toHaveLength(3); // the first save: one created, two deleted
  });

  it("answers 404 for another organisation's site, and leaves it untouched", async () => {
    const { site } = await createSiteWithSurfaces(a, "Layout isolated");
    const before = await rows(site.id);
    expect((await put(site.id, { surfaces: [mainRoof] }, eng(b))).status).toBe(404);
    expect((await callApi(surfacesApi, "GET", `/api/v1/sites/${site.id}/surfaces`, { auth: eng(b), params: { siteId: site.id } })).status).toBe(404);
    expect((await callApi(backdropApi, "DELETE", `/api/v1/sites/${site.id}/backdrop`, { auth: eng(b), params: { siteId: site.id } })).status).toBe(404);
    const upload = await callApi(backdropApi, "POST", `/api/v1/sites/${site.id}/backdrop`, { auth: eng(b), params: { siteId: site.id }, body: multipart([{ name: "image", file: { name: "roof.png", type: "image/png", bytes: await makePng() } }]) });
    expect(upload.status).toBe(404);
    expect(await rows(site.id)).toEqual(before);
  });

  it("lets owner, engineer and reviewer save; billing, client and regulator get 403; no sign-in 401", async () => {
    const { site } = await createSiteWithSurfaces(a, "Layout roles");
    for (const role of ["billing", "client", "regulator"] as const) {
      expect((await put(site.id, { surfaces: [mainRoof] }, { cookie: a.people[role].cookie })).status, role).toBe(403);
    }
    expect((await put(site.id, { surfaces: [mainRoof] }, {})).status).toBe(401);
    expect(await events(site.id)).toEqual([]);
    for (const role of ["owner", "engineer", "reviewer"] as const) {
      expect((await put(site.id, { surfaces: [mainRoof] }, { cookie: a.people[role].cookie })).status, role).toBe(200);
    }
    expect((await callApi(surfacesApi, "GET", `/api/v1/sites/${site.id}/surfaces`, { auth: { cookie: a.people.billing.cookie }, params: { siteId: site.id } })).status).toBe(200);
  });

  it("refuses a body that is not JSON with 415 and broken JSON with 400", async () => {
    const { site } = await createSiteWithSurfaces(a, "Layout body");
    expect((await callApi(surfacesApi, "PUT", `/api/v1/sites/${site.id}/surfaces`, { auth: eng(), params: { siteId: site.id }, body: "surfaces=1", contentType: "application/x-www-form-urlencoded" })).status).toBe(415);
    expect((await callApi(surfacesApi, "PUT", `/api/v1/sites/${site.id}/surfaces`, { auth: eng(), params: { siteId: site.id }, body: "{", contentType: "application/json" })).status).toBe(400);
  });
});

describe("the roof drawing", () => {
  const upload = (siteId: string, body: BodyInit, contentType?: string) => callApi(backdropApi, "POST", `/api/v1/sites/${siteId}/backdrop`, { auth: eng(), params: { siteId }, body, contentType });
  const files = () => db.select({ id: schema.storedFile.id }).from(schema.storedFile).where(and(eq(schema.storedFile.organizationId, a.id), eq(schema.storedFile.purpose, "backdrop")));

  it("stores a PNG, places it with the layout, replaces it and removes it, with audit events", async () => {
    const { site } = await createSiteWithSurfaces(a, "Layout drawing");
    const got = await upload(site.id, multipart([{ name: "image", file: { name: "roof plan.png", type: "image/png", bytes: await makePng() } }]));
    expect(got.status).toBe(201);
    expect(got.body.backdrop).toMatchObject({ widthPx: 40, heightPx: 30, p1: [0, 0], p2: [40, 0], opacity: 0.5 });
    expect(got.body.backdrop.href).toBe(`/files/${got.body.backdrop.fileId}`);
    const placed = await put(site.id, { version: got.body.version, surfaces: [mainRoof], backdrop: { p1: [5, 5], p2: [35, 5], distanceM: 15, originX: 0, originY: 12, rotationDeg: 2.5, opacity: 0.7 } });
    expect(placed.status).toBe(200);
    expect(placed.body.backdrop).toMatchObject({ p1: [5, 5], p2: [35, 5], distanceM: 15, originY: 12, rotationDeg: 2.5, opacity: 0.7 });
    const again = await upload(site.id, multipart([{ name: "image", file: { name: "aerial.png", type: "image/png", bytes: await makePng() } }]));
    expect(again.status).toBe(201);
    expect(await files()).toContainEqual({ id: again.body.backdrop.fileId });
    expect(await files()).not.toContainEqual({ id: got.body.backdrop.fileId });
    const removed = await callApi(backdropApi, "DELETE", `/api/v1/sites/${site.id}/backdrop`, { auth: eng(), params: { siteId: site.id } });
    expect(removed.status).toBe(200);
    expect(await files()).not.toContainEqual({ id: again.body.backdrop.fileId });
    expect((await events(site.id)).map((e) => e.action).sort()).toEqual(["backdrop.created", "backdrop.deleted", "backdrop.updated", "backdrop.updated", "surface.created", "surface.deleted", "surface.deleted"].sort());
  });

  it("refuses a file that is not an image, whatever its name, and an upload over 10 MB, writing nothing", async () => {
    const { site } = await createSiteWithSurfaces(a, "Layout drawing refused");
    const before = (await files()).length;
    const text = await upload(site.id, multipart([{ name: "image", file: { name: "roof.png", type: "image/png", bytes: Buffer.from("%PDF-1.7 not an image") } }]));
    expect(text.status).toBe(415);
    expect(text.body.error.message).toContain("PNG, JPEG or WebP");
    const huge = generatedUpload(11 * 1024 * 1024, "layout-boundary");
    const over = await upload(site.id, huge.stream, "multipart/form-data; boundary=layout-boundary");
    expect(over.status).toBe(413);
    expect(over.body.error.message).toContain("larger than 10 MB");
    expect(huge.pulled()).toBeLessThan(11 * 1024 * 1024);
    expect((await upload(site.id, "{}", "application/json")).status).toBe(415);
    expect((await upload(site.id, multipart([{ name: "other", value: "x" }]))).status).toBe(400);
    expect((await files()).length).toBe(before);
    expect(await db.select().from(schema.siteBackdrop).where(eq(schema.siteBackdrop.siteId, site.id))).toEqual([]);
    expect(await events(site.id)).toEqual([]);
  });

  it("refuses placing a drawing the site does not have", async () => {
    const { site } = await createSiteWithSurfaces(a, "Layout no drawing");
    const got = await put(site.id, { surfaces: [mainRoof], backdrop: { p1: [0, 0], p2: [10, 0], distanceM: 5, originX: 0, originY: 0, rotationDeg: 0, opacity: 0.5 } });
    expect(got.status).toBe(422);
    expect(got.body.error.fields.backdrop).toContain("no roof drawing");
    expect(await events(site.id)).toEqual([]);
  });
});
