// Builds organisations, members and sessions straight in the database, so tests skip the sign-in pages.
import { createHmac, randomBytes, randomInt, randomUUID } from "node:crypto";
import { auth } from "~/features/auth/auth.server";
import { db, schema } from "~/infra/db.server";
import { CLIENT_ADDRESS_HEADER } from "~/infra/client-address.server";
import { env } from "~/infra/env.server";
import { roles, type Role } from "~/lib/roles";

export type Person = { userId: string; memberId: string; email: string; cookie: string };
export type Org = { id: string; name: string; people: Record<Role, Person> };

export const password = "fixture-Password-9";
let passwordHash: string | undefined;

/** The cookie better-auth expects: the session token signed with HMAC-SHA-256 of the secret. */
function sessionCookie(token: string) {
  const signature = createHmac("sha256", env.BETTER_AUTH_SECRET).update(token).digest("base64");
  return `better-auth.session_token=${encodeURIComponent(`${token}.${signature}`)}`;
}

export async function createSession(userId: string) {
  const token = randomBytes(24).toString("base64url");
  await db.insert(schema.session).values({ id: randomUUID(), token, userId, expiresAt: new Date(Date.now() + 3_600_000) });
  return sessionCookie(token);
}

export async function createUser(email: string, name = "Fixture Person", emailVerified = true) {
  passwordHash ??= await (await auth.$context).password.hash(password);
  const userId = randomUUID();
  await db.insert(schema.user).values({ id: userId, name, email, emailVerified });
  await db.insert(schema.account).values({ id: randomUUID(), accountId: userId, providerId: "credential", userId, password: passwordHash });
  return userId;
}

/** One organisation with a signed-in member for every role. */
export async function createOrg(label: string): Promise<Org> {
  const id = randomUUID();
  const tag = `${label}-${id.slice(0, 8)}`;
  await db.insert(schema.organization).values({ id, name: `Org ${tag}`, slug: tag });
  const people = {} as Record<Role, Person>;
  for (const role of roles) {
    const email = `${role}.${tag}@fixture.test`;
    const userId = await createUser(email, `${role} ${tag}`);
    const memberId = randomUUID();
    await db.insert(schema.member).values({ id: memberId, organizationId: id, userId, role });
    people[role] = { userId, memberId, email, cookie: await createSession(userId) };
  }
  return { id, name: `Org ${tag}`, people };
}

let ipCounter = 0;
// Each test file loads this module afresh but shares the database's rate-limit and throttle rows,
// so every file draws its own random /16 (a fixed prefix made files reuse each other's addresses).
const ipPrefix = `${11 + randomInt(200)}.${randomInt(256)}`;
/** A distinct client address per request builder, so rate limits of different tests don't mix. */
export const freshIp = () => `${ipPrefix}.${(ipCounter >> 8) & 255}.${ipCounter++ & 255}`;

export function makeRequest(path: string, init: { cookie?: string; form?: Record<string, string>; json?: unknown; method?: string; ip?: string } = {}) {
  const headers = new Headers({ origin: env.APP_URL });
  if (init.cookie) headers.set("cookie", init.cookie);
  if (init.ip) headers.set(CLIENT_ADDRESS_HEADER, init.ip);
  if (init.json !== undefined) {
    headers.set("content-type", "application/json");
    return new Request(new URL(path, env.APP_URL), { method: init.method ?? "POST", headers, body: JSON.stringify(init.json) });
  }
  if (init.method && init.method !== "GET") return new Request(new URL(path, env.APP_URL), { method: init.method, headers });
  if (init.form) {
    headers.set("content-type", "application/x-www-form-urlencoded");
    return new Request(new URL(path, env.APP_URL), { method: "POST", headers, body: new URLSearchParams(init.form) });
  }
  return new Request(new URL(path, env.APP_URL), { headers });
}

export type Outcome = { status: number; location?: string; body?: unknown };

/** Runs a loader or action the way the router would, and reports status and redirect target. */
export async function outcome(run: () => unknown): Promise<Outcome> {
  try {
    return describeResult(await run());
  } catch (thrown) {
    return describeResult(thrown);
  }
}

function describeResult(value: unknown): Outcome {
  if (value instanceof Response) {
    return { status: value.status, location: value.headers.get("location") ?? undefined };
  }
  if (value && typeof value === "object" && "type" in value && (value as { type: string }).type === "DataWithResponseInit") {
    const d = value as unknown as { data: unknown; init: { status?: number } | null };
    return { status: d.init?.status ?? 200, body: d.data };
  }
  if (value instanceof Error) throw value;
  return { status: 200, body: value };
}
