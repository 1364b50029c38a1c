// The engineer freezes an assessment of the demo rooftop, edits its mitigation plan, changes an
// emitter (straight in the database: editing emitters is the Emitters section's own test), freezes
// again and compares the two: the change listed field by field, the worst point moved, the maps
// side by side. The emitter is put back afterwards so other specs see the demo as seeded.
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import postgres from "postgres";
import { shot, signIn, visit } from "./helpers";

const EMITTER = "SM-3-2100";

async function setPower(watts: number) {
  const sql = postgres(process.env.DATABASE_URL!, { max: 1, onnotice: () => {} });
  try {
    const rows = await sql`update emitter set power_per_carrier_w = ${watts}, version = version + 1
      where label = ${EMITTER} and site_id in (select s.id from site s join member m on m.organization_id = s.organization_id join "user" u on u.id = m.user_id where s.name = 'Calloway House' and u.email = 'engineer@demo.isotrope.test') returning id`;
    expect(rows.length).toBe(1);
  } finally {
    await sql.end();
  }
}

async function freeze(page: Page, name: string) {
  await page.getByLabel("Name").fill(name);
  await page.getByRole("button", { name: "Freeze the assessment" }).click();
  await expect(page.getByRole("heading", { level: 2, name })).toBeVisible({ timeout: 90_000 });
  await expect(page.getByText("Assessment frozen.")).toBeVisible();
}

test.afterAll(async () => {
  await setPower(60); // as seeded (scripts/demo/rooftop.ts)
});

test("freeze the demo rooftop, edit the plan, change an emitter, freeze again and compare", async ({ page }, info) => {
  test.setTimeout(240_000);
  await signIn(page, "engineer@demo.isotrope.test");
  await visit(page, "/sites");
  await page.getByRole("link", { name: "Calloway House" }).first().click();
  await page.getByRole("navigation", { name: "Site sections" }).getByRole("link", { name: "Assessments" }).click();
  await expect(page.getByRole("heading", { name: "Assessments", level: 2 })).toBeVisible();

  await freeze(page, "Before the mount is raised");
  await expect(page.getByRole("complementary", { name: "RF safety cautions" })).toBeVisible();
  const worstBefore = await page.getByText(/of the general-population limit, at x =/).innerText();
  expect(worstBefore).toMatch(/on Main roof/);
  await expect(page.getByRole("img", { name: /Main roof: exposure classes, signs and barriers/ })).toBeVisible();
  await expect(page.getByRole("heading", { name: "Mitigation plan" })).toBeVisible();
  // The proposal: a sign at each access point, zones with the emitters to power down.
  await expect(page.getByRole("textbox", { name: "Where s1 stands" })).toHaveValue(/Stair door/);
  await expect(page.getByText(/Untrained people \(general-population limit\): SM-3-2100/).first()).toBeVisible();
  await shot(page, info, "1280-assessment");
  expect((await new AxeBuilder({ page }).analyze()).violations).toEqual([]);

  // Edit the plan: re-categorise the first sign and add a note.
  await page.getByRole("combobox", { name: "Category of s1", exact: true }).selectOption("warning");
  await page.getByRole("button", { name: "Save s1", exact: true }).click();
  await expect(page.getByText("Mitigation plan saved.")).toBeVisible({ timeout: 30_000 });
  await page.waitForLoadState("networkidle"); // the page has its new plan version before the next edit
  await page.getByLabel("Notes").fill("Landlord to fit the barrier before the next visit.");
  // The flash from the first save is still shown: wait for this save's own answer.
  const answered = page.waitForResponse((r) => r.request().method() === "POST" && r.url().includes("/assessments/"));
  await page.getByRole("button", { name: "Save the notes" }).click();
  expect((await answered).ok()).toBe(true);
  await page.waitForLoadState("networkidle");
  await page.reload(); // what was stored, not what was typed
  await expect(page.getByLabel("Notes")).toHaveValue("Landlord to fit the barrier before the next visit.");
  await expect(page.getByRole("combobox", { name: "Category of s1", exact: true })).toHaveValue("warning");

  await setPower(20);
  await page.getByRole("link", { name: "Assessments", exact: true }).first().click();
  await freeze(page, "After the mount is raised");
  const worstAfter = await page.getByText(/of the general-population limit, at x =/).innerText();
  expect(worstAfter).not.toBe(worstBefore);

  await page.getByRole("link", { name: "Assessments", exact: true }).first().click();
  await page.getByRole("link", { name: "with the one before" }).first().click();
  await expect(page.getByRole("heading", { name: "Compare two assessments" })).toBeVisible();
  await expect(page.getByRole("complementary", { name: "RF safety cautions" })).toBeVisible();
  const emitters = page.locator("div", { has: page.getByRole("heading", { name: "Emitters", level: 4 }) }).last();
  await expect(emitters.getByText(`Changed ${EMITTER}:`)).toBeVisible();
  await expect(emitters.locator("ul ul li")).toHaveCount(1); // exactly the one field changed
  await expect(emitters.locator("ul ul li")).toHaveText(/Power per carrier \(W\)\s*60\s*→\s*20/);
  await expect(emitters.getByText(/^Added|^Removed/)).toHaveCount(0);
  await expect(page.getByText("Same options.")).toBeVisible();
  await expect(page.getByRole("img", { name: "Main roof (A): exposure classes" })).toBeVisible();
  await expect(page.getByRole("img", { name: "Main roof (B): exposure classes" })).toBeVisible();
  await shot(page, info, "1280-compare");
  expect((await new AxeBuilder({ page }).analyze()).violations).toEqual([]);

  await page.setViewportSize({ width: 390, height: 844 });
  await page.reload();
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await shot(page, info, "390-compare");
  await page.getByRole("link", { name: "After the mount is raised" }).click();
  await expect(page.getByRole("heading", { level: 2, name: "After the mount is raised" })).toBeVisible();
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await shot(page, info, "390-assessment");
});
