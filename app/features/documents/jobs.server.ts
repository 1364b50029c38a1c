// The documents' background work: rendering a PDF and sending an e-mail, each a pg-boss queue
// with retries (app/infra/jobs.server.ts). Rendering is idempotent: a job run twice (a worker
// killed mid-render, then the retry) stores one PDF; an issued document's stored PDF is never
// replaced (and the database would refuse).
import { createHash } from "node:crypto";
import { and, eq, inArray, isNull, lt } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { enqueue, startWorker, type Job, type QueueSpec } from "~/infra/jobs.server";
import { sendMail } from "~/infra/mail.server";
import type { DocumentMail } from "./mails";
import { renderPdf } from "./pdf/render.server";
import { loadSource } from "./source.server";

const { document } = schema;

export const RENDER_QUEUE: QueueSpec = { name: "document-render", retryLimit: 5, retryDelay: 5, expireInSeconds: Number(process.env.JOBS_RENDER_EXPIRE_SECONDS ?? 300) };
export const MAIL_QUEUE: QueueSpec = { name: "document-mail", retryLimit: 8, retryDelay: 10, expireInSeconds: 120 };
export const DOCUMENT_QUEUES = [RENDER_QUEUE, MAIL_QUEUE];

export const queueRender = (documentId: string) => enqueue(RENDER_QUEUE, { documentId });
export const queueMails = (mails: DocumentMail[]) => Promise.all(mails.map((m) => enqueue(MAIL_QUEUE, m)));

const draftStates = ["draft", "in_review"] as const;

export async function renderJob(job: Job<{ documentId: string }>, after: { issued?: (documentId: string) => Promise<void> } = {}) {
  const [doc] = await db.select().from(document).where(eq(document.id, job.data.documentId));
  if (!doc) return;
  const asDraft = (draftStates as readonly string[]).includes(doc.state);
  if (!asDraft && doc.pdf) {
    // Stored already. Not "ready" means the run that stored it failed afterwards (telling people
    // failed, and the catch below put it back to "queued"): finish that run's work, or the page
    // waiting for the PDF would wait for ever.
    if (doc.renderStatus !== "ready") {
      await after.issued?.(doc.id);
      await db.update(document).set({ renderStatus: "ready", renderError: null }).where(eq(document.id, doc.id));
    }
    return;
  }
  await db.update(document).set({ renderStatus: "rendering", renderAttempts: doc.renderAttempts + 1 }).where(eq(document.id, doc.id));
  try {
    const pause = Number(process.env.DOCUMENTS_RENDER_PAUSE_MS ?? 0); // for the kill -9 test only
    if (pause > 0) await new Promise((r) => setTimeout(r, pause));
    const started = Date.now();
    const pdf = await renderPdf(await loadSource(doc));
    const sha256 = createHash("sha256").update(pdf).digest("hex");
    const stored = await db
      .update(document)
      .set({ pdf, sha256, byteSize: pdf.length, renderStatus: "ready", renderError: null, renderedAt: new Date() })
      .where(and(eq(document.id, doc.id), asDraft ? inArray(document.state, [...draftStates]) : and(eq(document.state, doc.state), isNull(document.pdf))))
      .returning({ id: document.id });
    console.log(`[jobs] pid ${process.pid} rendered ${doc.kind} ${doc.id} v${doc.version} (${doc.state}) in ${Date.now() - started} ms${stored.length ? "" : ", not stored: already stored by another run, or its state moved on"}`);
    // The state moved on while rendering (a draft issued): the job for the new state renders it.
    if (stored.length && !asDraft) await after.issued?.(doc.id);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const last = job.retryCount >= job.retryLimit;
    await db.update(document).set({ renderStatus: last ? "failed" : "queued", renderError: message.slice(0, 1000) }).where(eq(document.id, doc.id));
    throw error;
  }
}

export async function mailJob(job: Job<DocumentMail>) {
  const { attachDocumentId, attachName, ...mail } = job.data;
  const attachments = [];
  if (attachDocumentId) {
    const [row] = await db.select({ pdf: document.pdf }).from(document).where(eq(document.id, attachDocumentId));
    if (row?.pdf) attachments.push({ filename: attachName ?? "document.pdf", content: row.pdf, contentType: "application/pdf" });
  }
  await sendMail({ ...mail, attachments });
}

/** Documents left "queued" without a job (the app stopped between commit and enqueue, or the enqueue
 * failed): queue them again, and mark them so the next sweep leaves them a minute. A document merely
 * waiting its turn may get a second job; a render run twice stores one PDF. */
export async function requeueStranded(olderThanMs = 60_000) {
  const stranded = db.select({ id: document.id }).from(document).where(and(eq(document.renderStatus, "queued"), lt(document.updatedAt, new Date(Date.now() - olderThanMs)))).limit(200);
  const rows = await db.update(document).set({ updatedAt: new Date() }).where(and(inArray(document.id, stranded), eq(document.renderStatus, "queued"))).returning({ id: document.id });
  for (const r of rows) await queueRender(r.id);
  return rows.length;
}

/** How often a running worker looks for stranded documents. */
const SWEEP_MS = Number(process.env.JOBS_SWEEP_SECONDS ?? 60) * 1000;

/** Starts the render and mail workers in this process, and the sweep for stranded documents. */
export async function startDocumentWorker(issued: (documentId: string) => Promise<void>) {
  const worker = await startWorker([
    { queue: RENDER_QUEUE, handle: (job) => renderJob(job, { issued }) },
    { queue: MAIL_QUEUE, handle: mailJob },
  ]);
  const sweep = () => requeueStranded().catch((e) => console.error("[jobs] requeue failed:", e instanceof Error ? e.message : e));
  await sweep();
  const timer = setInterval(sweep, SWEEP_MS);
  timer.unref();
  return {
    stop: async () => {
      clearInterval(timer);
      await worker.stop();
    },
  };
}
