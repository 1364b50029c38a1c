// The one database handle: Drizzle over the `postgres` driver.
import { drizzle } from "drizzle-orm/postgres-js";
import postgres from "postgres";
import { env } from "~/infra/env.server";
import * as schema from "./db/schema/index";

const globalForDb = globalThis as unknown as { isotropeSql?: postgres.Sql };

export const sql = (globalForDb.isotropeSql ??= postgres(env.DATABASE_URL, {
  max: 10,
  onnotice: () => {},
  connect_timeout: 5,
}));

export const db = drizzle(sql, { schema });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
export { schema };
