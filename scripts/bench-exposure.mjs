// Issue 8 §10: figures for the Exposure page on the demo rooftop (Calloway House) at 0.25 m over
// 0–2 m (11 heights): the loader's server time (first opening, result from PostgreSQL, result in
// memory; scripts/bench-exposure-loader.ts), the page in Chromium (time to first byte, hydrated),
// the what-if recompute and redraw time, and the 3D view's first frame. Prints figures, asserts
// nothing. Needs the built app and the seeded stack:
//   BUILD_DIR=build-test npm run -s build && WITH_APP=1 npm run -s with-stack -- npm run -s bench:exposure -- [runs]
// The machine's load average is printed first: on a shared machine the figures are that much slower.
// SKIP_LOADER=1 leaves out the loader's figures, SKIP_SOLID=1 the 3D view's; RAW=1 prints each what-if
// edit's phases (ms after the edit: worker started, answer posted, handled, committed, painted).
import { execFileSync } from "node:child_process";
import { cpus, loadavg } from "node:os";
import { chromium } from "playwright-core";
import { demoExposureUrl } from "./bench-support.mjs";

const base = process.env.APP_URL ?? "http://127.0.0.1:3100";
const runs = Number(process.argv[2] ?? 8);
const stats = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const q = (p) => s[Math.min(s.length - 1, Math.floor(p * s.length))];
  return `n=${s.length} min ${s[0].toFixed(0)} median ${q(0.5).toFixed(0)} p90 ${q(0.9).toFixed(0)} max ${s[s.length - 1].toFixed(0)} ms`;
};

console.log(`load average ${loadavg().map((l) => l.toFixed(1)).join(" / ")} on ${cpus().length} cores`);
if (process.env.SKIP_LOADER !== "1") execFileSync("npx", ["tsx", "scripts/bench-exposure-loader.ts", String(Math.max(2, Math.ceil(runs / 3)))], { stdio: "inherit" });

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM ?? "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--enable-unsafe-swiftshader", "--use-angle=swiftshader"],
});
const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
const url = await demoExposureUrl(page, base);

// 1. The loader: the computation's own time (measured in the loader) and the document's time to first byte.
const compute = [];
const ttfb = [];
const hydrated = [];
for (let i = 0; i < Math.max(3, Math.ceil(runs / 2)); i++) {
  const t0 = Date.now();
  await page.goto(url);
  await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
  hydrated.push(Date.now() - t0);
  const nav = await page.evaluate(() => performance.getEntriesByType("navigation")[0].toJSON());
  ttfb.push(nav.responseStart - nav.requestStart);
  const text = await page.getByTestId("what-if-state").innerText();
  compute.push(Number(/server in ([\d.]+)/.exec(text.replace(/\s+/g, " "))?.[1] ?? NaN));
}
const size = await page.evaluate(() => document.documentElement.outerHTML.length);
console.log(`page says computed on the server in:           ${stats(compute)} (when the result was first computed)`);
console.log(`document time to first byte:                  ${stats(ttfb)}`);
console.log(`navigation to hydrated page:                  ${stats(hydrated)}`);
console.log(`HTML size: ${(size / 1024).toFixed(0)} KiB`);

// 2. What-if: wait for the worker to have every emitter's layers, then edit and time each answer.
await page.waitForFunction(() => !document.querySelector("[data-testid=what-if-state]")?.textContent?.includes("Preparing"), null, { timeout: 120_000 });
await page.evaluate(() => (window.__exposureTimings = []));
const toggle = page.getByLabel("NW-A19 on");
for (let i = 0; i < runs; i++) {
  if (i % 2 === 0) {
    await toggle.uncheck();
    await page.locator("[data-testid=exposure-results][data-what-if=on][data-what-if-pending=false]").waitFor();
  } else {
    await toggle.check();
    await page.locator("[data-testid=exposure-results][data-what-if=off]").waitFor();
    // Back to the stored inventory draws the loader's result: no worker round trip to time.
  }
  await page.waitForTimeout(150);
}
const power = page.locator("[data-emitter-row='SM-3-2100'] input[id$='-power']");
for (let i = 0; i < runs; i++) {
  await power.fill(String(-(i % 6) - 1));
  await page.locator("[data-testid=exposure-results][data-what-if=on][data-what-if-pending=false]").waitFor();
  await page.waitForTimeout(150);
}
await page.evaluate(() => (window.__lastSwitch = window.__exposureTimings.length));
const tilt = page.locator("[data-emitter-row='SM-3-2100'] input[id$='-tilt']");
for (let i = 0; i < Math.ceil(runs / 2); i++) {
  await tilt.fill(String(5 + i));
  await page.locator("[data-testid=exposure-results][data-what-if=on][data-what-if-pending=false]").waitFor();
  await page.waitForTimeout(150);
}
const timings = await page.evaluate(() => ({ all: window.__exposureTimings, split: window.__lastSwitch }));
if (process.env.RAW === "1") for (const t of timings.all) console.log(JSON.stringify(Object.fromEntries(Object.entries(t).map(([k, v]) => [k, Math.round(v)]))));
const weightOnly = timings.all.slice(0, timings.split);
const geometry = timings.all.slice(timings.split);
console.log(`what-if, off / power edits (re-weighted layers): worker compute ${stats(weightOnly.map((t) => t.computeMs))}`);
console.log(`                                      maps' geometry in the worker ${stats(weightOnly.map((t) => t.geometryMs ?? 0))}`);
console.log(`                                      edit → result in the page ${stats(weightOnly.map((t) => t.resultMs))}`);
console.log(`                                      edit → next frame painted ${stats(weightOnly.filter((t) => t.paintedMs).map((t) => t.paintedMs))}`);
// Where the time of an off/power edit goes, one phase after the other (medians; the worker's clock is aligned on the wall clock).
const phased = weightOnly.filter((t) => t.paintedMs && t.committedMs && t.postedMs);
const phase = (f) => (phased.length ? stats(phased.map(f)) : "(not recorded by this build)");
console.log(`  phases: edit → worker starts               ${phase((t) => t.startedMs)}`);
console.log(`          worker: compute + geometry         ${phase((t) => t.postedMs - t.startedMs)}`);
console.log(`          answer posted → handled by the page ${phase((t) => t.resultMs - t.postedMs)}`);
console.log(`          handled → React committed          ${phase((t) => t.committedMs - t.resultMs)}`);
console.log(`          committed → next frame painted     ${phase((t) => t.paintedMs - t.committedMs)}`);
console.log(`what-if, tilt edits (one emitter re-evaluated):  worker compute ${stats(geometry.map((t) => t.computeMs))}`);
console.log(`                                      edit → result in the page ${stats(geometry.map((t) => t.resultMs))}`);
console.log(`                                      edit → next frame painted ${stats(geometry.filter((t) => t.paintedMs).map((t) => t.paintedMs))}`);

// 3. The 3D view's first frame: from the page starting the worker (grid + marching cubes) and loading three.js to the first rendered frame.
const first = [];
for (let r = 0; process.env.SKIP_SOLID !== "1" && r < Math.max(2, Math.ceil(runs / 3)); r++) {
  await page.goto(`${url}/solid`);
  await page.getByTestId("solid-summary").waitFor({ timeout: 120_000 });
  const [d] = await page.evaluate(() => performance.getEntriesByName("solid-first-frame").map((m) => m.detail));
  first.push(d.firstFrameMs);
}
if (first.length) console.log(`3D view, first frame after start (software WebGL):  ${stats(first)}`);
console.log(`load average ${loadavg().map((l) => l.toFixed(1)).join(" / ")} at the end`);
await browser.close();
