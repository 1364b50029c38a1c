// Regulator filings below the browser: who may file (engineers and reviewers, issued assessments
// only, to a regulator of their own organisation; one transaction with its audit row), who reads
// which (a regulator only the filings addressed to it; other organisations nothing, 404 on their
// ids), the list's contract and filters, and the bundle: every file in the manifest with its
// SHA-256, the issued report's stored bytes, the inventory in the import layout, the method, and
// each run re-run through `npm run -s evaluate` from inside the unzipped bundle to the same bytes.
import { spawnSync } from "node:child_process";
import { createHash, randomUUID } from "node:crypto";
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { and, eq, sql } from "drizzle-orm";
import JSZip from "jszip";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { freezeAssessment } from "~/features/assessments/freeze.server";
import { renderJob } from "~/features/documents/jobs.server";
import { emittersFromCsvBytes } from "~/features/emitters/csv";
import { db, schema } from "~/infra/db.server";
import { stopSender } from "~/infra/jobs.server";
import * as bundleApi from "~/routes/api/v1/filing-bundle";
import * as filingsApi from "~/routes/api/v1/filings";
import * as documentPage from "~/routes/documents/document";
import * as sitePage from "~/routes/documents/site-documents";
import * as bundlePage from "~/routes/filings/bundle";
import * as inboxPage from "~/routes/filings/inbox";
import { callApi, type Auth } from "./api-client";
import { createOrg, createSession, createUser, makeRequest, outcome, type Org } from "./fixtures";

const ROOT = join(__dirname, "..", "..");
let a: Org;
let b: Org;
let siteId = "";
let otherSiteId = "";
let issuedAssessmentId = "";
let draftOnlyAssessmentId = "";
let reportId = "";
/** A second regulator of organisation a, who must not see the first one's filings. */
const reg2 = { memberId: "", cookie: "" };
let filingId = "";

const as = (org: Org, role: keyof Org["people"]): Auth => ({ cookie: org.people[role].cookie });
const who = (org: Org, role: keyof Org["people"]) => ({ organizationId: org.id, userId: org.people[role].userId, role, clientId: null, name: `${role} of ${org.name}` });
const file = (org: Org, role: keyof Org["people"], form: Record<string, string>, cookie = org.people[role].cookie) =>
  outcome(() => inboxPage.action({ request: makeRequest("/filings", { cookie, form }), params: {}, context: {} } as never));
const list = (auth: Auth, query = "") => callApi(filingsApi, "GET", `/api/v1/filings${query}`, { auth });
async function bundleOf(id: string, auth: Auth) {
  const request = new Request(new URL(`/api/v1/filings/${id}/bundle`, process.env.APP_URL ?? "http://127.0.0.1:3000"), { headers: { cookie: auth.cookie ?? "" } });
  let response: Response;
  try {
    response = (await bundleApi.loader({ request, params: { filingId: id }, context: {} } as never)) as Response;
  } catch (thrown) {
    response = thrown as Response; // the guard throws its 401/403 answers
  }
  return { status: response.status, type: response.headers.get("content-type"), disposition: response.headers.get("content-disposition"), bytes: Buffer.from(await response.arrayBuffer()) };
}
const render = (documentId: string) => renderJob({ id: randomUUID(), data: { documentId }, retryCount: 0, retryLimit: 5 });
const step = (role: keyof Org["people"], id: string, intent: string) =>
  outcome(() => documentPage.action({ request: makeRequest(`/sites/${siteId}/documents/${id}`, { cookie: a.people[role].cookie, form: { intent } }), params: { siteId, documentId: id }, context: {} } as never));

