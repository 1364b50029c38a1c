// better-auth's own endpoints accept no more than the forms: closed where the pages don't
// need them, the forms' Zod limits where they do; and sign-up answers alike for taken addresses.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { CLIENT_ADDRESS_HEADER } from "~/infra/client-address.server";
import { db, schema } from "~/infra/db.server";
import { env } from "~/infra/env.server";
import * as apiAuth from "~/routes/api/auth";
import * as forgot from "~/routes/auth/forgot-password";
import * as signUp from "~/routes/auth/sign-up";
import { createOrg, freshIp, makeRequest, outcome, type Org } from "./fixtures";
import { mailsTo, waitForMail } from "./mail";

const args = (request: Request) => ({ request, params: {}, context: {} }) as never;
const usersWith = (email: string) => db.select().from(schema.user).where(eq(schema.user.email, email));

async function callApi(path: string, body?: unknown, init: { cookie?: string; method?: string } = {}) {
  const headers = new Headers({ "content-type": "application/json", origin: env.APP_URL, [CLIENT_ADDRESS_HEADER]: freshIp() });
  if (init.cookie) headers.set("cookie", init.cookie);
  const method = init.method ?? (body === undefined ? "GET" : "POST");
  const request = new Request(new URL(`/api/auth${path}`, env.APP_URL), { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
  const response = (method === "GET" ? await apiAuth.loader(args(request)) : await apiAuth.action(args(request))) as Response;
  const text = await response.text();
  return { status: response.status, body: (text ? JSON.parse(text) : null) as Record<string, unknown> | null };
}

const good = () => ({ name: "Nell Example", email: `api-${randomUUID()}@fixture.test`, password: "perfectly-fine-42" });

let org: Org;
beforeAll(async () => {
  org = await createOrg("api");
});

describe("closed endpoints", () => {
  it("answers 404 to update-user, and stores nothing", async () => {
    const person = org.people.engineer;
    const got = await callApi("/update-user", { name: { $ne: null } }, { cookie: person.cookie });
    expect(got.status).toBe(404);
    const [row] = await db.select().from(schema.user).where(eq(schema.user.id, person.userId));
    expect(row.name).not.toContain("[object Object]");
  });

  it("answers 404 to the other endpoints the pages don't use", async () => {
    for (const [path, body] of [
      ["/delete-user", {}], ["/change-email", { newEmail: "x@fixture.test" }], ["/revoke-sessions", {}],
      ["/organization/create", { name: "x", slug: "x" }], ["/sign-in/social", { provider: "github" }],
    ] as const) {
      expect((await callApi(path, body, { cookie: org.people.owner.cookie })).status, path).toBe(404);
    }
    for (const path of ["/list-sessions", "/list-accounts", "/organization/list-members"]) {
      expect((await callApi(path, undefined, { cookie: org.people.owner.cookie })).status, path).toBe(404);
    }
    expect((await callApi("/get-session", undefined, { cookie: org.people.owner.cookie })).status).toBe(200);
  });
});

describe("sign-up through the API", () => {
  it("refuses a 5 MB name with the limit in our words, and creates no account", async () => {
    const body = { ...good(), name: "N".repeat(5 * 1024 * 1024) };
    const got = await callApi("/sign-up/email", body);
    expect(got).toMatchObject({ status: 400, body: { code: "INVALID_INPUT", message: "name: Use at most 100 characters." } });
    expect(await usersWith(body.email)).toHaveLength(0);
  });

  it("refuses wrongly typed and unknown fields", async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ name: { $ne: null } }, "name: Send this as text."],
      [{ email: ["a@fixture.test"] }, "email: Send this as text."],
      [{ password: 1234567890123 }, "password: Send this as text."],
      [{ name: "Nell\u0000" }, "name: Use one line of ordinary characters, without control characters."],
      [{ email: `${"a".repeat(65)}@fixture.test` }, "email: Use at most 64 characters before the @."],
      [{ email: `a@${"b".repeat(250)}.test` }, "email: Use at most 254 characters."],
      [{ image: "https://evil.example/x.png" }, "Unknown field: image."],
      [{ callbackURL: "https://evil.example/" }, "callbackURL: Use a path on this site, such as /verified."],
    ];
    for (const [override, message] of cases) {
      const body = { ...good(), ...override };
      expect(await callApi("/sign-up/email", body), message).toMatchObject({ status: 400, body: { message } });
      if (typeof body.email === "string") expect(await usersWith(body.email)).toHaveLength(0);
    }
  });

  it("stores the name trimmed, as the form would", async () => {
    const body = { ...good(), name: "  Zoë <script>alert(1)</script>  " };
    expect((await callApi("/sign-up/email", body)).status).toBe(200);
    const [row] = await usersWith(body.email);
    expect(row.name).toBe("Zoë <script>alert(1)</script>");
  });

  it("answers a taken address exactly as a new one", async () => {
    const fresh = await callApi("/sign-up/email", good());
    const taken = await callApi("/sign-up/email", { ...good(), email: org.people.billing.email });
    expect(taken.status).toBe(fresh.status);
    const shape = (b: Record<string, unknown> | null) => ({ keys: Object.keys(b ?? {}).sort(), user: Object.keys((b?.user as object) ?? {}).sort(), token: b?.token });
    expect(shape(taken.body)).toEqual(shape(fresh.body));
    expect(await usersWith(org.people.billing.email)).toHaveLength(1);
  });

  it("refuses wrongly typed fields on sign-in and password reset too", async () => {
    expect(await callApi("/sign-in/email", { email: { $ne: null }, password: "x" })).toMatchObject({ status: 400, body: { message: "email: Send this as text." } });
    expect(await callApi("/request-password-reset", { email: "x".repeat(300) })).toMatchObject({ status: 400, body: { message: "email: Use at most 254 characters." } });
    expect(await callApi("/reset-password", { newPassword: "short", token: "t" })).toMatchObject({ status: 400, body: { message: "newPassword: Use at least 10 characters." } });
  });
});

