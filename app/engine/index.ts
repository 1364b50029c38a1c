/** Isotrope RF exposure engine — the public surface (pure; no I/O). See README.md. */
export * from "./units";
export * from "./limits";
export * from "./models";
export * from "./patterns";
export * from "./kernel";
export * from "./prepare";
export * from "./axes";
export * from "./grid";
export * from "./rows";
export * from "./exemption";
export * from "./planner";
export * from "./schema";
export * from "./evaluate";
export { EngineInputError } from "./errors";
