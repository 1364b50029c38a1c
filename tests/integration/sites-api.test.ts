// The sites, clients, history and token API: with a session and with a token, validation,
// optimistic concurrency, roles and organisation isolation.
import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import * as clientsApi from "~/routes/api/v1/clients";
import * as siteApi from "~/routes/api/v1/site";
import * as siteHistoryApi from "~/routes/api/v1/site-history";
import * as sitesApi from "~/routes/api/v1/sites";
import * as tokenApi from "~/routes/api/v1/token";
import * as tokensApi from "~/routes/api/v1/tokens";
import { callApi } from "./api-client";
import { createOrg, type Org } from "./fixtures";

let a: Org;
let b: Org;
let token = "";

beforeAll(async () => {
  a = await createOrg("api-a");
  b = await createOrg("api-b");
  const made = await callApi(tokensApi, "POST", "/api/v1/tokens", { auth: { cookie: a.people.engineer.cookie }, json: { name: "integration script" } });
  expect(made.status).toBe(201);
  token = made.body.token;
});

const eng = () => ({ cookie: a.people.engineer.cookie });

describe("POST /api/v1/sites", () => {
  it("creates a site with a session and answers 201 with the site and version 1", async () => {
    const got = await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), json: { name: "Harbour Lofts", kind: "rooftop", city: "Port Ellery", datumNote: "main roof slab" } });
    expect(got.status).toBe(201);
    expect(got.body.site).toMatchObject({ name: "Harbour Lofts", kind: "rooftop", city: "Port Ellery", version: 1, clientId: null, address: "" });
  });

  it("creates a site with a bearer token, recorded as the token's member", async () => {
    const got = await callApi(sitesApi, "POST", "/api/v1/sites", { auth: { token }, json: { name: "Token Tower", kind: "tower" } });
    expect(got.status).toBe(201);
    const [event] = await db.select().from(schema.auditEvent).where(eq(schema.auditEvent.subjectId, got.body.site.id));
    expect(event.actorUserId).toBe(a.people.engineer.userId);
  });

  it("names every invalid field, and writes nothing", async () => {
    const before = await db.select().from(schema.site).where(eq(schema.site.organizationId, a.id));
    const got = await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), json: { name: "x".repeat(121), kind: "lighthouse", latitude: 91, colour: "red" } });
    expect(got.status).toBe(400);
    expect(got.body.error.message).toBeTruthy();
    expect(got.body.error.fields).toMatchObject({ name: "Use at most 120 characters.", kind: expect.stringContaining("rooftop"), latitude: "Enter a latitude from -90 to 90." });
    expect(JSON.stringify(got.body.error.fields)).toContain("colour");
    expect(await db.select().from(schema.site).where(eq(schema.site.organizationId, a.id))).toHaveLength(before.length);
  });

  it("refuses a body that is not JSON with 415, and broken JSON with 400", async () => {
    expect((await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), body: "name=x", contentType: "application/x-www-form-urlencoded" })).status).toBe(415);
    expect((await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), body: "{", contentType: "application/json" })).status).toBe(400);
  });

  it("refuses another organisation's client id as a field error", async () => {
    const other = await callApi(clientsApi, "POST", "/api/v1/clients", { auth: { cookie: b.people.engineer.cookie }, json: { name: "B's landlord" } });
    const got = await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), json: { name: "Borrowed", kind: "rooftop", clientId: other.body.client.id } });
    expect(got.status).toBe(400);
    expect(got.body.error.fields.clientId).toContain("No such client");
  });

  it("keeps HTML and script in names as text", async () => {
    const name = `<script>alert("x")</script> Ünïcödé 漢字`;
    const got = await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), json: { name, kind: "other" } });
    expect(got.status).toBe(201);
    const read = await callApi(siteApi, "GET", `/api/v1/sites/${got.body.site.id}`, { auth: eng(), params: { siteId: got.body.site.id } });
    expect(read.body.site.name).toBe(name);
  });
});

