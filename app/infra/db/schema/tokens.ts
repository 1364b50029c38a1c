// API tokens: a member's bearer credential for /api/v1, stored as a SHA-256 hash and shown once.
import { index, pgTable, text, timestamp } from "drizzle-orm/pg-core";
import { member, organization, user } from "./auth";
import { createdAt, id } from "./columns";

export const apiToken = pgTable(
  "api_token",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    memberId: text("member_id").notNull().references(() => member.id, { onDelete: "cascade" }),
    userId: text("user_id").notNull().references(() => user.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    tokenHash: text("token_hash").notNull().unique(),
    /** The first characters of the token, so its owner can tell tokens apart. */
    prefix: text("prefix").notNull(),
    lastUsedAt: timestamp("last_used_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index("api_token_member_idx").on(t.memberId)],
);
