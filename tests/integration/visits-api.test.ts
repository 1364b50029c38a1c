// The visits and readings API: with a session and with a token, validation, CSV and JSON
// imports (all or nothing, or the valid rows on request), roles, isolation, audit rows.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import * as siteVisitsApi from "~/routes/api/v1/site-visits";
import * as tokensApi from "~/routes/api/v1/tokens";
import * as visitApi from "~/routes/api/v1/visit";
import * as readingsApi from "~/routes/api/v1/visit-readings";
import { callApi } from "./api-client";
import { createOrg, type Org } from "./fixtures";
import { createSiteWithSurfaces } from "./visit-fixtures";

let a: Org;
let b: Org;
let token = "";
let siteId = "";
let mainRoof = "";

const eng = () => ({ cookie: a.people.engineer.cookie });
const newVisit = async (json: unknown = { visitedOn: "2026-05-12" }) => callApi(siteVisitsApi, "POST", `/api/v1/sites/${siteId}/visits`, { auth: eng(), json, params: { siteId } });
const postReadings = (visitId: string, options: { json?: unknown; csv?: string; query?: string; auth?: { cookie?: string; token?: string } }) =>
  callApi(readingsApi, "POST", `/api/v1/visits/${visitId}/readings${options.query ?? ""}`, {
    auth: options.auth ?? eng(),
    params: { visitId },
    ...(options.csv !== undefined ? { body: options.csv, contentType: "text/csv" } : { json: options.json }),
  });
const countReadings = async (visitId: string) => (await db.select().from(schema.reading).where(eq(schema.reading.visitId, visitId))).length;
const auditFor = (entity: string, siteIdValue: string) =>
  db.select().from(schema.auditEvent).where(and(eq(schema.auditEvent.subjectType, entity), eq(schema.auditEvent.siteId, siteIdValue)));

beforeAll(async () => {
  a = await createOrg("visits-a");
  b = await createOrg("visits-b");
  const made = await callApi(tokensApi, "POST", "/api/v1/tokens", { auth: eng(), json: { name: "probe uploader" } });
  token = made.body.token;
  const { site, surfaces } = await createSiteWithSurfaces(a);
  siteId = site.id;
  mainRoof = surfaces[0].id;
});

describe("POST /api/v1/sites/:id/visits", () => {
  it("creates a visit with instruments, warns about an old calibration, audits it and touches the site", async () => {
    const [before] = await db.select().from(schema.site).where(eq(schema.site.id, siteId));
    const got = await newVisit({
      visitedOn: "2026-05-12",
      people: "R. Okafor, T. Lindqvist",
      conditions: "Dry, 14 °C, light wind",
      instruments: [
        { probe: "Broadband isotropic probe", serial: "BB-2231", calibrationDate: "2025-02-01" },
        { probe: "Frequency-selective meter", serial: "FS-09", calibrationDate: "2026-01-20" },
      ],
      notes: "Access through the north stair.",
    });
    expect(got.status).toBe(201);
    expect(got.body.visit).toMatchObject({ siteId, visitedOn: "2026-05-12", people: "R. Okafor, T. Lindqvist", version: 1, photoCount: 0, readingCount: 0 });
    expect(got.body.visit.instruments).toHaveLength(2);
    expect(got.body.visit.warnings).toEqual([expect.stringContaining("Broadband isotropic probe, serial BB-2231: calibrated on 1 Feb 2025, more than a year before the visit")]);
    const events = await auditFor("visit", siteId);
    expect(events.find((e) => e.subjectId === got.body.visit.id)).toMatchObject({ action: "visit.created", actorUserId: a.people.engineer.userId, before: null });
    const [after] = await db.select().from(schema.site).where(eq(schema.site.id, siteId));
    expect(after.updatedAt.getTime()).toBeGreaterThan(before.updatedAt.getTime());
  });

  it("creates a visit with a bearer token, recorded as the token's member", async () => {
    const got = await callApi(siteVisitsApi, "POST", `/api/v1/sites/${siteId}/visits`, { auth: { token }, json: { visitedOn: "2026-05-13" }, params: { siteId } });
    expect(got.status).toBe(201);
    const [event] = await db.select().from(schema.auditEvent).where(eq(schema.auditEvent.subjectId, got.body.visit.id));
    expect(event.actorUserId).toBe(a.people.engineer.userId);
  });

  it("names every invalid field and writes nothing", async () => {
    const before = await db.select().from(schema.visit).where(eq(schema.visit.siteId, siteId));
    const got = await newVisit({ visitedOn: "2026-02-30", people: "x".repeat(501), instruments: [{ serial: "no probe", calibrationDate: "yesterday" }], weather: "fine" });
    expect(got.status).toBe(400);
    expect(got.body.error.fields).toMatchObject({
      visitedOn: "Enter the date of the visit as a date (YYYY-MM-DD).",
      people: "Use at most 500 characters.",
      "instruments[0].probe": "Enter the probe or meter (make and model).",
      "instruments[0].calibrationDate": "Enter the calibration date as a date (YYYY-MM-DD).",
    });
    expect(JSON.stringify(got.body.error.fields)).toContain("weather");
    expect(await db.select().from(schema.visit).where(eq(schema.visit.siteId, siteId))).toHaveLength(before.length);
  });

  it("lists a site's visits newest first with their counts", async () => {
    const counted = (await newVisit({ visitedOn: "2026-06-30" })).body.visit.id;
    const reading = { x: 1, y: 1, heightM: 1.5, value: 2, unit: "V/m" };
    expect((await postReadings(counted, { json: { readings: [reading, reading] } })).status).toBe(201);
    const got = await callApi(siteVisitsApi, "GET", `/api/v1/sites/${siteId}/visits`, { auth: { token }, params: { siteId } });
    expect(got.status).toBe(200);
    const dates = got.body.visits.map((v: { visitedOn: string }) => v.visitedOn);
    expect(dates).toEqual([...dates].sort().reverse());
    expect(got.body.visits[0]).toMatchObject({ id: counted, readingCount: 2, photoCount: 0 });
    expect(got.body.visits.slice(1).every((v: { readingCount: number }) => v.readingCount === 0)).toBe(true);
  });
});

