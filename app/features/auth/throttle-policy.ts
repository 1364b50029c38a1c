// How fast repeated attempts slow down: pure rules, no database (throttle.server.ts applies them).

export type Policy = {
  /** Attempts allowed before any delay. */
  free: number;
  /** The first delay once `free` is used up; each further attempt doubles it. */
  baseSeconds: number;
  /** The longest delay. */
  capSeconds: number;
  /** After this long without an attempt the count starts again from zero. */
  quietSeconds: number;
};

export const policies = {
  /** Failed passwords for one address from one client address. */
  accountFromAddress: { free: 5, baseSeconds: 1, capSeconds: 15 * 60, quietSeconds: 24 * 3600 },
  /** Failed passwords for one address from anywhere: looser, so rotating client addresses still slows. */
  account: { free: 20, baseSeconds: 1, capSeconds: 15 * 60, quietSeconds: 24 * 3600 },
  /** Reset links tried from one client address (the token is the only secret). */
  resetFromAddress: { free: 10, baseSeconds: 1, capSeconds: 15 * 60, quietSeconds: 24 * 3600 },
  /** E-mails (reset links, confirmation links) asked for one address, whether or not it has an account. */
  mailsToAddress: { free: 3, baseSeconds: 60, capSeconds: 60 * 60, quietSeconds: 60 * 60 },
} satisfies Record<string, Policy>;

/** A client address that signed in to an account within this long is not slowed by that account's failures elsewhere. */
export const KNOWN_ADDRESS_SECONDS = 30 * 24 * 3600;

export type Bucket = { failures: number; lockedUntil: Date | null; updatedAt: Date };

/**
 * One more attempt on a bucket: refused (with the seconds to wait) while it is locked,
 * otherwise counted, and locked for the next attempt once the free ones are used up.
 */
export function nextAttempt(bucket: Bucket | null, policy: Policy, now: Date): { waitSeconds: number } | { failures: number; lockedUntil: Date | null } {
  if (bucket?.lockedUntil && bucket.lockedUntil > now) {
    return { waitSeconds: Math.max(1, Math.ceil((bucket.lockedUntil.getTime() - now.getTime()) / 1000)) };
  }
  const quiet = !bucket || now.getTime() - bucket.updatedAt.getTime() > policy.quietSeconds * 1000;
  const failures = quiet ? 1 : bucket.failures + 1;
  return { failures, lockedUntil: lockAfter(failures, policy, now) };
}

/** When a bucket with this many counted attempts opens again (null: at once). */
export function lockAfter(failures: number, policy: Policy, now: Date): Date | null {
  const over = failures - policy.free;
  if (over <= 0) return null;
  const seconds = Math.min(policy.capSeconds, policy.baseSeconds * 2 ** Math.min(over - 1, 30));
  return new Date(now.getTime() + seconds * 1000);
}

/** "Wait 12 seconds" / "Wait 3 minutes", for the message of a refused attempt. */
export function waitPhrase(seconds: number): string {
  if (seconds < 60) return `${seconds} ${seconds === 1 ? "second" : "seconds"}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} ${minutes === 1 ? "minute" : "minutes"}`;
}

export const tooManyFailures = (seconds: number) => `Too many failed attempts. Wait ${waitPhrase(seconds)}, then try again.`;
export const tooManyMails = (seconds: number) => `We have sent several e-mails to this address already. Wait ${waitPhrase(seconds)}, then ask again.`;
