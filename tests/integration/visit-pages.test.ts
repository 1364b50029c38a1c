// The visit pages' forms: edit and delete a visit, add, edit and delete readings, caption and
// delete photos; stale edits answer 409; another organisation's or another site's ids are 404.
import { and, eq, inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import * as siteVisitsApi from "~/routes/api/v1/site-visits";
import * as photosApi from "~/routes/api/v1/visit-photos";
import * as photoPage from "~/routes/sites/photo";
import * as visitPage from "~/routes/sites/visit";
import * as newVisitPage from "~/routes/sites/visit-new";
import { callApi } from "./api-client";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";
import { createSiteWithSurfaces, makeJpeg, multipart } from "./visit-fixtures";

let a: Org;
let b: Org;
let siteId = "";
let otherSiteId = "";
let mainRoof = "";

const args = (request: Request, params: Record<string, string>) => ({ request, params, context: {} }) as never;
const post = (org: Org, path: string, params: Record<string, string>, form: Record<string, string>, module: { action: (a: never) => unknown } = visitPage) =>
  outcome(() => module.action(args(makeRequest(path, { cookie: org.people.engineer.cookie, form }), params)));
const visitPath = (visitId: string, site = siteId) => `/sites/${site}/visits/${visitId}`;
const reading = { label: "P1", surfaceId: "", x: "2", y: "3", heightM: "1.5", value: "6.14", unit: "V/m" };

async function makeVisit(visitedOn = "2026-04-20") {
  const got = await callApi(siteVisitsApi, "POST", `/api/v1/sites/${siteId}/visits`, { auth: { cookie: a.people.engineer.cookie }, json: { visitedOn, instruments: [{ probe: "Probe", calibrationDate: "2026-01-01" }] }, params: { siteId } });
  return got.body.visit as { id: string; version: number };
}

beforeAll(async () => {
  a = await createOrg("vpages-a");
  b = await createOrg("vpages-b");
  const made = await createSiteWithSurfaces(a);
  siteId = made.site.id;
  mainRoof = made.surfaces[0].id;
  otherSiteId = (await createSiteWithSurfaces(a, "Neighbour")).site.id;
});

describe("the visit forms", () => {
  it("records a new visit and goes to its page; a bad date stays on the form with 400", async () => {
    const params = { siteId };
    const bad = await post(a, `/sites/${siteId}/visits/new`, params, { visitedOn: "12/05/2026" }, newVisitPage);
    expect(bad.status).toBe(400);
    const got = await post(a, `/sites/${siteId}/visits/new`, params, { visitedOn: "2026-05-12", people: "A. Person", "instruments[0].probe": "Probe X", "instruments[0].calibrationDate": "2024-01-01" }, newVisitPage);
    expect(got.status).toBe(302);
    const [row] = await db.select().from(schema.visit).where(and(eq(schema.visit.siteId, siteId), eq(schema.visit.people, "A. Person")));
    expect(got.location).toBe(visitPath(row.id));
    expect(row.instruments).toEqual([{ probe: "Probe X", serial: "", calibrationDate: "2024-01-01" }]);
  });

  it("saves the visit with the version it read, and answers a stale copy with 409, keeping the first edit", async () => {
    const visit = await makeVisit();
    const params = { siteId, visitId: visit.id };
    const first = await post(a, visitPath(visit.id), params, { intent: "save-visit", version: "1", visitedOn: "2026-04-21", conditions: "Windy" });
    expect(first.status).toBe(302);
    const stale = await post(a, visitPath(visit.id), params, { intent: "save-visit", version: "1", visitedOn: "2026-04-22", conditions: "Calm" });
    expect(stale.status).toBe(409);
    const [row] = await db.select().from(schema.visit).where(eq(schema.visit.id, visit.id));
    expect(row).toMatchObject({ visitedOn: "2026-04-21", conditions: "Windy", version: 2 });
    const events = await db.select().from(schema.auditEvent).where(and(eq(schema.auditEvent.subjectId, visit.id), eq(schema.auditEvent.action, "visit.updated")));
    expect(events).toHaveLength(1);
    expect(events[0].after).toMatchObject({ visitedOn: "2026-04-21", conditions: "Windy" });
  });

  it("adds a reading from the table, refuses a bad one next to its field, edits with 409 on a stale copy, and deletes", async () => {
    const visit = await makeVisit();
    const params = { siteId, visitId: visit.id };
    const bad = await post(a, visitPath(visit.id), params, { intent: "add-reading", ...reading, unit: "%", frequencyMHz: "900" });
    expect(bad.status).toBe(400);
    expect((bad.body as { error: Record<string, string[]> }).error.standard).toEqual(["Name the standard the % refers to."]);
    const added = await post(a, visitPath(visit.id), params, { intent: "add-reading", ...reading, surfaceId: mainRoof });
    expect(added.status).toBe(200);
    const [row] = await db.select().from(schema.reading).where(eq(schema.reading.visitId, visit.id));
    expect(row).toMatchObject({ label: "P1", surfaceId: mainRoof, value: 6.14, unit: "V/m", version: 1 });
    expect(row.powerDensityWm2).toBeCloseTo(0.10007, 4);

    const edit = { intent: "edit-reading", ...reading, surfaceId: mainRoof, id: row.id, version: "1" };
    expect((await post(a, visitPath(visit.id), params, { ...edit, value: "10" })).status).toBe(200);
    const stale = await post(a, visitPath(visit.id), params, { ...edit, value: "20" });
    expect(stale.status).toBe(409);
    const [after] = await db.select().from(schema.reading).where(eq(schema.reading.id, row.id));
    expect(after).toMatchObject({ value: 10, version: 2 });
    expect(after.powerDensityWm2).toBeCloseTo(100 / 376.730313668, 10);

    expect((await post(a, visitPath(visit.id), params, { intent: "delete-reading", id: row.id })).status).toBe(200);
    expect(await db.select().from(schema.reading).where(eq(schema.reading.id, row.id))).toEqual([]);
    const actions = (await db.select().from(schema.auditEvent).where(eq(schema.auditEvent.subjectId, row.id))).map((e) => e.action).sort();
    expect(actions).toEqual(["reading.created", "reading.deleted", "reading.updated"]);
  });

  it("changes a photo's caption (stale copy 409), deletes it with its stored files, and deletes a visit with everything in it", async () => {
    const visit = await makeVisit();
    const uploaded = await callApi(photosApi, "POST", `/api/v1/visits/${visit.id}/photos`, {
      auth: { cookie: a.people.engineer.cookie },
      params: { visitId: visit.id },
      body: multipart([{ name: "photo", file: { name: "p.jpg", type: "image/jpeg", bytes: await makeJpeg() } }]),
    });
    const photoId = uploaded.body.photo.id;
    const params = { siteId, visitId: visit.id, photoId };
    const path = `${visitPath(visit.id)}/photos/${photoId}`;
    expect((await post(a, path, params, { caption: "East parapet", version: "1" }, photoPage)).status).toBe(302);
    expect((await post(a, path, params, { caption: "Overwrite", version: "1" }, photoPage)).status).toBe(409);
    const [photo] = await db.select().from(schema.photo).where(eq(schema.photo.id, photoId));
    expect(photo.caption).toBe("East parapet");
    const deleted = await post(a, path, params, { intent: "delete-photo" }, photoPage);
    expect(deleted).toMatchObject({ status: 302, location: visitPath(visit.id) });
    expect(await db.select().from(schema.storedFile).where(inArray(schema.storedFile.id, [photo.fileId, photo.thumbFileId]))).toEqual([]);

    const second = await callApi(photosApi, "POST", `/api/v1/visits/${visit.id}/photos`, {
      auth: { cookie: a.people.engineer.cookie },
      params: { visitId: visit.id },
      body: multipart([{ name: "photo", file: { name: "q.jpg", type: "image/jpeg", bytes: await makeJpeg() } }]),
    });
    const [kept] = await db.select().from(schema.photo).where(eq(schema.photo.id, second.body.photo.id));
    await post(a, visitPath(visit.id), { siteId, visitId: visit.id }, { intent: "add-reading", ...reading });
    const gone = await post(a, visitPath(visit.id), { siteId, visitId: visit.id }, { intent: "delete-visit" });
    expect(gone).toMatchObject({ status: 302, location: `/sites/${siteId}/visits` });
    expect(await db.select().from(schema.reading).where(eq(schema.reading.visitId, visit.id))).toEqual([]);
    expect(await db.select().from(schema.storedFile).where(inArray(schema.storedFile.id, [kept.fileId, kept.thumbFileId]))).toEqual([]);
    const [event] = await db.select().from(schema.auditEvent).where(and(eq(schema.auditEvent.subjectId, visit.id), eq(schema.auditEvent.action, "visit.deleted")));
    expect(event.before).toMatchObject({ photoCount: 1, readingCount: 1, visitedOn: "2026-04-20" });
  });
});

describe("isolation on the pages", () => {
  it("answers 404 to another organisation, and to a visit addressed under another site, changing nothing", async () => {
    const visit = await makeVisit();
    const mine = { siteId, visitId: visit.id };
    const theirs = await outcome(() => visitPage.loader(args(makeRequest(visitPath(visit.id), { cookie: b.people.engineer.cookie }), mine)));
    expect(theirs.status).toBe(404);
    expect((await post(b, visitPath(visit.id), mine, { intent: "delete-visit" })).status).toBe(404);
    expect((await post(b, visitPath(visit.id), mine, { intent: "add-reading", ...reading })).status).toBe(404);
    const wrongSite = { siteId: otherSiteId, visitId: visit.id };
    expect((await outcome(() => visitPage.loader(args(makeRequest(visitPath(visit.id, otherSiteId), { cookie: a.people.engineer.cookie }), wrongSite)))).status).toBe(404);
    expect((await post(a, visitPath(visit.id, otherSiteId), wrongSite, { intent: "delete-visit" })).status).toBe(404);
    expect(await db.select().from(schema.visit).where(eq(schema.visit.id, visit.id))).toHaveLength(1);
    expect(await db.select().from(schema.reading).where(eq(schema.reading.visitId, visit.id))).toEqual([]);
  });
});
