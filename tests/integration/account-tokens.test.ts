// API tokens on the Account page: made (shown once), listed with their last use, revoked.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import * as account from "~/routes/account/account";
import * as sitesApi from "~/routes/api/v1/sites";
import { callApi } from "./api-client";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";

let org: Org;
const post = (cookie: string, form: Record<string, string>) => outcome(() => account.action({ request: makeRequest("/account", { cookie, form }), params: {}, context: {} } as never));
const load = async (cookie: string) => (await account.loader({ request: makeRequest("/account", { cookie }), params: {}, context: {} } as never)) as { tokens: { id: string; name: string; lastUsedAt: Date | null }[] };

beforeAll(async () => {
  org = await createOrg("tokens-page");
});

describe("tokens on the Account page", () => {
  it("makes a token shown once, lists it with its last use after a call, and revokes it", async () => {
    const made = await post(org.people.billing.cookie, { intent: "create-token", name: "ledger export" });
    expect(made.status).toBe(200);
    const value = (made.body as { token: { value: string } }).token.value;
    expect(value).toMatch(/^iso_/);
    let listed = await load(org.people.billing.cookie);
    expect(listed.tokens.map((t) => t.name)).toEqual(["ledger export"]);
    expect(listed.tokens[0].lastUsedAt).toBeNull();
    expect(JSON.stringify(listed)).not.toContain(value);

    expect((await callApi(sitesApi, "GET", "/api/v1/sites", { auth: { token: value } })).status).toBe(200);
    listed = await load(org.people.billing.cookie);
    expect(listed.tokens[0].lastUsedAt).not.toBeNull();

    const revoked = await post(org.people.billing.cookie, { intent: "revoke-token", tokenId: listed.tokens[0].id });
    expect(revoked.status).toBe(200);
    expect((await load(org.people.billing.cookie)).tokens).toEqual([]);
    expect((await callApi(sitesApi, "GET", "/api/v1/sites", { auth: { token: value } })).status).toBe(401);
  });

  it("refuses an empty name and another member's token, writing nothing", async () => {
    const empty = await post(org.people.engineer.cookie, { intent: "create-token", name: "" });
    expect(empty.status).toBe(400);
    expect(await db.select().from(schema.apiToken).where(eq(schema.apiToken.memberId, org.people.engineer.memberId))).toHaveLength(0);
    await post(org.people.engineer.cookie, { intent: "create-token", name: "mine" });
    const [mine] = await db.select().from(schema.apiToken).where(eq(schema.apiToken.memberId, org.people.engineer.memberId));
    expect((await post(org.people.reviewer.cookie, { intent: "revoke-token", tokenId: mine.id })).status).toBe(404);
    expect(await db.select().from(schema.apiToken).where(eq(schema.apiToken.id, mine.id))).toHaveLength(1);
  });
});
