// Integration tests run against the real PostgreSQL that `npm test` starts (scripts/stack.mjs).
// Run alone with DATABASE_URL pointing at a scratch database; migrations are applied here.
import { drizzle } from "drizzle-orm/postgres-js";
import { migrate } from "drizzle-orm/postgres-js/migrator";
import postgres from "postgres";

export default async function setup() {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set: run the integration tests through `npm test`, or point DATABASE_URL at a scratch database.");
  const sql = postgres(url, { max: 1, onnotice: () => {} });
  try {
    await migrate(drizzle(sql), { migrationsFolder: "drizzle" });
  } finally {
    await sql.end();
  }
}
