// The audit writer: every command calls it inside its own transaction, so the
// change and the record of it land together or not at all.
import { sql } from "drizzle-orm";
import { schema, type Tx } from "~/infra/db.server";

export type Actor = { organizationId: string; userId: string };

/** An event about the organisation itself (members, invitations): what happened, with details. */
export function audit(tx: Tx, actor: Actor, action: string, subjectType: string, subjectId: string, detail: Record<string, unknown> = {}) {
  return tx.insert(schema.auditEvent).values({ organizationId: actor.organizationId, actorUserId: actor.userId, action, subjectType, subjectId, detail });
}

export type RecordChange = {
  /** e.g. "emitter.updated" */
  action: string;
  entity: string;
  entityId: string;
  /** Files the change under a site, for the site's History. */
  siteId?: string | null;
  /** The record's fields as they were (null for a create) and became (null for a delete). */
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
};

/** A create, update or delete of an inventory record, with its fields before and after. */
export function auditChange(tx: Tx, actor: Actor, change: RecordChange) {
  return tx.insert(schema.auditEvent).values({
    organizationId: actor.organizationId,
    actorUserId: actor.userId,
    action: change.action,
    subjectType: change.entity,
    subjectId: change.entityId,
    siteId: change.siteId ?? null,
    before: change.before,
    after: change.after,
  });
}

/**
 * Many changes (an import of hundreds of rows), each its own event, in one statement: the events
 * travel as one JSON parameter (jsonb_to_recordset), which is many times quicker than a VALUES
 * list of thousands of parameters.
 */
export async function auditChanges(tx: Tx, actor: Actor, changes: RecordChange[]) {
  if (changes.length === 0) return;
  const records = changes.map((c) => ({ action: c.action, subject_type: c.entity, subject_id: c.entityId, site_id: c.siteId ?? null, before: c.before, after: c.after }));
  await tx.execute(sql`
    insert into audit_event (organization_id, actor_user_id, action, subject_type, subject_id, site_id, before, after)
    select ${actor.organizationId}, ${actor.userId}, r.action, r.subject_type, r.subject_id, r.site_id, r.before, r.after
    from jsonb_to_recordset(${JSON.stringify(records)}::jsonb) as r(action text, subject_type text, subject_id text, site_id text, before jsonb, after jsonb)`);
}
