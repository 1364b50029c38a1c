// Sends a generated 1 GB photo upload to a running app and prints what happened: the status,
// how much of the body the server took before answering, and the app's memory before and after.
// Usage (the test stack with the built app):
//   WITH_APP=1 npm run -s with-stack -- node scripts/upload-cutoff.mjs
// Needs the demo engineer (the seed) and APP_URL; reads the app's memory from /proc when it can find it.
import { execSync } from "node:child_process";
import { readFileSync } from "node:fs";

const base = process.env.APP_URL ?? "http://127.0.0.1:3100";
const origin = new URL(base).origin;
const password = process.env.DEMO_PASSWORD ?? "isotrope-demo";

function appRssMb() {
  try {
    const port = new URL(base).port;
    const line = execSync(`ss -ltnpH 'sport = :${port}'`, { encoding: "utf8" });
    const pid = /pid=(\d+)/.exec(line)?.[1];
    const status = readFileSync(`/proc/${pid}/status`, "utf8");
    const kb = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1]);
    const hwm = Number(/VmHWM:\s+(\d+)/.exec(status)?.[1]);
    return { rss: (kb / 1024).toFixed(1), peak: (hwm / 1024).toFixed(1) };
  } catch {
    return { rss: "?", peak: "?" };
  }
}

const signIn = await fetch(`${base}/api/auth/sign-in/email`, { method: "POST", headers: { "content-type": "application/json", origin }, body: JSON.stringify({ email: "engineer@demo.isotrope.test", password }) });
const cookie = (signIn.headers.getSetCookie?.() ?? []).map((c) => c.split(";")[0]).join("; ");
if (!signIn.ok || !cookie) throw new Error(`sign-in failed: ${signIn.status}`);
const json = (path, body) => fetch(`${base}${path}`, { method: "POST", headers: { cookie, origin, "content-type": "application/json" }, body: JSON.stringify(body) }).then((r) => r.json());
const { site } = await json("/api/v1/sites", { name: "Upload cut-off check", kind: "other" });
const { visit } = await json(`/api/v1/sites/${site.id}/visits`, { visitedOn: "2026-01-01" });

const total = 1024 ** 3;
const boundary = "cutoff-check";
const head = new TextEncoder().encode(`--${boundary}\r\nContent-Disposition: form-data; name="photo"; filename="huge.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`);
const chunk = new Uint8Array(256 * 1024).fill(0x41);
let sent = 0;
let started = false;
const body = new ReadableStream({
  pull(controller) {
    if (!started) return void ((started = true), controller.enqueue(head));
    if (sent >= total) return void (controller.enqueue(new TextEncoder().encode(`\r\n--${boundary}--\r\n`)), controller.close());
    sent += chunk.length;
    controller.enqueue(chunk);
  },
});

const before = appRssMb();
const t0 = performance.now();
let status = "connection closed";
try {
  const response = await fetch(`${base}/api/v1/visits/${visit.id}/photos`, { method: "POST", headers: { cookie, origin, "content-type": `multipart/form-data; boundary=${boundary}` }, body, duplex: "half" });
  status = `${response.status} ${(await response.text()).slice(0, 120)}`;
} catch (error) {
  status = `request ended: ${error.cause?.code ?? error.message}`;
}
const after = appRssMb();
console.log(`answer: ${status}`);
console.log(`client sent ${(sent / 1024 / 1024).toFixed(1)} MB of ${(total / 1024 / 1024).toFixed(0)} MB in ${((performance.now() - t0) / 1000).toFixed(2)} s`);
console.log(`app RSS before ${before.rss} MB, after ${after.rss} MB, high-water mark ${after.peak} MB`);
