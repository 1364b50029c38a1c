// Drawing on the layout editor's plan by clicking at site coordinates (metres, x east, y north).
// The plan's <svg> says which part of the site it shows (data-bounds) and its pixel size (viewBox),
// so a site point becomes a click on the screen. Shared with the combined issue-7 flow: open the
// editor first (the site page's "Edit layout" link, /sites/:siteId/layout), then drawOutline → saveLayout.
import { expect, type Page } from "@playwright/test";

export type SitePoint = [number, number];

/** Clicks the plan at a site point: site metres → the plan's viewBox pixels → the screen, through the SVG's own matrix. */
export async function clickPlanAt(page: Page, point: SitePoint) {
  const svg = page.getByTestId("layout-plan").locator("svg").first();
  const { x, y } = await svg.evaluate((el, [sx, sy]) => {
    const plan = el as SVGSVGElement;
    const [minX, , maxX, maxY] = (plan.getAttribute("data-bounds") ?? "").split(" ").map(Number);
    const perMetre = plan.viewBox.baseVal.width / (maxX - minX);
    const at = new DOMPoint((sx - minX) * perMetre, (maxY - sy) * perMetre).matrixTransform(plan.getScreenCTM()!);
    return { x: at.x, y: at.y };
  }, point);
  // Whole pixels: the browser drops a click's fraction of a pixel, which at some widths is 0.05 m.
  await page.mouse.click(Math.round(x), Math.round(y));
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
