// Reading the audit trail: a site's changes, and the organisation's with filters.
import { and, desc, eq, gte, inArray, lt, sql, type SQL } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";

const { auditEvent, user } = schema;

export type HistoryFilter = { entity?: string | null; actorUserId?: string | null; from?: Date | null; to?: Date | null; page: number; pageSize: number };

function query(where: SQL | undefined, limit: number, offset = 0) {
  return db
    .select({
      id: auditEvent.id,
      at: auditEvent.createdAt,
      actorUserId: auditEvent.actorUserId,
      actor: user.name,
      actorEmail: user.email,
      action: auditEvent.action,
      entity: auditEvent.subjectType,
      entityId: auditEvent.subjectId,
      siteId: auditEvent.siteId,
      before: auditEvent.before,
      after: auditEvent.after,
      detail: auditEvent.detail,
    })
    .from(auditEvent)
    .leftJoin(user, eq(user.id, auditEvent.actorUserId))
    .where(where)
    .orderBy(desc(auditEvent.createdAt), desc(auditEvent.id))
    .limit(limit)
    .offset(offset);
}

/** Fields that point at another record, and the table and column that name it. */
const references = {
  clientId: { table: schema.client, name: schema.client.name },
  patternId: { table: schema.antennaPattern, name: schema.antennaPattern.name },
  surfaceId: { table: schema.surface, name: schema.surface.name },
} as const;

/** The names of the records the events point at (clients, patterns, surfaces), by id, within the organisation. */
export async function referencedNames(organizationId: string, events: { before: unknown; after: unknown }[]): Promise<Record<string, string>> {
  const ids = { clientId: new Set<string>(), patternId: new Set<string>(), surfaceId: new Set<string>() };
  for (const e of events) {
    for (const side of [e.before, e.after] as (Record<string, unknown> | null)[]) {
      if (!side) continue;
      for (const key of Object.keys(ids) as (keyof typeof ids)[]) if (typeof side[key] === "string") ids[key].add(side[key] as string);
    }
  }
  const names: Record<string, string> = {};
  await Promise.all(
    (Object.keys(ids) as (keyof typeof ids)[])
      .filter((key) => ids[key].size)
      .map(async (key) => {
        const { table, name } = references[key];
        const rows = await db.select({ id: table.id, name }).from(table).where(and(eq(table.organizationId, organizationId), inArray(table.id, [...ids[key]])));
        for (const r of rows) names[r.id] = r.name;
      }),
  );
  return names;
}

/** A site's events, newest first. The caller has already checked the site is in scope. */
export function siteHistory(organizationId: string, siteId: string, limit = 200) {
  return query(and(eq(auditEvent.organizationId, organizationId), eq(auditEvent.siteId, siteId)), limit);
}

export async function organizationHistory(organizationId: string, filter: HistoryFilter) {
  const where = and(
    eq(auditEvent.organizationId, organizationId),
    filter.entity ? eq(auditEvent.subjectType, filter.entity) : undefined,
    filter.actorUserId ? eq(auditEvent.actorUserId, filter.actorUserId) : undefined,
    filter.from ? gte(auditEvent.createdAt, filter.from) : undefined,
    filter.to ? lt(auditEvent.createdAt, filter.to) : undefined,
  );
  const [events, [count]] = await Promise.all([
    query(where, filter.pageSize, (filter.page - 1) * filter.pageSize),
    db.select({ n: sql<number>`count(*)::int` }).from(auditEvent).where(where),
  ]);
  return { events, total: count?.n ?? 0 };
}

/** Who has written to the trail, for the actor filter. */
export function historyActors(organizationId: string) {
  return db
    .selectDistinct({ id: user.id, name: user.name })
    .from(auditEvent)
    .innerJoin(user, eq(user.id, auditEvent.actorUserId))
    .where(eq(auditEvent.organizationId, organizationId));
}
