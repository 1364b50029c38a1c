// Password guessing is throttled per account and per account + client address, so rotating
// addresses doesn't help, and one client's failures never lock out other members.
// The clock is frozen (Date only) so that a one-second lock can't run out between two attempts.
import { randomUUID } from "node:crypto";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { policies } from "~/features/auth/throttle-policy";
import { takeAttempt, throttleKeys } from "~/features/auth/throttle.server";
import { CLIENT_ADDRESS_HEADER } from "~/infra/client-address.server";
import { env } from "~/infra/env.server";
import * as apiAuth from "~/routes/api/auth";
import * as account from "~/routes/account/account";
import * as signIn from "~/routes/auth/sign-in";
import { createOrg, createUser, freshIp, makeRequest, outcome, password } from "./fixtures";

const args = (request: Request) => ({ request, params: {}, context: {} }) as never;
const wrong = "not-the-Password-1";

const signInPage = (email: string, pass: string, ip?: string) =>
  outcome(() => signIn.action(args(makeRequest("/sign-in", { ip, form: { email, password: pass } }))));

async function signInApi(email: string, pass: string, ip?: string) {
  const headers = new Headers({ "content-type": "application/json", origin: env.APP_URL });
  if (ip) headers.set(CLIENT_ADDRESS_HEADER, ip);
  const request = new Request(new URL("/api/auth/sign-in/email", env.APP_URL), { method: "POST", headers, body: JSON.stringify({ email, password: pass }) });
  const response = (await apiAuth.action(args(request))) as Response;
  return { status: response.status, body: (await response.json()) as { code?: string; message?: string }, retryAfter: response.headers.get("retry-after") };
}

/** Spends an account's free failures straight in the throttle (the first test does it through the pages). */
async function usedUpFreeAttempts(email: string) {
  for (let i = 0; i < policies.account.free; i++) {
    expect(await takeAttempt([{ key: throttleKeys.account(email), policy: policies.account }])).toBe(0);
  }
}

let clock = Date.now();
const advance = (seconds: number) => {
  clock += seconds * 1000;
  vi.setSystemTime(clock);
};
beforeEach(() => {
  clock = Date.now();
  vi.useFakeTimers({ toFake: ["Date"], now: clock });
});
afterEach(() => vi.useRealTimers());

describe("sign-in throttle", () => {
  it("still slows guessing when every attempt comes from a new client address, on the page and the API alike", async () => {
    const email = `rotated-${randomUUID()}@fixture.test`;
    await createUser(email);
    const statuses: number[] = [];
    for (let i = 0; i < policies.account.free + 1; i++) statuses.push((await signInPage(email, wrong, freshIp())).status);
    expect(statuses.every((s) => s === 400)).toBe(true);
    // The account is now locked for a second, from any address, for the right password too.
    const page = await signInPage(email, password, freshIp());
    expect(page.status).toBe(429);
    expect(JSON.stringify(page.body)).toContain("Too many failed attempts. Wait 1 second, then try again.");
    const api = await signInApi(email, password, freshIp());
    expect(api).toMatchObject({ status: 429, body: { code: "TOO_MANY_ATTEMPTS" }, retryAfter: "1" });
    // Once the delay has passed the right password works, and the next lock would be longer.
    advance(2);
    expect(await signInPage(email, password, freshIp())).toMatchObject({ status: 302, location: "/" });
  });

  it("throttles an address that has no account exactly like one that has", async () => {
    const known = `known-${randomUUID()}@fixture.test`;
    const unknown = `unknown-${randomUUID()}@fixture.test`;
    await createUser(known);
    const run = async (email: string) => {
      await usedUpFreeAttempts(email);
      const out: number[] = [];
      for (let i = 0; i < 3; i++) out.push((await signInApi(email, wrong, freshIp())).status);
      return out;
    };
    expect(await run(known)).toEqual([401, 429, 429]);
    expect(await run(unknown)).toEqual([401, 429, 429]);
  });

  it("lets other members sign in from the guessing client's own address right after", async () => {
    const org = await createOrg("throttle");
    const victim = org.people.engineer.email;
    const ip = freshIp();
    await usedUpFreeAttempts(victim);
    expect((await signInApi(victim, wrong, ip)).status).toBe(401);
    expect((await signInApi(victim, wrong, ip)).status).toBe(429);
    expect((await signInApi(victim, password, freshIp())).status).toBe(429);
    expect(await signInPage(org.people.reviewer.email, password, ip)).toMatchObject({ status: 302, location: "/" });
    expect(await signInPage(org.people.billing.email, password, freshIp())).toMatchObject({ status: 302, location: "/" });
  });

  it("keeps letting the owner in from an address they signed in from before", async () => {
    const email = `owner-${randomUUID()}@fixture.test`;
    await createUser(email);
    const home = freshIp();
    expect((await signInPage(email, password, home)).status).toBe(302);
    await usedUpFreeAttempts(email);
    expect((await signInApi(email, wrong, freshIp())).status).toBe(401);
    expect((await signInApi(email, password, freshIp())).status).toBe(429);
    expect(await signInPage(email, password, home)).toMatchObject({ status: 302, location: "/" });
  });

  it("locks one account from one client address after five failures, and a success clears it", async () => {
    const email = `pair-${randomUUID()}@fixture.test`;
    const ip = freshIp();
    const take = () => takeAttempt([{ key: throttleKeys.accountFromAddress(email, ip), policy: policies.accountFromAddress }]);
    const waits = [];
    for (let i = 0; i < 7; i++) waits.push(await take());
    expect(waits).toEqual([0, 0, 0, 0, 0, 0, 1]);
    advance(1.5);
    expect(await take()).toBe(0);
    expect(await take()).toBe(2);
  });
});

describe("change-password throttle", () => {
  it("slows guessing of the current password from rotating addresses", async () => {
    const org = await createOrg("change");
    const person = org.people.owner;
    const change = (current: string) =>
      outcome(() =>
        account.action(args(makeRequest("/account", { cookie: person.cookie, ip: freshIp(), form: { intent: "change-password", current, password: "another-Pass-55", confirm: "another-Pass-55" } }))),
      );
    await usedUpFreeAttempts(person.email);
    expect((await change(wrong)).status).toBe(400);
    const locked = await change(password);
    expect(locked.status).toBe(429);
    expect(JSON.stringify(locked.body)).toContain("Too many failed attempts.");
  });
});
