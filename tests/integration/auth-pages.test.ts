// The sign-in pages tell the truth and stay on this site: redirects, confirmation,
// the check-email page and its resend, reset links checked up front, password change.
import { randomUUID } from "node:crypto";
import { eq, like } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "~/infra/db.server";
import * as account from "~/routes/account/account";
import * as checkEmail from "~/routes/auth/check-email";
import * as forgot from "~/routes/auth/forgot-password";
import * as reset from "~/routes/auth/reset-password";
import * as signIn from "~/routes/auth/sign-in";
import * as signUp from "~/routes/auth/sign-up";
import * as verified from "~/routes/auth/verified";
import { createOrg, createSession, createUser, freshIp, makeRequest, outcome, password, type Org } from "./fixtures";
import { mailsTo, waitForMail } from "./mail";

const args = (request: Request) => ({ request, params: {}, context: {} }) as never;
const text = (body: unknown) => JSON.stringify(body);

let org: Org;
beforeAll(async () => {
  org = await createOrg("pages");
});

describe("redirect after sign-in", () => {
  // Values as the hidden field carries them (the query string already decoded once).
  const hostile = [
    "/\t/evil.example/", "/%09/evil.example/", "/\nfoo", "/\r\nSet-Cookie: a=b", "//evil.example", "/\\evil.example",
    "https://evil.example", "javascript:alert(1)", "%2F%2Fevil.example", "/%2F%2Fevil.example", " /members",
  ];
  for (const redirectTo of hostile) {
    it(`goes home, not to ${JSON.stringify(redirectTo)}`, async () => {
      const got = await outcome(() => signIn.action(args(makeRequest("/sign-in", { ip: freshIp(), form: { email: org.people.engineer.email, password, redirectTo } }))));
      expect(got).toEqual({ status: 302, location: "/" });
    });
  }
  it("follows a plain path on this site", async () => {
    const got = await outcome(() => signIn.action(args(makeRequest("/sign-in", { ip: freshIp(), form: { email: org.people.engineer.email, password, redirectTo: "/account?tab=1" } }))));
    expect(got).toEqual({ status: 302, location: "/account?tab=1" });
  });
});

describe("/verified", () => {
  it("doesn't claim a session on a direct visit or a reused link", async () => {
    const got = await outcome(() => verified.loader(args(makeRequest("/verified"))));
    expect(got).toEqual({ status: 200, body: { problem: null, signedInAs: null } });
  });
  it("says who is signed in when someone is", async () => {
    const got = await outcome(() => verified.loader(args(makeRequest("/verified", { cookie: org.people.client.cookie }))));
    expect(got.body).toEqual({ problem: null, signedInAs: org.people.client.email });
  });
});

describe("/check-email", () => {
  const signUpAs = async (email: string) => {
    const response = (await signUp.action(args(makeRequest("/sign-up", { ip: freshIp(), form: { name: "Pending Person", email, password: "perfectly-fine-42", confirm: "perfectly-fine-42" } })))) as Response;
    expect(response.headers.get("location")).toBe("/check-email");
    return response.headers.get("set-cookie")!.split(";")[0];
  };
  const resend = (form: Record<string, string>, cookie?: string) =>
    outcome(() => checkEmail.action(args(makeRequest("/check-email", { ip: freshIp(), cookie, form }))));

  it("repeats nothing from the address bar", async () => {
    const got = await outcome(() => checkEmail.loader(args(makeRequest("/check-email?email=%3Cb%3EYour%20account%20is%20locked%3C%2Fb%3E"))));
    expect(got).toEqual({ status: 200, body: { email: null } });
  });

  it("names the address sign-up remembered, and resends to it", async () => {
    const email = `pending-${randomUUID()}@fixture.test`;
    const cookie = await signUpAs(email);
    expect((await outcome(() => checkEmail.loader(args(makeRequest("/check-email", { cookie }))))).body).toEqual({ email });
    await waitForMail(email, /Confirm your e-mail/);
    expect(await resend({}, cookie)).toEqual({ status: 302, location: "/check-email" });
    for (let i = 0; i < 20 && (await mailsTo(email)).length < 2; i++) await new Promise((r) => setTimeout(r, 250));
    expect((await mailsTo(email)).filter((m) => /Confirm your e-mail/.test(m.subject))).toHaveLength(2);
  });

  it("answers alike for unknown, confirmed and waiting addresses, and throttles alike", async () => {
    const waiting = `waiting-${randomUUID()}@fixture.test`;
    await createUser(waiting, "Waiting", false);
    const addresses = [`nobody-${randomUUID()}@fixture.test`, org.people.owner.email, waiting];
    for (const email of addresses) {
      const statuses = [];
      for (let i = 0; i < 5; i++) statuses.push((await resend({ email })).status);
      expect(statuses, email).toEqual([302, 302, 302, 302, 429]);
    }
  });

  it("asks for the address when there is no remembered one", async () => {
    const got = await resend({});
    expect(got.status).toBe(400);
    expect(text(got.body)).toContain("Enter the address you signed up with.");
  });
});

describe("reset links", () => {
  it("refuses a forged token before showing the form", async () => {
    const got = await outcome(() => reset.loader(args(makeRequest("/reset-password?token=forged-token-123"))));
    expect(got.status).toBe(400);
    expect(text(got.body)).toContain("expired or was already used");
  });

  it("shows the form for a live token", async () => {
    const email = `live-${randomUUID()}@fixture.test`;
    await createUser(email);
    await outcome(() => forgot.action(args(makeRequest("/forgot-password", { ip: freshIp(), form: { email } }))));
    const [user] = await db.select().from(schema.user).where(eq(schema.user.email, email));
    const rows = await db.select().from(schema.verification).where(like(schema.verification.identifier, "reset-password:%"));
    const row = rows.find((r) => r.value === user.id)!;
    const token = row.identifier.slice("reset-password:".length);
    expect(await outcome(() => reset.loader(args(makeRequest(`/reset-password?token=${token}`))))).toEqual({ status: 200, body: { token, problem: null } });
  });
});

describe("change password", () => {
  const change = (cookie: string, current: string, next: string) =>
    outcome(() => account.action(args(makeRequest("/account", { cookie, ip: freshIp(), form: { intent: "change-password", current, password: next, confirm: next } }))));

  it("refuses the current password as the new one", async () => {
    const email = `same-${randomUUID()}@fixture.test`;
    const userId = await createUser(email);
    await db.insert(schema.member).values({ id: randomUUID(), organizationId: org.id, userId, role: "engineer" });
    const got = await change(await createSession(userId), password, password);
    expect(got.status).toBe(400);
    expect(text(got.body)).toContain("Choose a password different from the current one.");
  });

  it("answers a success with an emptied form", async () => {
    const email = `changer-${randomUUID()}@fixture.test`;
    const userId = await createUser(email);
    await db.insert(schema.member).values({ id: randomUUID(), organizationId: org.id, userId, role: "engineer" });
    const hash = async () => (await db.select().from(schema.account).where(eq(schema.account.userId, userId)))[0].password;
    const before = await hash();
    const got = await change(await createSession(userId), password, "another-Pass-55");
    expect(got).toEqual({ status: 200, body: { initialValue: null } });
    expect(await hash()).not.toBe(before);
  });
});
