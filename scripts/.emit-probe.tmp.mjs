import { chromium } from "playwright-core";
const base = process.env.APP_URL;
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium" });
const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
await page.goto(`${base}/sign-in`);
await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
await page.getByLabel("E-mail").fill("engineer@demo.isotrope.test");
await page.getByLabel("Password").fill("isotrope-demo");
await page.getByRole("button", { name: "Sign in" }).click();
await page.getByRole("button", { name: "Sign out" }).waitFor();
const list = await (await page.request.get(`${base}/api/v1/sites?pageSize=50`)).json();
const site = list.sites.sort((a, b) => b.emitterCount - a.emitterCount)[0].id;
await page.goto(`${base}/sites/${site}/emitters`);
console.log(await page.evaluate(() => {
  const out = [];
  for (const el of document.querySelectorAll("body *")) { const r = el.getBoundingClientRect(); if (r.right > 1285 && getComputedStyle(el).position !== "static") out.push(`${el.tagName}.${el.className?.baseVal ?? el.className} ${Math.round(r.right)}`); }
  return out.slice(0, 10).join("\n") + `\nscrollWidth ${document.documentElement.scrollWidth}`;
}));
await browser.close();
