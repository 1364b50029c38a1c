// Every route × every role: allowed, redirected to sign-in, or refused — checked on the server.
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import routeConfig from "~/routes";
import { db, schema } from "~/infra/db.server";
import { roles, type Role } from "~/lib/roles";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";

import * as account from "~/routes/account/account";
import * as apiAuth from "~/routes/api/auth";
import * as apiHealth from "~/routes/api/health";
import * as apiMe from "~/routes/api/v1/me";
import * as appLayout from "~/routes/app-layout";
import * as authLayout from "~/routes/auth/layout";
import * as checkEmail from "~/routes/auth/check-email";
import * as forgotPassword from "~/routes/auth/forgot-password";
import * as home from "~/routes/overview";
import * as invite from "~/routes/auth/invite";
import * as members from "~/routes/members/members";
import * as notFound from "~/routes/not-found";
import * as resetPassword from "~/routes/auth/reset-password";
import * as signIn from "~/routes/auth/sign-in";
import * as signOut from "~/routes/auth/sign-out";
import * as signUp from "~/routes/auth/sign-up";
import * as verified from "~/routes/auth/verified";
import * as welcome from "~/routes/welcome";

type Actor = "anonymous" | Role;
type Expect = "ok" | "sign-in" | "forbidden" | "home" | "unauthorized" | "not-found" | "signed-out" | "bad-request" | "conflict";
type Handler = (args: { request: Request; params: Record<string, string>; context: unknown }) => unknown;
type Case = { file: string; method: "loader" | "action"; path: () => string; form?: Record<string, string>; params?: () => Record<string, string>; expect: (actor: Actor) => Expect };

const staff = (actor: Actor, ok: Expect, anonymous: Expect = "sign-in") => (actor === "anonymous" ? anonymous : ok);
const ownerOnly = (actor: Actor, ok: Expect) => (actor === "anonymous" ? "sign-in" : actor === "owner" ? ok : "forbidden");
const visitorOnly = (actor: Actor) => (actor === "anonymous" ? "ok" : "home");

let org: Org;
let invitationId = "";

const modules: Record<string, Record<string, unknown>> = {
  "routes/account/account.tsx": account,
  "routes/api/auth.ts": apiAuth,
  "routes/api/health.ts": apiHealth,
  "routes/api/v1/me.ts": apiMe,
  "routes/app-layout.tsx": appLayout,
  "routes/auth/layout.tsx": authLayout,
  "routes/auth/check-email.tsx": checkEmail,
  "routes/auth/forgot-password.tsx": forgotPassword,
  "routes/overview.tsx": home,
  "routes/auth/invite.tsx": invite,
  "routes/members/members.tsx": members,
  "routes/not-found.tsx": notFound,
  "routes/auth/reset-password.tsx": resetPassword,
  "routes/auth/sign-in.tsx": signIn,
  "routes/auth/sign-out.ts": signOut,
  "routes/auth/sign-up.tsx": signUp,
  "routes/auth/verified.tsx": verified,
  "routes/welcome.tsx": welcome,
};

