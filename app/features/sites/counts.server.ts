// How much an organisation has recorded, for the overview.
import { eq, sql, type Placeholder, type SQL } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";

/**
 * Site and client counts as select columns, for a statement over one organisation row whose id is
 * the given parameter (the owner's overview asks them with the team counts in one round trip).
 */
export function inventoryCountColumns(organizationId: SQL | Placeholder) {
  return {
    sites: sql<number>`(select count(*)::int from ${schema.site} where ${schema.site.organizationId} = ${organizationId})`,
    clients: sql<number>`(select count(*)::int from ${schema.client} where ${schema.client.organizationId} = ${organizationId})`,
  };
}

const organizationId = sql.placeholder("organizationId");
/** Built once (every staff overview asks it). */
const counts = db
  .select(inventoryCountColumns(organizationId))
  .from(schema.organization)
  .where(eq(schema.organization.id, organizationId))
  .prepare("inventory_counts");

export async function inventoryCounts(organizationId: string) {
  const [row] = await counts.execute({ organizationId });
  return { sites: row?.sites ?? 0, clients: row?.clients ?? 0 };
}
