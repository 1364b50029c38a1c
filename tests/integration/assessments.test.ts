// Frozen assessments through the API: the contract's shapes, the stored runs re-run through the
// command line to the same bytes, later inventory edits leaving an assessment untouched, the
// comparison listing exactly the changes made, validation, roles, tenant isolation, the trigger
// that guards the frozen columns, and the editable mitigation plan.
import { spawnSync } from "node:child_process";
import { join } from "node:path";
import { and, eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import * as compareApi from "~/routes/api/v1/assessment-compare";
import * as assessmentApi from "~/routes/api/v1/assessment";
import * as siteAssessmentsApi from "~/routes/api/v1/site-assessments";
import * as assessmentPage from "~/routes/sites/assessment";
import { callApi, type Auth } from "./api-client";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";

const ROOT = join(__dirname, "..", "..");
let a: Org;
let b: Org;
let siteId = "";
let otherSiteId = "";
let emitterIds: string[] = [];

const as = (org: Org, role: keyof Org["people"]): Auth => ({ cookie: org.people[role].cookie });
const freeze = (json: unknown, auth: Auth = as(a, "engineer"), site = siteId) => callApi(siteAssessmentsApi, "POST", `/api/v1/sites/${site}/assessments`, { auth, json, params: { siteId: site } });
const getOne = (id: string, auth: Auth = as(a, "engineer")) => callApi(assessmentApi, "GET", `/api/v1/assessments/${id}`, { auth, params: { assessmentId: id } });
const compare = (x: string, y: string, auth: Auth = as(a, "engineer")) => callApi(compareApi, "GET", `/api/v1/assessments/${x}/compare/${y}`, { auth, params: { a: x, b: y } });
const quick = { name: "Quick look", standard: "fcc", tier: "general", gridStepM: 0.5 };

const sector = (label: string, over: Partial<typeof schema.emitter.$inferInsert> = {}) => ({
  organizationId: a.id, siteId, label, operator: "Fixture Mobile", band: "PCS", frequencyMHz: 1960, powerPerCarrierW: 30, carriers: 2, lossDb: 1, gainDbi: 17,
  hBeamwidthDeg: 65, vBeamwidthDeg: 7, azimuthDeg: 90, x: 1, y: 6, z: 2, model: "spherical" as const, ...over,
});

beforeAll(async () => {
  a = await createOrg("assess-a");
  b = await createOrg("assess-b");
  const [client] = await db.insert(schema.client).values({ organizationId: a.id, name: "Fixture Estates" }).returning();
  const [site] = await db.insert(schema.site).values({ organizationId: a.id, clientId: client.id, name: "Assessment fixture roof", kind: "rooftop" }).returning();
  siteId = site.id;
  const [other] = await db.insert(schema.site).values({ organizationId: a.id, name: "Another roof", kind: "rooftop" }).returning();
  otherSiteId = other.id;
  await db.insert(schema.surface).values([
    { organizationId: a.id, siteId, name: "Main roof", kind: "area", polygon: [[0, 0], [20, 0], [20, 12], [0, 12]], elevationM: 0, access: "workers", position: 0 },
    { organizationId: a.id, siteId, name: "Plant deck", kind: "area", polygon: [[14, 8], [20, 8], [20, 12], [14, 12]], elevationM: 3, access: "none", position: 1 },
  ]);
  await db.insert(schema.obstruction).values({ organizationId: a.id, siteId, name: "Plant room", polygon: [[14, 8], [20, 8], [20, 12], [14, 12]], baseM: 0, heightM: 3 });
  await db.insert(schema.accessPoint).values({ organizationId: a.id, siteId, name: "Roof door", kind: "door", x: 19.5, y: 1, z: 0, locked: false });
  const rows = await db.insert(schema.emitter).values([sector("FX-1"), sector("FX-2", { azimuthDeg: 0, x: 10, y: 0.5, frequencyMHz: 739, gainDbi: 14 }), sector("FX-3", { azimuthDeg: 270, x: 19, y: 3, z: 2.5, position: 2 })]).returning();
  emitterIds = rows.map((r) => r.id);
  await db.insert(schema.emitter).values({ organizationId: b.id, siteId: (await db.insert(schema.site).values({ organizationId: b.id, name: "B's roof", kind: "rooftop" }).returning())[0].id, label: "B-1", frequencyMHz: 900, powerPerCarrierW: 10, gainDbi: 10, x: 0, y: 0, z: 0 });
});

describe("POST /api/v1/sites/:id/assessments", () => {
  it("freezes the site with the options' defaults and answers 201 with the contract's shape", async () => {
    const got = await freeze({ name: "Baseline", standard: "fcc", tier: "general" });
    expect(got.status).toBe(201);
    const x = got.body.assessment;
    expect(Object.keys(x).sort()).toEqual(["author", "createdAt", "id", "inventory", "mitigation", "name", "options", "runs", "siteId", "standard", "summary", "tier"]);
    expect(x).toMatchObject({ siteId, name: "Baseline", standard: "fcc", tier: "general", author: { id: a.people.engineer.userId } });
    expect(x.options).toEqual({ standard: "fcc", tier: "general", gridStepM: 0.25, heights: { fromM: 0, toM: 2, count: 11 }, mode: "average", reflectionFactor: 1, defaultModel: "spherical" });
    expect(x.inventory.site).toMatchObject({ id: siteId, name: "Assessment fixture roof" });
    expect(x.inventory.client).toMatchObject({ name: "Fixture Estates" });
    expect(x.inventory.emitters.map((e: { label: string }) => e.label)).toEqual(["FX-1", "FX-2", "FX-3"]);
    expect(x.inventory.accessPoints).toHaveLength(1);
    expect(x.inventory.obstructions).toHaveLength(1);
    expect(x.runs).toHaveLength(2);
    for (const run of x.runs) expect(Object.keys(run).sort()).toEqual(["request", "response", "surfaceId"]);
    expect(x.runs[0].request.grid).toMatchObject({ step: 0.25, zCount: 11, mode: "average" });
    expect(Object.keys(x.summary).sort()).toEqual(["areas", "emitters", "worstAt", "worstPercent"]);
    expect(Object.keys(x.summary.worstAt).sort()).toEqual(["surfaceId", "x", "y", "z"]);
    for (const e of x.summary.emitters) expect(Object.keys(e).sort()).toEqual(["complianceDistanceM", "eirpW", "id", "label"]);
    expect(Object.keys(x.summary.emitters[0].complianceDistanceM).sort()).toEqual(["general", "occupational"]);
    for (const area of x.summary.areas) expect(Object.keys(area).sort()).toEqual(["overGeneralM2", "overOccupationalM2", "overTenTimesOccupationalM2", "surfaceId"]);
    // summary.worstPercent is the largest value over the runs.
    const largest = Math.max(...x.runs.map((r: { response: { grid?: { maxPercent: number } } }) => r.response.grid?.maxPercent ?? 0));
    expect(x.summary.worstPercent).toBe(largest);
    expect(x.summary.worstPercent).toBeGreaterThan(100); // the fixture's sectors put the roof over the general-population limit
    expect(x.mitigation).toMatchObject({ version: 1, notes: "", basis: { signSource: "47 CFR §1.1307(b)(2) and (b)(4)" } });
    expect(x.mitigation.signs.find((s: { origin: string }) => s.origin === "access-point")).toMatchObject({ x: 19.5, y: 1 });
    const [event] = await db.select().from(schema.auditEvent).where(and(eq(schema.auditEvent.subjectType, "assessment"), eq(schema.auditEvent.subjectId, x.id)));
    expect(event).toMatchObject({ action: "assessment.created", actorUserId: a.people.engineer.userId, siteId });
  });

  it("stores runs whose requests re-run through `npm run -s evaluate` to the stored responses, byte for byte", async () => {
    const made = await freeze(quick);
    const id = made.body.assessment.id;
    const runs = made.body.assessment.runs as { request: unknown; response: unknown }[];
    for (let i = 0; i < runs.length; i++) {
      const cli = spawnSync("npm", ["run", "-s", "evaluate", "--", "-"], { cwd: ROOT, input: JSON.stringify(runs[i].request), encoding: "utf8", maxBuffer: 256 * 1024 * 1024 });
      expect(cli.stderr).toBe("");
      expect(cli.status).toBe(0);
      // The bytes as stored (a `json` column keeps its text) and as the API sent them.
      const [stored] = await db.execute<{ response: string }>(sql`select (runs -> ${i}::int -> 'response')::text as response from assessment where id = ${id}`);
      expect(cli.stdout).toBe(`${stored.response}\n`);
      expect(cli.stdout).toBe(`${JSON.stringify(runs[i].response)}\n`);
    }
  }, 120_000);

  it("refuses bad input with the fields named, storing nothing", async () => {
    const before = (await db.select().from(schema.assessment).where(eq(schema.assessment.siteId, siteId))).length;
    const empty = await freeze({});
    expect(empty.status).toBe(400);
    expect(Object.keys(empty.body.error.fields).sort()).toEqual(["name", "standard", "tier"]);
    const wrong = await freeze({ name: "x".repeat(121), standard: "fcc", tier: "everyone", gridStepM: 0.01, heights: { fromM: 1, toM: 0, count: 0 }, mode: "peak", reflectionFactor: 3, colour: "red" });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toMatchObject({
      name: "Use at most 120 characters.",
      tier: "Choose the tier: general or occupational.",
      gridStepM: "Use a grid step from 0.1 to 5 m.",
      "heights.count": "Use 1 to 41 heights.",
      mode: "Choose average or max.",
      reflectionFactor: "Choose a reflection factor of 1, 2.56 or 4.",
      body: "Unknown field: colour.",
    });
    const notJson = await callApi(siteAssessmentsApi, "POST", `/api/v1/sites/${siteId}/assessments`, { auth: as(a, "engineer"), body: "name=x", contentType: "application/x-www-form-urlencoded", params: { siteId } });
    expect(notJson.status).toBe(415);
    expect((await db.select().from(schema.assessment).where(eq(schema.assessment.siteId, siteId))).length).toBe(before);
  });

  it("answers 422 when the inventory cannot be evaluated against the standard (a frequency outside its table)", async () => {
    const [low] = await db.insert(schema.emitter).values({ organizationId: a.id, siteId: otherSiteId, label: "LOW", frequencyMHz: 50, powerPerCarrierW: 10, gainDbi: 3, x: 0, y: 0, z: 1 }).returning();
    await db.insert(schema.surface).values({ organizationId: a.id, siteId: otherSiteId, name: "Deck", kind: "area", polygon: [[0, 0], [4, 0], [4, 4], [0, 4]], elevationM: 0 });
    const got = await freeze({ ...quick, standard: "ieee-c95.1-2019" }, as(a, "engineer"), otherSiteId);
    expect(got.status).toBe(422);
    expect(got.body.error.message).toMatch(/cannot be evaluated/);
    await db.delete(schema.emitter).where(eq(schema.emitter.id, low.id));
  });
});

describe("roles and tenant isolation", () => {
  let id = "";
  beforeAll(async () => {
    id = (await freeze(quick)).body.assessment.id;
  });

  it("lets the staff read (billing read-only), engineers freeze, and refuses clients and regulators", async () => {
    for (const role of ["owner", "engineer", "reviewer", "billing"] as const) {
      expect((await getOne(id, as(a, role))).status, role).toBe(200);
      expect((await callApi(siteAssessmentsApi, "GET", `/api/v1/sites/${siteId}/assessments`, { auth: as(a, role), params: { siteId } })).status, role).toBe(200);
    }
    for (const role of ["client", "regulator"] as const) {
      expect((await getOne(id, as(a, role))).status, role).toBe(403);
      expect((await compare(id, id, as(a, role))).status, role).toBe(403);
      expect((await callApi(siteAssessmentsApi, "GET", `/api/v1/sites/${siteId}/assessments`, { auth: as(a, role), params: { siteId } })).status, role).toBe(403);
    }
    for (const role of ["billing", "client", "regulator"] as const) expect((await freeze(quick, as(a, role))).status, role).toBe(403);
    expect((await getOne(id, {})).status).toBe(401);
  });

  it("answers 404 for another organisation's site and assessments", async () => {
    const other = as(b, "owner");
    expect((await getOne(id, other)).status).toBe(404);
    expect((await compare(id, id, other)).status).toBe(404);
    expect((await callApi(siteAssessmentsApi, "GET", `/api/v1/sites/${siteId}/assessments`, { auth: other, params: { siteId } })).status).toBe(404);
    expect((await freeze(quick, other)).status).toBe(404);
  });

  it("lists a site's assessments newest first, without their runs", async () => {
    const got = await callApi(siteAssessmentsApi, "GET", `/api/v1/sites/${siteId}/assessments`, { auth: as(a, "billing"), params: { siteId } });
    expect(got.body.assessments[0].id).toBe(id);
    expect(Object.keys(got.body.assessments[0]).sort()).toEqual(["author", "createdAt", "id", "name", "options", "siteId", "standard", "summary", "tier"]);
  });
});

describe("frozen means frozen", () => {
  it("stays the same after the inventory is edited, and the comparison lists exactly the changes made", async () => {
    const first = (await freeze({ ...quick, name: "Before the changes" })).body.assessment;
    // The changes: FX-1's power, FX-3 taken down, FX-4 put up.
    await db.update(schema.emitter).set({ powerPerCarrierW: 60, version: 2 }).where(eq(schema.emitter.id, emitterIds[0]));
    await db.delete(schema.emitter).where(eq(schema.emitter.id, emitterIds[2]));
    const [added] = await db.insert(schema.emitter).values(sector("FX-4", { azimuthDeg: 180, x: 5, y: 11.5, position: 3 })).returning();
    expect((await getOne(first.id)).body.assessment).toEqual(first);

    const second = (await freeze({ ...quick, name: "After the changes" })).body.assessment;
    const got = await compare(first.id, second.id);
    expect(got.status).toBe(200);
    expect(got.body.a).toMatchObject({ id: first.id, name: "Before the changes" });
    expect(got.body.inventory.emitters).toEqual({
      added: [{ id: added.id, label: "FX-4" }],
      removed: [{ id: emitterIds[2], label: "FX-3" }],
      changed: [{ id: emitterIds[0], label: "FX-1", fields: [{ field: "powerPerCarrierW", before: 30, after: 60 }] }],
    });
    for (const kind of ["surfaces", "obstructions", "accessPoints"]) expect(got.body.inventory[kind], kind).toEqual({ added: [], removed: [], changed: [] });
    expect(got.body.options).toEqual([]);
    expect(got.body.results.worstPercent).toEqual({ a: first.summary.worstPercent, b: second.summary.worstPercent });
    const roof = got.body.results.surfaces.find((s: { name: string }) => s.name === "Main roof");
    const areaOf = (x: typeof first) => x.summary.areas.find((s: { surfaceId: string }) => s.surfaceId === roof.surfaceId).overGeneralM2;
    expect(roof.overGeneralM2).toEqual({ a: areaOf(first), b: areaOf(second) });
    expect(roof.overGeneralM2.b).not.toBe(roof.overGeneralM2.a);
  });

  it("refuses to compare assessments of two different sites", async () => {
    const [one] = await db.select({ id: schema.assessment.id }).from(schema.assessment).where(eq(schema.assessment.siteId, siteId)).limit(1);
    const [other] = await db.insert(schema.assessment).values({ organizationId: a.id, siteId: otherSiteId, name: "Elsewhere", authorName: "Fixture", standard: "fcc", tier: "general", options: {}, site: {}, inventory: {}, runs: [], summary: {}, results: {}, engine: "", mitigation: {} }).returning();
    expect((await compare(one.id, other.id)).status).toBe(400);
  });

  it("refuses, in the database itself, any update of a frozen column; the mitigation plan may change", async () => {
    const [row] = await db.select({ id: schema.assessment.id }).from(schema.assessment).where(eq(schema.assessment.siteId, siteId)).limit(1);
    // Drizzle wraps the database's error; its message is the cause's.
    const refusal = async (update: PromiseLike<unknown>) => {
      try {
        await update;
        return "updated";
      } catch (error) {
        return String((error as { cause?: Error }).cause?.message ?? error);
      }
    };
    expect(await refusal(db.update(schema.assessment).set({ name: "Renamed" }).where(eq(schema.assessment.id, row.id)))).toMatch(/is frozen: only its mitigation plan may change/);
    expect(await refusal(db.update(schema.assessment).set({ runs: [] }).where(eq(schema.assessment.id, row.id)))).toMatch(/is frozen/);
    expect(await refusal(db.execute(sql`update assessment set summary = jsonb_set(summary, '{worstPercent}', '1') where id = ${row.id}`))).toMatch(/is frozen/);
    expect(await refusal(db.update(schema.assessment).set({ inventory: {} }).where(eq(schema.assessment.id, row.id)))).toMatch(/is frozen/);
    await db.update(schema.assessment).set({ mitigationVersion: sql`mitigation_version` }).where(eq(schema.assessment.id, row.id));
  });
});

describe("PATCH /api/v1/assessments/:id (the mitigation plan only)", () => {
  it("changes what it is given, keeps the rest, refuses a stale version, other roles and other organisations", async () => {
    const x = (await freeze({ ...quick, name: "Plan by API" })).body.assessment;
    const patch = (json: unknown, auth: Auth = as(a, "engineer")) => callApi(assessmentApi, "PATCH", `/api/v1/assessments/${x.id}`, { auth, json, params: { assessmentId: x.id } });
    const sign = x.mitigation.signs[0];
    const got = await patch({ mitigationVersion: 1, signs: [{ id: sign.id, category: sign.category, x: 2, y: 3, where: sign.where, note: sign.note }] });
    expect(got.status).toBe(200);
    expect(got.body.assessment.mitigation.version).toBe(2);
    expect(got.body.assessment.mitigation.signs[0]).toMatchObject({ id: sign.id, x: 2, y: 3 });
    expect(got.body.assessment.mitigation.barriers).toEqual(x.mitigation.barriers); // not given: kept
    expect(got.body.assessment.runs).toEqual(x.runs);
    expect((await patch({ mitigationVersion: 1, notes: "late" })).status).toBe(409);
    expect((await patch({ mitigationVersion: 2, signs: [{ id: sign.id, category: "danger", x: 0, y: 0 }] })).body.error.fields).toEqual({ "signs[0].category": "Choose a sign: information, notice, caution, warning." });
    expect((await patch({ mitigationVersion: 2, notes: "x" }, as(a, "billing"))).status).toBe(403);
    expect((await patch({ mitigationVersion: 2, notes: "x" }, as(b, "owner"))).status).toBe(404);
  });
});

describe("the mitigation plan, edited on the assessment page", () => {
  it("moves, re-categorises and removes signs, adds one, removes a barrier, saves notes, and refuses a stale version", async () => {
    const x = (await freeze({ ...quick, name: "Plan edits" })).body.assessment;
    const [first, second] = x.mitigation.signs;
    const post = (form: Record<string, string>) =>
      outcome(() => assessmentPage.action({ request: makeRequest(`/sites/${siteId}/assessments/${x.id}`, { cookie: a.people.engineer.cookie, form }), params: { siteId, assessmentId: x.id }, context: {} } as never));
    // Each small form of the page: one sign saved, one removed, the notes, one barrier removed.
    const saved = await post({ intent: "save-plan", mitigationVersion: "1", "signs[0].id": first.id, "signs[0].category": "caution", "signs[0].x": "3.5", "signs[0].y": "4", "signs[0].where": "Moved to the parapet", "signs[0].note": "" });
    expect(saved.status).toBe(302);
    const removed = await post({ intent: "save-plan", mitigationVersion: "2", "signs[0].id": second.id, "signs[0].category": second.category, "signs[0].x": String(second.x), "signs[0].y": String(second.y), "signs[0].remove": "on" });
    expect(removed.status).toBe(302);
    expect((await post({ intent: "save-plan", mitigationVersion: "3", notes: "Barriers to be fitted by the landlord's contractor." })).status).toBe(302);
    expect(x.mitigation.barriers.length).toBeGreaterThan(0);
    const barrier = x.mitigation.barriers[0].id;
    expect((await post({ intent: "save-plan", mitigationVersion: "4", "removeBarriers[0]": barrier })).status).toBe(302);
    const deck = x.runs[1].surfaceId;
    const elsewhere = await post({ intent: "add-sign", mitigationVersion: "5", surfaceId: "not-a-surface", category: "notice", x: "1", y: "1" });
    expect(elsewhere.status).toBe(400);
    const added = await post({ intent: "add-sign", mitigationVersion: "5", surfaceId: deck, category: "notice", x: "1", y: "1", where: "Stair landing", note: "" });
    expect(added.status).toBe(302);
    const stale = await post({ intent: "add-sign", mitigationVersion: "5", category: "notice", x: "1", y: "1" });
    expect(stale.status).toBe(409);
    const plan = (await getOne(x.id)).body.assessment.mitigation;
    expect(plan.version).toBe(6);
    expect(plan.notes).toBe("Barriers to be fitted by the landlord's contractor.");
    expect(plan.signs.find((s: { id: string }) => s.id === first.id)).toMatchObject({ category: "caution", x: 3.5, y: 4, where: "Moved to the parapet" });
    expect(plan.signs.find((s: { id: string }) => s.id === second.id)).toBeUndefined();
    expect(plan.signs.at(-1)).toMatchObject({ category: "notice", x: 1, y: 1, z: 3, surfaceId: deck, origin: "engineer", where: "Stair landing" });
    expect(plan.signs).toHaveLength(x.mitigation.signs.length);
    expect(plan.barriers.map((b: { id: string }) => b.id)).toEqual(x.mitigation.barriers.slice(1).map((b: { id: string }) => b.id));
    const bad = await post({ intent: "add-sign", mitigationVersion: "6", category: "danger", x: "north", y: "1" });
    expect(bad.status).toBe(400);
  });
});
