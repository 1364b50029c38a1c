import { describe, expect, it } from "vitest";
import { lockAfter, nextAttempt, policies, waitPhrase, type Bucket } from "./throttle-policy";

const now = new Date("2026-12-10T10:00:00Z");
const at = (seconds: number) => new Date(now.getTime() + seconds * 1000);

describe("lockAfter", () => {
  const p = policies.accountFromAddress;
  it("lets the free attempts through without delay", () => {
    for (let n = 1; n <= p.free; n++) expect(lockAfter(n, p, now)).toBeNull();
  });
  it("doubles the delay from one second after the free attempts, up to 15 minutes", () => {
    const seconds = [6, 7, 8, 9, 10, 15, 40].map((n) => (lockAfter(n, p, now)!.getTime() - now.getTime()) / 1000);
    expect(seconds).toEqual([1, 2, 4, 8, 16, 512, 900]);
  });
  it("is looser per account than per account and client address", () => {
    expect(lockAfter(20, policies.account, now)).toBeNull();
    expect(lockAfter(21, policies.account, now)).toEqual(at(1));
  });
});

describe("nextAttempt", () => {
  const p = policies.accountFromAddress;
  const bucket = (failures: number, lockedUntil: Date | null, updatedAt = now): Bucket => ({ failures, lockedUntil, updatedAt });

  it("refuses while locked, with the whole seconds left, and counts nothing", () => {
    expect(nextAttempt(bucket(6, at(1.2)), p, now)).toEqual({ waitSeconds: 2 });
  });
  it("counts and locks once the free attempts are used", () => {
    expect(nextAttempt(bucket(4, null), p, now)).toEqual({ failures: 5, lockedUntil: null });
    expect(nextAttempt(bucket(5, null), p, now)).toEqual({ failures: 6, lockedUntil: at(1) });
  });
  it("counts on after a lock has run out, with a longer one", () => {
    expect(nextAttempt(bucket(6, at(-1)), p, now)).toEqual({ failures: 7, lockedUntil: at(2) });
  });
  it("starts again after a quiet day", () => {
    expect(nextAttempt(bucket(30, at(-3600), at(-25 * 3600)), p, now)).toEqual({ failures: 1, lockedUntil: null });
  });
  it("treats a missing bucket as a first attempt", () => {
    expect(nextAttempt(null, p, now)).toEqual({ failures: 1, lockedUntil: null });
  });
});

describe("waitPhrase", () => {
  it("says seconds under a minute and whole minutes above", () => {
    expect([1, 2, 59, 60, 61, 900].map(waitPhrase)).toEqual(["1 second", "2 seconds", "59 seconds", "1 minute", "2 minutes", "15 minutes"]);
  });
});
