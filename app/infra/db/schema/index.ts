// The database schema, one file per feature. drizzle-kit reads this folder (drizzle.config.ts).
export * from "./auth";
export * from "./audit";
export * from "./files";
export * from "./clients";
export * from "./sites";
export * from "./emitters";
export * from "./visits";
export * from "./tokens";
export * from "./auth-throttle";
export * from "./assessments";
export * from "./documents";
export * from "./filings";
export * from "./billing";
export * from "./exposure-cache";
