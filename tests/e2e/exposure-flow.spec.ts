// Issue 8 §9 in one go: the engineer opens Exposure on the demo rooftop and reads the worst point,
// switches an emitter off in what-if and sees the map and the worst point change, draws a work
// area and reads the plan, opens the elevation and 3D views, freezes an assessment, edits an
// emitter in the Emitters section, freezes again and compares the two. A screenshot at each step.
// The emitter is put back afterwards (in the database) so other specs see the demo as seeded.
import { expect, test, type Page } from "@playwright/test";
import postgres from "postgres";
import config from "./playwright.config";
import { shot, signIn, visit } from "./helpers";

// WebGL without a GPU: Chromium's software renderer, which recent versions enable only on request.
test.use({ launchOptions: { ...config.use?.launchOptions, args: [...(config.use?.launchOptions?.args ?? []), "--enable-unsafe-swiftshader", "--use-angle=swiftshader"] } });

const EMITTER = "SM-3-2100";

test.afterAll(async () => {
  const sql = postgres(process.env.DATABASE_URL!, { max: 1, onnotice: () => {} });
  try {
    await sql`update emitter set power_per_carrier_w = 60, power_unit = 'W', version = version + 1
      where label = ${EMITTER} and site_id in (select s.id from site s join member m on m.organization_id = s.organization_id join "user" u on u.id = m.user_id where s.name = 'Calloway House' and u.email = 'engineer@demo.isotrope.test')`;
  } finally {
    await sql.end();
  }
});

const results = (page: Page, what: "on" | "off") => page.locator(`[data-testid=exposure-results][data-what-if=${what}]${what === "on" ? "[data-what-if-pending=false]" : ""}`);

async function freeze(page: Page, name: string) {
  await page.getByLabel("Name").fill(name);
  await page.getByRole("button", { name: "Freeze the assessment" }).click();
  await expect(page.getByRole("heading", { level: 2, name })).toBeVisible({ timeout: 120_000 });
  await expect(page.getByText("Assessment frozen.")).toBeVisible();
}

