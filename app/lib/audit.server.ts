// The audit writer: every command calls it inside its own transaction, so the
// change and the record of it land together or not at all.
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

/** Many changes in one statement (an import of hundreds of rows), each its own event. */
export async function auditChanges(tx: Tx, actor: Actor, changes: RecordChange[]) {
  for (let i = 0; i < changes.length; i += 1000) {
    await tx.insert(schema.auditEvent).values(
      changes.slice(i, i + 1000).map((change) => ({
        organizationId: actor.organizationId,
        actorUserId: actor.userId,
        action: change.action,
        subjectType: change.entity,
        subjectId: change.entityId,
        siteId: change.siteId ?? null,
        before: change.before,
        after: change.after,
      })),
    );
  }
}
