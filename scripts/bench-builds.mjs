// Two builds of the portal compared on one machine that other work keeps busy: both builds' request
// handlers are loaded into this one process and take turns in rounds of requests (no network, no
// server), and each round's CPU time per request is read with process.cpuUsage(). A neighbour's load
// weighs on both alike, so the paired rounds separate a 10 % change that HTTP runs cannot. Prints
// figures; asserts nothing. Run under the test stack (it needs DATABASE_URL and the auth secret):
//   BUILD_DIR=build-a npm run -s build   # on the other tree (e.g. a worktree of main), copied here
//   BUILD_DIR=build-b npm run -s build
//   npm run -s with-stack -- node scripts/bench-builds.mjs build-a build-b / /sites
// BENCH_ROUNDS (default 8), BENCH_PER_ROUND (requests per path per round, default 100), BENCH_EMAIL
// (default the demo owner), BENCH_COOKIE (a session cookie to use instead of signing in, e.g. the one
// `BENCH_SEED_ONLY=1 bench:inventory` prints), BENCH_PROFILE=<file> (a CPU profile of the second
// build's requests, for chrome://inspect or any .cpuprofile viewer). Paths may name :site
// (BENCH_SITE). Both builds share one database pool, so their prepared statements must not clash.
import { pathToFileURL } from "node:url";
import { writeFileSync } from "node:fs";
import { Session } from "node:inspector/promises";

const [dirA, dirB, ...rawPaths] = process.argv.slice(2);
if (!dirA || !dirB || rawPaths.length === 0) throw new Error("usage: node scripts/bench-builds.mjs BUILD_A BUILD_B PATH [PATH …]");
// Before React loads (it picks its production or development build from NODE_ENV when first imported).
process.env.NODE_ENV = "production";
process.env.WORKER = "off";
const { createRequestHandler } = await import("react-router");
const base = (process.env.APP_URL ?? "http://127.0.0.1:3100").replace(/\/$/, "");
const rounds = Number(process.env.BENCH_ROUNDS ?? 8);
const perRound = Number(process.env.BENCH_PER_ROUND ?? 100);
const paths = rawPaths.map((p) => p.replaceAll(":site", process.env.BENCH_SITE ?? ":site"));
const builds = [dirA, dirB];
const handlers = [];
for (const dir of builds) handlers.push(createRequestHandler(await import(pathToFileURL(`${process.cwd()}/${dir}/server/index.js`).href), "production"));

async function signIn() {
  const address = `10.77.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`; // its own sign-in throttle bucket
  const response = await handlers[0](
    new Request(`${base}/sign-in`, {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded", origin: base, "x-forwarded-for": address },
      body: new URLSearchParams({ email: process.env.BENCH_EMAIL ?? "owner@demo.isotrope.test", password: process.env.DEMO_PASSWORD ?? "isotrope-demo" }),
    }),
  );
  const cookie = response.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  if (!cookie.includes("session_token")) throw new Error(`sign-in failed: HTTP ${response.status}`);
  return cookie;
}
const cookie = process.env.BENCH_COOKIE ?? (await signIn());

async function one(handler, path) {
  const response = await handler(new Request(base + path, { headers: { cookie } }));
  const body = await response.arrayBuffer();
  return { status: response.status, bytes: body.byteLength };
}

for (const path of paths) {
  const answers = [];
  for (const handler of handlers) answers.push(await one(handler, path));
  console.log(path, builds.map((dir, i) => `${dir}: HTTP ${answers[i].status}, ${answers[i].bytes} bytes`).join("; "));
  if (answers.some((a) => a.status !== 200)) throw new Error(`${path} did not answer 200 in both builds`);
}
for (const handler of handlers) for (let k = 0; k < 50; k++) for (const path of paths) await one(handler, path); // warm-up

const perRequest = builds.map(() => []);
for (let r = 0; r < rounds; r++) {
  for (const [i, handler] of handlers.entries()) {
    const start = process.cpuUsage();
    for (let k = 0; k < perRound; k++) for (const path of paths) await one(handler, path);
    const used = process.cpuUsage(start);
    perRequest[i].push((used.user + used.system) / 1000 / perRound / paths.length);
  }
}

if (process.env.BENCH_PROFILE) {
  const session = new Session();
  session.connect();
  await session.post("Profiler.enable");
  await session.post("Profiler.setSamplingInterval", { interval: 200 });
  await session.post("Profiler.start");
  for (let k = 0; k < perRound; k++) for (const path of paths) await one(handlers[1], path);
  const { profile } = await session.post("Profiler.stop");
  writeFileSync(process.env.BENCH_PROFILE, JSON.stringify(profile));
}

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const bFaster = perRequest[1].filter((x, r) => x < perRequest[0][r]).length;
console.log(`load average ${(await import("node:os")).loadavg().map((x) => x.toFixed(1)).join(" ")}; ${rounds} rounds × ${perRound} requests per path`);
for (const [i, dir] of builds.entries()) console.log(`${dir}: CPU ms/request median ${median(perRequest[i]).toFixed(2)} (rounds: ${perRequest[i].map((x) => x.toFixed(2)).join(" ")})`);
console.log(`${dirB} used less CPU than ${dirA} in ${bFaster} of ${rounds} rounds`);
process.exit(0);
