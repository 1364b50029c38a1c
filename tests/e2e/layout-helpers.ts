// Drawing on the layout editor's plan by clicking at site coordinates (metres, x east, y north).
// The plan's <svg> says which part of the site it shows (data-bounds) and its pixel size (viewBox),
// so a site point becomes a click on the screen. Shared with the combined issue-7 flow.
import { expect, type Page } from "@playwright/test";

export type SitePoint = [number, number];

/** Clicks the plan at a site point. */
export async function clickPlanAt(page: Page, [x, y]: SitePoint) {
  const svg = page.getByTestId("layout-plan").locator("svg").first();
  const box = await svg.boundingBox();
  const [minX, , maxX, maxY] = ((await svg.getAttribute("data-bounds")) ?? "").split(" ").map(Number);
  const [, , vbWidth] = ((await svg.getAttribute("viewBox")) ?? "").split(" ").map(Number);
  if (!box) throw new Error("the plan is not on screen");
  const scale = vbWidth / (maxX - minX); // viewBox pixels per metre
  const toScreen = box.width / vbWidth;
  await page.mouse.click(box.x + (x - minX) * scale * toScreen, box.y + (maxY - y) * scale * toScreen);
}

/**
 * Draws an outline with the "Draw area" (or "Draw obstruction") tool: one click per corner, then a
 * click on the first corner closes it. The new record is selected, its panel open.
 */
export async function drawOutline(page: Page, corners: SitePoint[], tool: "Draw area" | "Draw obstruction" = "Draw area") {
  await page.getByRole("toolbar", { name: "Drawing tools" }).getByRole("button", { name: tool }).click();
  for (const corner of corners) await clickPlanAt(page, corner);
  await clickPlanAt(page, corners[0]);
  await expect(page.getByRole("complementary", { name: "Selected record" }).getByLabel("Name")).toBeVisible();
}

/** Names the selected record and sets its elevation (areas). */
export async function describeSelected(page: Page, name: string, elevation?: string) {
  const panel = page.getByRole("complementary", { name: "Selected record" });
  await panel.getByLabel("Name").fill(name);
  if (elevation !== undefined) await panel.getByLabel("Elevation (m)").fill(elevation);
}

/** Saves the layout and waits for the editor to say so. */
export async function saveLayout(page: Page) {
  await page.getByRole("button", { name: "Save layout" }).click();
  await expect(page.getByText("Layout saved.")).toBeVisible();
}
