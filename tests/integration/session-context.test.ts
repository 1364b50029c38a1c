// The signed-in member is resolved once per request: the layout and the page share one lookup.
import { RouterContextProvider } from "react-router";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { auth } from "~/features/auth/auth.server";
import { sessionMiddleware } from "~/features/auth/session-context.server";
import * as appLayout from "~/routes/app-layout";
import * as overview from "~/routes/overview";
import { createOrg, createSession, makeRequest, type Org } from "./fixtures";

let org: Org;
beforeAll(async () => {
  org = await createOrg("context");
});
afterEach(() => vi.restoreAllMocks());

type Args = { request: Request; params: Record<string, string>; context: unknown };
const load = (args: Args) => Promise.all([appLayout.loader(args as never), overview.loader(args as never)]);

// Fixture sessions are due for better-auth's sliding refresh, so these lookups go through
// better-auth (fast-session.test.ts covers the one-query read); each test takes a new session,
// as better-auth's refresh would otherwise make the next read a fast one.
const ownerCookie = () => createSession(org.people.owner.userId);

describe("session lookup", () => {
  it("asks better-auth once when the root middleware ran", async () => {
    const getSession = vi.spyOn(auth.api, "getSession");
    const request = makeRequest("/", { cookie: await ownerCookie() });
    const context = new RouterContextProvider();
    await sessionMiddleware({ request, context, params: {}, unstable_pattern: "/" } as never, async () => new Response());
    const [layout, page] = await load({ request, params: {}, context });
    expect(getSession).toHaveBeenCalledTimes(1);
    expect(layout.data.role).toBe("owner");
    expect(page.organizationName).toBe(org.name);
  });

  it("without the middleware (loaders called directly) keeps one lookup per Request", async () => {
    const getSession = vi.spyOn(auth.api, "getSession");
    const request = makeRequest("/", { cookie: await ownerCookie() });
    await load({ request, params: {}, context: {} });
    expect(getSession).toHaveBeenCalledTimes(1);
    await load({ request: makeRequest("/", { cookie: await ownerCookie() }), params: {}, context: {} });
    expect(getSession).toHaveBeenCalledTimes(2);
  });

  it("never lets one request see another's member", async () => {
    const context = new RouterContextProvider();
    const request = makeRequest("/", { cookie: org.people.billing.cookie });
    await sessionMiddleware({ request, context, params: {}, unstable_pattern: "/" } as never, async () => new Response());
    const other = await overview.loader({ request: makeRequest("/", { cookie: org.people.engineer.cookie }), params: {}, context: new RouterContextProvider() } as never);
    const mine = await overview.loader({ request, params: {}, context } as never);
    expect([mine.role, other.role]).toEqual(["billing", "engineer"]);
  });
});
