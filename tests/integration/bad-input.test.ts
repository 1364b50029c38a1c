// Bad input gets a clear message and a 4xx, and nothing is written.
import { randomUUID } from "node:crypto";
import { createEmailVerificationToken } from "better-auth/api";
import { and, eq, like } from "drizzle-orm";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { db, schema } from "~/infra/db.server";
import { env } from "~/infra/env.server";
import * as account from "~/routes/account/account";
import * as apiAuth from "~/routes/api/auth";
import * as forgot from "~/routes/auth/forgot-password";
import * as invite from "~/routes/auth/invite";
import * as members from "~/routes/members/members";
import * as reset from "~/routes/auth/reset-password";
import * as signIn from "~/routes/auth/sign-in";
import * as signUp from "~/routes/auth/sign-up";
import * as verified from "~/routes/auth/verified";
import { createOrg, createSession, createUser, freshIp, makeRequest, outcome, password, type Org } from "./fixtures";

const args = (request: Request, params: Record<string, string> = {}) => ({ request, params, context: {} }) as never;
const usersWith = (email: string) => db.select().from(schema.user).where(eq(schema.user.email, email));
const message = (body: unknown) => JSON.stringify(body);

let org: Org;
beforeAll(async () => {
  org = await createOrg("bad");
});

describe("sign-up", () => {
  it("refuses a weak password with the rule, and creates no account", async () => {
    const email = `weak-${randomUUID()}@fixture.test`;
    const got = await outcome(() => signUp.action(args(makeRequest("/sign-up", { ip: freshIp(), form: { name: "Weak", email, password: "abcdefghij", confirm: "abcdefghij" } }))));
    expect(got.status).toBe(400);
    expect(message(got.body)).toContain("Mix letters with digits or symbols.");
    expect(await usersWith(email)).toHaveLength(0);
  });

  it("answers a taken e-mail exactly as a new one (no tell-tale 409), and adds no second account", async () => {
    const got = await outcome(() =>
      signUp.action(args(makeRequest("/sign-up", { ip: freshIp(), form: { name: "Dup", email: org.people.engineer.email.toUpperCase(), password: "perfectly-fine-42", confirm: "perfectly-fine-42" } }))),
    );
    expect(got).toEqual({ status: 302, location: "/check-email" });
    expect(await usersWith(org.people.engineer.email)).toHaveLength(1);
  });

  it("refuses passwords that differ", async () => {
    const email = `differ-${randomUUID()}@fixture.test`;
    const got = await outcome(() => signUp.action(args(makeRequest("/sign-up", { ip: freshIp(), form: { name: "Differ", email, password: "perfectly-fine-42", confirm: "perfectly-fine-43" } }))));
    expect(got.status).toBe(400);
    expect(message(got.body)).toContain("The two passwords differ.");
    expect(await usersWith(email)).toHaveLength(0);
  });
});

describe("members form", () => {
  const post = (form: Record<string, string>) => outcome(() => members.action(args(makeRequest("/members", { cookie: org.people.owner.cookie, form }))));

  it("refuses a malformed invitation and writes no invitation", async () => {
    const got = await post({ intent: "invite", email: "not-an-address", role: "emperor" });
    expect(got.status).toBe(400);
    expect(message(got.body)).toContain("Enter a valid e-mail address.");
    expect(await db.select().from(schema.invitation).where(eq(schema.invitation.organizationId, org.id))).toHaveLength(0);
  });

  it("refuses an unknown intent", async () => {
    expect((await post({ intent: "promote-everyone" })).status).toBe(400);
  });

  it("refuses to invite an existing member", async () => {
    const got = await post({ intent: "invite", email: org.people.billing.email, role: "engineer" });
    expect(got.status).toBe(409);
    expect(message(got.body)).toContain("already a member");
    expect(await db.select().from(schema.invitation).where(eq(schema.invitation.organizationId, org.id))).toHaveLength(0);
  });
});

async function requestReset(email: string) {
  const got = await outcome(() => forgot.action(args(makeRequest("/forgot-password", { ip: freshIp(), form: { email } }))));
  expect(got.status).toBe(302);
}