test("Exposure from the map to two compared assessments", async ({ page }, info) => {
  test.setTimeout(420_000);
  await signIn(page, "engineer@demo.isotrope.test");
  await visit(page, "/sites");
  const site = (await page.getByRole("link", { name: "Calloway House" }).first().getAttribute("href"))!;
  expect(site).toMatch(/^\/sites\/[0-9a-f-]+$/);
  await page.getByRole("link", { name: "Calloway House" }).first().click();
  const sections = page.getByRole("navigation", { name: "Site sections" });

  // 1. The map and the worst point.
  await sections.getByRole("link", { name: "Exposure" }).click();
  const worst = page.getByTestId("site-worst-percent");
  await expect(worst).toBeVisible({ timeout: 120_000 });
  await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
  const before = (await worst.innerText()).trim();
  expect(before).toMatch(/^[\d\u2009.]+ %$/);
  await expect(page.getByTestId("site-worst")).toContainText("Main roof");
  const mainMap = page.locator("figure").first();
  await expect(mainMap.getByTestId("worst-marker")).toContainText(`worst ${before}`);
  const markerBefore = (await mainMap.getByTestId("worst-marker").textContent()) ?? "";
  const fieldBefore = await mainMap.locator("image").first().getAttribute("href");
  await shot(page, info, "01-exposure");

  // 2. What-if: the emitter behind the worst point off; the map and the worst point change, nothing saved.
  await expect(page.getByTestId("what-if-state")).not.toContainText("Preparing", { timeout: 120_000 });
  await page.getByLabel(`${EMITTER} on`).uncheck();
  await expect(results(page, "on")).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId("what-if-state")).toContainText(`${EMITTER}: switched off`);
  const whatIf = (await worst.innerText()).trim();
  expect(whatIf).not.toBe(before);
  // The main roof's own worst point moves too (the site's may now be on another level).
  await expect(mainMap.getByTestId("worst-marker")).not.toHaveText(markerBefore);
  expect(await mainMap.locator("image").first().getAttribute("href")).not.toBe(fieldBefore);
  await expect(mainMap.locator(`[data-emitter="${EMITTER}"]`)).toContainText("(off)");
  await mainMap.scrollIntoViewIfNeeded();
  await shot(page, info, "02-what-if-off");
  await page.getByRole("button", { name: "Reset to the stored inventory" }).click();
  await expect(results(page, "off")).toBeVisible();
  await expect(worst).toHaveText(before);

  // 3. The work-area planner: a square in front of the west sector, against the general-population limit.
  await visit(page, `${site}/exposure/planner`);
  const plan = page.getByRole("img", { name: /click the corners/ });
  const [minX, , maxX, maxY] = (await plan.getAttribute("data-bounds"))!.split(" ").map(Number);
  const [, , vbW] = (await plan.getAttribute("viewBox"))!.split(" ").map(Number);
  const box = (await plan.boundingBox())!;
  const k = box.width / vbW;
  const scale = vbW / (maxX - minX);
  const at = (x: number, y: number) => [box.x + (x - minX) * scale * k, box.y + (maxY - y) * scale * k] as const;
  for (const [x, y] of [[2, 9], [8, 9], [8, 15], [2, 15]] as const) await page.mouse.click(...at(x, y));
  await page.mouse.click(...at(2.1, 9.1));
  await expect(page.getByTestId("planner-corners")).toContainText("closed");
  await page.getByLabel("Limit to keep the work area under").selectOption("general");
  const summary = page.getByTestId("planner-summary");
  await expect(summary).toContainText("of the general population limit now");
  await expect(page.getByRole("table", { name: "Emitters to reduce or switch off" }).getByRole("row", { name: new RegExp(EMITTER) })).toContainText(/reduce power|switch off/);
  await expect(page.getByRole("img", { name: "Map of Main roof after the changes" })).toBeVisible();
  await shot(page, info, "03-planner");

  // 4. The elevation view and the 3D view.
  await visit(page, `${site}/exposure/section`);
  await expect(page.getByRole("img", { name: "Elevation view along the cut" }).getByText("100 % general population")).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId("section-summary")).toContainText("Highest on this cut");
  await shot(page, info, "04-section");
  await visit(page, `${site}/exposure/solid`);
  await expect(page.getByTestId("solid-summary")).toContainText("Grid of", { timeout: 120_000 });
  await expect(page.getByTestId("solid-canvas")).toBeVisible();
  await shot(page, info, "05-solid");

  // 5. Freeze, edit the emitter in the Emitters section, freeze again, compare.
  await visit(page, `${site}/assessments`);
  await freeze(page, "Flow: as seeded");
  const worstA = await page.getByText(/of the general-population limit, at x =/).innerText();
  await shot(page, info, "06-assessment-a");

  await visit(page, `${site}/emitters`);
  const table = page.getByRole("table", { name: "Emitters of this site, with EIRP and ERP" });
  await table.getByRole("row").filter({ hasText: EMITTER }).first().getByRole("button", { name: `Edit emitter ${EMITTER}` }).click();
  const editor = page.locator("form[id^='emitter-']");
  await editor.getByLabel("Power unit").selectOption("W");
  await editor.getByLabel("Power per carrier").fill("20");
  await editor.getByRole("button", { name: `Save ${EMITTER}` }).click();
  await expect(editor).toBeHidden({ timeout: 30_000 });

  // The map follows the stored inventory at once (a new input: computed again, not an old result).
  await visit(page, `${site}/exposure`);
  await expect(worst).toBeVisible({ timeout: 120_000 });
  expect((await worst.innerText()).trim()).not.toBe(before);

  await visit(page, `${site}/assessments`);
  await freeze(page, "Flow: west sector at 20 W");
  const worstB = await page.getByText(/of the general-population limit, at x =/).innerText();
  expect(worstB).not.toBe(worstA);
  await page.getByRole("link", { name: "Assessments", exact: true }).first().click();
  await page.getByRole("link", { name: "with the one before" }).first().click();
  await expect(page.getByRole("heading", { name: "Compare two assessments" })).toBeVisible();
  const emitters = page.locator("div", { has: page.getByRole("heading", { name: "Emitters", level: 4 }) }).last();
  await expect(emitters.getByText(`Changed ${EMITTER}:`)).toBeVisible();
  await expect(emitters.locator("ul ul li").filter({ hasText: "Power per carrier (W)" })).toHaveText(/Power per carrier \(W\)\s*60\s*→\s*20/);
  await expect(page.getByRole("img", { name: "Main roof (A): exposure classes" })).toBeVisible();
  await expect(page.getByRole("img", { name: "Main roof (B): exposure classes" })).toBeVisible();
  await expect(page.getByRole("complementary", { name: "RF safety cautions" })).toBeVisible();
  await shot(page, info, "07-compare");
});
