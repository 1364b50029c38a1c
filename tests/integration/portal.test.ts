// The client portal: a client member sees its own client's sites and their issued documents only,
// with each site's status read from the latest issued assessment; everything else is 404 (another
// client's or organisation's ids, drafts) or 403 (the consultancy's own pages).
import { createHash, randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { freezeAssessment } from "~/features/assessments/freeze.server";
import { db, schema } from "~/infra/db.server";
import * as overview from "~/routes/overview";
import * as portalHome from "~/routes/portal/home";
import * as portalSite from "~/routes/portal/site";
import * as pdfRoute from "~/routes/documents/pdf";
import * as documentsApi from "~/routes/api/v1/documents";
import * as documentPdfApi from "~/routes/api/v1/document-pdf";
import { callApi } from "./api-client";
import * as sitesList from "~/routes/sites/list";
import * as siteLayout from "~/routes/sites/site";
import * as clientsList from "~/routes/clients/list";
import * as siteDocuments from "~/routes/documents/site-documents";
import * as exposurePage from "~/routes/exposure/exposure";
import * as visitsPage from "~/routes/sites/visits";
import * as historyPage from "~/routes/sites/history";
import * as patternsPage from "~/routes/patterns/patterns";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";

let a: Org;
let b: Org;
let mine = "";
let theirs = "";
let foreign = "";
const ids: Record<string, string> = {};
const SECRET = "Key safe code 4471 behind the fire hose";

type Loader = (args: never) => unknown;
const get = (mod: { loader: Loader }, path: string, cookie: string, params: Record<string, string> = {}) =>
  outcome(() => mod.loader({ request: makeRequest(path, { cookie }), params, context: {} } as never));
const asClient = () => a.people.client.cookie;

async function issued(org: Org, siteId: string, assessmentId: string, kind: "report" | "letter" | "certificate", issuedAt: Date, state: "issued" | "draft" | "in_review" = "issued") {
  const pdf = Buffer.from(`%PDF-1.4\n% portal fixture ${randomUUID()}\n%%EOF\n`);
  const [row] = await db.insert(schema.document).values({
    organizationId: org.id, siteId, assessmentId, kind, state, authorName: "Fixture Author", code: `PORTAL-${randomUUID()}`,
    ...(state === "issued" ? { reviewerName: "Fixture Reviewer", issuedAt, renderStatus: "ready" as const, pdf, sha256: createHash("sha256").update(pdf).digest("hex"), byteSize: pdf.length } : {}),
  }).returning();
  return row.id;
}

async function siteWithAssessment(org: Org, clientId: string, name: string, strong: boolean) {
  const [site] = await db.insert(schema.site).values({ organizationId: org.id, clientId, name, kind: "rooftop", address: "7 Fixture Lane", city: "Testham", accessNotes: SECRET }).returning();
  await db.insert(schema.surface).values({ organizationId: org.id, siteId: site.id, name: "Main roof", kind: "area", polygon: [[0, 0], [20, 0], [20, 12], [0, 12]], elevationM: 0, access: "workers", position: 0 });
  await db.insert(schema.accessPoint).values({ organizationId: org.id, siteId: site.id, name: "Stair door", kind: "door", x: 19.5, y: 1, z: 0, locked: false });
  await db.insert(schema.emitter).values({ organizationId: org.id, siteId: site.id, label: "PX-1", operator: "Hidden Operator Ltd", band: "PCS", frequencyMHz: 1960, powerPerCarrierW: strong ? 60 : 0.5, carriers: strong ? 4 : 1, lossDb: 1, gainDbi: 17, hBeamwidthDeg: 65, vBeamwidthDeg: 7, azimuthDeg: 90, x: 2, y: 6, z: 1.5, model: "spherical" });
  const frozen = await freezeAssessment({ organizationId: org.id, userId: org.people.engineer.userId, role: "engineer", clientId: null, name: "Fixture Engineer" }, site.id, { name: "Portal baseline", standard: "fcc", tier: "general", gridStepM: 0.5 });
  return { siteId: site.id, assessmentId: frozen.id };
}

beforeAll(async () => {
  a = await createOrg("portal-a");
  b = await createOrg("portal-b");
  const [client, other] = await db.insert(schema.client).values([{ organizationId: a.id, name: "Portal Estates", notes: "Internal: slow payer" }, { organizationId: a.id, name: "Other Estates" }]).returning();
  await db.insert(schema.clientMember).values({ memberId: a.people.client.memberId, clientId: client.id });
  const m = await siteWithAssessment(a, client.id, "Portal roof", true);
  mine = m.siteId;
  ids.letter = await issued(a, mine, m.assessmentId, "letter", new Date("2026-06-02T10:00:00Z"));
  ids.draft = await issued(a, mine, m.assessmentId, "report", new Date(), "draft");
  ids.inReview = await issued(a, mine, m.assessmentId, "certificate", new Date(), "in_review");
  const t = await siteWithAssessment(a, other.id, "Other client's roof", false);
  theirs = t.siteId;
  ids.theirs = await issued(a, theirs, t.assessmentId, "letter", new Date("2026-06-03T10:00:00Z"));
  const [bClient] = await db.insert(schema.client).values({ organizationId: b.id, name: "Foreign Estates" }).returning();
  const f = await siteWithAssessment(b, bClient.id, "Foreign roof", false);
  foreign = f.siteId;
  ids.foreign = await issued(b, foreign, f.assessmentId, "letter", new Date("2026-06-04T10:00:00Z"));
  await db.insert(schema.visit).values({ organizationId: a.id, siteId: mine, visitedOn: "2026-05-01", notes: "Visit note: the caretaker lets us in" });
}, 120_000);

describe("the portal pages", () => {
  it("send a client member from / to /portal", async () => {
    expect(await get(overview, "/", asClient())).toMatchObject({ status: 302, location: "/portal" });
  });

  it("list only the client's own sites, with the status and issued documents only", async () => {
    const got = await get(portalHome, "/portal", asClient());
    expect(got.status).toBe(200);
    const { sites } = got.body as { sites: { id: string; status: { compliant: boolean; keepOut: { name: string }[] } | null; documents: { id: string }[] }[] };
    expect(sites.map((s) => s.id)).toEqual([mine]);
    expect(sites[0].documents.map((d) => d.id)).toEqual([ids.letter]);
    expect(sites[0].status?.compliant).toBe(false);
    expect(sites[0].status?.keepOut.map((k) => k.name)).toEqual(["Main roof"]);
  });

  it("show a site's status, keep-out map and issued documents, and nothing internal", async () => {
    const got = await get(portalSite, `/portal/sites/${mine}`, asClient(), { siteId: mine });
    expect(got.status).toBe(200);
    const body = got.body as { status: { compliant: boolean; lockedAccess: string[] }; basis: { assessmentName: string; documentKind: string }; maps: { name: string; classes: number[] }[]; documents: { id: string }[] };
    expect(body.status.compliant).toBe(false);
    // The status names the assessment it comes from, so a landlord can tell it from another document's figure.
    expect(body.basis).toMatchObject({ assessmentName: "Portal baseline", documentKind: "letter" });
    expect(body.status.lockedAccess).toEqual(["Stair door"]);
    expect(body.maps.map((m) => m.name)).toEqual(["Main roof"]);
    expect(body.maps[0].classes.some((c) => c > 0 && c !== 255)).toBe(true);
    expect(body.documents.map((d) => d.id)).toEqual([ids.letter]);
    const text = JSON.stringify(got.body);
    for (const hidden of [SECRET, "slow payer", "Hidden Operator Ltd", "caretaker", ids.draft, ids.inReview, "Fixture Author"]) expect(text, hidden).not.toContain(hidden);
  });

  it("answer 404 for another client's site, another organisation's site and an unknown id", async () => {
    for (const siteId of [theirs, foreign, randomUUID(), "not-an-id"]) {
      expect((await get(portalSite, `/portal/sites/${siteId}`, asClient(), { siteId })).status, siteId).toBe(404);
    }
  });

  it("download the client's issued PDFs only: drafts, documents in review, another client's and organisation's are 404", async () => {
    const pdf = (documentId: string) => pdfRoute.loader({ request: makeRequest(`/documents/${documentId}/pdf`, { cookie: asClient() }), params: { documentId }, context: {} } as never) as Promise<Response>;
    const ok = await pdf(ids.letter);
    expect(ok.status).toBe(200);
    expect(ok.headers.get("content-type")).toBe("application/pdf");
    expect(ok.headers.get("content-disposition")).toMatch(/^attachment;/);
    for (const id of [ids.draft, ids.inReview, ids.theirs, ids.foreign]) expect((await pdf(id)).status, id).toBe(404);
  });

  it("and the API agree: GET /api/v1/documents lists the client's issued documents only, and their PDFs alone download", async () => {
    const listed = await callApi(documentsApi, "GET", "/api/v1/documents", { auth: { cookie: asClient() } });
    expect(listed.status).toBe(200);
    expect(listed.body.documents.map((d: { id: string }) => d.id)).toEqual([ids.letter]);
    for (const query of [`?siteId=${theirs}`, `?siteId=${foreign}`, "?state=draft", "?state=in_review"]) {
      expect((await callApi(documentsApi, "GET", `/api/v1/documents${query}`, { auth: { cookie: asClient() } })).body.documents, query).toEqual([]);
    }
    const pdf = (documentId: string) => documentPdfApi.loader({ request: makeRequest(`/api/v1/documents/${documentId}/pdf`, { cookie: asClient() }), params: { documentId }, context: {} } as never) as Promise<Response>;
    expect((await pdf(ids.letter)).status).toBe(200);
    for (const id of [ids.draft, ids.inReview, ids.theirs, ids.foreign]) expect((await pdf(id)).status, id).toBe(404);
  });

  it("are for client members only, and the consultancy's pages refuse a client member", async () => {
    for (const role of ["owner", "engineer", "reviewer", "billing", "regulator"] as const) {
      expect((await get(portalHome, "/portal", a.people[role].cookie)).status, role).toBe(403);
      expect((await get(portalSite, `/portal/sites/${mine}`, a.people[role].cookie, { siteId: mine })).status, role).toBe(403);
    }
    const staffPages: [{ loader: Loader }, string, Record<string, string>][] = [
      [sitesList, "/sites", {}],
      [clientsList, "/clients", {}],
      [patternsPage, "/patterns", {}],
      [siteLayout, `/sites/${mine}`, { siteId: mine }],
      [siteDocuments, `/sites/${mine}/documents`, { siteId: mine }],
      [exposurePage, `/sites/${mine}/exposure`, { siteId: mine }],
      [visitsPage, `/sites/${mine}/visits`, { siteId: mine }],
      [historyPage, `/sites/${mine}/history`, { siteId: mine }],
    ];
    for (const [mod, path, params] of staffPages) expect((await get(mod, path, asClient(), params)).status, path).toBe(403);
  });

  it("say plainly when the client member is bound to no client", async () => {
    await db.delete(schema.clientMember).where(eq(schema.clientMember.memberId, a.people.client.memberId));
    try {
      const got = await get(portalHome, "/portal", asClient());
      expect(got.body).toMatchObject({ bound: false, sites: [] });
      expect((await get(portalSite, `/portal/sites/${mine}`, asClient(), { siteId: mine })).status).toBe(404);
    } finally {
      const [client] = await db.select().from(schema.client).where(eq(schema.client.name, "Portal Estates"));
      await db.insert(schema.clientMember).values({ memberId: a.people.client.memberId, clientId: client.id });
    }
  });
});