describe("POST /api/v1/visits/:id/readings (JSON)", () => {
  it("stores readings with their original value and unit and the power density, and audits each", async () => {
    const visitId = (await newVisit()).body.visit.id;
    const got = await postReadings(visitId, {
      json: {
        readings: [
          { label: "R1", surfaceId: mainRoof, x: 3, y: 4, heightM: 1.7, value: 6.14, unit: "V/m" },
          { label: "R2", surface: "penthouse top", x: 4, y: 3, heightM: 1.5, value: 50, unit: "%", standard: "fcc", tier: "general", frequencyMHz: 1900 },
          { label: "R3", x: 30, y: -2, heightM: 1.5, value: 40, unit: "percent", standard: "icnirp-2020", tier: "general" },
          { label: "R4", x: 1, y: 1, heightM: 2, value: 0.2, unit: "mW/cm²", frequencyMHz: 850 },
        ],
      },
    });
    expect(got.status).toBe(201);
    const [r1, r2, r3, r4] = got.body.readings;
    expect(r1).toMatchObject({ label: "R1", surfaceId: mainRoof, value: 6.14, unit: "V/m", frequencyMHz: null, standard: null });
    expect(r1.powerDensityWm2).toBeCloseTo(0.10007, 4); // 6.14² / 376.73
    expect(r2).toMatchObject({ unit: "percent", standard: "fcc", tier: "general", powerDensityWm2: 5 }); // 47 CFR §1.1310 Table 1(B): 10 W/m² above 1500 MHz
    expect(r3).toMatchObject({ unit: "percent", frequencyMHz: null, powerDensityWm2: null, surfaceId: null });
    expect(r4).toMatchObject({ unit: "mW/cm2", powerDensityWm2: 2 });
    const events = await auditFor("reading", siteId);
    expect(events.filter((e) => got.body.readings.some((r: { id: string }) => r.id === e.subjectId))).toHaveLength(4);
    const read = await callApi(visitApi, "GET", `/api/v1/visits/${visitId}`, { auth: { token }, params: { visitId } });
    expect(read.body.visit.readingCount).toBe(4);
    expect(read.body.visit.readings[1].surfaceName).toBe("Penthouse top");
  });

  it("refuses the whole batch when one reading is invalid, naming it like readings[1].unit, and writes nothing", async () => {
    const visitId = (await newVisit()).body.visit.id;
    const auditBefore = (await auditFor("reading", siteId)).length;
    const got = await postReadings(visitId, {
      json: { readings: [{ x: 1, y: 1, heightM: 1, value: 3, unit: "V/m" }, { x: 1, y: 1, heightM: 1, value: 3, unit: "dBm" }, { x: "one", y: 1, heightM: 1, value: -2, unit: "V/m", colour: "red" }, { x: 1, y: 1, heightM: 1, value: 1, unit: "V/m", surface: "Moon" }] },
    });
    expect(got.status).toBe(400);
    expect(got.body.error.message).toMatch(/nothing was stored/);
    expect(got.body.error.fields["readings[1].unit"]).toMatch(/^Choose a unit/);
    expect(got.body.error.fields["readings[2].x"]).toMatch(/^Enter x in metres/);
    expect(got.body.error.fields["readings[2].value"]).toMatch(/^Enter the reading from 0/);
    expect(got.body.error.fields["readings[2].colour"]).toBe("Unknown field: colour.");
    expect(got.body.error.fields["readings[3].surface"]).toBe("This site has no surface named “Moon”.");
    expect(await countReadings(visitId)).toBe(0);
    expect((await auditFor("reading", siteId)).length).toBe(auditBefore);
  });

  it("stores only the valid readings when asked, and lists the skipped ones", async () => {
    const visitId = (await newVisit()).body.visit.id;
    const got = await postReadings(visitId, { query: "?validOnly=true", json: { readings: [{ x: 1, y: 1, heightM: 1, value: 3, unit: "V/m" }, { x: 1, y: 1, heightM: 1, value: 3, unit: "dBm" }] } });
    expect(got.status).toBe(201);
    expect(got.body.readings).toHaveLength(1);
    expect(got.body.skipped).toEqual([{ index: 1, field: "unit", message: expect.stringMatching(/^Choose a unit/) }]);
    expect(await countReadings(visitId)).toBe(1);
  });

  it("refuses a malformed body: no readings, broken JSON, wrong content type, too large", async () => {
    const visitId = (await newVisit()).body.visit.id;
    expect((await postReadings(visitId, { json: { readings: [] } })).status).toBe(400);
    expect((await postReadings(visitId, { json: [{ x: 1 }] })).status).toBe(400);
    expect((await callApi(readingsApi, "POST", `/api/v1/visits/${visitId}/readings`, { auth: eng(), params: { visitId }, body: "{", contentType: "application/json" })).status).toBe(400);
    expect((await callApi(readingsApi, "POST", `/api/v1/visits/${visitId}/readings`, { auth: eng(), params: { visitId }, body: "x=1", contentType: "application/x-www-form-urlencoded" })).status).toBe(415);
    const huge = "x_m,y_m,height_m,value,unit\n" + "1,2,1.5,3,V/m\n".repeat(200_000);
    const big = await callApi(readingsApi, "POST", `/api/v1/visits/${visitId}/readings`, { auth: eng(), params: { visitId }, body: huge, contentType: "text/csv" });
    expect(big.status).toBe(413);
    expect(await countReadings(visitId)).toBe(0);
  });
});

