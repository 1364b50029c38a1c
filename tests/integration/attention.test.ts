// The overview's attention list (issue 9 §7), per role, through the overview's loader: a reviewer
// sees documents in review written by someone else; an engineer sees sites whose inventory changed
// after the inventory of their latest issued document was frozen; owner and billing see issued
// certificates expiring within 60 days; a regulator the filings addressed to it in the last 30 days.
// Nothing of another organisation shows; the client gets no list here (its home is /portal).
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { deleteEmitter } from "~/features/emitters/emitters.server";
import { db, schema } from "~/infra/db.server";
import type { DocumentKind, DocumentState } from "~/infra/db/schema/documents";
import * as overview from "~/routes/overview";
import { createOrg, makeRequest, type Org } from "./fixtures";

const DAY = 86_400_000;
const ago = (days: number) => new Date(Date.now() - days * DAY);
let a: Org;
let b: Org;
const sites: Record<string, string> = {};
const docs: Record<string, string> = {};
const filed: { assessmentId?: string } = {};

async function memberIdOf(org: Org, role: "regulator" | "engineer") {
  const [row] = await db.select({ id: schema.member.id }).from(schema.member).where(and(eq(schema.member.organizationId, org.id), eq(schema.member.userId, org.people[role].userId)));
  return row.id;
}

async function fileTo(org: Org, regulatorMemberId: string, siteId: string, assessmentId: string, documentId: string, filedAt: Date, authority: string) {
  const [row] = await db.insert(schema.filing).values({ organizationId: org.id, siteId, assessmentId, documentId, regulatorMemberId, authority, filedByName: "Fixture", filedAt }).returning();
  return row.id;
}

async function makeSite(org: Org, name: string) {
  const [row] = await db.insert(schema.site).values({ organizationId: org.id, name, kind: "rooftop" }).returning();
  return row.id;
}

async function makeAssessment(org: Org, siteId: string, createdAt: Date) {
  const [row] = await db
    .insert(schema.assessment)
    .values({ organizationId: org.id, siteId, name: "Fixture assessment", authorName: "Fixture", standard: "fcc", tier: "general", options: {}, site: {}, inventory: {}, runs: [], summary: {}, results: {}, engine: "fixture", mitigation: {}, createdAt })
    .returning();
  return row.id;
}

type DocInput = { kind: DocumentKind; state: DocumentState; author?: string | null; version?: number; submittedAt?: Date; issuedAt?: Date; expiresAt?: Date };
async function makeDocument(org: Org, siteId: string, assessmentId: string, d: DocInput) {
  const [row] = await db
    .insert(schema.document)
    .values({ organizationId: org.id, siteId, assessmentId, kind: d.kind, state: d.state, version: d.version ?? 1, authorUserId: d.author ?? null, authorName: "Fixture Author", code: randomUUID(), submittedAt: d.submittedAt, issuedAt: d.issuedAt, expiresAt: d.expiresAt })
    .returning();
  return row.id;
}

async function inventoryChange(org: Org, siteId: string, entity: string, at: Date) {
  await db.insert(schema.auditEvent).values({ organizationId: org.id, actorUserId: org.people.engineer.userId, action: `${entity}.updated`, subjectType: entity, subjectId: randomUUID(), siteId, before: {}, after: {}, createdAt: at });
}

async function attentionOf(org: Org, role: keyof Org["people"]) {
  const data = await overview.loader({ request: makeRequest("/", { cookie: org.people[role].cookie }), params: {}, context: {} } as never);
  return data.attention;
}

