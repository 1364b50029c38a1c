// axe-core on the sign-in, members and overview pages: no serious or critical violations.
import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { shot, signIn, visit } from "./helpers";

async function seriousViolations(page: import("@playwright/test").Page) {
  const results = await new AxeBuilder({ page }).analyze();
  return results.violations.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => `${v.id}: ${v.help}`);
}

test("sign-in page", async ({ page }, info) => {
  await visit(page, "/sign-in");
  await shot(page, info, "sign-in");
  expect(await seriousViolations(page)).toEqual([]);
});

test("overview and members pages", async ({ page }, info) => {
  await signIn(page, "owner@demo.isotrope.test");
  await shot(page, info, "overview");
  expect(await seriousViolations(page)).toEqual([]);
  await visit(page, "/members");
  await shot(page, info, "members");
  expect(await seriousViolations(page)).toEqual([]);
});

test("unknown address shows the 404 page", async ({ page }, info) => {
  const response = await visit(page, "/no-such-page");
  expect(response?.status()).toBe(404);
  await expect(page.getByRole("heading", { name: "Page not found" })).toBeVisible();
  await shot(page, info, "not-found");
});
