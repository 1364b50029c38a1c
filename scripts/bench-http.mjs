// HTTP throughput of a running Isotrope: /api/health, /api/v1/me and the signed-in overview in one
// run, with autocannon. Starts nothing: point it at a server (`npm start`, or the test stack, see
// DEVELOPERS.md). The targets take turns in short rounds, so that a busy neighbour on a shared
// machine weighs on all three alike. Prints figures; asserts nothing.
//   npm run -s bench:http -- [base URL]      BENCH_SECONDS=10 BENCH_ROUNDS=3 BENCH_CONNECTIONS=10
// With APP_PID (set by `with-stack` when it starts the app) it also prints the server's CPU time
// per request, read from /proc: a figure that a busy machine disturbs far less than requests/s.
import autocannon from "autocannon";
import { appPid, serverCpuMs } from "./bench-support.mjs";

const base = (process.argv[2] ?? process.env.BENCH_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
const seconds = Number(process.env.BENCH_SECONDS ?? 10);
const rounds = Number(process.env.BENCH_ROUNDS ?? 3);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 10);
const email = process.env.BENCH_EMAIL ?? "owner@demo.isotrope.test";
const password = process.env.DEMO_PASSWORD ?? "isotrope-demo";

/** Signs in through the sign-in page, as a browser without JavaScript would, and returns the cookies. */
async function signIn() {
  const response = await fetch(`${base}/sign-in`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", origin: base },
    body: new URLSearchParams({ email, password }),
  });
  const cookie = response.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  if (response.status !== 302 || !cookie.includes("session_token")) throw new Error(`sign-in as ${email} failed: HTTP ${response.status}`);
  return cookie;
}

/** One autocannon run. @returns {Promise<import("autocannon").Result>} */
function run(path, headers, duration) {
  return new Promise((resolve, reject) => {
    autocannon({ url: `${base}${path}`, connections, duration, headers }, (error, result) => (error ? reject(error) : resolve(result)));
  });
}


const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
  const cookie = await signIn();
  for (const path of ["/api/v1/me", "/"]) {
    const check = await fetch(`${base}${path}`, { headers: { cookie }, redirect: "manual" });
    if (check.status !== 200) throw new Error(`${path} answered ${check.status} with the bench session`);
  }
  const targets = [
    { name: "/api/health", path: "/api/health", headers: {} },
    { name: "/api/v1/me", path: "/api/v1/me", headers: { cookie } },
    { name: "/ (overview, signed in)", path: "/", headers: { cookie } },
  ];
  console.log(`${base}: ${connections} connections, ${rounds} rounds × ${(seconds / rounds).toFixed(1)} s per target, signed in as ${email}`);
  for (const t of targets) await run(t.path, t.headers, 1); // warm-up, not counted
  const results = targets.map(() => []);
  const cpu = targets.map(() => 0);
  for (let r = 0; r < rounds; r++) {
    for (const [i, t] of targets.entries()) {
      const before = serverCpuMs();
      results[i].push(await run(t.path, t.headers, seconds / rounds));
      const after = serverCpuMs();
      if (before !== null && after !== null) cpu[i] += after - before;
    }
  }
  const rows = targets.map((t, i) => {
    const runs = results[i];
    const total = runs.reduce((n, x) => n + x.requests.total, 0);
    const time = runs.reduce((n, x) => n + x.duration, 0);
    return {
      target: t.name,
      "req/s": Math.round(total / time),
      "p50 ms (median of rounds)": median(runs.map((x) => x.latency.p50)),
      "p99 ms (worst round)": Math.max(...runs.map((x) => x.latency.p99)),
      requests: total,
      "non-2xx": runs.reduce((n, x) => n + x.non2xx, 0),
      errors: runs.reduce((n, x) => n + x.errors + x.timeouts, 0),
      ...(appPid ? { "server CPU ms/request": Number((cpu[i] / total).toFixed(2)) } : {}),
    };
  });
  console.table(rows);
  console.log(`overview / health throughput: ${((100 * rows[2]["req/s"]) / rows[0]["req/s"]).toFixed(0)} %`);
  if (appPid) console.log(`health / overview server CPU per request: ${((100 * cpu[0] / rows[0].requests) / (cpu[2] / rows[2].requests)).toFixed(0)} %`);
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
