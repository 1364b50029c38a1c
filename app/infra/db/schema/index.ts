// The database schema, one file per feature. drizzle-kit reads this folder (drizzle.config.ts).
export * from "./auth";
export * from "./audit";
export * from "./auth-throttle";
