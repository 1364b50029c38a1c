// The engineer opens Exposure on the demo rooftop, reads the worst point and the readings summary,
// points at the map, switches the emitter behind the worst point off in what-if (recomputed in the
// browser's worker, not saved) and sees the worst point change, then resets.
import { expect, test } from "@playwright/test";
import { shot, signIn, visit } from "./helpers";

test("Exposure on the demo rooftop: worst point, readings, what-if off and reset", async ({ page }, info) => {
  await signIn(page, "engineer@demo.isotrope.test");
  await visit(page, "/sites");
  await page.getByRole("link", { name: "Calloway House" }).first().click();
  await page.getByRole("navigation", { name: "Site sections" }).getByRole("link", { name: "Exposure" }).click();
  await expect(page.getByRole("heading", { name: "Exposure", exact: true })).toBeVisible({ timeout: 60_000 });
  await page.locator("html[data-hydrated]").waitFor({ state: "attached" });

  const worst = page.getByTestId("site-worst-percent");
  const before = (await worst.innerText()).trim();
  expect(before).toMatch(/^[\d\u2009.]+ %$/);
  // The demo's worst point is in front of SM-3-2100 on the west parapet of the main roof, far above the limit.
  await expect(page.getByTestId("site-worst")).toContainText("Main roof");
  await expect(page.getByTestId("worst-points").locator("tr", { hasText: "Main roof" })).toContainText("SM-3-2100");
  await expect(page.getByTestId("readings-summary")).toContainText("1 of 7 readings is above its prediction");
  await expect(page.locator('[data-reading][data-above="true"]')).toHaveCount(1);
  await expect(page.getByRole("complementary", { name: "RF safety cautions" })).toBeVisible();
  await expect(page.getByTestId("map-legend")).toContainText("US FCC 47 CFR §1.1310");

  // Pointing at the main roof's plan gives the value there and its three largest contributors.
  const map = page.locator("figure svg[role=img]").first();
  await map.scrollIntoViewIfNeeded();
  const box = (await map.boundingBox())!;
  await map.hover({ position: { x: box.width * 0.5, y: box.height * 0.45 } });
  await expect(page.getByTestId("point-readout").first()).toContainText(/^At \(/);
  await shot(page, info, "exposure-stored");

  // What-if: SM-3-2100 off. The worker answers; the page says it is not saved.
  await expect(page.getByTestId("what-if-state")).not.toContainText("Preparing", { timeout: 60_000 });
  await page.getByLabel("SM-3-2100 on").uncheck();
  await expect(page.locator("[data-testid=exposure-results][data-what-if=on][data-what-if-pending=false]")).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId("what-if-state")).toContainText("What-if, not saved");
  await expect(page.getByTestId("what-if-state")).toContainText("SM-3-2100: switched off");
  const after = (await worst.innerText()).trim();
  expect(after).not.toBe(before);
  await expect(page.getByTestId("worst-points").locator("tr", { hasText: "Main roof" })).not.toContainText("SM-3-2100");
  await expect(page.getByTestId("map-legend")).toContainText("what-if, not saved");
  await shot(page, info, "exposure-what-if");

  // Reset: back to the stored inventory's numbers.
  await page.getByRole("button", { name: "Reset to the stored inventory" }).click();
  await expect(page.locator("[data-testid=exposure-results][data-what-if=off]")).toBeVisible();
  await expect(worst).toHaveText(before);
  await expect(page.getByLabel("SM-3-2100 on")).toBeChecked();
});
