// Two app servers and two workers against one database work together (issue 9 §3): the stack's
// app (A, with its in-process worker) plus a second server (B, WORKER=off) started here from the same
// build, and two `npm run worker` processes. A session made on A works on B; a photo uploaded to A is
// served by B; renders queued from both finish, each exactly once (one attempt, one pg-boss job, no
// retry), and both servers hand out the same PDF bytes. No app server keeps state on its disk.
import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import { join } from "node:path";
import { expect, test } from "@playwright/test";
import postgres from "postgres";
import sharp from "sharp";
import { demoPassword } from "./helpers";

const ROOT = join(import.meta.dirname, "..", "..");
const A = process.env.APP_URL ?? "http://127.0.0.1:3100";
const children: { name: string; child: ChildProcess; log: string[] }[] = [];

function start(name: string, command: string, args: string[], env: Record<string, string>) {
  const child = spawn(command, args, { cwd: ROOT, env: { ...process.env, ...env }, stdio: ["ignore", "pipe", "pipe"] });
  const entry = { name, child, log: [] as string[] };
  child.stdout!.on("data", (d: Buffer) => entry.log.push(...d.toString().split("\n").filter(Boolean)));
  child.stderr!.on("data", (d: Buffer) => entry.log.push(...d.toString().split("\n").filter(Boolean)));
  children.push(entry);
  return entry;
}

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

async function until<T>(what: string, probe: () => Promise<T | undefined | false>, seconds = 60): Promise<T> {
  for (let i = 0; i < seconds * 4; i++) {
    const got = await probe().catch(() => undefined);
    if (got) return got;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`timed out waiting for ${what}:\n${children.map((c) => `${c.name}: ${c.log.slice(-5).join("\n  ")}`).join("\n")}`);
}

test.afterAll(async () => {
  for (const { child } of children) if (child.exitCode === null) child.kill("SIGTERM");
  await Promise.all(children.map(({ child }) => (child.exitCode === null ? new Promise((r) => child.once("exit", r)) : null)));
});

