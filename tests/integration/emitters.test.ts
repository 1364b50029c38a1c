// Emitters and the pattern library: the API with a session and with a token, every validation
// error, the CSV import (all or nothing, valid rows on request, replace or append, a failure halfway
// through the writes), export then import, stale edits, isolation, roles, a pattern in use.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { importEmitters } from "~/features/emitters/bulk.server";
import { db, schema } from "~/infra/db.server";
import { snapshot } from "~/lib/snapshot";
import * as csvApi from "~/routes/api/v1/site-emitters-csv";
import * as emittersApi from "~/routes/api/v1/site-emitters";
import * as patternsApi from "~/routes/api/v1/patterns";
import * as tokensApi from "~/routes/api/v1/tokens";
import * as patternsPage from "~/routes/patterns/patterns";
import * as emittersPage from "~/routes/sites/emitters";
import { callApi, type Auth } from "./api-client";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";

let a: Org;
let b: Org;
let token = "";
let siteId = "";

const eng = (): Auth => ({ cookie: a.people.engineer.cookie });
const put = (emitters: unknown, auth: Auth = eng(), site = siteId) => callApi(emittersApi, "PUT", `/api/v1/sites/${site}/emitters`, { auth, json: { emitters }, params: { siteId: site } });
const get = (auth: Auth = eng(), site = siteId) => callApi(emittersApi, "GET", `/api/v1/sites/${site}/emitters`, { auth, params: { siteId: site } });
const importCsv = (csv: string, query = "", auth: Auth = eng(), site = siteId) =>
  callApi(csvApi, "POST", `/api/v1/sites/${site}/emitters/csv${query}`, { auth, body: csv, contentType: "text/csv", params: { siteId: site } });
const stored = (site = siteId) => db.select().from(schema.emitter).where(eq(schema.emitter.siteId, site));
const audits = (site = siteId) => db.select().from(schema.auditEvent).where(and(eq(schema.auditEvent.subjectType, "emitter"), eq(schema.auditEvent.siteId, site)));
const newSite = async (org: Org, name = "Emitter test site") => (await db.insert(schema.site).values({ organizationId: org.id, name, kind: "rooftop" }).returning())[0].id;

const one = (over: Record<string, unknown> = {}) => ({ label: "A1", operator: "Northwind Mobile", band: "LTE 700", frequencyMHz: 739, powerPerCarrierW: 40, carriers: 2, lossDb: 1.5, gain: 15.85, gainUnit: "dBd", azimuthDeg: 30, mechanicalTiltDeg: 2, electricalTiltDeg: 4, position: { x: 1, y: 2, z: 3.5 }, ...over });

const header = "label,operator,band,frequency_mhz,power_per_carrier_w,gain_dbi,azimuth_deg,x_m,y_m,z_m";
const rows = (n: number, bad?: number) =>
  [header, ...Array.from({ length: n }, (_, i) => `R${i + 1},Quay Wireless,NR 3500,${i + 1 === bad ? "three thousand" : 3500},20,17,${i * 40},${i},0,6`)].join("\n");

beforeAll(async () => {
  a = await createOrg("emitters-a");
  b = await createOrg("emitters-b");
  const made = await callApi(tokensApi, "POST", "/api/v1/tokens", { auth: eng(), json: { name: "inventory sync" } });
  token = made.body.token;
  siteId = await newSite(a);
});

