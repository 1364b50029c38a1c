// Exposure views in Chromium, on the demo rooftop (Calloway House, 14 emitters): prints
//   - the elevation view's compute time (cut geometry, the engine over the cut for both tiers and the
//     100 % contours), for the default cut and each emitter's boresight cut;
//   - the 3D view's first frame: from the page starting the worker (grid + marching cubes) and loading
//     three.js to the first rendered frame, and the worker's compute time, over BENCH_RUNS page loads.
// Figures from the pages' own performance marks ("section-computed", "solid-first-frame"); asserts nothing.
//   BUILD_DIR=build-test npm run -s build && WITH_APP=1 npm run -s with-stack -- node scripts/bench-views.mjs
// WebGL runs on Chromium's software renderer (no GPU here): a GPU is faster.
import { chromium } from "@playwright/test";

const base = (process.env.APP_URL ?? "http://127.0.0.1:3100").replace(/\/$/, "");
const runs = Number(process.env.BENCH_RUNS ?? 5);
const browser = await chromium.launch({
  executablePath: "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--enable-unsafe-swiftshader", "--use-angle=swiftshader", "--no-first-run"],
});
const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
const hydrated = () => page.locator("html[data-hydrated]").waitFor({ state: "attached" });

await page.goto(`${base}/sign-in`);
await hydrated();
await page.getByLabel("E-mail").fill(process.env.BENCH_EMAIL ?? "engineer@demo.isotrope.test");
await page.getByLabel("Password").fill(process.env.DEMO_PASSWORD ?? "isotrope-demo");
await page.getByRole("button", { name: "Sign in" }).click();
await page.getByRole("button", { name: "Sign out" }).waitFor();
await page.goto(`${base}/sites`);
const site = await page.getByRole("link", { name: "Calloway House" }).first().getAttribute("href");

const marks = (name) => page.evaluate((n) => performance.getEntriesByName(n).map((m) => m.detail), name);
const stats = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const q = (p) => s[Math.min(s.length - 1, Math.floor(p * s.length))];
  return `median ${q(0.5).toFixed(0)} ms, min ${s[0].toFixed(0)} ms, max ${s[s.length - 1].toFixed(0)} ms (n = ${s.length})`;
};

// Elevation view: the default cut, then every emitter's boresight cut.
await page.goto(`${base}${site}/exposure/section`);
await hydrated();
await page.getByTestId("section-summary").waitFor();
const options = await page.getByLabel("Cut through").locator("option").allTextContents();
for (const label of options.filter((o) => o.includes("boresight"))) {
  const before = (await marks("section-computed")).length;
  await page.getByLabel("Cut through").selectOption({ label });
  await page.waitForFunction((n) => performance.getEntriesByName("section-computed").length > n, before);
}
const section = (await marks("section-computed")).map((d) => d.ms);
const summary = await page.getByTestId("section-summary").innerText();
console.log(`elevation view, compute per cut: ${stats(section)}; last cut: ${summary.replace(/\s+/g, " ").match(/\(([^)]*points[^)]*)\)/)?.[1] ?? ""}`);

// 3D view: fresh page loads.
const first = [];
const compute = [];
let grid = "";
for (let r = 0; r < runs; r++) {
  await page.goto(`${base}${site}/exposure/solid`);
  await page.getByTestId("solid-summary").waitFor({ timeout: 120_000 });
  const [d] = await marks("solid-first-frame");
  first.push(d.firstFrameMs);
  compute.push(d.computeMs);
  grid = (await page.getByTestId("solid-summary").innerText()).match(/Grid of [^;]*/)?.[0] ?? "";
}
console.log(`3D view, first frame after start: ${stats(first)}`);
console.log(`3D view, worker compute (grid both tiers + marching cubes): ${stats(compute)}; ${grid}`);
await browser.close();
