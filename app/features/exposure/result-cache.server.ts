// The Exposure page's result for the stored inventory, computed once per input: a small in-process
// LRU in front of the exposure_result table (PostgreSQL holds the state; the LRU only saves the
// read). The key hashes everything computeExposure reads plus the engine's version and this
// result's format, so a result is reused only for the same input and code. Concurrent requests
// for the same key share one computation. A miss runs the engine after the current turn of the
// event loop, so the page's shell can be sent first (the route defers the result).
import { createHash } from "node:crypto";
import { and, desc, eq, notInArray } from "drizzle-orm";
import { EngineInputError } from "~/engine";
import { ENGINE_VERSION } from "~/engine/evaluate";
import { db, schema } from "~/infra/db.server";
import { computeExposure, type ExposureInput, type ExposureResult } from "./exposure-result";

/** Bump when computeExposure's output changes for the same input (its shape or its numbers). */
export const RESULT_FORMAT = "exposure-result/1";
const KEEP_PER_SITE = 6;
const MEMORY_ENTRIES = 16;

export type ExposureOutcome = { result: ExposureResult | null; problem: string | null; computeMs: number; source: "memory" | "database" | "computed" };

export function exposureKey(input: ExposureInput): string {
  return createHash("sha256").update(JSON.stringify([ENGINE_VERSION, RESULT_FORMAT, input])).digest("hex");
}

const memory = new Map<string, ExposureOutcome>(); // insertion order = recency
const running = new Map<string, Promise<ExposureOutcome>>();

function remember(key: string, outcome: ExposureOutcome) {
  memory.delete(key);
  memory.set(key, outcome);
  while (memory.size > MEMORY_ENTRIES) memory.delete(memory.keys().next().value!);
}

/** The outcome at once when it is in memory, else a promise (the database, else the engine). */
export function exposureOutcome(organizationId: string, siteId: string, input: ExposureInput): ExposureOutcome | Promise<ExposureOutcome> {
  const key = `${siteId}:${exposureKey(input)}`;
  const hit = memory.get(key);
  if (hit) {
    remember(key, hit);
    return { ...hit, source: "memory" };
  }
  let job = running.get(key);
  if (!job) {
    job = stored(siteId, key).then((found) => found ?? computeAndStore(organizationId, siteId, key, input));
    job.then((o) => remember(key, o)).finally(() => running.delete(key)).catch(() => {});
    running.set(key, job);
  }
  return job;
}

async function stored(siteId: string, key: string): Promise<ExposureOutcome | null> {
  const [row] = await db
    .select({ result: schema.exposureResult.result, computeMs: schema.exposureResult.computeMs })
    .from(schema.exposureResult)
    .where(and(eq(schema.exposureResult.siteId, siteId), eq(schema.exposureResult.key, key.split(":")[1])));
  if (!row) return null;
  const parsed = JSON.parse(row.result) as { result: ExposureResult | null; problem: string | null };
  return { ...parsed, computeMs: row.computeMs, source: "database" };
}

async function computeAndStore(organizationId: string, siteId: string, key: string, input: ExposureInput): Promise<ExposureOutcome> {
  await new Promise((resolve) => setTimeout(resolve, 5)); // let the page's shell go out first
  const started = performance.now();
  let result: ExposureResult | null = null;
  let problem: string | null = null;
  try {
    result = computeExposure(input);
  } catch (error) {
    if (!(error instanceof EngineInputError)) throw error;
    problem = `These options cannot be computed for this site: ${error.message}`;
  }
  const computeMs = Math.round(performance.now() - started);
  const hash = key.split(":")[1];
  await db.transaction(async (tx) => {
    await tx.insert(schema.exposureResult).values({ organizationId, siteId, key: hash, result: JSON.stringify({ result, problem }), computeMs }).onConflictDoNothing();
    // Only the newest few per site: older inputs are unlikely to come back.
    const keep = tx.select({ key: schema.exposureResult.key }).from(schema.exposureResult).where(eq(schema.exposureResult.siteId, siteId)).orderBy(desc(schema.exposureResult.createdAt)).limit(KEEP_PER_SITE);
    await tx.delete(schema.exposureResult).where(and(eq(schema.exposureResult.siteId, siteId), notInArray(schema.exposureResult.key, keep)));
  });
  return { result, problem, computeMs, source: "computed" };
}

/** For tests: forget the in-process entries (the table stays). */
export function clearExposureMemory() {
  memory.clear();
}