describe("PUT /api/v1/sites/:id/emitters", () => {
  it("replaces the list with a session: stores dBd as dBi + 2.15, answers EIRP/ERP, audits each row", async () => {
    const got = await put([one(), one({ label: "A2", gain: 18, gainUnit: "dBi", operator: "Quay Wireless", model: "cylindrical", apertureM: 1.4, actualMaxFactor: 0.3, tddFactor: 0.74 })]);
    expect(got.status).toBe(200);
    expect(got.body.emitters).toHaveLength(2);
    const [a1, a2] = got.body.emitters;
    expect(a1).toMatchObject({ label: "A1", gain: 15.85, gainUnit: "dBd", powerPerCarrierW: 40, carriers: 2, position: { x: 1, y: 2, z: 3.5 }, version: 1 });
    expect(a1.gainDbi).toBeCloseTo(18, 12); // dBd + 2.15 (OET-65 §1)
    // EIRP = P·carriers·10^(−loss/10)·10^(G/10) (OET-65 §1): 80 W, 1.5 dB loss, 18 dBi.
    expect(a1.eirpW).toBeCloseTo(80 * 10 ** -0.15 * 10 ** 1.8, 6);
    expect(a2).toMatchObject({ model: "cylindrical", apertureM: 1.4, actualMaxFactor: 0.3, tddFactor: 0.74 });
    const events = await audits();
    expect(events.filter((e) => e.action === "emitter.created").map((e) => e.subjectId).sort()).toEqual([a1.id, a2.id].sort());
  });

  it("keeps ids for rows that keep their id, with a token; drops the others and adds the new", async () => {
    const before = (await get()).body.emitters;
    const got = await put([{ ...one({ label: "A1", azimuthDeg: 45 }), id: before[0].id }, one({ label: "A3" })], { token });
    expect(got.status).toBe(200);
    expect(got.body.emitters.map((e: { label: string }) => e.label)).toEqual(["A1", "A3"]);
    expect(got.body.emitters[0]).toMatchObject({ id: before[0].id, azimuthDeg: 45, version: 2 });
    const events = await audits();
    expect(events.find((e) => e.action === "emitter.deleted" && e.subjectId === before[1].id)?.actorUserId).toBe(a.people.engineer.userId);
    expect(events.find((e) => e.action === "emitter.updated" && e.subjectId === before[0].id)).toMatchObject({ before: { label: "A1", azimuthDeg: 30 }, after: { label: "A1", azimuthDeg: 45 } });
  });

  it("names every invalid field by its path and changes nothing", async () => {
    const before = await stored();
    const pattern = await db.insert(schema.antennaPattern).values({ organizationId: b.id, name: "Other org's", kind: "3gpp-38.901", pattern: { type: "3gpp-38.901", hBeamwidthDeg: 65, vBeamwidthDeg: 7, maxAttenuationDb: 30, sideLobeDb: 30 } }).returning();
    const got = await put([
      one(),
      one({ label: "", frequencyMHz: 0, powerPerCarrierW: -1, gainUnit: "dBx", carriers: 1.5, dutyFactor: 1.2, colour: "red" }),
      one({ position: { x: 1, y: 2 }, model: "aperture", azimuthDeg: "north" }),
      one({ model: "cylindrical", mechanicalTiltDeg: 60, electricalTiltDeg: 45, pattern: { type: "3gpp-38.901", hBeamwidthDeg: 0, vBeamwidthDeg: 7 } }),
    ]);
    expect(got.status).toBe(400);
    expect(got.body.error.fields).toMatchObject({
      "emitters[1].label": "Enter a label (e.g. A1).",
      "emitters[1].frequencyMHz": "Enter the frequency in MHz from 0 to 300,000.",
      "emitters[1].powerPerCarrierW": "Enter the power per carrier in W from 0 to 1,000,000.",
      "emitters[1].gainUnit": "Choose the gain's unit: dBi, dBd.",
      "emitters[1].carriers": "Enter the number of carriers as a whole number.",
      "emitters[1].dutyFactor": "Enter the duty factor from 0 to 1.",
      "emitters[1]": "Unknown field: colour.",
      "emitters[2].position.z": "Enter z in metres from -10,000 to 10,000.",
      "emitters[2].azimuthDeg": "Enter the azimuth in degrees from -360 to 360.",
      "emitters[3].pattern.hBeamwidthDeg": "Enter the horizontal beamwidth in degrees from 0 to 360.",
    });
    const cross = await put([one({ model: "cylindrical", mechanicalTiltDeg: 60, electricalTiltDeg: 45 }), one({ model: "aperture" })]);
    expect(cross.body.error.fields).toEqual({
      "emitters[0].apertureM": "Enter the aperture height in metres for the cylindrical model.",
      "emitters[0].electricalTiltDeg": "The total tilt (105°) must lie between −90° and 90°.",
      "emitters[1].dishDiameterM": "Enter the dish diameter in metres for the aperture model.",
    });
    const refs = await put([{ ...one(), id: randomUUID() }, one({ patternId: pattern[0].id })]);
    expect(refs.status).toBe(400);
    expect(refs.body.error.fields).toEqual({ "emitters[0].id": expect.stringMatching(/No such emitter on this site/), "emitters[1].patternId": "No such pattern in your organisation's library." });
    const notJson = await callApi(emittersApi, "PUT", `/api/v1/sites/${siteId}/emitters`, { auth: eng(), body: "label,x", contentType: "text/csv", params: { siteId } });
    expect(notJson.status).toBe(415);
    const notList = await put("all of them");
    expect(notList.body.error.fields.emitters).toBe("Send { emitters: [...] }.");
    expect(await stored()).toEqual(before);
  });

  it("refuses a row whose version is stale with 409 and the row as it now stands", async () => {
    const [first] = (await get()).body.emitters;
    const got = await put([{ ...one({ label: "A1", azimuthDeg: 90 }), id: first.id, version: first.version - 1 }]);
    expect(got.status).toBe(409);
    expect(got.body.current).toMatchObject({ id: first.id, azimuthDeg: 45, version: first.version });
    expect((await get()).body.emitters).toHaveLength(2);
  });
});

