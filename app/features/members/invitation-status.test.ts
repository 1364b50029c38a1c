import { describe, expect, it } from "vitest";
import { invitationProblem, nextStepAfter } from "./invitation-status";

const now = new Date("2026-12-10T10:00:00Z");
const base = { status: "pending", expiresAt: new Date(now.getTime() + 1000), organizationName: "Kestrel Lane", inviterName: "Ola Owner" };

describe("invitationProblem", () => {
  it("has none for a pending, unexpired invitation", () => expect(invitationProblem(base, now)).toBeNull());
  it("tells a replaced invitation apart from a withdrawn one", () => {
    expect(invitationProblem({ ...base, status: "superseded" }, now)).toMatch(/newer invitation, which replaces this one/);
    expect(invitationProblem({ ...base, status: "canceled" }, now)).toMatch(/^Kestrel Lane withdrew this invitation/);
  });
  it("names whom to ask for a new one when it expired", () => {
    expect(invitationProblem({ ...base, expiresAt: now }, now)).toBe("This invitation has expired. Ask Ola Owner at Kestrel Lane to send a new one.");
  });
  it("offers a next step after a used one", () => {
    expect(invitationProblem({ ...base, status: "accepted" }, now)).toMatch(/already been used\. Sign in to continue\./);
    expect(nextStepAfter(false)).toEqual({ label: "Go to sign-in", to: "/sign-in" });
    expect(nextStepAfter(true)).toEqual({ label: "Continue to Isotrope", to: "/" });
  });
});