beforeAll(async () => {
  a = await createOrg("attention-a");
  b = await createOrg("attention-b");
  for (const name of ["changed", "unchanged", "visits-only", "never-issued", "reissued", "certs"]) sites[name] = await makeSite(a, `Attention <i>${name}</i>`);
  const older = await makeAssessment(a, sites.changed, ago(10));
  docs.changedReport = await makeDocument(a, sites.changed, older, { kind: "report", state: "issued", issuedAt: ago(9), version: 3 });
  filed.assessmentId = older;
  await inventoryChange(a, sites.changed, "surface", ago(5));

  const unchanged = await makeAssessment(a, sites.unchanged, ago(4));
  await inventoryChange(a, sites.unchanged, "emitter", ago(6)); // before the freeze: already in the document
  await makeDocument(a, sites.unchanged, unchanged, { kind: "letter", state: "issued", issuedAt: ago(3) });

  const visitsOnly = await makeAssessment(a, sites["visits-only"], ago(4));
  await makeDocument(a, sites["visits-only"], visitsOnly, { kind: "report", state: "issued", issuedAt: ago(3) });
  await inventoryChange(a, sites["visits-only"], "reading", ago(1)); // a reading is not the inventory
  await inventoryChange(a, sites["visits-only"], "document", ago(1));

  const never = await makeAssessment(a, sites["never-issued"], ago(4));
  await makeDocument(a, sites["never-issued"], never, { kind: "report", state: "in_review", author: a.people.engineer.userId, submittedAt: ago(2) });
  await inventoryChange(a, sites["never-issued"], "emitter", ago(1));

  // Reissued from a newer assessment after the change: the latest issued document is current.
  const first = await makeAssessment(a, sites.reissued, ago(8));
  const second = await makeAssessment(a, sites.reissued, ago(2));
  await makeDocument(a, sites.reissued, first, { kind: "report", state: "superseded", issuedAt: ago(7) });
  await inventoryChange(a, sites.reissued, "emitter", ago(5));
  await makeDocument(a, sites.reissued, second, { kind: "report", state: "issued", issuedAt: ago(1), version: 2 });

  const certs = await makeAssessment(a, sites.certs, ago(400));
  docs.soon = await makeDocument(a, sites.certs, certs, { kind: "certificate", state: "issued", issuedAt: ago(300), expiresAt: new Date(Date.now() + 30 * DAY) });
  docs.expired = await makeDocument(a, sites.certs, certs, { kind: "certificate", state: "issued", issuedAt: ago(390), expiresAt: ago(2) });
  docs.later = await makeDocument(a, sites.certs, certs, { kind: "certificate", state: "issued", issuedAt: ago(10), expiresAt: new Date(Date.now() + 90 * DAY) });
  docs.supersededCert = await makeDocument(a, sites.certs, certs, { kind: "certificate", state: "superseded", issuedAt: ago(350), expiresAt: new Date(Date.now() + 10 * DAY) });
  docs.reportExpiry = await makeDocument(a, sites.certs, certs, { kind: "report", state: "issued", issuedAt: ago(350), expiresAt: new Date(Date.now() + 10 * DAY) });
  docs.byEngineer = await makeDocument(a, sites.certs, certs, { kind: "letter", state: "in_review", author: a.people.engineer.userId, submittedAt: ago(3), version: 2 });
  docs.byReviewer = await makeDocument(a, sites.certs, certs, { kind: "report", state: "in_review", author: a.people.reviewer.userId, submittedAt: ago(4) });
  docs.draft = await makeDocument(a, sites.certs, certs, { kind: "report", state: "draft", author: a.people.engineer.userId });
  docs.neverIssued = (await db.select({ id: schema.document.id }).from(schema.document).where(eq(schema.document.siteId, sites["never-issued"])))[0].id;

  // Another organisation with one of everything: none of it may show in a's lists.
  const bSite = await makeSite(b, "Other organisation's roof");
  const bAssessment = await makeAssessment(b, bSite, ago(10));
  await makeDocument(b, bSite, bAssessment, { kind: "report", state: "issued", issuedAt: ago(9) });
  await makeDocument(b, bSite, bAssessment, { kind: "report", state: "in_review", author: b.people.engineer.userId, submittedAt: ago(1) });
  await makeDocument(b, bSite, bAssessment, { kind: "certificate", state: "issued", issuedAt: ago(300), expiresAt: new Date(Date.now() + 5 * DAY) });
  await inventoryChange(b, bSite, "emitter", ago(1));
});