describe("the Emitters section's inline edit", () => {
  const form = (values: Record<string, string>) => ({ intent: "save-emitter", label: "A1", frequencyMHz: "739", power: "46", powerUnit: "dBm", gain: "18", gainUnit: "dBi", x: "1", y: "2", z: "3", active: "on", ...values });
  const post = (values: Record<string, string>, cookie = a.people.engineer.cookie, site = siteId) =>
    outcome(() => emittersPage.action({ request: makeRequest(`/sites/${site}/emitters`, { cookie, form: values }), params: { siteId: site }, context: {} } as never));

  it("saves an edit made on the current version and answers 409 with their values to one made on a stale copy", async () => {
    const [row] = (await get()).body.emitters;
    const saved = await post(form({ id: row.id, version: String(row.version), azimuthDeg: "120" }));
    expect(saved.status).toBe(200);
    const [after] = (await get()).body.emitters;
    expect(after).toMatchObject({ azimuthDeg: 120, powerUnit: "dBm", version: row.version + 1 });
    expect(after.powerPerCarrierW).toBeCloseTo(39.810717055349734, 10); // 46 dBm = 10^((46 − 30)/10) W
    const stale = await post(form({ id: row.id, version: String(row.version), azimuthDeg: "200" }));
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ conflict: { id: row.id, azimuthDeg: 120, version: row.version + 1 } });
    expect((await get()).body.emitters[0].azimuthDeg).toBe(120);
  });

  it("answers field errors with 400 and refuses other organisations' and read-only roles", async () => {
    const bad = await post(form({ intent: "add-emitter", frequencyMHz: "abc" }));
    expect(bad.status).toBe(400);
    expect(bad.body).toMatchObject({ result: { error: { frequencyMHz: ["Enter the frequency in MHz from 0 to 300,000."] } } });
    const dish = await post(form({ intent: "add-emitter", model: "aperture" }));
    expect(dish.status).toBe(400);
    expect(dish.body).toMatchObject({ result: { error: { dishDiameterM: ["Enter the dish diameter in metres for the aperture model."] } } });
    expect((await post(form({ intent: "add-emitter" }), b.people.engineer.cookie)).status).toBe(404);
    for (const role of ["billing", "client", "regulator"] as const) expect((await post(form({ intent: "add-emitter" }), a.people[role].cookie)).status).toBe(403);
  });
});

