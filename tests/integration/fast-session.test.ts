// The one-query session read agrees with better-auth's get-session wherever it answers, and
// hands every other case to better-auth (expired, due for refresh, forged, revoked).
import { createHmac, randomBytes, randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { auth } from "~/features/auth/auth.server";
import { cookieValue, readSessionFast, verifiedToken } from "~/features/auth/fast-session.server";
import { findMembership, sessionLookup } from "~/features/auth/session-context.server";
import { db, schema } from "~/infra/db.server";
import { env } from "~/infra/env.server";
import { createOrg, type Org } from "./fixtures";

let org: Org;
beforeAll(async () => {
  org = await createOrg("fast-session");
});
afterEach(() => vi.restoreAllMocks());

const day = 86_400_000;
const sign = (token: string) => createHmac("sha256", env.BETTER_AUTH_SECRET).update(token).digest("base64");
const headersFor = (cookie: string) => new Headers({ cookie });

/** A session of the owner expiring `ms` from now; returns its token and cookie. */
async function sessionExpiringIn(ms: number, userId = org.people.owner.userId) {
  const token = randomBytes(24).toString("base64url");
  await db.insert(schema.session).values({ id: randomUUID(), token, userId, expiresAt: new Date(Date.now() + ms), activeOrganizationId: org.id });
  return { token, cookie: `theme=paper; better-auth.session_token=${encodeURIComponent(`${token}.${sign(token)}`)}` };
}

describe("reading the session in one query", () => {
  it("gives what better-auth gives for a fresh session, and the same membership", async () => {
    const { cookie } = await sessionExpiringIn(7 * day - 60_000);
    const fast = await readSessionFast(headersFor(cookie));
    const theirs = await auth.api.getSession({ headers: headersFor(cookie) });
    expect(fast).toBeDefined();
    expect(fast!.signedIn).toEqual(theirs);
    expect(fast!.membership).toEqual(await findMembership(org.people.owner.userId, org.id));
    expect(fast!.membership?.role).toBe("owner");
  });

  it("lets the page's lookup skip better-auth in that case", async () => {
    const { cookie } = await sessionExpiringIn(7 * day - 60_000);
    const getSession = vi.spyOn(auth.api, "getSession");
    const lookup = sessionLookup(new Request("http://app.test/", { headers: headersFor(cookie) }));
    expect((await lookup.signedIn())?.user.id).toBe(org.people.owner.userId);
    expect((await lookup.membership())?.organizationId).toBe(org.id);
    expect(getSession).not.toHaveBeenCalled();
  });

  it("hands a session due for its sliding refresh to better-auth, which extends it", async () => {
    const { token, cookie } = await sessionExpiringIn(3_600_000);
    expect(await readSessionFast(headersFor(cookie))).toBeUndefined();
    const signedIn = await sessionLookup(new Request("http://app.test/", { headers: headersFor(cookie) })).signedIn();
    expect(signedIn?.user.id).toBe(org.people.owner.userId);
    const [row] = await db.select().from(schema.session).where(eq(schema.session.token, token));
    expect(row.expiresAt.getTime()).toBeGreaterThan(Date.now() + 6 * day);
  });

  it("signs out an expired, a revoked or a forged session (through better-auth)", async () => {
    const expired = await sessionExpiringIn(-60_000);
    const revoked = await sessionExpiringIn(7 * day - 60_000);
    await db.delete(schema.session).where(eq(schema.session.token, revoked.token));
    const forgedToken = revoked.token.replace(/^./, (c) => (c === "A" ? "B" : "A"));
    const forged = `better-auth.session_token=${encodeURIComponent(`${forgedToken}.${sign(revoked.token)}`)}`;
    for (const cookie of [expired.cookie, revoked.cookie, forged, "better-auth.session_token=no-signature"]) {
      expect(await readSessionFast(headersFor(cookie))).toBeUndefined();
      expect(await sessionLookup(new Request("http://app.test/", { headers: headersFor(cookie) })).signedIn()).toBeNull();
    }
  });

  it("answers signed out at once without any of its cookies, and defers to better-auth with its other cookies", async () => {
    expect(await readSessionFast(new Headers())).toEqual({ signedIn: null, membership: null });
    expect(await readSessionFast(headersFor("theme=paper"))).toEqual({ signedIn: null, membership: null });
    expect(await readSessionFast(headersFor("better-auth.dont_remember=x.y"))).toBeUndefined();
  });

  it("reads cookie values and signatures strictly", () => {
    expect(cookieValue("a=1; b=%3D2; c", "b")).toBe("=2");
    expect(cookieValue('a="q%20r"', "a")).toBe("q r");
    expect(cookieValue("a=%E0%A4%A", "a")).toBeNull();
    expect(cookieValue("ab=1", "a")).toBeNull();
    expect(verifiedToken(`tok.${sign("tok")}`, env.BETTER_AUTH_SECRET)).toBe("tok");
    expect(verifiedToken(`tok.${sign("tok")}`, "another-secret-of-enough-length-0123456789")).toBeNull();
    expect(verifiedToken(`.${sign("")}`, env.BETTER_AUTH_SECRET)).toBeNull();
  });
});
