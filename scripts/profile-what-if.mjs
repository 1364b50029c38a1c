// Profiles the Exposure page's main thread during what-if power edits (CDP Profiler) and prints the
// functions with the most self time. Needs the built app and the seeded stack, as bench-exposure.mjs:
//   WITH_APP=1 npm run -s with-stack -- node scripts/profile-what-if.mjs [edits]
import { chromium } from "playwright-core";
import { demoExposureUrl } from "./bench-support.mjs";

const base = process.env.APP_URL ?? "http://127.0.0.1:3100";
const edits = Number(process.argv[2] ?? 8);
const browser = await chromium.launch({ executablePath: process.env.CHROMIUM ?? "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu"] });
const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
await page.goto(await demoExposureUrl(page, base));
await page.waitForFunction(() => !document.querySelector("[data-testid=what-if-state]")?.textContent?.includes("Preparing"), null, { timeout: 120_000 });
const power = page.locator("[data-emitter-row='SM-3-2100'] input[id$='-power']");
await power.fill("-1");
await page.locator("[data-testid=exposure-results][data-what-if=on][data-what-if-pending=false]").waitFor();
const cdp = await page.context().newCDPSession(page);
await cdp.send("Profiler.enable");
await cdp.send("Profiler.setSamplingInterval", { interval: 200 });
await cdp.send("Profiler.start");
const t0 = Date.now();
for (let i = 0; i < edits; i++) {
  await power.fill(String(-(i % 5) - 2));
  await page.locator("[data-testid=exposure-results][data-what-if=on][data-what-if-pending=false]").waitFor();
  await page.waitForTimeout(150);
}
const wall = Date.now() - t0;
const { profile } = await cdp.send("Profiler.stop");
const dt = new Map();
profile.samples.forEach((id, k) => dt.set(id, (dt.get(id) ?? 0) + (profile.timeDeltas[k + 1] ?? 0) / 1000));
const byName = new Map();
let busy = 0;
for (const n of profile.nodes) {
  const ms = dt.get(n.id) ?? 0;
  const f = n.callFrame;
  if (f.functionName === "(idle)" || f.functionName === "(program)") continue;
  busy += ms;
  const key = `${f.functionName || "(anonymous)"} ${f.url.split("/").pop()}:${f.lineNumber}:${f.columnNumber}`;
  byName.set(key, (byName.get(key) ?? 0) + ms);
}
console.log(`${edits} edits in ${wall} ms; main thread busy ${busy.toFixed(0)} ms (${(busy / edits).toFixed(1)} ms per edit)`);
for (const [k, ms] of [...byName].sort((a, b) => b[1] - a[1]).slice(0, Number(process.env.TOP ?? 30))) console.log(`${(ms / edits).toFixed(2).padStart(7)} ms/edit  ${k}`);
if (process.env.INCLUSIVE === "1") {
  // Inclusive time (a function with everything it called), for React's components and the page's own functions.
  const parent = new Map();
  for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const total = new Map();
  for (const [id, ms] of dt) {
    const seen = new Set();
    for (let x = id; x !== undefined; x = parent.get(x)) {
      const f = byId.get(x).callFrame;
      const key = `${f.functionName || "(anonymous)"} ${f.url.split("/").pop()}:${f.lineNumber}:${f.columnNumber}`;
      if (seen.has(key)) continue;
      seen.add(key);
      total.set(key, (total.get(key) ?? 0) + ms);
    }
  }
  console.log("inclusive:");
  for (const [k, ms] of [...total].sort((a, b) => b[1] - a[1]).slice(0, Number(process.env.TOP ?? 30))) console.log(`${(ms / edits).toFixed(2).padStart(7)} ms/edit  ${k}`);
}
await browser.close();
