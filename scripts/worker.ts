// `npm run worker`: the background work (PDF rendering, e-mail delivery) alone, against the same
// DATABASE_URL as the app servers. Run as many as you like; pg-boss hands each job to one of them.
// Stops gracefully on SIGTERM / SIGINT (a job cut short by kill -9 is retried after its expiry).
import { startBackgroundWork, stopBackgroundWork } from "../app/features/documents/worker.server";
import { sql } from "../app/infra/db.server";

await startBackgroundWork();
console.log(`[worker] started (pid ${process.pid}): queues document-render and document-mail`);
const stop = async () => {
  await stopBackgroundWork();
  await sql.end();
  process.exit(0);
};
process.once("SIGTERM", stop);
process.once("SIGINT", stop);
