import { index, integer, jsonb, pgTable, text } from "drizzle-orm/pg-core";
import { organization, user } from "./auth";
import { createdAt } from "./columns";

// Who did what to which record, when. Written in the same transaction as the change.
export const auditEvent = pgTable(
  "audit_event",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    actorUserId: text("actor_user_id").references(() => user.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    subjectType: text("subject_type").notNull(),
    subjectId: text("subject_id").notNull(),
    detail: jsonb("detail").$type<Record<string, unknown>>().notNull().default({}),
    createdAt: createdAt(),
  },
  (t) => [index("audit_org_time_idx").on(t.organizationId, t.createdAt)],
);
