// The overview's counts: the owner's team and inventory counts come from one statement
// (features/overview/counts.server.ts) and must equal what each feature's own query answers.
import { beforeAll, describe, expect, it } from "vitest";
import { teamCounts } from "~/features/members/members.server";
import { overviewCounts } from "~/features/overview/counts.server";
import { inventoryCounts } from "~/features/sites/counts.server";
import { createSite } from "~/features/sites/sites.server";
import { createOrg, type Org } from "./fixtures";

let org: Org;
beforeAll(async () => {
  org = await createOrg("overview-counts");
  const actor = { organizationId: org.id, role: "owner" as const, clientId: null, userId: org.people.owner.userId };
  for (const name of ["North mast", "South roof"]) await createSite(actor, { name, kind: "rooftop" } as never);
});

describe("overview counts", () => {
  it("gives the owner the team's and the inventory's counts, as the features count them", async () => {
    const { team, inventory } = await overviewCounts("owner", org.id, true);
    expect(team).toEqual(await teamCounts(org.id));
    expect(inventory).toEqual(await inventoryCounts(org.id));
    expect(team?.members).toBe(Object.keys(org.people).length);
    expect(inventory?.sites).toBe(2);
  });

  it("gives other staff the inventory's only, and other roles neither", async () => {
    expect(await overviewCounts("engineer", org.id, true)).toEqual({ team: null, inventory: { sites: 2, clients: 0 } });
    expect(await overviewCounts("regulator", org.id, false)).toEqual({ team: null, inventory: null });
  });
});
