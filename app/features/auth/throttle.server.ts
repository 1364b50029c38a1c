// Throttles for password guessing and mail flooding, kept in PostgreSQL (login_throttle) so
// every app server sees the same counts. Keys hash the e-mail address, so an address with no
// account is throttled exactly like one with an account. Rules: throttle-policy.ts.
import { createHash } from "node:crypto";
import { and, asc, eq, inArray, isNull, lt, or } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { KNOWN_ADDRESS_SECONDS, nextAttempt, policies, type Policy } from "./throttle-policy";

const { loginThrottle } = schema;

const addressHash = (email: string) => createHash("sha256").update(email.trim().toLowerCase()).digest("hex");

export const throttleKeys = {
  account: (email: string) => `acct:${addressHash(email)}`,
  accountFromAddress: (email: string, client: string) => `acct-ip:${addressHash(email)}:${client}`,
  resetFromAddress: (client: string) => `reset-ip:${client}`,
  mailsTo: (kind: "reset" | "confirm", email: string) => `mail-${kind}:${addressHash(email)}`,
};

export type Take = { key: string; policy: Policy };

/**
 * Counts one attempt on every key, all or none. Returns 0 when the attempt may go ahead, or the
 * seconds to wait when a key is locked (and then counts nothing). Row locks make concurrent
 * attempts queue, so a burst of parallel guesses is counted one by one.
 */
export async function takeAttempt(takes: Take[]): Promise<number> {
  const sorted = [...takes].sort((a, b) => a.key.localeCompare(b.key));
  const keys = sorted.map((t) => t.key);
  const wait = await db.transaction(async (tx) => {
    const now = new Date();
    await tx.insert(loginThrottle).values(keys.map((key) => ({ key, failures: 0, updatedAt: now }))).onConflictDoNothing();
    const rows = await tx.select().from(loginThrottle).where(inArray(loginThrottle.key, keys)).orderBy(asc(loginThrottle.key)).for("update");
    const byKey = new Map(rows.map((r) => [r.key, r]));
    const updates = [];
    for (const take of sorted) {
      const next = nextAttempt(byKey.get(take.key) ?? null, take.policy, now);
      if ("waitSeconds" in next) return next.waitSeconds;
      updates.push({ key: take.key, ...next });
    }
    for (const u of updates) {
      await tx.update(loginThrottle).set({ failures: u.failures, lockedUntil: u.lockedUntil, updatedAt: now }).where(eq(loginThrottle.key, u.key));
    }
    return 0;
  });
  if (Math.random() < 0.01) await pruneThrottle();
  return wait;
}

/** Whether this client address signed in to this account recently (its failures elsewhere don't slow it). */
export async function isKnownAddress(email: string, client: string, now = new Date()) {
  const [row] = await db.select({ at: loginThrottle.succeededAt }).from(loginThrottle).where(eq(loginThrottle.key, throttleKeys.accountFromAddress(email, client)));
  return Boolean(row?.at && now.getTime() - row.at.getTime() < KNOWN_ADDRESS_SECONDS * 1000);
}

/** Counts one password attempt for an account: per client address always, per account unless the address is known. */
export async function takePasswordAttempt(email: string, client: string) {
  const takes: Take[] = [{ key: throttleKeys.accountFromAddress(email, client), policy: policies.accountFromAddress }];
  if (!(await isKnownAddress(email, client))) takes.push({ key: throttleKeys.account(email), policy: policies.account });
  return takeAttempt(takes);
}

/** A right password: the client address starts afresh and becomes known; the account gets its attempt back. */
export async function passwordSucceeded(email: string, client: string) {
  const known = await isKnownAddress(email, client);
  const now = new Date();
  const pair = throttleKeys.accountFromAddress(email, client);
  await db
    .insert(loginThrottle)
    .values({ key: pair, failures: 0, succeededAt: now, updatedAt: now })
    .onConflictDoUpdate({ target: loginThrottle.key, set: { failures: 0, lockedUntil: null, succeededAt: now, updatedAt: now } });
  if (!known) await giveBack(throttleKeys.account(email), policies.account);
}

/** Undoes one counted attempt (it turned out to be a success), unlocking the bucket if that brings it under the limit. */
async function giveBack(key: string, policy: Policy) {
  await db.transaction(async (tx) => {
    const [row] = await tx.select().from(loginThrottle).where(eq(loginThrottle.key, key)).for("update");
    if (!row) return;
    const failures = Math.max(0, row.failures - 1);
    await tx.update(loginThrottle).set({ failures, lockedUntil: failures > policy.free ? row.lockedUntil : null }).where(eq(loginThrottle.key, key));
  });
}

/** Forgets a bucket (a reset link that worked). */
export async function clearThrottle(key: string) {
  await db.delete(loginThrottle).where(eq(loginThrottle.key, key));
}

/** Drops buckets nobody used for two days, keeping "known address" marks for their 30 days. */
export async function pruneThrottle(now = new Date()) {
  const twoDays = new Date(now.getTime() - 2 * 86_400_000);
  const known = new Date(now.getTime() - KNOWN_ADDRESS_SECONDS * 1000);
  await db
    .delete(loginThrottle)
    .where(and(lt(loginThrottle.updatedAt, twoDays), or(isNull(loginThrottle.succeededAt), lt(loginThrottle.succeededAt, known))));
}
