// The signed-in member is resolved once per request: the layout and the page share one lookup.
import { RouterContextProvider } from "react-router";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { auth } from "~/features/auth/auth.server";
import { sessionMiddleware } from "~/features/auth/session-context.server";
import * as appLayout from "~/routes/app-layout";
import * as overview from "~/routes/overview";
import { createOrg, makeRequest, type Org } from "./fixtures";

let org: Org;
beforeAll(async () => {
  org = await createOrg("context");
});
afterEach(() => vi.restoreAllMocks());

type Args = { request: Request; params: Record<string, string>; context: unknown };
const load = (args: Args) => Promise.all([appLayout.loader(args as never), overview.loader(args as never)]);

describe("session lookup", () => {
  it("asks better-auth once when the root middleware ran", async () => {
    const getSession = vi.spyOn(auth.api, "getSession");
    const request = makeRequest("/", { cookie: org.people.owner.cookie });
    const context = new RouterContextProvider();
    await sessionMiddleware({ request, context, params: {}, unstable_pattern: "/" } as never, async () => new Response());
    const [layout, page] = await load({ request, params: {}, context });
    expect(getSession).toHaveBeenCalledTimes(1);
    expect(layout.data.role).toBe("owner");
    expect(page.organizationName).toBe(org.name);
  });

  it("without the middleware (loaders called directly) keeps one lookup per Request", async () => {
    const getSession = vi.spyOn(auth.api, "getSession");
    const request = makeRequest("/", { cookie: org.people.owner.cookie });
    await load({ request, params: {}, context: {} });
    expect(getSession).toHaveBeenCalledTimes(1);
    await load({ request: makeRequest("/", { cookie: org.people.owner.cookie }), params: {}, context: {} });
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
