// Background jobs in PostgreSQL through pg-boss 10 (decision record 0018): the same DATABASE_URL,
// its own schema (`pgboss`, made by pg-boss at start). Each queue retries a failed job with
// back-off; a job whose worker died (kill -9) stays "active" until its expiry, then the
// maintenance pass marks it failed and it is retried by whichever worker is alive. Any number of
// app servers and workers may share one database.
import PgBoss from "pg-boss";
import { env } from "~/infra/env.server";

export const JOBS_SCHEMA = "pgboss";

export type QueueSpec = { name: string; retryLimit: number; retryDelay: number; expireInSeconds: number };
export type Job<T> = { id: string; data: T; retryCount: number; retryLimit: number };

const globalForJobs = globalThis as unknown as { isotropeSender?: Promise<PgBoss> };

function boss(role: "sender" | "worker") {
  return new PgBoss({
    connectionString: env.DATABASE_URL,
    schema: JOBS_SCHEMA,
    max: role === "sender" ? 2 : 4,
    application_name: `isotrope-jobs-${role}`,
    // Only workers watch for expired jobs; a sender just inserts.
    supervise: role === "worker",
    schedule: false,
    maintenanceIntervalSeconds: Number(process.env.JOBS_MAINTENANCE_SECONDS ?? 30),
  });
}

const made = new WeakMap<PgBoss, Map<string, Promise<void>>>();

/** Makes the queue (or brings its retry and expiry settings up to date), once per instance. */
function ensureQueue(instance: PgBoss, q: QueueSpec) {
  let queues = made.get(instance);
  if (!queues) made.set(instance, (queues = new Map()));
  let ready = queues.get(q.name);
  if (!ready) {
    const options = { name: q.name, retryLimit: q.retryLimit, retryDelay: q.retryDelay, retryBackoff: true, expireInSeconds: q.expireInSeconds };
    ready = (async () => {
      if (await instance.getQueue(q.name)) await instance.updateQueue(q.name, options);
      else await instance.createQueue(q.name, options);
    })();
    queues.set(q.name, ready);
  }
  return ready;
}

async function started(instance: PgBoss, queues: QueueSpec[]) {
  instance.on("error", (error) => console.error("[jobs]", error instanceof Error ? error.message : error));
  await instance.start();
  for (const q of queues) await ensureQueue(instance, q);
  return instance;
}

/** The process's sending instance (started once). */
function sender() {
  return (globalForJobs.isotropeSender ??= started(boss("sender"), []).catch((error) => {
    globalForJobs.isotropeSender = undefined;
    throw error;
  }));
}

/** Puts a job on a queue; answers its id. */
export async function enqueue<T extends object>(queue: QueueSpec, data: T, options: { expireInSeconds?: number; startAfter?: number } = {}): Promise<string> {
  const b = await sender();
  await ensureQueue(b, queue);
  const id = await b.send(queue.name, data, options);
  if (!id) throw new Error(`the job for ${queue.name} was not queued`);
  return id;
}

export type Worker = { stop(): Promise<void> };

/** Starts a worker for each queue with its handler: one job at a time per queue, polling every second. */
export async function startWorker(handlers: { queue: QueueSpec; handle: (job: Job<any>) => Promise<void> }[]): Promise<Worker> {
  const b = await started(boss("worker"), handlers.map((h) => h.queue));
  for (const { queue, handle } of handlers) {
    await b.work(queue.name, { batchSize: 1, includeMetadata: true, pollingIntervalSeconds: 1 }, async ([job]) => {
      await handle({ id: job.id, data: job.data, retryCount: job.retryCount, retryLimit: job.retryLimit });
    });
  }
  return { stop: () => b.stop({ graceful: true, timeout: 10_000, wait: true }) };
}

/** Creates pg-boss's tables and the queues (the start and test commands call this). */
export async function prepareJobs(queues: QueueSpec[]) {
  const b = await started(boss("sender"), queues);
  await b.stop({ graceful: false, wait: true });
}

export async function stopSender() {
  const b = globalForJobs.isotropeSender;
  globalForJobs.isotropeSender = undefined;
  if (b) await (await b).stop({ graceful: false, wait: true });
}
