import { chromium } from "@playwright/test";
const base = "http://127.0.0.1:3114";
const which = process.argv[2] ?? "section";
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--enable-unsafe-swiftshader", "--use-angle=swiftshader"] });
const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
page.on("console", (m) => console.log("console:", m.type(), m.text()));
page.on("pageerror", (e) => console.log("pageerror:", e.message));
await page.goto(base + "/sign-in");
await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
await page.getByLabel("E-mail").fill("engineer@demo.isotrope.test");
await page.getByLabel("Password").fill("isotrope-demo");
await page.getByRole("button", { name: "Sign in" }).click();
await page.getByRole("button", { name: "Sign out" }).waitFor();
await page.goto(base + "/sites");
const href = await page.getByRole("link", { name: "Calloway House" }).first().getAttribute("href");
console.log("site", href);
await page.goto(base + href + "/exposure/" + which + (process.argv[3] ?? ""));
await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
if (which === "solid") { const t0 = Date.now(); await page.locator("[data-testid=solid-summary], p.text-danger-700").first().waitFor({ timeout: 90000 }); console.log("waited", Date.now() - t0); await page.waitForTimeout(500); } else await page.waitForTimeout(2000);
if (which === "planner") {
  const plan = page.getByRole("img", { name: /click the corners/ });
  const box = await plan.boundingBox();
  for (const [fx, fy] of [[0.62, 0.2], [0.8, 0.2], [0.8, 0.4], [0.62, 0.4]]) await page.mouse.click(box.x + box.width * fx, box.y + box.height * fy);
  await page.getByRole("button", { name: "Close the area" }).click();
  await page.waitForTimeout(1500);
}
await page.screenshot({ path: `/tmp/vshots/${which}.png`, fullPage: true });
console.log(await page.locator("main").innerText().catch(() => ""));
await browser.close();