async function siteWithEmitters(org: Org, name: string, city: string) {
  const [site] = await db.insert(schema.site).values({ organizationId: org.id, name, kind: "rooftop", address: "9 Private Lane", city }).returning();
  await db.insert(schema.surface).values({ organizationId: org.id, siteId: site.id, name: "Main roof", kind: "area", polygon: [[0, 0], [12, 0], [12, 8], [0, 8]], elevationM: 0, access: "workers", position: 0 });
  const [pattern] = await db.insert(schema.antennaPattern).values({ organizationId: org.id, name: "Filing panel", kind: "3gpp-38.901", gainDbi: 16, pattern: { type: "3gpp-38.901", hBeamwidthDeg: 65, vBeamwidthDeg: 8 } as never }).returning();
  await db.insert(schema.emitter).values([
    { organizationId: org.id, siteId: site.id, label: "F-1", operator: "Filing Mobile", band: "PCS", frequencyMHz: 1960, powerPerCarrierW: 20, carriers: 2, lossDb: 1, gainDbi: 16, hBeamwidthDeg: 65, vBeamwidthDeg: 8, azimuthDeg: 90, x: 1, y: 4, z: 2, model: "spherical" },
    { organizationId: org.id, siteId: site.id, label: "F-2", operator: "Filing Mobile", band: "LTE 700", frequencyMHz: 739, powerPerCarrierW: 40, powerUnit: "dBm", carriers: 1, lossDb: 0.5, gainDbi: 14.15, gainUnit: "dBd", patternId: pattern.id, azimuthDeg: 0, x: 6, y: 0.5, z: 2.5, model: "cylindrical", apertureM: 1.2, dutyFactor: 0.8 },
  ]);
  return site.id;
}

beforeAll(async () => {
  a = await createOrg("filings-a");
  b = await createOrg("filings-b");
  siteId = await siteWithEmitters(a, "Filing fixture roof", "Fileton");
  otherSiteId = await siteWithEmitters(a, "Second filing roof", "Otherby");
  const options = { name: "Filed baseline", standard: "fcc", tier: "general", gridStepM: 1 } as const;
  issuedAssessmentId = (await freezeAssessment(who(a, "engineer"), siteId, options)).id;
  draftOnlyAssessmentId = (await freezeAssessment(who(a, "engineer"), otherSiteId, { ...options, name: "Not issued" })).id;
  // Draft, review and issue the report of the first assessment.
  const drafted = await outcome(() => sitePage.action({ request: makeRequest(`/sites/${siteId}/documents`, { cookie: a.people.engineer.cookie, form: { assessmentId: issuedAssessmentId, kind: "report" } }), params: { siteId }, context: {} } as never));
  reportId = drafted.location!.split("/").pop()!;
  await render(reportId);
  expect((await step("engineer", reportId, "submit")).status).toBe(302);
  expect((await step("reviewer", reportId, "issue")).status).toBe(302);
  await render(reportId);
  const userId = await createUser(`regulator2.${randomUUID().slice(0, 8)}@fixture.test`, "Ida Quill (Harbour Radio Board)");
  reg2.memberId = randomUUID();
  await db.insert(schema.member).values({ id: reg2.memberId, organizationId: a.id, userId, role: "regulator" });
  reg2.cookie = await createSession(userId);
}, 180_000);

afterAll(async () => {
  await stopSender();
});