describe("CSV import and export", () => {
  it("stores a good file in one go with its audit rows, appending or replacing", async () => {
    const site = await newSite(a, "CSV site");
    const got = await importCsv(rows(3), "?mode=replace", eng(), site);
    expect(got.status).toBe(201);
    expect(got.body).toMatchObject({ stored: true, count: 3, deleted: 0, skipped: [] });
    expect((await get(eng(), site)).body.emitters.map((e: { label: string }) => e.label)).toEqual(["R1", "R2", "R3"]);
    const created = (await audits(site)).filter((e) => e.action === "emitter.created");
    expect(created).toHaveLength(3);
    // The audit rows are built in SQL; they hold what snapshot() would, so History reads them alike.
    const [r1] = (await stored(site)).filter((e) => e.label === "R1");
    expect(created.find((e) => e.subjectId === r1.id)).toMatchObject({ before: null, after: snapshot(r1), actorUserId: a.people.engineer.userId });
    const appended = await importCsv(rows(2), "?mode=append", { token }, site);
    expect(appended.status).toBe(201);
    expect(await stored(site)).toHaveLength(5);
    const replaced = await importCsv(rows(1), "?mode=replace", eng(), site);
    expect(replaced.body.deleted).toBe(5);
    expect((await stored(site)).map((e) => e.label)).toEqual(["R1"]);
    const deleted = (await audits(site)).filter((e) => e.action === "emitter.deleted");
    expect(deleted).toHaveLength(5);
    expect(deleted.find((e) => e.subjectId === r1.id)).toMatchObject({ before: snapshot(r1), after: null });
  });

  it("refuses a file with a bad row in the middle: every problem by row and column, no emitter, no audit row", async () => {
    const site = await newSite(a, "Half file site");
    const got = await importCsv(rows(5, 3), "?mode=replace", eng(), site);
    expect(got.status).toBe(400);
    expect(got.body.problems).toEqual([{ row: 4, column: "frequency_mhz", message: "“three thousand” is not a number (write decimals with a point)." }]);
    expect(got.body.validCount).toBe(4);
    expect(got.body.error.fields).toEqual({ "row 4.frequency_mhz": "“three thousand” is not a number (write decimals with a point)." });
    expect(await stored(site)).toEqual([]);
    expect(await audits(site)).toEqual([]);
    const preview = await importCsv(rows(5, 3), "?mode=replace&dryRun=true&validOnly=true", eng(), site);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ stored: false, skipped: [{ row: 4 }] });
    expect(preview.body.emitters).toHaveLength(4);
    expect(await stored(site)).toEqual([]);
    const valid = await importCsv(rows(5, 3), "?mode=replace&validOnly=true", eng(), site);
    expect(valid.status).toBe(201);
    expect((await stored(site)).map((e) => e.label).sort()).toEqual(["R1", "R2", "R4", "R5"]);
  });

  it("leaves no emitter and no audit row when the writes fail halfway (the audit insert fails after the emitters went in)", async () => {
    const site = await newSite(a, "Rollback site");
    const who = { organizationId: a.id, role: "engineer" as const, clientId: null, userId: `no-such-user-${randomUUID()}` };
    await expect(importEmitters(who, site, new TextEncoder().encode(rows(50)), { mode: "replace" })).rejects.toThrow();
    expect(await stored(site)).toEqual([]);
    expect(await audits(site)).toEqual([]);
  });

  it("refuses an empty file, a wrong type and a file over 5 MB", async () => {
    const site = await newSite(a, "Refusals site");
    expect((await importCsv("", "", eng(), site)).body.problems).toEqual([{ row: null, column: null, message: "The file is empty." }]);
    expect((await callApi(csvApi, "POST", `/api/v1/sites/${site}/emitters/csv`, { auth: eng(), json: {}, params: { siteId: site } })).status).toBe(415);
    const big = await importCsv(`${header}\n${"x".repeat(5 * 1024 * 1024)}`, "", eng(), site);
    expect(big.status).toBe(413);
    expect(await stored(site)).toEqual([]);
  });

  it("exports in the import layout: importing the export gives the same inventory", async () => {
    const site = await newSite(a, "Round trip site");
    const [pattern] = await db.insert(schema.antennaPattern).values({ organizationId: a.id, name: `Round trip panel ${randomUUID().slice(0, 6)}`, kind: "itu-r-f.1336-sectoral", pattern: { type: "itu-r-f.1336-sectoral", hBeamwidthDeg: 65, vBeamwidthDeg: 7 } }).returning();
    const first = await put(
      [
        one({ powerUnit: "dBm", powerPerCarrierW: 39.810717055349734, patternId: pattern.id, notes: "=cmd|' /C calc'!A0, \"quoted\"" }),
        one({ label: "B1", operator: "Ünïcode Ltd", pattern: { type: "3gpp-38.901", hBeamwidthDeg: 90, vBeamwidthDeg: 10 }, hBeamwidthDeg: 90, vBeamwidthDeg: 10, model: "aperture", dishDiameterM: 0.6, active: false }),
        one({ label: "C1", model: "auto", apertureM: 2.1, dutyFactor: 0.5, actualMaxFactor: 0.25, tddFactor: 0.75 }),
      ],
      eng(),
      site,
    );
    expect(first.status).toBe(200);
    const response = (await csvApi.loader({ request: makeRequest(`/api/v1/sites/${site}/emitters/csv`, { cookie: a.people.engineer.cookie }), params: { siteId: site }, context: {} } as never)) as Response;
    expect(response.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    const bytes = new Uint8Array(await response.arrayBuffer());
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]); // a BOM, so spreadsheets read it as UTF-8
    const csv = new TextDecoder().decode(bytes);
    expect(csv.startsWith("label,operator,band,frequency_mhz,power_per_carrier_w,power_per_carrier_dbm")).toBe(true);
    const again = await importCsv(csv, "?mode=replace", eng(), site);
    expect(again.status).toBe(201);
    const strip = (list: Record<string, unknown>[]) => list.map(({ id: _i, version: _v, ...rest }) => rest);
    expect(again.body).toMatchObject({ count: 3, deleted: 3 });
    expect(strip((await get(eng(), site)).body.emitters)).toEqual(strip(first.body.emitters));
  });
});