const cases: Case[] = [
  { file: "routes/overview.tsx", method: "loader", path: () => "/", expect: (a) => staff(a, "ok") },
  { file: "routes/account/account.tsx", method: "loader", path: () => "/account", expect: (a) => staff(a, "ok") },
  { file: "routes/account/account.tsx", method: "action", path: () => "/account", form: {}, expect: (a) => staff(a, "bad-request") },
  { file: "routes/members/members.tsx", method: "loader", path: () => "/members", expect: (a) => ownerOnly(a, "ok") },
  // An empty post passes the guard only for owners, who then get the validation error.
  { file: "routes/members/members.tsx", method: "action", path: () => "/members", form: {}, expect: (a) => ownerOnly(a, "bad-request") },
  { file: "routes/welcome.tsx", method: "loader", path: () => "/welcome", expect: (a) => staff(a, "home") },
  { file: "routes/welcome.tsx", method: "action", path: () => "/welcome", form: { name: "Another consultancy" }, expect: (a) => staff(a, "conflict") },
  { file: "routes/api/v1/me.ts", method: "loader", path: () => "/api/v1/me", expect: (a) => staff(a, "ok", "unauthorized") },
  { file: "routes/api/health.ts", method: "loader", path: () => "/api/health", expect: () => "ok" },
  { file: "routes/api/auth.ts", method: "loader", path: () => "/api/auth/get-session", expect: () => "ok" },
  { file: "routes/api/auth.ts", method: "loader", path: () => "/api/auth/organization/list-members", expect: () => "not-found" },
  { file: "routes/api/auth.ts", method: "action", path: () => "/api/auth/organization/update-member-role", form: {}, expect: () => "not-found" },
  { file: "routes/api/auth.ts", method: "action", path: () => "/api/auth/update-user", form: { name: "x" }, expect: () => "not-found" },
  { file: "routes/api/auth.ts", method: "loader", path: () => "/api/auth/list-sessions", expect: () => "not-found" },
  { file: "routes/auth/check-email.tsx", method: "loader", path: () => "/check-email", expect: () => "ok" },
  { file: "routes/auth/check-email.tsx", method: "action", path: () => "/check-email", form: {}, expect: () => "bad-request" },
  { file: "routes/auth/sign-in.tsx", method: "loader", path: () => "/sign-in", expect: visitorOnly },
  { file: "routes/auth/sign-up.tsx", method: "loader", path: () => "/sign-up", expect: visitorOnly },
  { file: "routes/auth/sign-in.tsx", method: "action", path: () => "/sign-in", form: { email: "not-an-address" }, expect: () => "bad-request" },
  { file: "routes/auth/sign-up.tsx", method: "action", path: () => "/sign-up", form: { email: "x" }, expect: () => "bad-request" },
  { file: "routes/auth/forgot-password.tsx", method: "action", path: () => "/forgot-password", form: { email: "x" }, expect: () => "bad-request" },
  // A token better-auth never issued is refused before the form shows.
  { file: "routes/auth/reset-password.tsx", method: "loader", path: () => "/reset-password?token=abc", expect: () => "bad-request" },
  { file: "routes/auth/reset-password.tsx", method: "loader", path: () => "/reset-password", expect: () => "bad-request" },
  { file: "routes/auth/reset-password.tsx", method: "action", path: () => "/reset-password", form: { token: "abc" }, expect: () => "bad-request" },
  { file: "routes/auth/verified.tsx", method: "loader", path: () => "/verified", expect: () => "ok" },
  { file: "routes/auth/verified.tsx", method: "loader", path: () => "/verified?error=INVALID_TOKEN", expect: () => "bad-request" },
  { file: "routes/auth/invite.tsx", method: "loader", path: () => `/invite/${invitationId}`, params: () => ({ invitationId }), expect: () => "ok" },
  { file: "routes/auth/invite.tsx", method: "loader", path: () => "/invite/nope", params: () => ({ invitationId: "nope" }), expect: () => "not-found" },
  // Signed-in members are not the invitee: refused; a visitor's empty form is a validation error.
  { file: "routes/auth/invite.tsx", method: "action", path: () => `/invite/${invitationId}`, form: {}, params: () => ({ invitationId }), expect: (a) => (a === "anonymous" ? "bad-request" : "forbidden") },
  { file: "routes/auth/sign-out.ts", method: "loader", path: () => "/sign-out", expect: () => "home" },
  { file: "routes/not-found.tsx", method: "loader", path: () => "/no-such-page", expect: () => "not-found" },
  { file: "routes/app-layout.tsx", method: "loader", path: () => "/", expect: () => "ok" },
  { file: "routes/auth/layout.tsx", method: "loader", path: () => "/sign-in", expect: () => "ok" },
  // Last: signing out revokes the fixture sessions.
  { file: "routes/auth/sign-out.ts", method: "action", path: () => "/sign-out", form: {}, expect: () => "signed-out" },
];

// Pages with no loader or action of their own (static text).
const staticPages: string[] = [];

function matches(expected: Expect, got: { status: number; location?: string }) {
  switch (expected) {
    case "ok": return got.status === 200;
    case "sign-in": return got.status === 302 && got.location?.startsWith("/sign-in") === true;
    case "home": return got.status === 302 && got.location === "/";
    case "signed-out": return got.status === 302 && got.location === "/sign-in";
    case "forbidden": return got.status === 403;
    case "unauthorized": return got.status === 401;
    case "not-found": return got.status === 404;
    case "bad-request": return got.status === 400;
    case "conflict": return got.status === 409;
  }
}

beforeAll(async () => {
  org = await createOrg("access");
  invitationId = randomUUID();
  await db.insert(schema.invitation).values({
    id: invitationId, organizationId: org.id, email: `invitee-${invitationId}@fixture.test`, role: "engineer",
    status: "pending", expiresAt: new Date(Date.now() + 86_400_000), inviterId: org.people.owner.userId,
  });
});

describe("route × role", () => {
  it("covers every route file listed in app/routes.ts", () => {
    const files = new Set<string>();
    const walk = (entries: { file: string; children?: unknown[] }[]) => {
      for (const entry of entries) {
        files.add(entry.file);
        if (entry.children) walk(entry.children as { file: string; children?: unknown[] }[]);
      }
    };
    walk(routeConfig as { file: string; children?: unknown[] }[]);
    const covered = new Set([...cases.map((c) => c.file), ...staticPages]);
    expect([...files].filter((f) => !covered.has(f))).toEqual([]);
    for (const file of staticPages) expect(modules[file]).not.toHaveProperty("loader");
  });

  const actors: Actor[] = ["anonymous", ...roles];
  for (const c of cases) {
    it(`${c.form ? "POST" : "GET"} ${c.path().replace(/\/invite\/$/, "/invite/:id")} → ${c.file} ${c.method}`, async () => {
      const handler = modules[c.file][c.method] as Handler | undefined;
      expect(handler, `${c.file} has a ${c.method}`).toBeTypeOf("function");
      const results: Record<string, string> = {};
      const wanted: Record<string, string> = {};
      for (const actor of actors) {
        const cookie = actor === "anonymous" ? undefined : org.people[actor].cookie;
        const request = makeRequest(c.path(), { cookie, form: c.form });
        const got = await outcome(() => handler!({ request, params: c.params?.() ?? {}, context: {} }));
        const expected = c.expect(actor);
        wanted[actor] = expected;
        results[actor] = matches(expected, got) ? expected : `${got.status} ${got.location ?? ""}`.trim();
      }
      expect(results).toEqual(wanted);
    });
  }
});