describe("sign-up page with a taken address", () => {
  const post = (email: string) =>
    outcome(async () => {
      const response = (await signUp.action(args(makeRequest("/sign-up", { ip: freshIp(), form: { name: "Someone", email, password: "perfectly-fine-42", confirm: "perfectly-fine-42" } })))) as Response;
      return response;
    });

  it("answers as for a new address, and tells the owner by mail with sign-in and reset links", async () => {
    const newEmail = `new-${randomUUID()}@fixture.test`;
    const takenEmail = org.people.reviewer.email;
    const [fresh, taken] = [await post(newEmail), await post(takenEmail.toUpperCase())];
    expect(fresh).toEqual({ status: 302, location: "/check-email" });
    expect(taken).toEqual(fresh);
    expect(await usersWith(takenEmail)).toHaveLength(1);
    const warning = await waitForMail(takenEmail, /Someone tried to sign up with your address/);
    expect(warning.text).toContain(`${env.APP_URL}/sign-in`);
    expect(warning.text).toContain(`${env.APP_URL}/forgot-password`);
    await waitForMail(newEmail, /Confirm your e-mail/);
    expect((await mailsTo(takenEmail)).some((m) => /Confirm your e-mail/.test(m.subject))).toBe(false);
  });
});

describe("forgot password", () => {
  it("answers known and unknown addresses alike, and mails only the known one", async () => {
    const ask = (email: string) => outcome(() => forgot.action(args(makeRequest("/forgot-password", { ip: freshIp(), form: { email } }))));
    const known = org.people.client.email;
    const unknown = `nobody-${randomUUID()}@fixture.test`;
    const [a, b] = [await ask(known), await ask(unknown)];
    expect(a).toEqual({ status: 302, location: "/sign-in" });
    expect(b).toEqual(a);
    await waitForMail(known, /Reset your Isotrope password/);
    expect(await mailsTo(unknown)).toHaveLength(0);
  });

  it("limits reset mails per address, alike for known and unknown addresses", async () => {
    const ask = (email: string) => outcome(() => forgot.action(args(makeRequest("/forgot-password", { ip: freshIp(), form: { email } }))));
    const run = async (email: string) => {
      const out: number[] = [];
      for (let i = 0; i < 5; i++) out.push((await ask(email)).status);
      return out;
    };
    const known = org.people.regulator.email;
    expect(await run(known)).toEqual([302, 302, 302, 302, 429]);
    expect(await run(`nobody-${randomUUID()}@fixture.test`)).toEqual([302, 302, 302, 302, 429]);
  });
});