describe("isolation and roles", () => {
  it("answers 404 to another organisation's engineer for every emitter route of the site", async () => {
    const other = { cookie: b.people.engineer.cookie };
    expect((await get(other)).status).toBe(404);
    expect((await put([one()], other)).status).toBe(404);
    expect((await importCsv(rows(1), "", other)).status).toBe(404);
    const page = await outcome(() => emittersPage.loader({ request: makeRequest(`/sites/${siteId}/emitters`, { cookie: b.people.engineer.cookie }), params: { siteId }, context: {} } as never));
    expect(page.status).toBe(404);
    expect((await stored()).length).toBeGreaterThan(0);
  });

  it("lets billing read, and answers 403 to client and regulator members", async () => {
    expect((await get({ cookie: a.people.billing.cookie })).status).toBe(200);
    expect((await put([one()], { cookie: a.people.billing.cookie })).status).toBe(403);
    for (const role of ["client", "regulator"] as const) {
      expect((await get({ cookie: a.people[role].cookie })).status).toBe(403);
      expect((await put([one()], { cookie: a.people[role].cookie })).status).toBe(403);
      expect((await callApi(patternsApi, "GET", "/api/v1/patterns", { auth: { cookie: a.people[role].cookie } })).status).toBe(403);
    }
  });
});