describe("the overview's attention list", () => {
  it("shows a reviewer the documents in review that someone else wrote, oldest first, linked", async () => {
    const list = await attentionOf(a, "reviewer");
    expect(list?.reason).toBe("review");
    expect(list?.items.map((i) => i.to)).toEqual([`/sites/${sites.certs}/documents/${docs.byEngineer}`, `/sites/${sites["never-issued"]}/documents/${docs.neverIssued}`]);
    expect(list?.total).toBe(2);
    expect(list?.items[0].title).toBe("Landlord letter v2, Attention <i>certs</i>");
  });

  it("shows an engineer the sites whose inventory changed after their latest issued document's inventory", async () => {
    const list = await attentionOf(a, "engineer");
    expect(list?.reason).toBe("inventory-changed");
    expect(list?.items.map((i) => i.to)).toEqual([`/sites/${sites.changed}/history`]);
    expect(list?.items[0].detail).toContain("report v3");
  });

  it("puts a site on the engineer's list when an emitter is deleted through the app", async () => {
    const [emitter] = await db.insert(schema.emitter).values({ organizationId: a.id, siteId: sites.unchanged, label: "Attention-1", frequencyMHz: 1900, powerPerCarrierW: 20, gainDbi: 15, x: 0, y: 0, z: 3 }).returning();
    await deleteEmitter({ organizationId: a.id, userId: a.people.engineer.userId, role: "engineer", clientId: null }, sites.unchanged, emitter.id);
    const list = await attentionOf(a, "engineer");
    expect(list?.items.map((i) => i.to)).toEqual([`/sites/${sites.unchanged}/history`, `/sites/${sites.changed}/history`]);
    expect(list?.total).toBe(2);
  });

  it("shows owner and billing the issued certificates expiring within 60 days, soonest (or expired) first", async () => {
    for (const role of ["owner", "billing"] as const) {
      const list = await attentionOf(a, role);
      expect(list?.reason, role).toBe("certificate-expiring");
      expect(list?.items.map((i) => i.to), role).toEqual([`/sites/${sites.certs}/documents/${docs.expired}`, `/sites/${sites.certs}/documents/${docs.soon}`]);
      expect(list?.items[0].detail).toMatch(/^Expired on/);
      expect(list?.items[1].detail).toMatch(/^Expires on .*, in (29|30) days\.$/);
    }
  });

  it("shows a regulator the filings addressed to it in the last 30 days, newest first, and no one else's", async () => {
    expect(await attentionOf(a, "regulator")).toMatchObject({ reason: "filing-received", total: 0, items: [] });
    const regulator = await memberIdOf(a, "regulator");
    // A second assessment of the same site for a second filing (one filing per assessment and regulator).
    const newer = await makeAssessment(a, sites.changed, ago(3));
    const newerReport = await makeDocument(a, sites.changed, newer, { kind: "report", state: "issued", issuedAt: ago(2), version: 4 });
    const recent = await fileTo(a, regulator, sites.changed, newer, newerReport, ago(1), "Spectrum Safety Office");
    const earlier = await fileTo(a, regulator, sites.changed, filed.assessmentId!, docs.changedReport, ago(5), "Harbour Radio Authority");
    // Too old for the list, and one addressed to another member: neither shows.
    const oldAssessment = await makeAssessment(a, sites.unchanged, ago(60));
    const oldReport = await makeDocument(a, sites.unchanged, oldAssessment, { kind: "report", state: "superseded", issuedAt: ago(59) });
    await fileTo(a, regulator, sites.unchanged, oldAssessment, oldReport, ago(45), "Spectrum Safety Office");
    await fileTo(a, await memberIdOf(a, "engineer"), sites.changed, newer, newerReport, ago(1), "Not the regulator");
    const list = await attentionOf(a, "regulator");
    expect(list?.items.map((i) => i.key)).toEqual([`filing:${recent}`, `filing:${earlier}`]);
    expect(list?.items[0]).toMatchObject({ to: `/filings?siteId=${sites.changed}`, title: "Attention <i>changed</i>: assessment with its report v4" });
    expect(list?.items[1].detail).toContain("Filed to Harbour Radio Authority");
    expect(await attentionOf(b, "regulator")).toMatchObject({ total: 0, items: [] });
  });

  it("sends the client to its portal instead, and an empty list says so", async () => {
    const toPortal = await attentionOf(a, "client").then(
      () => null,
      (thrown: unknown) => (thrown instanceof Response ? thrown.headers.get("location") : String(thrown)),
    );
    expect(toPortal).toBe("/portal");
    const lone = await createOrg("attention-empty");
    for (const role of ["owner", "engineer", "reviewer", "billing", "regulator"] as const) expect(await attentionOf(lone, role)).toMatchObject({ total: 0, items: [] });
  });

  it("caps the list and counts the rest", async () => {
    const site = await makeSite(b, "Many drafts");
    const assessmentId = await makeAssessment(b, site, ago(1));
    for (let i = 0; i < 12; i++) await makeDocument(b, site, assessmentId, { kind: "letter", state: "in_review", author: b.people.engineer.userId, submittedAt: ago(1) });
    const list = await attentionOf(b, "reviewer");
    expect(list?.items).toHaveLength(10);
    expect(list?.total).toBe(13);
  });
});