describe("password reset links", () => {
  async function issue(email: string) {
    const before = new Set((await db.select().from(schema.verification)).map((r) => r.id));
    await requestReset(email);
    const after = await db.select().from(schema.verification).where(like(schema.verification.identifier, "reset-password:%"));
    const fresh = after.filter((r) => !before.has(r.id));
    expect(fresh).toHaveLength(1);
    return fresh[0];
  }
  const resetWith = (token: string, newPassword: string) =>
    outcome(() => reset.action(args(makeRequest("/reset-password", { ip: freshIp(), form: { token, password: newPassword, confirm: newPassword } }))));
  const passwordHashOf = async (userId: string) =>
    (await db.select().from(schema.account).where(and(eq(schema.account.userId, userId), eq(schema.account.providerId, "credential"))))[0].password;

  it("refuses an expired link and leaves the password alone", async () => {
    const email = `expired-${randomUUID()}@fixture.test`;
    const userId = await createUser(email);
    const before = await passwordHashOf(userId);
    const row = await issue(email);
    await db.update(schema.verification).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(schema.verification.id, row.id));
    const got = await resetWith(row.identifier.slice("reset-password:".length), "brand-new-Pass-1");
    expect(got.status).toBe(400);
    expect(message(got.body)).toContain("expired or was already used");
    expect(await passwordHashOf(userId)).toBe(before);
  });

  it("accepts a link once and refuses it the second time", async () => {
    const email = `reuse-${randomUUID()}@fixture.test`;
    const userId = await createUser(email);
    const row = await issue(email);
    const token = row.identifier.slice("reset-password:".length);
    expect(await resetWith(token, "brand-new-Pass-2")).toMatchObject({ status: 302, location: "/sign-in" });
    const changed = await passwordHashOf(userId);
    const again = await resetWith(token, "brand-new-Pass-3");
    expect(again.status).toBe(400);
    expect(await passwordHashOf(userId)).toBe(changed);
  });
});

describe("e-mail confirmation links", () => {
  it("refuses an expired link: the address stays unconfirmed and the page says why", async () => {
    const email = `unconfirmed-${randomUUID()}@fixture.test`;
    const userId = await createUser(email, "Unconfirmed", false);
    const token = await createEmailVerificationToken(env.BETTER_AUTH_SECRET, email, undefined, -60, { userId });
    const response = (await apiAuth.loader(args(makeRequest(`/api/auth/verify-email?token=${token}&callbackURL=/verified`)))) as Response;
    expect(response.status).toBe(302);
    const location = response.headers.get("location") ?? "";
    expect(location).toMatch(/\/verified\?error=/);
    const [row] = await usersWith(email);
    expect(row.emailVerified).toBe(false);
    const page = await outcome(() => verified.loader(args(makeRequest(location))));
    expect(page.status).toBe(400);
    expect(message(page.body)).toMatch(/expired|not valid/);
  });
});

describe("invitations", () => {
  async function invitation(overrides: Partial<typeof schema.invitation.$inferInsert> = {}) {
    const id = randomUUID();
    const email = `invitee-${id}@fixture.test`;
    await db.insert(schema.invitation).values({
      id, organizationId: org.id, email, role: "engineer", status: "pending",
      expiresAt: new Date(Date.now() + 86_400_000), inviterId: org.people.owner.userId, ...overrides,
    });
    return { id, email: overrides.email ?? email };
  }
  const accept = (id: string) =>
    outcome(() => invite.action(args(makeRequest(`/invite/${id}`, { ip: freshIp(), form: { name: "New Person", password: "joining-Pass-8", confirm: "joining-Pass-8" } }), { invitationId: id })));

  it("refuses an expired invitation and creates no account", async () => {
    const inv = await invitation({ expiresAt: new Date(Date.now() - 1000) });
    const page = await outcome(() => invite.loader(args(makeRequest(`/invite/${inv.id}`), { invitationId: inv.id })));
    expect(page.status).toBe(410);
    expect(message(page.body)).toContain("expired");
    expect((await accept(inv.id)).status).toBe(410);
    expect(await usersWith(inv.email)).toHaveLength(0);
  });

  it("accepts once, then refuses the same link", async () => {
    const inv = await invitation();
    const first = await accept(inv.id);
    expect(first).toMatchObject({ status: 302, location: "/" });
    const [created] = await usersWith(inv.email);
    expect(created.emailVerified).toBe(true);
    const memberships = await db.select().from(schema.member).where(eq(schema.member.userId, created.id));
    expect(memberships.map((m) => [m.organizationId, m.role])).toEqual([[org.id, "engineer"]]);
    expect((await accept(inv.id)).status).toBe(410);
    expect(await usersWith(inv.email)).toHaveLength(1);
  });

  it("lets a signed-in person with the invited address join, and no one else", async () => {
    const other = await createOrg("joiner");
    const inv = await invitation({ email: other.people.billing.email, role: "reviewer" });
    const stranger = await outcome(() => invite.action(args(makeRequest(`/invite/${inv.id}`, { cookie: other.people.engineer.cookie, form: {} }), { invitationId: inv.id })));
    expect(stranger.status).toBe(403);
    const joined = await outcome(() => invite.action(args(makeRequest(`/invite/${inv.id}`, { cookie: other.people.billing.cookie, form: {} }), { invitationId: inv.id })));
    expect(joined).toMatchObject({ status: 302, location: "/" });
    const memberships = await db.select().from(schema.member).where(eq(schema.member.userId, other.people.billing.userId));
    expect(memberships.map((m) => [m.organizationId, m.role]).sort()).toEqual([[org.id, "reviewer"], [other.id, "billing"]].sort());
  });

  it("writes nothing when the invitee's address already has an account", async () => {
    const inv = await invitation({ email: org.people.client.email });
    const got = await accept(inv.id);
    expect(got.status).toBe(409);
    const [row] = await db.select().from(schema.invitation).where(eq(schema.invitation.id, inv.id));
    expect(row.status).toBe("pending");
    expect(await usersWith(org.people.client.email)).toHaveLength(1);
  });
});

