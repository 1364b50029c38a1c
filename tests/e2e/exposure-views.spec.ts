// The engineer opens the demo rooftop's elevation view (the 100 % boundaries are labelled), its 3D
// view (a WebGL canvas with a real picture in it), and the work-area planner, where they draw an
// area in front of a low sector and read which emitters to turn down and the map after.
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import sharp from "sharp";
import config from "./playwright.config";
import { shot, signIn, visit } from "./helpers";

// WebGL without a GPU: Chromium's software renderer, which recent versions enable only on request.
test.use({ launchOptions: { ...config.use?.launchOptions, args: [...(config.use?.launchOptions?.args ?? []), "--enable-unsafe-swiftshader", "--use-angle=swiftshader"] } });

async function demoSite(page: Page) {
  await signIn(page, "engineer@demo.isotrope.test");
  await visit(page, "/sites");
  const href = await page.getByRole("link", { name: "Calloway House" }).first().getAttribute("href");
  expect(href).toMatch(/^\/sites\/[0-9a-f-]+$/);
  return href!;
}

test("elevation view: the cut along the strongest sector with both tiers' 100 % boundaries", async ({ page }, info) => {
  const site = await demoSite(page);
  const scripts: string[] = [];
  page.on("request", (r) => { if (r.resourceType() === "script") scripts.push(r.url()); });
  await visit(page, `${site}/exposure/section?standard=fcc&tier=general`);
  await expect(page.getByRole("heading", { name: /Elevation view/ })).toBeVisible();
  const chart = page.getByRole("img", { name: "Elevation view along the cut" });
  await expect(chart.getByText("100 % general population")).toBeVisible();
  await expect(chart.getByText("100 % occupational")).toBeVisible();
  await expect(chart.getByText(/Main roof \+0\.0 m/)).toBeVisible();
  await expect(page.getByTestId("section-summary")).toContainText("Highest on this cut");
  await expect(page.getByRole("complementary", { name: "RF safety cautions" })).toBeVisible();
  // Pointing at the drawing reads the value there for both tiers.
  const c = (await chart.boundingBox())!;
  await page.mouse.move(c.x + c.width * 0.3, c.y + c.height * 0.5);
  await expect(page.getByTestId("section-readout")).toContainText(/m along, .* m high: .* of the general population limit · .* of the occupational limit/);
  await shot(page, info, "section-default");

  // Another cut: along an emitter on the penthouse; then one drawn by two clicks on the plan.
  await page.getByLabel("Cut through").selectOption({ label: "NW-B19 along its boresight (140°)" });
  await expect(chart.getByText("NW-B19")).toBeVisible();
  const plan = page.getByRole("img", { name: "Plan: where the cut runs" });
  const box = (await plan.boundingBox())!;
  await page.mouse.click(box.x + box.width * 0.2, box.y + box.height * 0.5);
  await page.mouse.click(box.x + box.width * 0.8, box.y + box.height * 0.5);
  await expect(page.getByLabel("Cut through")).toHaveValue("points");
  await expect(page.getByText(/Cut from A \(/)).toBeVisible();
  await shot(page, info, "section-clicked");

  // three.js is loaded by the 3D view only.
  expect(scripts.length).toBeGreaterThan(0);
  expect(scripts.filter((u) => /solid-scene/.test(u))).toEqual([]);

  // Back to the Exposure page, with the options.
  await expect(page.getByRole("link", { name: "← Exposure" })).toHaveAttribute("href", `${site}/exposure?standard=fcc&tier=general`);
});

test("3D view: the boundary solids render in a canvas that is not blank", async ({ page }, info) => {
  const site = await demoSite(page);
  const errors: string[] = [];
  page.on("console", (m) => { if (m.type() === "error") errors.push(m.text()); });
  const response = await visit(page, `${site}/exposure/solid`);
  // The worker is allowed by the page's policy, and nothing needs eval.
  const csp = response!.headers()["content-security-policy"];
  expect(csp).toContain("worker-src 'self' blob:");
  expect(csp).not.toContain("unsafe-eval");
  await expect(page.getByTestId("solid-summary")).toContainText("Grid of", { timeout: 90_000 });
  expect(errors).toEqual([]);
  const canvas = page.getByTestId("solid-canvas");
  await expect(canvas).toBeVisible();
  const { data, info: raw } = await sharp(await canvas.screenshot()).raw().toBuffer({ resolveWithObject: true });
  const colours = new Set<number>();
  let notBackground = 0;
  for (let p = 0; p < data.length; p += raw.channels) {
    colours.add((data[p] << 16) | (data[p + 1] << 8) | data[p + 2]);
    if (data[p] + data[p + 1] + data[p + 2] < 3 * 245) notBackground++;
  }
  // Slabs, blocks, antennas and two translucent solids, shaded: many colours over a good part of the picture.
  expect(colours.size).toBeGreaterThan(200);
  expect(notBackground / (raw.width * raw.height)).toBeGreaterThan(0.1);

  // Dragging turns the view: the picture changes.
  const before = await canvas.screenshot();
  const b = (await canvas.boundingBox())!;
  await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2);
  await page.mouse.down();
  await page.mouse.move(b.x + b.width / 2 + 150, b.y + b.height / 2 + 40, { steps: 8 });
  await page.mouse.up();
  expect(Buffer.compare(before, await canvas.screenshot())).not.toBe(0);

  // Hiding the general-population solid changes the picture too.
  const shown = await canvas.screenshot();
  await page.getByLabel("general population").uncheck();
  expect(Buffer.compare(shown, await canvas.screenshot())).not.toBe(0);
  await shot(page, info, "solid");

  // A finer grid: computed again, a smaller step.
  const coarse = await page.getByTestId("solid-summary").innerText();
  await page.getByLabel("Grid").selectOption("fine");
  await expect(page.getByTestId("solid-summary")).not.toHaveText(coarse, { timeout: 120_000 });
  await expect(page.getByTestId("solid-summary")).toContainText("Grid of");
  const step = (text: string) => Number(text.match(/points, ([\d.]+)\s*m apart/)![1]);
  expect(step(await page.getByTestId("solid-summary").innerText())).toBeLessThan(step(coarse));
  await page.getByLabel("general population").check();
  await shot(page, info, "solid-fine");
});

