// The pages hydrate and work under the Content-Security-Policy: no violation, no console error.
import { expect, test, type Page } from "@playwright/test";
import { hydrated, shot, signIn, visit } from "./helpers";

async function watch(page: Page) {
  const problems: string[] = [];
  page.on("console", (message) => {
    // A form refused by the server (4xx) is logged by the browser as a failed resource: expected here.
    if (message.type() === "error" && !/status of 4\d\d/.test(message.text())) problems.push(`console: ${message.text()}`);
  });
  page.on("pageerror", (error) => problems.push(`page error: ${error.message}`));
  await page.exposeFunction("reportCspViolation", (text: string) => problems.push(`CSP: ${text}`));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      (window as unknown as { reportCspViolation: (t: string) => void }).reportCspViolation(`${e.violatedDirective} blocked ${e.blockedURI || "inline"} at ${e.sourceFile}:${e.lineNumber}:${e.columnNumber} on ${location.pathname}`);
    });
  });
  return problems;
}

test("public pages and the signed-in journey raise no CSP violation", async ({ page }, info) => {
  const problems = await watch(page);
  for (const path of ["/sign-in", "/sign-up", "/forgot-password"]) {
    const response = await visit(page, path);
    expect(response?.headers()["content-security-policy"]).toContain("'nonce-");
  }
  await shot(page, info, "forgot-password");
  await signIn(page, "owner@demo.isotrope.test");
  await shot(page, info, "overview");
  // Client-side navigation: data requests and lazily loaded route modules.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Members" }).click();
  await expect(page.getByRole("heading", { name: "Members" })).toBeVisible();
  await hydrated(page);
  await shot(page, info, "members");
  await visit(page, "/account");
  await page.getByLabel("Current password").fill("not-the-password-1");
  await page.getByLabel("New password", { exact: true }).fill("another-Pass-77");
  await page.getByLabel("Repeat the new password").fill("another-Pass-77");
  await page.getByRole("button", { name: "Change password" }).click();
  await expect(page.getByText("Your current password is not right.")).toBeVisible();
  await shot(page, info, "account-error");
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByRole("heading", { name: "Sign in" })).toBeVisible();
  expect(problems).toEqual([]);
});
