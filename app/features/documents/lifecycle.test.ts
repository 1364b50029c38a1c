// The lifecycle and the two-person rule (issue 9 §2; common practice, no published source).
import { describe, expect, it } from "vitest";
import { availableSteps, certificateExpiry, check, verdict } from "./lifecycle";

const author = { userId: "u-author", role: "engineer" as const };
const reviewer = { userId: "u-reviewer", role: "reviewer" as const };
const reviewerAuthor = { userId: "u-author", role: "reviewer" as const };
const doc = (state: Parameters<typeof check>[1]["state"], authorUserId = "u-author") => ({ state, authorUserId });

describe("check", () => {
  it("walks draft → in review → issued → withdrawn", () => {
    expect(check("submit", doc("draft"), author)).toBeNull();
    expect(check("issue", doc("in_review"), reviewer)).toBeNull();
    expect(check("withdraw", doc("issued"), reviewer)).toBeNull();
    expect(check("reissue", doc("issued"), author)).toBeNull();
    expect(check("supersede", doc("issued"), reviewer)).toBeNull();
  });
  it("refuses steps out of order with 409", () => {
    expect(check("issue", doc("draft"), reviewer)?.status).toBe(409);
    expect(check("submit", doc("in_review"), author)?.status).toBe(409);
    expect(check("withdraw", doc("in_review"), reviewer)?.status).toBe(409);
    expect(check("withdraw", doc("withdrawn"), reviewer)?.status).toBe(409);
    expect(check("reissue", doc("superseded"), author)?.status).toBe(409);
    expect(check("issue", doc("issued"), reviewer)?.status).toBe(409);
  });
  it("lets only a reviewer issue (403 for engineers and owners)", () => {
    expect(check("issue", doc("in_review", "someone"), author)).toEqual({ status: 403, message: "Only a reviewing engineer issues documents." });
    expect(check("issue", doc("in_review", "someone"), { userId: "o", role: "owner" })?.status).toBe(403);
    expect(check("submit", doc("draft"), { userId: "b", role: "billing" })?.status).toBe(403);
    expect(check("submit", doc("draft"), { userId: "c", role: "client" })?.status).toBe(403);
  });
  it("never lets a reviewer issue or return what they wrote (two-person rule)", () => {
    const refused = check("issue", doc("in_review"), reviewerAuthor);
    expect(refused?.status).toBe(403);
    expect(refused?.message).toMatch(/two-person rule/);
    expect(check("return", doc("in_review"), reviewerAuthor)?.status).toBe(403);
    // An author who is a reviewer may still submit their own draft.
    expect(check("submit", doc("draft"), reviewerAuthor)).toBeNull();
  });
  it("lists the steps an actor can take", () => {
    expect(availableSteps(doc("in_review"), reviewer)).toEqual(["return", "issue"]);
    expect(availableSteps(doc("in_review"), reviewerAuthor)).toEqual([]);
    expect(availableSteps(doc("draft"), author)).toEqual(["submit"]);
    expect(availableSteps(doc("issued"), reviewer)).toEqual(["reissue", "withdraw"]);
  });
});

describe("verdict", () => {
  const now = new Date("2027-01-01T00:00:00Z");
  it("says valid, expired, superseded, withdrawn or unknown", () => {
    const issued = new Date("2026-06-01T00:00:00Z");
    expect(verdict({ state: "issued", expiresAt: certificateExpiry(issued) }, now)).toBe("valid");
    expect(verdict({ state: "issued", expiresAt: new Date("2026-12-31T00:00:00Z") }, now)).toBe("expired");
    expect(verdict({ state: "superseded", expiresAt: null }, now)).toBe("superseded");
    expect(verdict({ state: "withdrawn", expiresAt: null }, now)).toBe("withdrawn");
    expect(verdict({ state: "draft", expiresAt: null }, now)).toBe("unknown");
    expect(verdict(null, now)).toBe("unknown");
  });
  it("sets expiry a year after issue", () => {
    expect(certificateExpiry(new Date("2026-01-01T00:00:00Z")).toISOString()).toBe("2027-01-01T00:00:00.000Z");
  });
});
