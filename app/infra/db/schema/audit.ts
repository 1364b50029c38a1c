import { index, integer, jsonb, pgTable, text } from "drizzle-orm/pg-core";
import { organization, user } from "./auth";
import { createdAt } from "./columns";

// Who did what to which record, when. Written in the same transaction as the change.
// `siteId` files inventory changes under their site (the site's History); `before` and
// `after` are the record's fields as they were and became (null for a create or a delete).
export const auditEvent = pgTable(
  "audit_event",
  {
    id: integer("id").primaryKey().generatedAlwaysAsIdentity(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    actorUserId: text("actor_user_id").references(() => user.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    subjectType: text("subject_type").notNull(),
    subjectId: text("subject_id").notNull(),
    siteId: text("site_id"),
    detail: jsonb("detail").$type<Record<string, unknown>>().notNull().default({}),
    before: jsonb("before").$type<Record<string, unknown> | null>(),
    after: jsonb("after").$type<Record<string, unknown> | null>(),
    createdAt: createdAt(),
  },
  (t) => [
    index("audit_org_time_idx").on(t.organizationId, t.createdAt),
    index("audit_site_time_idx").on(t.siteId, t.createdAt),
    index("audit_org_subject_idx").on(t.organizationId, t.subjectType, t.createdAt),
  ],
);
