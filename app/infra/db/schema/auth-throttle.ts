import { integer, pgTable, text, timestamp } from "drizzle-orm/pg-core";
import { updatedAt } from "./columns";

// Failed sign-in, password-change and reset attempts, one row per throttle key
// (app/features/auth/throttle.server.ts): `acct:<sha256(e-mail)>` for an address,
// `acct-ip:<sha256(e-mail)>:<client address>` for an address from one client, and a few
// others. No e-mail address is stored in clear.
export const loginThrottle = pgTable("login_throttle", {
  key: text("key").primaryKey(),
  failures: integer("failures").notNull().default(0),
  lockedUntil: timestamp("locked_until", { withTimezone: true }),
  // The last successful sign-in from this key (account + address keys only).
  succeededAt: timestamp("succeeded_at", { withTimezone: true }),
  updatedAt: updatedAt(),
});