describe("the pattern library", () => {
  const tabulated = { type: "tabulated", horizontal: [{ angleDeg: -180, attenuationDb: 25 }, { angleDeg: 0, attenuationDb: 0 }, { angleDeg: 90, attenuationDb: 20 }], vertical: [{ angleDeg: -90, attenuationDb: 30 }, { angleDeg: 0, attenuationDb: 0 }, { angleDeg: 90, attenuationDb: 30 }] };

  it("adds tabulated and parametric patterns with a session or a token, and lists them with their use", async () => {
    const tab = await callApi(patternsApi, "POST", "/api/v1/patterns", { auth: eng(), json: { name: "Measured panel", maker: "Field team", gainDbi: 16.5, frequencyMHz: 1800, pattern: tabulated } });
    expect(tab.status).toBe(201);
    expect(tab.body.pattern).toMatchObject({ name: "Measured panel", kind: "tabulated", gainDbi: 16.5, version: 1 });
    const par = await callApi(patternsApi, "POST", "/api/v1/patterns", { auth: { token }, json: { name: "F.1336 65/7", pattern: { type: "itu-r-f.1336-sectoral", hBeamwidthDeg: 65, vBeamwidthDeg: 7 } } });
    expect(par.status).toBe(201);
    expect(par.body.pattern).toMatchObject({ kind: "itu-r-f.1336-sectoral", hBeamwidthDeg: 65, vBeamwidthDeg: 7 });
    const listed = await callApi(patternsApi, "GET", "/api/v1/patterns", { auth: { token } });
    expect(listed.body.patterns.map((p: { name: string }) => p.name)).toEqual(expect.arrayContaining(["Measured panel", "F.1336 65/7"]));
    const [event] = await db.select().from(schema.auditEvent).where(eq(schema.auditEvent.subjectId, tab.body.pattern.id));
    expect(event).toMatchObject({ action: "pattern.created", subjectType: "pattern" });
  });

  it("names invalid fields", async () => {
    const got = await callApi(patternsApi, "POST", "/api/v1/patterns", { auth: eng(), json: { name: "", pattern: { ...tabulated, horizontal: [{ angleDeg: 0, attenuationDb: -3 }] } } });
    expect(got.status).toBe(400);
    expect(got.body.error.fields).toMatchObject({ name: "Enter the pattern's name.", "pattern.horizontal[0].attenuationDb": "Enter the attenuation in dB from 0 to 200." });
  });

  it("refuses to delete a pattern in use (409, naming the sites) and deletes an unused one with its audit row", async () => {
    const made = await callApi(patternsApi, "POST", "/api/v1/patterns", { auth: eng(), json: { name: "In use", pattern: tabulated } });
    const id = made.body.pattern.id;
    const site = await newSite(a, "Pattern user site");
    expect((await put([one({ patternId: id })], eng(), site)).status).toBe(200);
    const del = (patternId: string, cookie = a.people.engineer.cookie) => outcome(() => patternsPage.action({ request: makeRequest("/patterns", { cookie, form: { intent: "delete-pattern", id: patternId } }), params: {}, context: {} } as never));
    const refused = await del(id);
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({ ok: false, sites: [{ id: site, name: "Pattern user site" }] });
    expect((await del(id, b.people.engineer.cookie)).status).toBe(404);
    expect((await put([one()], eng(), site)).status).toBe(200);
    expect((await del(id)).status).toBe(200);
    expect(await db.select().from(schema.antennaPattern).where(eq(schema.antennaPattern.id, id))).toEqual([]);
    const [event] = await db.select().from(schema.auditEvent).where(and(eq(schema.auditEvent.subjectId, id), eq(schema.auditEvent.action, "pattern.deleted")));
    expect(event.actorUserId).toBe(a.people.engineer.userId);
  });
});
