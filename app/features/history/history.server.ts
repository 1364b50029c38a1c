// Reading the audit trail: a site's changes, and the organisation's with filters.
import { and, desc, eq, gte, lt, sql, type SQL } from "drizzle-orm";
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