describe("GET /api/v1/sites", () => {
  it("pages through the organisation's sites with their emitter counts", async () => {
    for (let i = 0; i < 3; i++) await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), json: { name: `Paging ${i}`, kind: "monopole" } });
    const got = await callApi(sitesApi, "GET", "/api/v1/sites?page=2&pageSize=2&q=Paging", { auth: { token } });
    expect(got.status).toBe(200);
    expect(got.body).toMatchObject({ total: 3, page: 2, pageSize: 2 });
    expect(got.body.sites).toHaveLength(1);
    expect(Object.keys(got.body.sites[0]).sort()).toEqual(["city", "clientId", "emitterCount", "id", "kind", "name", "updatedAt"]);
    // A page past the end has no row to carry the total; it is still counted.
    const past = await callApi(sitesApi, "GET", "/api/v1/sites?page=5&pageSize=2&q=Paging", { auth: { token } });
    expect(past.body).toMatchObject({ total: 3, page: 5, sites: [] });
    const none = await callApi(sitesApi, "GET", "/api/v1/sites?q=No such site anywhere", { auth: { token } });
    expect(none.body).toMatchObject({ total: 0, sites: [] });
  });

  it("searches name, city and address, ignoring case, with % and _ taken literally", async () => {
    const made = [
      { name: "Quarry Mast", kind: "tower", city: "Port Lowan", address: "1 Shore Rd" },
      { name: "Depot roof", kind: "rooftop", city: "QUARRYTON", address: "" },
      { name: "Pole 7", kind: "street-pole", city: "", address: "Old quarry lane" },
      { name: "100% Tower_1", kind: "tower", city: "", address: "" },
      { name: "1000 Tower-1", kind: "tower", city: "", address: "" },
    ];
    for (const json of made) expect((await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), json })).status).toBe(201);
    const names = async (q: string) => {
      const got = await callApi(sitesApi, "GET", `/api/v1/sites?q=${encodeURIComponent(q)}&pageSize=100`, { auth: { token } });
      expect(got.status).toBe(200);
      expect(got.body.total).toBe(got.body.sites.length);
      return got.body.sites.map((s: { name: string }) => s.name).sort();
    };
    expect(await names("quarry")).toEqual(["Depot roof", "Pole 7", "Quarry Mast"]);
    expect(await names("0% Tower_")).toEqual(["100% Tower_1"]);
    expect(await names("er_1")).toEqual(["100% Tower_1"]);
    // The search's index (migration 0015) exists with the trigram operator class.
    const [index] = await db.execute<{ def: string }>(sql`select indexdef as def from pg_indexes where indexname = 'site_search_idx'`);
    expect(index.def).toContain("gin_trgm_ops");
  });

  it("lets billing read, and refuses client and regulator members", async () => {
    expect((await callApi(sitesApi, "GET", "/api/v1/sites", { auth: { cookie: a.people.billing.cookie } })).status).toBe(200);
    expect((await callApi(sitesApi, "POST", "/api/v1/sites", { auth: { cookie: a.people.billing.cookie }, json: { name: "No", kind: "other" } })).status).toBe(403);
    expect((await callApi(sitesApi, "GET", "/api/v1/sites", { auth: { cookie: a.people.client.cookie } })).status).toBe(403);
    expect((await callApi(sitesApi, "GET", "/api/v1/sites", { auth: { cookie: a.people.regulator.cookie } })).status).toBe(403);
  });

  it("answers 401 without a session or with a revoked token", async () => {
    expect((await callApi(sitesApi, "GET", "/api/v1/sites")).status).toBe(401);
    expect((await callApi(sitesApi, "GET", "/api/v1/sites", { auth: { token: "iso_not-a-real-token" } })).status).toBe(401);
  });
});

describe("PATCH /api/v1/sites/:id", () => {
  it("updates with the version read, then refuses a stale version with 409 and the current values", async () => {
    const made = await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), json: { name: "Versioned", kind: "rooftop" } });
    const id = made.body.site.id;
    const first = await callApi(siteApi, "PATCH", `/api/v1/sites/${id}`, { auth: eng(), params: { siteId: id }, json: { version: 1, city: "Marrow Bay" } });
    expect(first.status).toBe(200);
    expect(first.body.site).toMatchObject({ city: "Marrow Bay", version: 2, name: "Versioned" });
    const stale = await callApi(siteApi, "PATCH", `/api/v1/sites/${id}`, { auth: { token }, params: { siteId: id }, json: { version: 1, city: "Overwritten" } });
    expect(stale.status).toBe(409);
    expect(stale.body.current).toMatchObject({ city: "Marrow Bay", version: 2 });
    const [row] = await db.select().from(schema.site).where(eq(schema.site.id, id));
    expect(row.city).toBe("Marrow Bay");
  });
});