describe("filing an issued assessment", () => {
  it("lets engineers and reviewers file, refuses the other roles, and writes the filing with its audit row", async () => {
    const form = { assessmentId: issuedAssessmentId, regulatorMemberId: a.people.regulator.memberId, authority: "", note: "Annual filing <script>alert(1)</script>" };
    for (const role of ["owner", "billing", "client", "regulator"] as const) expect((await file(a, role, form)).status, role).toBe(403);
    const done = await file(a, "engineer", form);
    expect(done).toMatchObject({ status: 302, location: "/filings" });
    const [row] = await db.select().from(schema.filing).where(eq(schema.filing.assessmentId, issuedAssessmentId));
    filingId = row.id;
    // The authority comes from the brackets in the regulator's name ("regulator filings-a-…" has none: the whole name).
    const [regUser] = await db.select({ name: schema.user.name }).from(schema.user).where(eq(schema.user.id, a.people.regulator.userId));
    expect(row).toMatchObject({ organizationId: a.id, siteId, documentId: reportId, regulatorMemberId: a.people.regulator.memberId, authority: regUser.name, note: form.note, filedByUserId: a.people.engineer.userId });
    const audit = await db.select().from(schema.auditEvent).where(and(eq(schema.auditEvent.subjectType, "filing"), eq(schema.auditEvent.subjectId, row.id)));
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({ action: "filing.created", actorUserId: a.people.engineer.userId, siteId });
    // The regulator is told by e-mail (a job on the mail queue, queued after the commit).
    const mails = await db.execute<{ subject: string; text: string }>(sql`select data->>'subject' as subject, data->>'text' as text from pgboss.job where name = 'document-mail' and data->>'to' = ${a.people.regulator.email}`);
    expect(mails).toHaveLength(1);
    expect(mails[0].subject).toBe("Filed to you: Filing fixture roof, Filed baseline");
    expect(mails[0].text).toMatch(/\/filings$/m);
    // The reviewer files the same assessment to the second regulator, naming the authority.
    expect((await file(a, "reviewer", { ...form, regulatorMemberId: reg2.memberId, authority: "Harbour Radio Board", note: "" })).status).toBe(302);
  });

  it("refuses a second filing to the same regulator, an assessment without an issued report, and other organisations' records, writing nothing", async () => {
    const before = (await db.select({ n: sql<number>`count(*)::int` }).from(schema.filing))[0].n;
    const again = await file(a, "engineer", { assessmentId: issuedAssessmentId, regulatorMemberId: a.people.regulator.memberId });
    expect(again.status).toBe(409);
    expect(JSON.stringify(again.body)).toMatch(/already filed/);
    const notIssued = await file(a, "engineer", { assessmentId: draftOnlyAssessmentId, regulatorMemberId: a.people.regulator.memberId });
    expect(notIssued.status).toBe(409);
    expect(JSON.stringify(notIssued.body)).toMatch(/report is issued/);
    // b's engineer with a's assessment, and a's engineer to b's regulator or to a non-regulator member.
    expect((await file(b, "engineer", { assessmentId: issuedAssessmentId, regulatorMemberId: b.people.regulator.memberId })).status).toBe(404);
    expect((await file(a, "engineer", { assessmentId: issuedAssessmentId, regulatorMemberId: b.people.regulator.memberId })).status).toBe(404);
    expect((await file(a, "engineer", { assessmentId: issuedAssessmentId, regulatorMemberId: a.people.client.memberId })).status).toBe(404);
    const bad = await file(a, "engineer", { assessmentId: "", regulatorMemberId: "x", authority: "a".repeat(121) });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body)).toMatch(/Use at most 120 characters/);
    expect((await db.select({ n: sql<number>`count(*)::int` }).from(schema.filing))[0].n).toBe(before);
  });
});

describe("GET /api/v1/filings", () => {
  it("answers the contract's exact fields: a regulator its own inbox, the staff the organisation's, billing and clients 403", async () => {
    const mine = await list(as(a, "regulator"));
    expect(mine.status).toBe(200);
    expect(mine.body.filings).toHaveLength(1);
    const [f] = mine.body.filings;
    expect(Object.keys(f).sort()).toEqual(["assessmentId", "authority", "filedAt", "id", "siteId"]);
    expect(f).toMatchObject({ id: filingId, siteId, assessmentId: issuedAssessmentId });
    expect(new Date(f.filedAt).toISOString()).toBe(f.filedAt);
    const second = await list({ cookie: reg2.cookie });
    expect(second.body.filings.map((x: { authority: string }) => x.authority)).toEqual(["Harbour Radio Board"]);
    for (const role of ["owner", "engineer", "reviewer"] as const) expect((await list(as(a, role))).body.filings, role).toHaveLength(2);
    for (const role of ["billing", "client"] as const) expect((await list(as(a, role))).status, role).toBe(403);
    expect((await list({})).status).toBe(401);
    for (const role of ["engineer", "regulator", "owner"] as const) expect((await list(as(b, role))).body.filings, role).toEqual([]);
  });

  it("filters by site, authority and date range, and refuses bad filters with 400", async () => {
    const staff = as(a, "owner");
    expect((await list(staff, `?authority=${encodeURIComponent("Harbour Radio Board")}`)).body.filings).toHaveLength(1);
    expect((await list(staff, `?siteId=${siteId}`)).body.filings).toHaveLength(2);
    expect((await list(staff, `?siteId=${otherSiteId}`)).body.filings).toHaveLength(0);
    const today = new Date().toISOString().slice(0, 10);
    expect((await list(staff, `?from=${today}&to=${today}`)).body.filings).toHaveLength(2);
    expect((await list(staff, "?to=2000-01-01")).body.filings).toHaveLength(0);
    expect((await list(staff, "?from=2999-01-01")).body.filings).toHaveLength(0);
    const bad = await list(staff, "?from=yesterday&colour=red");
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({ from: "Use a date as YYYY-MM-DD." });
    expect((await list(staff, "?from=2026-02-01&to=2026-01-01")).body.error.fields).toMatchObject({ to: "The end date is before the start date." });
  });
});