describe("POST /api/v1/visits/:id/readings (CSV)", () => {
  const header = "label,surface,x_m,y_m,height_m,value,unit,standard,tier,frequency_mhz,notes";

  it("imports a CSV body with a token, converting each row", async () => {
    const visitId = (await newVisit()).body.visit.id;
    const csv = `${header}\nR1,Main roof,1,2,1.5,580,µW/cm²,,,,\nR2,Penthouse top,3,4,1.5,0.163,A/m,,,100,\n`;
    const got = await postReadings(visitId, { csv, auth: { token } });
    expect(got.status).toBe(201);
    expect(got.body.readings.map((r: { powerDensityWm2: number }) => r.powerDensityWm2)).toEqual([5.8, expect.closeTo(10.009, 3)]);
  });

  it("reads a Latin-1 file and a UTF-16 file from a spreadsheet program alike", async () => {
    const visitId = (await newVisit()).body.visit.id;
    const text = `${header}\nL1,Main roof,1,2,1.5,580,µW/cm²,,,,Ü\n`;
    for (const body of [Buffer.from(text, "latin1"), Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, "utf16le")])]) {
      const got = await callApi(readingsApi, "POST", `/api/v1/visits/${visitId}/readings`, { auth: eng(), params: { visitId }, body, contentType: "text/csv" });
      expect(got.status).toBe(201);
      expect(got.body.readings[0]).toMatchObject({ unit: "uW/cm2", powerDensityWm2: 5.8, notes: "Ü" });
    }
  });

  it("answers a bad file row by row (row, column, reason) and stores nothing", async () => {
    const visitId = (await newVisit()).body.visit.id;
    const csv = `${header}\nR1,Main roof,1,2,1.5,3,V/m,,,,\nR2,Main roof,1,2,1.5,three,V/m,,,,\nR3,Nowhere,1,2,1.5,3,V/m,,,,\n`;
    const got = await postReadings(visitId, { csv });
    expect(got.status).toBe(400);
    expect(got.body.problems).toEqual([
      { row: 3, column: "value", message: "“three” is not a number (write decimals with a point)." },
      { row: 4, column: "surface", message: "This site has no surface named “Nowhere”." },
    ]);
    expect(got.body.error.fields).toMatchObject({ "row 3.value": expect.any(String), "row 4.surface": expect.any(String) });
    expect(await countReadings(visitId)).toBe(0);
  });

  it("refuses an empty file, unknown columns and a file of the wrong encoding's garbage alike, storing nothing", async () => {
    const visitId = (await newVisit()).body.visit.id;
    expect((await postReadings(visitId, { csv: "" })).body.problems).toEqual([{ row: null, column: null, message: "The file is empty." }]);
    const unknown = await postReadings(visitId, { csv: "x_m,y_m,height_m,value,unit,colour\n1,2,1,3,V/m,red\n" });
    expect(unknown.status).toBe(400);
    expect(unknown.body.problems[0]).toMatchObject({ row: 1, column: "colour" });
    expect(await countReadings(visitId)).toBe(0);
  });
});