describe("tenant isolation", () => {
  it("answers 404 for every id of another organisation, and changes nothing", async () => {
    const made = await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), json: { name: "Private", kind: "rooftop" } });
    const id = made.body.site.id;
    const other = { cookie: b.people.engineer.cookie };
    expect((await callApi(siteApi, "GET", `/api/v1/sites/${id}`, { auth: other, params: { siteId: id } })).status).toBe(404);
    expect((await callApi(siteApi, "PATCH", `/api/v1/sites/${id}`, { auth: other, params: { siteId: id }, json: { version: 1, name: "Mine" } })).status).toBe(404);
    expect((await callApi(siteApi, "DELETE", `/api/v1/sites/${id}`, { auth: other, params: { siteId: id } })).status).toBe(404);
    expect((await callApi(siteHistoryApi, "GET", `/api/v1/sites/${id}/history`, { auth: other, params: { siteId: id } })).status).toBe(404);
    const list = await callApi(sitesApi, "GET", "/api/v1/sites?q=Private", { auth: other });
    expect(list.body.sites).toEqual([]);
    const [row] = await db.select().from(schema.site).where(eq(schema.site.id, id));
    expect(row.name).toBe("Private");
  });
});

describe("history", () => {
  it("lists a site's events newest first with before and after", async () => {
    const made = await callApi(sitesApi, "POST", "/api/v1/sites", { auth: eng(), json: { name: "Storied", kind: "rooftop" } });
    const id = made.body.site.id;
    await callApi(siteApi, "PATCH", `/api/v1/sites/${id}`, { auth: eng(), params: { siteId: id }, json: { version: 1, address: "4 Quay Row" } });
    const got = await callApi(siteHistoryApi, "GET", `/api/v1/sites/${id}/history`, { auth: eng(), params: { siteId: id } });
    expect(got.status).toBe(200);
    expect(got.body.events.map((e: { action: string }) => e.action)).toEqual(["site.updated", "site.created"]);
    expect(got.body.events[0]).toMatchObject({ entity: "site", entityId: id, before: { address: "" }, after: { address: "4 Quay Row" } });
    expect(got.body.events[1].before).toBeNull();
    expect(got.body.events[0].actor.name).toContain("engineer");
  });
});

describe("tokens", () => {
  it("shows a token once, stores only its hash, lists it with its last use, and revokes it", async () => {
    const made = await callApi(tokensApi, "POST", "/api/v1/tokens", { auth: { cookie: a.people.reviewer.cookie }, json: { name: "report bot" } });
    expect(made.status).toBe(201);
    const [row] = await db.select().from(schema.apiToken).where(eq(schema.apiToken.id, made.body.id));
    expect(row.tokenHash).not.toContain(made.body.token);
    expect(JSON.stringify(row)).not.toContain(made.body.token);
    expect((await callApi(sitesApi, "GET", "/api/v1/sites", { auth: { token: made.body.token } })).status).toBe(200);
    const listed = await callApi(tokensApi, "GET", "/api/v1/tokens", { auth: { cookie: a.people.reviewer.cookie } });
    expect(listed.body.tokens[0]).toMatchObject({ name: "report bot", lastUsedAt: expect.any(String) });
    expect(JSON.stringify(listed.body)).not.toContain(made.body.token);
    const revoked = await callApi(tokenApi, "DELETE", `/api/v1/tokens/${made.body.id}`, { auth: { cookie: a.people.reviewer.cookie }, params: { tokenId: made.body.id } });
    expect(revoked.status).toBe(204);
    expect((await callApi(sitesApi, "GET", "/api/v1/sites", { auth: { token: made.body.token } })).status).toBe(401);
  });

  it("refuses to make a token with a token, and another member's token id is 404", async () => {
    expect((await callApi(tokensApi, "POST", "/api/v1/tokens", { auth: { token }, json: { name: "chain" } })).status).toBe(403);
    const [mine] = await db.select().from(schema.apiToken).where(eq(schema.apiToken.memberId, a.people.engineer.memberId));
    expect((await callApi(tokenApi, "DELETE", `/api/v1/tokens/${mine.id}`, { auth: { cookie: a.people.owner.cookie }, params: { tokenId: mine.id } })).status).toBe(404);
  });
});