describe("the bundle", () => {
  it("is a ZIP only for those who may read the filing: 404 for the other regulator and other organisations", async () => {
    expect((await bundleOf(filingId, { cookie: reg2.cookie })).status).toBe(404);
    for (const role of ["engineer", "regulator", "owner"] as const) expect((await bundleOf(filingId, as(b, role))).status, role).toBe(404);
    for (const role of ["billing", "client"] as const) expect((await bundleOf(filingId, as(a, role))).status, role).toBe(403);
    expect((await bundleOf(randomUUID(), as(a, "regulator"))).status).toBe(404);
    const page = await outcome(() => bundlePage.loader({ request: makeRequest(`/filings/${filingId}/bundle`, { cookie: reg2.cookie }), params: { filingId }, context: {} } as never));
    expect(page.status).toBe(404);
    const ok = await bundleOf(filingId, as(a, "regulator"));
    expect(ok.status).toBe(200);
    expect(ok.type).toBe("application/zip");
    expect(ok.disposition).toMatch(/attachment; filename="isotrope-filing-filing-fixture-roof-\d{4}-\d{2}-\d{2}-[0-9a-f]{8}\.zip"/);
    // The same filing zips to the same bytes.
    expect((await bundleOf(filingId, as(a, "engineer"))).bytes.equals(ok.bytes)).toBe(true);
  });

  it("holds the manifest with every file's SHA-256, the stored runs, the inventory CSV, the method and the issued report's bytes", async () => {
    const zip = await JSZip.loadAsync((await bundleOf(filingId, as(a, "regulator"))).bytes);
    const names = Object.keys(zip.files).filter((n) => !zip.files[n].dir).sort();
    const [assessment] = await db.select().from(schema.assessment).where(eq(schema.assessment.id, issuedAssessmentId));
    const runCount = (assessment.runs as unknown[]).length;
    expect(runCount).toBeGreaterThan(0);
    const runFiles = Array.from({ length: runCount }, (_, i) => [`runs/${i + 1}/request.json`, `runs/${i + 1}/response.json`]).flat();
    expect(names).toEqual(["inventory.csv", "manifest.json", "method.md", "report.pdf", ...runFiles].sort());
    const manifest = JSON.parse(await zip.file("manifest.json")!.async("string"));
    expect(manifest.files.map((f: { path: string }) => f.path).sort()).toEqual(names.filter((n) => n !== "manifest.json"));
    for (const f of manifest.files as { path: string; sha256: string; bytes: number }[]) {
      const bytes = await zip.file(f.path)!.async("nodebuffer");
      expect(createHash("sha256").update(bytes).digest("hex"), f.path).toBe(f.sha256);
      expect(bytes.length, f.path).toBe(f.bytes);
    }
    expect(manifest).toMatchObject({ filing: { id: filingId }, site: { name: "Filing fixture roof", city: "Fileton" }, assessment: { id: issuedAssessmentId, standard: "fcc", tier: "general" } });
    expect(JSON.stringify(manifest)).not.toContain("9 Private Lane");
    // The report: the issued document's stored bytes exactly.
    const [report] = await db.select().from(schema.document).where(eq(schema.document.id, reportId));
    const pdf = await zip.file("report.pdf")!.async("nodebuffer");
    expect(pdf.equals(report.pdf!)).toBe(true);
    expect(manifest.report).toMatchObject({ version: 1, code: report.code, sha256: report.sha256 });
    // The runs: the stored text of the `json` column, request as is and response with the CLI's newline.
    for (let i = 0; i < runCount; i++) {
      const [stored] = await db.execute<{ request: string; response: string }>(sql`select (runs -> ${i}::int -> 'request')::text as request, (runs -> ${i}::int -> 'response')::text as response from assessment where id = ${issuedAssessmentId}`);
      expect(await zip.file(`runs/${i + 1}/request.json`)!.async("string")).toBe(stored.request);
      expect(await zip.file(`runs/${i + 1}/response.json`)!.async("string")).toBe(`${stored.response}\n`);
    }
    // The inventory imports back through the emitter CSV reader to the assessed emitters, the library pattern by name.
    const csv = emittersFromCsvBytes(await zip.file("inventory.csv")!.async("uint8array"), [{ id: "p", name: "Filing panel" }]);
    expect(csv.problems).toEqual([]);
    expect(csv.valid.map((v) => v.emitter.label)).toEqual(["F-1", "F-2"]);
    expect(csv.valid[1].emitter).toMatchObject({ frequencyMHz: 739, patternId: "p", model: "cylindrical", apertureM: 1.2, dutyFactor: 0.8, gainUnit: "dBd" });
    const method = await zip.file("method.md")!.async("string");
    for (const s of ["# Method: Filed baseline", "Filing fixture roof, Fileton", "US FCC", "## Method, models and assumptions", "Model: ", "Heights: ", "## Models and factors by emitter", "| F-2 | yes | cylindrical (aperture 1.2 m) | library: Filing panel | 0.8 | 1 | 1 |", "## Published sources", "OET Bulletin 65", report.code]) expect(method, s).toContain(s);
  });

  it("re-runs every request through `npm run -s evaluate` inside the unzipped bundle to its response, byte for byte", async () => {
    const zip = await JSZip.loadAsync((await bundleOf(filingId, as(a, "regulator"))).bytes);
    mkdirSync(join(ROOT, ".data"), { recursive: true });
    const dir = mkdtempSync(join(ROOT, ".data", "filing-bundle-"));
    try {
      for (const name of Object.keys(zip.files)) {
        if (zip.files[name].dir) continue;
        mkdirSync(dirname(join(dir, name)), { recursive: true });
        writeFileSync(join(dir, name), await zip.file(name)!.async("nodebuffer"));
      }
      const runs = (JSON.parse(await zip.file("manifest.json")!.async("string")).runs as { n: number }[]).map((r) => r.n);
      expect(runs.length).toBeGreaterThan(0);
      for (const n of runs) {
        // Called from inside the bundle with the relative path, as the README says.
        const cli = spawnSync("npm", ["run", "-s", "evaluate", "--", `runs/${n}/request.json`], { cwd: dir, encoding: "utf8", maxBuffer: 256 * 1024 * 1024 });
        expect(cli.stderr).toBe("");
        expect(cli.status).toBe(0);
        expect(Buffer.from(cli.stdout, "utf8").equals(await zip.file(`runs/${n}/response.json`)!.async("nodebuffer")), `run ${n}`).toBe(true);
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);
});

describe("the Filings page", () => {
  const inbox = (cookie: string, query = "") => outcome(() => inboxPage.loader({ request: makeRequest(`/filings${query}`, { cookie }), params: {}, context: {} } as never));
  it("shows a regulator only its inbox, with its filters' choices drawn from it, and the staff the form", async () => {
    const mine = (await inbox(a.people.regulator.cookie)).body as { inbox: boolean; canFile: boolean; filings: { id: string; siteName: string }[]; choices: { sites: unknown[]; authorities: string[] }; fileable: unknown[]; regulators: unknown[] };
    expect(mine).toMatchObject({ inbox: true, canFile: false, fileable: [], regulators: [] });
    expect(mine.filings.map((f) => f.id)).toEqual([filingId]);
    expect(mine.choices.authorities).not.toContain("Harbour Radio Board");
    const other = (await inbox(reg2.cookie)).body as typeof mine;
    expect(other.filings).toHaveLength(1);
    expect(other.filings[0].id).not.toBe(filingId);
    const staff = (await inbox(a.people.engineer.cookie)).body as typeof mine;
    expect(staff).toMatchObject({ inbox: false, canFile: true });
    expect(staff.filings).toHaveLength(2);
    expect(staff.regulators).toHaveLength(2);
    expect(staff.fileable).toHaveLength(1);
    expect((await inbox(a.people.owner.cookie, "?from=nonsense")).status).toBe(400);
    expect((await inbox(b.people.regulator.cookie)).body).toMatchObject({ filings: [] });
  });
});
