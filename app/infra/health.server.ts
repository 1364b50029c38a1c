import { sql } from "~/infra/db.server";

/** True when PostgreSQL answers a trivial query within two seconds. */
export async function databaseIsUp(): Promise<boolean> {
  try {
    await Promise.race([
      sql`select 1`,
      new Promise((_, reject) => setTimeout(() => reject(new Error("timeout")), 2000)),
    ]);
    return true;
  } catch {
    return false;
  }
}
