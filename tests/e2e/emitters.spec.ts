// An engineer imports a site's emitters from CSV (a file with one bad row first: the report names
// row, column and reason; then the fixed file), edits a row inline (dBd and dBm kept as typed, EIRP
// recomputed), sees the emitters on the plan and exports them.
import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { checkBadEmitterCsv, importFixedEmitterCsv } from "./emitters-helpers";
import { shot, signIn, visit } from "./helpers";

test("an engineer imports emitters from CSV, fixes the file after the report, and edits a row inline", async ({ page }, info) => {
  await page.setViewportSize({ width: 1280, height: 900 });
  await signIn(page, "engineer@demo.isotrope.test");
  await visit(page, "/sites/new");
  const siteName = `Harbour Lofts ${Date.now().toString(36)}`;
  await page.getByLabel("Name").fill(siteName);
  await page.getByRole("button", { name: "Record the site" }).click();
  await expect(page.getByRole("heading", { name: siteName })).toBeVisible();

  await page.getByRole("navigation", { name: "Site sections" }).getByRole("link", { name: "Emitters" }).click();
  await expect(page.getByText("No emitters on this site yet")).toBeVisible();

  await checkBadEmitterCsv(page);
  await shot(page, info, "01-report");
  await importFixedEmitterCsv(page);
  await shot(page, info, "02-imported");

  // E1's gain was imported in dBd: 15.85 dBd = 18 dBi; 2 × 40 W, 1.2 dB loss → EIRP = 80·10^(−0.12)·10^(1.8) W (OET-65 §1).
  const table = page.getByRole("table", { name: "Emitters of this site, with EIRP and ERP" });
  const e1 = table.getByRole("row").filter({ hasText: "E1" }).first();
  await expect(e1).toContainText("15.85 dBd");
  await expect(e1).toContainText("3.83 kW");

  // Inline edit: the power in dBm, the azimuth; errors next to the field first.
  await e1.getByRole("button", { name: "Edit emitter E1" }).click();
  const editor = page.locator("form[id^='emitter-']");
  await editor.getByLabel("Frequency (MHz)").fill("");
  await editor.getByRole("button", { name: "Save E1" }).click();
  await expect(editor.getByText("Enter the frequency in MHz from 0 to 300,000.")).toBeVisible();
  await editor.getByLabel("Frequency (MHz)").fill("806");
  await editor.getByLabel("Power per carrier").fill("49");
  await editor.getByLabel("Power unit").selectOption("dBm");
  await editor.getByLabel("Azimuth (°)").fill("45");
  await expect(editor.getByText(/EIRP 7\.6 kW/)).toBeVisible();
  await shot(page, info, "03-editing");
  await editor.getByRole("button", { name: "Save E1" }).click();
  await expect(editor).toBeHidden();
  const saved = table.getByRole("row").filter({ hasText: "E1" }).first();
  await expect(saved).toContainText("49 dBm");
  await expect(saved).toContainText("45");

  // On the plan, by operator, with the legend.
  await expect(page.getByRole("list", { name: "Operators on the plan" })).toContainText("Harbour Mobile");
  await expect(page.getByRole("img", { name: `Emitters on the plan of ${siteName}` })).toBeVisible();

  // The export is the import layout.
  const download = page.waitForEvent("download");
  await page.getByRole("link", { name: "Export CSV" }).click();
  const file = await (await download).path();
  const { readFileSync } = await import("node:fs");
  expect(readFileSync(file, "utf8")).toContain("E1,Harbour Mobile,LTE 800,806,,49,2,1.2,,15.85,,3gpp-38.901");
  await shot(page, info, "04-done");
});

for (const viewport of [{ width: 1280, height: 800 }, { width: 390, height: 844 }]) {
  test(`the Emitters section and the pattern library at ${viewport.width} px: no sideways overflow, no serious axe finding`, async ({ browser }, info) => {
    const page = await (await browser.newContext({ viewport })).newPage();
    await signIn(page, "engineer@demo.isotrope.test");
    const { sites } = (await (await page.request.get("/api/v1/sites?pageSize=50")).json()) as { sites: { id: string; emitterCount: number }[] };
    const rooftop = sites.sort((a, b) => b.emitterCount - a.emitterCount)[0];
    const look = async (name: string) => {
      await expect(page.getByRole("heading", { level: 1 }).first()).toBeVisible();
      const overflow = await page.evaluate(() => document.scrollingElement!.scrollWidth - window.innerWidth);
      expect.soft(overflow, `${name}: wider than the window`).toBeLessThanOrEqual(0);
      const axe = await new AxeBuilder({ page }).analyze();
      expect.soft(axe.violations.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => `${v.id}: ${v.help}`), name).toEqual([]);
      await shot(page, info, `${viewport.width}-${name}`);
    };
    await visit(page, `/sites/${rooftop.id}/emitters`);
    await expect(page.getByRole("table", { name: "Emitters of this site, with EIRP and ERP" }).getByRole("row")).toHaveCount(rooftop.emitterCount + 1);
    await look("emitters");
    await visit(page, `/sites/${rooftop.id}`);
    await expect(page.getByRole("list", { name: "Operators on the plan" })).toBeVisible();
    await look("layout-with-emitters");
    await visit(page, "/patterns");
    await look("patterns");
    if (viewport.width === 1280) {
      // A parametric pattern, previewed as two polar diagrams before saving.
      const name = `Reference 3GPP 90/10 ${Date.now().toString(36)}`;
      await page.getByLabel("Name").fill(name);
      await page.getByLabel("Pattern", { exact: true }).selectOption("3gpp-38.901");
      await page.getByLabel("Horizontal beamwidth (°)").fill("90");
      await page.getByLabel("Vertical beamwidth (°)").fill("10");
      await expect(page.getByText("Preview (nothing saved yet): half-power beamwidths 90.0° horizontal, 10.0° vertical")).toBeVisible();
      await expect(page.getByRole("img", { name: /^Preview: horizontal cut/ })).toBeVisible();
      await page.getByRole("button", { name: "Save to the library" }).click();
      await expect(page.getByText(`“${name}” is in the library.`)).toBeVisible();
      await expect(page.getByRole("heading", { name, level: 3 })).toBeVisible();
    }
    await page.context().close();
  });
}
