import { chromium } from "@playwright/test";
const base = "http://127.0.0.1:3115";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium" });
const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
await page.goto(base + "/sign-in");
await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
await page.getByLabel("E-mail").fill("engineer@demo.isotrope.test");
await page.getByLabel("Password").fill("isotrope-demo");
await page.getByRole("button", { name: "Sign in" }).click();
await page.getByRole("button", { name: "Sign out" }).waitFor();
await page.goto(base + "/sites?q=Calloway");
const href = await page.getByRole("link", { name: "Calloway House" }).first().getAttribute("href");
const siteUrl = base + href;
await page.goto(siteUrl + "/assessments");
await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
await page.screenshot({ path: "/tmp/assess-shots/list-empty-1280.png", fullPage: true });
const mode = process.argv[2] ?? "freeze";
if (mode === "freeze") {
  await page.getByLabel("Name").fill(process.argv[3] ?? "Baseline 2026");
  const t0 = Date.now();
  await page.getByRole("button", { name: "Freeze the assessment" }).click();
  await page.waitForURL(/assessments\/[^/]+$/, { timeout: 120000 });
  console.log("freeze + redirect + page load ms", Date.now() - t0);
}
const url = page.url();
for (const [w, h] of [[1280, 900], [390, 844]]) {
  await page.setViewportSize({ width: w, height: h });
  await page.goto(url);
  await page.screenshot({ path: `/tmp/assess-shots/assessment-${w}.png`, fullPage: true });
  await page.goto(siteUrl + "/assessments");
  await page.screenshot({ path: `/tmp/assess-shots/list-${w}.png`, fullPage: true });
}
console.log(url);
await browser.close();
