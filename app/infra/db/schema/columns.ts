// Column helpers shared by every table.
import { randomUUID } from "node:crypto";
import { integer, text, timestamp } from "drizzle-orm/pg-core";

export const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();
export const updatedAt = () => timestamp("updated_at", { withTimezone: true }).notNull().defaultNow();
/** A text primary key holding a random UUID: any string can be looked up (no cast errors), unknown ones find nothing. */
export const id = () => text("id").primaryKey().$defaultFn(() => randomUUID());
/** Optimistic concurrency: every update must name the version it read, and bumps it. */
export const version = () => integer("version").notNull().default(1);
