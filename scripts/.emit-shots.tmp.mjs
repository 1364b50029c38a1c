import { chromium } from "playwright-core";
const base = process.env.APP_URL;
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium" });
const out = process.argv[2] ?? "/tmp/emit";
for (const width of [1280, 390]) {
  const page = await browser.newPage({ viewport: { width, height: 900 } });
  await page.goto(`${base}/sign-in`);
  await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
  await page.getByLabel("E-mail").fill("engineer@demo.isotrope.test");
  await page.getByLabel("Password").fill("isotrope-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("button", { name: "Sign out" }).waitFor();
  const list = await (await page.request.get(`${base}/api/v1/sites?pageSize=50`)).json();
  const site = list.sites.sort((a, b) => b.emitterCount - a.emitterCount)[0].id;
  await page.goto(`${base}/sites/${site}/emitters`);
  await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
  await page.screenshot({ path: `${out}-${width}-emitters.png`, fullPage: true });
  if (width === 1280) {
    await page.getByRole("button", { name: /^Edit emitter/ }).first().click();
    await page.screenshot({ path: `${out}-${width}-edit.png`, fullPage: false });
  }
  await page.goto(`${base}/sites/${site}`);
  await page.screenshot({ path: `${out}-${width}-layout.png`, fullPage: true });
  await page.goto(`${base}/patterns`);
  await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
  await page.screenshot({ path: `${out}-${width}-patterns.png`, fullPage: true });
  await page.close();
}
await browser.close();
