// The public verification page, every state: valid, superseded (with the newer certificate's
// code), withdrawn, expired, and unknown (404: no such code, a draft, a report's code, a malformed
// code); only the public facts in the answer; and the per-address rate limit (429 with Retry-After).
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { newCode } from "~/features/documents/commands.server";
import { verifyPolicy } from "~/features/documents/verify-limit.server";
import { db, schema } from "~/infra/db.server";
import * as verifyPage from "~/routes/verify";
import { createOrg, freshIp, makeRequest, outcome, type Org } from "./fixtures";

let org: Org;
let assessmentId = "";
let siteId = "";
const DAY = 86_400_000;
const codes: Record<string, string> = {};

const verify = (code: string, ip = freshIp()) => outcome(() => verifyPage.loader({ request: makeRequest(`/verify/${code}`, { ip }), params: { code }, context: {} } as never));

async function certificate(state: "draft" | "issued" | "superseded" | "withdrawn", over: Partial<typeof schema.document.$inferInsert> = {}) {
  const issuedAt = new Date(Date.now() - 30 * DAY);
  const [d] = await db
    .insert(schema.document)
    .values({ organizationId: org.id, siteId, assessmentId, kind: "certificate", state, authorName: "Ann Author", reviewerName: state === "draft" ? null : "Rita Reviewer", code: newCode(), issuedAt: state === "draft" ? null : issuedAt, expiresAt: state === "draft" ? null : new Date(issuedAt.getTime() + 365 * DAY), ...over })
    .returning();
  return d;
}

beforeAll(async () => {
  org = await createOrg("verify");
  const [site] = await db.insert(schema.site).values({ organizationId: org.id, name: "Verify <b>roof</b>", kind: "rooftop", address: "12 Hidden Street", city: "Checkham" }).returning();
  siteId = site.id;
  const [a] = await db
    .insert(schema.assessment)
    .values({ organizationId: org.id, siteId, name: "Verify baseline", authorName: "Ann Author", standard: "icnirp-2020", tier: "occupational", options: {}, site: { site: { name: site.name, city: site.city, address: site.address }, client: { name: "Secret Client Ltd" } }, inventory: {}, runs: [], summary: {}, results: {}, engine: "test", mitigation: {} })
    .returning();
  assessmentId = a.id;
  const newer = await certificate("issued", { version: 2 });
  const old = await certificate("superseded", { supersededById: newer.id, supersededAt: new Date() });
  const withdrawn = await certificate("withdrawn", { withdrawnAt: new Date(), withdrawnReason: "Wrong site" });
  const expired = await certificate("issued", { issuedAt: new Date(Date.now() - 400 * DAY), expiresAt: new Date(Date.now() - 35 * DAY) });
  const draft = await certificate("draft");
  const [report] = await db.insert(schema.document).values({ organizationId: org.id, siteId, assessmentId, kind: "report", state: "issued", authorName: "Ann Author", code: newCode(), issuedAt: new Date() }).returning();
  Object.assign(codes, { valid: newer.code, superseded: old.code, withdrawn: withdrawn.code, expired: expired.code, draft: draft.code, report: report.code });
});

describe("GET /verify/:code", () => {
  it("says valid with only the public facts: the site's name and city, the dates, standard and tier, the issuer", async () => {
    const got = await verify(codes.valid);
    expect(got.status).toBe(200);
    const c = (got.body as { certificate: Record<string, unknown> }).certificate;
    expect(Object.keys(c).sort()).toEqual(["city", "code", "expiresAt", "issuedAt", "issuer", "newerCode", "siteName", "standard", "tier", "verdict"]);
    expect(c).toMatchObject({ verdict: "valid", siteName: "Verify <b>roof</b>", city: "Checkham", standard: "icnirp-2020", tier: "occupational", newerCode: null, issuer: `Rita Reviewer, ${org.name}` });
    const text = JSON.stringify(got.body);
    for (const secret of ["12 Hidden Street", "Secret Client Ltd", "Ann Author"]) expect(text).not.toContain(secret);
    // Codes are read in any case and with stray spaces.
    expect((await verify(` ${codes.valid.toLowerCase()} `)).body).toMatchObject({ certificate: { verdict: "valid" } });
  });

  it("says superseded with the newer certificate's code, withdrawn, and expired", async () => {
    expect((await verify(codes.superseded)).body).toMatchObject({ certificate: { verdict: "superseded", newerCode: codes.valid } });
    expect((await verify(codes.withdrawn)).body).toMatchObject({ certificate: { verdict: "withdrawn", newerCode: null } });
    const expired = await verify(codes.expired);
    expect(expired.body).toMatchObject({ certificate: { verdict: "expired" } });
    expect(new Date((expired.body as { certificate: { expiresAt: string } }).certificate.expiresAt).getTime()).toBeLessThan(Date.now());
  });

  it("answers 404 for an unknown code, a draft, a report's code and a malformed code", async () => {
    for (const code of [newCode(), codes.draft, codes.report, "not a code!", "x".repeat(500)]) {
      const got = await verify(code);
      expect(got.status, code).toBe(404);
      expect(JSON.stringify(got.body)).toMatch(/No certificate has this code/);
    }
  });

  it("makes codes of 20 characters from a 32-letter alphabet (100 bits), all different", () => {
    const many = Array.from({ length: 2000 }, newCode);
    for (const c of many) expect(c).toMatch(/^[A-HJ-NP-Z2-9]{4}(-[A-HJ-NP-Z2-9]{4}){4}$/);
    expect(new Set(many).size).toBe(many.length);
    // Every letter of the alphabet turns up (a biased or short alphabet would not).
    expect(new Set(many.join("").replace(/-/g, "")).size).toBe(32);
  });

  it("rate-limits each client address: after the free look-ups (and the one that locks) a 429 with Retry-After and a message, other addresses unaffected", async () => {
    const ip = freshIp();
    for (let i = 0; i <= verifyPolicy.free; i++) expect((await verify(i % 2 ? codes.valid : randomUUID(), ip)).status, `look-up ${i + 1}`).not.toBe(429);
    let thrown: unknown;
    try {
      await verifyPage.loader({ request: makeRequest(`/verify/${codes.valid}`, { ip }), params: { code: codes.valid }, context: {} } as never);
    } catch (error) {
      thrown = error;
    }
    const limited = thrown as { init?: { status?: number; headers?: Record<string, string> }; data?: { message?: string } };
    expect(limited.init?.status).toBe(429);
    const retryAfter = Number(limited.init?.headers?.["Retry-After"]);
    expect(retryAfter).toBeGreaterThanOrEqual(1);
    expect(retryAfter).toBeLessThanOrEqual(verifyPolicy.capSeconds);
    expect(limited.data?.message).toMatch(/Too many look-ups from your network\. Wait \d+ seconds?, then try again\./);
    // Found or not, the limit holds; another address is served.
    expect((await verify(newCode(), ip)).status).toBe(429);
    expect((await verify(codes.valid)).status).toBe(200);
    const [row] = await db.select().from(schema.loginThrottle).where(eq(schema.loginThrottle.key, `verify-ip:${ip}`));
    expect(row.failures).toBe(verifyPolicy.free + 1);
  });
});
