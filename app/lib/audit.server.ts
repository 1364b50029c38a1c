// The audit writer: every command calls it inside its own transaction, so the
// change and the record of it land together or not at all.
import { schema, type Tx } from "~/infra/db.server";

export type Actor = { organizationId: string; userId: string };

export function audit(tx: Tx, actor: Actor, action: string, subjectType: string, subjectId: string, detail: Record<string, unknown> = {}) {
  return tx.insert(schema.auditEvent).values({ organizationId: actor.organizationId, actorUserId: actor.userId, action, subjectType, subjectId, detail });
}
