// Starting and stopping the background work of this process: the app server calls it unless
// WORKER=off; `npm run worker` (scripts/worker.ts) runs it alone.
import type { Worker } from "~/infra/jobs.server";
import { announceIssued } from "./commands.server";
import { startDocumentWorker } from "./jobs.server";

let running: Promise<Worker> | null = null;

export function startBackgroundWork() {
  running ??= startDocumentWorker(announceIssued);
  return running;
}

export async function stopBackgroundWork() {
  const w = running;
  running = null;
  if (w) await (await w).stop();
}
