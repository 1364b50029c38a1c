import { describe, expect, it } from "vitest";
import { roles, sectionsFor } from "~/lib/roles";
import { guideFor } from "./guide";

describe("guideFor", () => {
  it("sends every role's next step to a page that role may open", () => {
    for (const role of roles) {
      const { next, now } = guideFor(role, { members: 3, pending: 1 }, { sites: 0, clients: 0 });
      expect(sectionsFor(role).map((s) => s.path), role).toContain(next.to);
      expect(now.length, role).toBeGreaterThan(0);
    }
  });

  it("asks a lone owner to invite the first colleague", () => {
    expect(guideFor("owner", { members: 1, pending: 0 }).next.title).toBe("Invite your first colleague");
  });

  it("sends engineers to record their first site, then to the sites on record", () => {
    expect(guideFor("engineer", null, { sites: 0, clients: 0 }).next.title).toBe("Record your first site");
    expect(guideFor("reviewer", null, { sites: 3, clients: 1 }).next.title).toBe("3 sites on record");
    expect(guideFor("client", null, null).now.join(" ")).not.toContain("Record");
  });

  it("sends a regulator to its inbox of filings", () => {
    expect(guideFor("regulator", null, null).next).toMatchObject({ title: "Filings received", to: "/filings" });
  });

  it("points an owner at invitations still waiting, counted", () => {
    expect(guideFor("owner", { members: 4, pending: 2 }).next.title).toBe("2 invitations waiting");
    expect(guideFor("owner", { members: 4, pending: 1 }).next.title).toBe("1 invitation waiting");
  });

  it("tells each role the work it can do now, and only that", () => {
    const now = (role: Parameters<typeof guideFor>[0]) => guideFor(role, { members: 2, pending: 0 }, { sites: 2, clients: 1 }).now.join(" ").toLowerCase();
    // Documents: drafting is for inventory editors, issuing for reviewers only (lifecycle.ts).
    expect(now("engineer")).toContain("draft a report");
    expect(now("engineer")).not.toContain("issue the documents");
    expect(now("reviewer")).toContain("issue the documents");
    expect(now("owner")).not.toContain("issue the documents");
    // Filing is for engineers and reviewers (filings.server.ts `filers`).
    expect(now("reviewer")).toContain("regulator");
    expect(now("owner")).not.toContain("file an issued");
    // Billing works on invoices and refunds and only reads the inventory.
    expect(now("billing")).toContain("invoice");
    expect(now("billing")).toContain("refund");
    expect(now("billing")).not.toContain("record sites");
    expect(guideFor("billing", null, { sites: 2, clients: 1 }).next).toMatchObject({ to: "/billing", action: "Open Billing" });
  });
});