test("two app servers and two workers share sessions, uploads and jobs through the database", async () => {
  test.setTimeout(120_000);
  const portB = await freePort();
  const B = `http://127.0.0.1:${portB}`;
  // B: the same build and settings as A (the same APP_URL, as behind one load balancer), no worker of its own.
  start("server B", process.execPath, ["server/index.mjs"], { PORT: String(portB), HOST: "127.0.0.1", NODE_ENV: "production", BUILD_DIR: "build-test", WORKER: "off" });
  const workers = [start("worker 1", join(ROOT, "node_modules/.bin/tsx"), ["scripts/worker.ts"], {}), start("worker 2", join(ROOT, "node_modules/.bin/tsx"), ["scripts/worker.ts"], {})];
  await until("server B", async () => (await fetch(`${B}/api/health`)).ok);
  for (const w of workers) await until(w.name, async () => w.log.some((l) => l.includes("[worker] started")));

  // Sessions: sign in on A, use the cookie on B.
  const signIn = await fetch(`${A}/api/auth/sign-in/email`, { method: "POST", headers: { "content-type": "application/json", origin: A }, body: JSON.stringify({ email: "engineer@demo.isotrope.test", password: demoPassword }) });
  expect(signIn.status).toBe(200);
  const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  expect(cookie).toContain("session_token");
  const json = (url: string, init: RequestInit = {}) => fetch(url, { ...init, headers: { cookie, origin: A, ...(init.body && typeof init.body === "string" ? { "content-type": "application/json" } : {}), ...init.headers } });
  const meB = await json(`${B}/api/v1/me`);
  expect(meB.status).toBe(200);
  expect(await meB.json()).toMatchObject({ email: "engineer@demo.isotrope.test", role: "engineer" });

  // A small site of our own, made on A and read on B.
  const name = `Two servers ${Date.now().toString(36)}`;
  const made = await json(`${A}/api/v1/sites`, { method: "POST", body: JSON.stringify({ name, kind: "rooftop", city: "Pairton" }) });
  expect(made.status).toBe(201);
  const siteId = (await made.json()).site.id as string;
  expect((await json(`${B}/api/v1/sites/${siteId}/surfaces`, { method: "PUT", body: JSON.stringify({ surfaces: [{ name: "Roof", kind: "area", polygon: [[0, 0], [8, 0], [8, 6], [0, 6]], elevationM: 0, access: "workers" }] }) })).status).toBe(200);
  expect((await json(`${A}/api/v1/sites/${siteId}/emitters`, { method: "PUT", body: JSON.stringify({ emitters: [{ label: "P-1", frequencyMHz: 1900, powerPerCarrierW: 20, gain: 15, gainUnit: "dBi", azimuthDeg: 90, position: { x: 1, y: 3, z: 2 } }] }) })).status).toBe(200);

  // Uploads: a photo sent to A, served by B (the bytes live in PostgreSQL).
  const visit = await json(`${A}/api/v1/sites/${siteId}/visits`, { method: "POST", body: JSON.stringify({ visitedOn: "2026-06-01" }) });
  expect(visit.status).toBe(201);
  const visitId = (await visit.json()).visit.id as string;
  const png = await sharp({ create: { width: 32, height: 24, channels: 3, background: { r: 40, g: 90, b: 160 } } }).png().toBuffer();
  const form = new FormData();
  form.append("photo", new Blob([new Uint8Array(png)], { type: "image/png" }), "roof.png");
  const upload = await fetch(`${A}/api/v1/visits/${visitId}/photos`, { method: "POST", headers: { cookie, origin: A }, body: form });
  expect(upload.status).toBe(201);
  const photo = (await upload.json()).photo as { url: string };
  const fromA = await fetch(`${A}${photo.url}`, { headers: { cookie } });
  const fromB = await fetch(`${B}${photo.url}`, { headers: { cookie } });
  expect(fromB.status).toBe(200);
  expect(Buffer.from(await fromB.arrayBuffer()).equals(Buffer.from(await fromA.arrayBuffer()))).toBe(true);

  // Jobs: freeze on B, then draft three documents through A and three through B; each queues a render.
  const frozen = await json(`${B}/api/v1/sites/${siteId}/assessments`, { method: "POST", body: JSON.stringify({ name: "Shared baseline", standard: "fcc", tier: "general", gridStepM: 1 }) });
  expect(frozen.status).toBe(201);
  const assessmentId = (await frozen.json()).assessment.id as string;
  const ids: string[] = [];
  for (const server of [A, B]) {
    for (const kind of ["report", "letter", "certificate"]) {
      const drafted = await fetch(`${server}/sites/${siteId}/documents`, { method: "POST", redirect: "manual", headers: { cookie, origin: A, "content-type": "application/x-www-form-urlencoded" }, body: new URLSearchParams({ assessmentId, kind }) });
      expect(drafted.status, `${kind} via ${server}`).toBe(302);
      ids.push(drafted.headers.get("location")!.split("/").pop()!);
    }
  }
  const sql = postgres(process.env.DATABASE_URL!, { max: 1, onnotice: () => {} });
  try {
    const rows = await until("every render to finish", async () => {
      const got = await sql<{ id: string; render_status: string; render_attempts: number }[]>`select id, render_status, render_attempts from document where id = any(${ids})`;
      return got.length === ids.length && got.every((r) => r.render_status === "ready") ? got : undefined;
    }, 90);
    for (const r of rows) expect(r.render_attempts, r.id).toBe(1);
    const jobs = await sql<{ id: string; n: number; state: string; retries: number }[]>`
      select data->>'documentId' as id, count(*)::int as n, min(state::text) as state, max(retry_count)::int as retries
      from pgboss.job where name = 'document-render' and data->>'documentId' = any(${ids}) group by 1`;
    expect(jobs.map((j) => j.id).sort()).toEqual([...ids].sort());
    for (const j of jobs) expect(j, j.id).toMatchObject({ n: 1, retries: 0 });
  } finally {
    await sql.end();
  }
  // Who rendered what (figures, not asserted: the stack's app A renders too, and its log is not ours).
  const byWorker = workers.map((w) => `${w.name}: ${ids.filter((id) => w.log.some((l) => l.includes(`rendered`) && l.includes(id))).length}`);
  console.log(`[many-copies] renders of ${ids.length} documents: ${byWorker.join(", ")}, app A: the rest`);
  // Each rendered exactly once across our processes, too.
  for (const id of ids) expect(workers.flatMap((w) => w.log).filter((l) => l.includes("rendered") && l.includes(id)).length, id).toBeLessThanOrEqual(1);

  // Both servers hand out the same PDF.
  for (const id of [ids[0], ids[5]]) {
    const a = Buffer.from(await (await fetch(`${A}/api/v1/documents/${id}/pdf`, { headers: { cookie } })).arrayBuffer());
    const b = Buffer.from(await (await fetch(`${B}/api/v1/documents/${id}/pdf`, { headers: { cookie } })).arrayBuffer());
    expect(a.subarray(0, 5).toString()).toBe("%PDF-");
    expect(b.equals(a)).toBe(true);
  }
});