describe("roles and isolation", () => {
  it("lets billing read visits and refuses billing, client and regulator writes", async () => {
    const visitId = (await newVisit()).body.visit.id;
    expect((await callApi(visitApi, "GET", `/api/v1/visits/${visitId}`, { auth: { cookie: a.people.billing.cookie }, params: { visitId } })).status).toBe(200);
    expect((await callApi(siteVisitsApi, "POST", `/api/v1/sites/${siteId}/visits`, { auth: { cookie: a.people.billing.cookie }, json: { visitedOn: "2026-01-01" }, params: { siteId } })).status).toBe(403);
    expect((await postReadings(visitId, { auth: { cookie: a.people.client.cookie }, json: { readings: [] } })).status).toBe(403);
    expect((await callApi(visitApi, "GET", `/api/v1/visits/${visitId}`, { auth: { cookie: a.people.regulator.cookie }, params: { visitId } })).status).toBe(403);
    expect((await callApi(visitApi, "GET", `/api/v1/visits/${visitId}`, { params: { visitId } })).status).toBe(401);
  });

  it("answers 404 to another organisation for the site, the visit and its readings, and writes nothing", async () => {
    const visitId = (await newVisit()).body.visit.id;
    const other = { cookie: b.people.engineer.cookie };
    expect((await callApi(siteVisitsApi, "GET", `/api/v1/sites/${siteId}/visits`, { auth: other, params: { siteId } })).status).toBe(404);
    expect((await callApi(siteVisitsApi, "POST", `/api/v1/sites/${siteId}/visits`, { auth: other, json: { visitedOn: "2026-01-01" }, params: { siteId } })).status).toBe(404);
    expect((await callApi(visitApi, "GET", `/api/v1/visits/${visitId}`, { auth: other, params: { visitId } })).status).toBe(404);
    expect((await callApi(readingsApi, "GET", `/api/v1/visits/${visitId}/readings`, { auth: other, params: { visitId } })).status).toBe(404);
    expect((await postReadings(visitId, { auth: other, json: { readings: [{ x: 1, y: 1, heightM: 1, value: 3, unit: "V/m" }] } })).status).toBe(404);
    expect(await countReadings(visitId)).toBe(0);
  });

  it("refuses a surface of another site, even of the same organisation", async () => {
    const { surfaces } = await createSiteWithSurfaces(a, "Another site");
    const visitId = (await newVisit()).body.visit.id;
    const got = await postReadings(visitId, { json: { readings: [{ surfaceId: surfaces[0].id, x: 1, y: 1, heightM: 1, value: 3, unit: "V/m" }] } });
    expect(got.status).toBe(400);
    expect(got.body.error.fields["readings[0].surfaceId"]).toBe("No such surface on this site.");
  });
});