test("planner: a work area in front of the west sector, the plan and the map after", async ({ page }, info) => {
  const site = await demoSite(page);
  await visit(page, `${site}/exposure/planner`);
  const plan = page.getByRole("img", { name: /click the corners/ });
  // Site metres to the screen through the plan's own frame (its data-bounds and viewBox).
  const [minX, , maxX, maxY] = (await plan.getAttribute("data-bounds"))!.split(" ").map(Number);
  const [, , vbW, vbH] = (await plan.getAttribute("viewBox"))!.split(" ").map(Number);
  const box = (await plan.boundingBox())!;
  const k = box.width / vbW;
  const scale = vbW / (maxX - minX);
  expect(Math.abs(box.height / k - vbH)).toBeLessThan(2);
  const at = (x: number, y: number) => [box.x + (x - minX) * scale * k, box.y + (maxY - y) * scale * k] as const;
  // The square x 2…8 m, y 9…15 m on the main roof, in front of SM-3-2100 (at x 0.4 m, y 12 m, facing 70°).
  for (const [x, y] of [[2, 9], [8, 9], [8, 15], [2, 15]] as const) await page.mouse.click(...at(x, y));
  await expect(page.getByTestId("planner-corners")).toHaveText("4 corners");
  await page.mouse.click(...at(2.1, 9.1)); // the first corner again closes it
  await expect(page.getByTestId("planner-corners")).toContainText("closed");
  await expect(page.getByLabel("Limit to keep the work area under")).toHaveValue("occupational");
  await expect(page.getByLabel("Level the area is on")).toContainText("the level under the area (Main roof)");

  // For trained workers (spatial average over 0–2 m) the area is within the occupational limit already.
  const summary = page.getByTestId("planner-summary");
  await expect(summary).toContainText("of the occupational limit now");
  await expect(summary).toContainText("The area is within the limit already");
  await expect(page.getByRole("img", { name: "Map of Main roof after the changes" })).toBeVisible();
  await shot(page, info, "planner-occupational");

  // Against the general-population limit the west sector has to give.
  await page.getByLabel("Limit to keep the work area under").selectOption("general");
  await expect(summary).toContainText("of the general population limit now");
  await expect(summary).toContainText("100 % after the changes");
  const table = page.getByRole("table", { name: "Emitters to reduce or switch off" });
  await expect(table.getByRole("row", { name: /SM-3-2100/ })).toContainText(/reduce power|switch off/);
  await expect(page.getByRole("img", { name: "Map of Main roof after the changes" })).toBeVisible();
  await shot(page, info, "planner-general");
});

test("on a phone the three pages fit the width and pass axe", async ({ page }, info) => {
  await page.setViewportSize({ width: 390, height: 844 });
  const site = await demoSite(page);
  for (const [view, ready] of [["section", "section-summary"], ["solid", "solid-summary"], ["planner", null]] as const) {
    await visit(page, `${site}/exposure/${view}`);
    if (ready) await expect(page.getByTestId(ready)).toBeVisible({ timeout: 90_000 });
    const overflow = await page.evaluate(() => document.scrollingElement!.scrollWidth - window.innerWidth);
    expect.soft(overflow, `${view}: wider than the window`).toBeLessThanOrEqual(0);
    const axe = await new AxeBuilder({ page }).analyze();
    expect.soft(axe.violations.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => `${v.id}: ${v.help} (${v.nodes[0]?.target})`), view).toEqual([]);
    await shot(page, info, `390-${view}`);
  }
});