describe("account", () => {
  const change = (cookie: string, current: string) =>
    outcome(() => account.action(args(makeRequest("/account", { cookie, ip: freshIp(), form: { intent: "change-password", current, password: "another-Pass-55", confirm: "another-Pass-55" } }))));
  const hashOf = async (userId: string) => (await db.select().from(schema.account).where(eq(schema.account.userId, userId)))[0].password;

  it("refuses a wrong current password and keeps the old one", async () => {
    const member = org.people.reviewer;
    const before = await hashOf(member.userId);
    const wrong = await change(member.cookie, "not-my-password-1");
    expect(wrong.status).toBe(400);
    expect(message(wrong.body)).toContain("current password is not right");
    expect(await hashOf(member.userId)).toBe(before);
  });

  it("sends a signed-in user without an organisation to /welcome before anything else", async () => {
    const userId = await createUser(`loner-${randomUUID()}@fixture.test`);
    const got = await change(await createSession(userId), password);
    expect(got).toMatchObject({ status: 302, location: "/welcome" });
  });
});

describe("sign-in", () => {
  it("is rate-limited per client address", async () => {
    const ip = freshIp();
    const attempt = () => outcome(() => signIn.action(args(makeRequest("/sign-in", { ip, form: { email: org.people.engineer.email, password: "wrong-password-1" } }))));
    const statuses: number[] = [];
    for (let i = 0; i < env.SIGN_IN_LIMIT + 1; i++) statuses.push((await attempt()).status);
    expect(statuses.slice(0, env.SIGN_IN_LIMIT).every((s) => s === 400)).toBe(true);
    const last = statuses[env.SIGN_IN_LIMIT];
    expect(last).toBe(429);
    // Another address is unaffected and signs in with the right password.
    const ok = await outcome(() => signIn.action(args(makeRequest("/sign-in", { ip: freshIp(), form: { email: org.people.engineer.email, password } }))));
    expect(ok).toMatchObject({ status: 302, location: "/" });
  });
});

describe("health", () => {
  it("answers 503 with the database down when PostgreSQL is unreachable", async () => {
    vi.resetModules();
    const saved = process.env.DATABASE_URL;
    const cache = globalThis as { isotropeSql?: unknown };
    const connection = cache.isotropeSql;
    delete cache.isotropeSql; // db.server.ts keeps one connection pool per process
    process.env.DATABASE_URL = "postgres://nobody@127.0.0.1:9/none";
    try {
      const health = await import("~/routes/api/health");
      const response = (await health.loader()) as Response;
      expect(response.status).toBe(503);
      expect(await response.json()).toEqual({ status: "degraded", database: "down" });
    } finally {
      process.env.DATABASE_URL = saved;
      cache.isotropeSql = connection;
      vi.resetModules();
    }
  });

  it("answers ok when it is up", async () => {
    const health = await import("~/routes/api/health");
    const response = (await health.loader()) as Response;
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ status: "ok", database: "ok" });
  });
});

