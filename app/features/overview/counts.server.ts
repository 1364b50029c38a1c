// The overview's counts. An owner sees the team's and the inventory's: one statement over the
// organisation's row built from the two features' columns (one round trip instead of two); other
// staff see the inventory's alone.
import { eq, sql } from "drizzle-orm";
import { teamCountColumns } from "~/features/members/members.server";
import { inventoryCountColumns, inventoryCounts } from "~/features/sites/counts.server";
import { db, schema } from "~/infra/db.server";
import type { Role } from "~/lib/roles";

const organizationId = sql.placeholder("organizationId");
const ownerCounts = db
  .select({ ...teamCountColumns(organizationId), ...inventoryCountColumns(organizationId) })
  .from(schema.organization)
  .where(eq(schema.organization.id, organizationId))
  .prepare("overview_owner_counts");

export type TeamCounts = { members: number; pending: number };
export type InventoryCounts = { sites: number; clients: number };

/** The team's counts (owners only, else null) and the inventory's (staff only, else null). */
export async function overviewCounts(role: Role, organizationId: string, staff: boolean): Promise<{ team: TeamCounts | null; inventory: InventoryCounts | null }> {
  if (role === "owner") {
    const [row] = await ownerCounts.execute({ organizationId });
    return { team: { members: row?.members ?? 0, pending: row?.pending ?? 0 }, inventory: { sites: row?.sites ?? 0, clients: row?.clients ?? 0 } };
  }
  return { team: null, inventory: staff ? await inventoryCounts(organizationId) : null };
}
