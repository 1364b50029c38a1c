// How much an organisation has recorded, for the overview.
import { eq, sql } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";

export async function inventoryCounts(organizationId: string) {
  const [row] = await db
    .select({
      sites: sql<number>`(select count(*)::int from ${schema.site} where ${schema.site.organizationId} = ${organizationId})`,
      clients: sql<number>`(select count(*)::int from ${schema.client} where ${schema.client.organizationId} = ${organizationId})`,
    })
    .from(schema.organization)
    .where(eq(schema.organization.id, organizationId));
  return { sites: row?.sites ?? 0, clients: row?.clients ?? 0 };
}
