// An engineer records a new site's layout by drawing on the plan: an area drawn by clicking and
// saved; a self-intersecting outline refused with its reason; the saved area on the site page.
import { expect, test } from "@playwright/test";
import { shot, signIn, visit } from "./helpers";
import { clickPlanAt, describeSelected, drawOutline, saveLayout } from "./layout-helpers";

test("an engineer draws a surface on the plan, saves it, and sees a crossing outline refused", async ({ page }, info) => {
  await page.setViewportSize({ width: 1280, height: 900 });
  await signIn(page, "engineer@demo.isotrope.test");
  await visit(page, "/sites/new");
  const name = `Drawn roof ${Date.now().toString(36)}`;
  await page.getByLabel("Name").fill(name);
  await page.getByLabel("Kind").selectOption("rooftop");
  await page.getByRole("button", { name: "Record the site" }).click();
  await expect(page.getByRole("heading", { name, level: 1 })).toBeVisible();

  await page.getByRole("link", { name: "Edit layout" }).click();
  await expect(page.getByRole("heading", { name: "Edit layout" })).toBeVisible();

  // A 12 m × 8 m roof, drawn by clicking its corners (snapped to 0.1 m) and closed on the first.
  await drawOutline(page, [[-6, -4], [6, -4], [6, 4], [-6, 4]]);
  await describeSelected(page, "Main roof", "0");
  const panel = page.getByRole("complementary", { name: "Selected record" });
  await expect(panel.getByLabel("Point 1 x")).toHaveValue("-6");
  await expect(panel.getByLabel("Point 3 y")).toHaveValue("4");
  await saveLayout(page);
  await shot(page, info, "1280-layout-saved");

  // A bow tie: its second and fourth edges cross. Refused with the reason, nothing sent.
  await page.getByRole("toolbar", { name: "Drawing tools" }).getByRole("button", { name: "Draw area" }).click();
  for (const corner of [[-4, -2], [4, 2], [4, -2], [-4, 2]] as [number, number][]) await clickPlanAt(page, corner);
  await page.getByRole("button", { name: /^Finish/ }).click();
  await describeSelected(page, "Bow tie", "0");
  await expect(page.getByTestId("item-problems")).toContainText("Area “Bow tie”: edge 1–2 meets edge 3–4 at (0, 0); an outline must not cross or touch itself.");
  await page.getByRole("button", { name: "Save layout" }).click();
  await expect(page.getByText(/Nothing is saved yet: fix the problem/)).toBeVisible();
  await shot(page, info, "1280-layout-refused");

  // Escape cancels a drawing in progress.
  await page.getByRole("toolbar", { name: "Drawing tools" }).getByRole("button", { name: "Draw obstruction" }).click();
  await clickPlanAt(page, [1, 1]);
  await page.keyboard.press("Escape");
  await expect(page.getByRole("button", { name: /^Finish/ })).toHaveCount(0);

  // Leaving with the unsaved bow tie asks first; the site page shows the saved area on its level.
  page.on("dialog", (dialog) => void dialog.accept());
  await page.getByRole("link", { name: "Leave without saving" }).click();
  await expect(page.getByRole("link", { name: "Edit layout" })).toBeVisible();
  const levels = page.getByTestId("level-list");
  await expect(levels).toContainText("Level 0.0 m");
  await expect(levels).toContainText("Main roof");
  await expect(levels).not.toContainText("Bow tie");
  await page.setViewportSize({ width: 390, height: 844 });
  await shot(page, info, "390-layout-section");
});
