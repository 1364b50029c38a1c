// Issue 9 §9 end to end in Chromium: the engineer drafts a landlord letter from the demo rooftop's
// frozen assessment and submits it, the reviewer issues it, the client (bound to Larchmont Estates,
// which owns Calloway House: scripts/demo/inventory.ts) signs in, lands on the portal, sees the letter
// and downloads it as a PDF, and the mail catcher got the e-mail to the client. The consultancy's pages
// refuse the client. Full-page shots of the portal pages at 1280 and 390 px.
import AxeBuilder from "@axe-core/playwright";
import { readFileSync } from "node:fs";
import { expect, test, type Page } from "@playwright/test";
import { latestMail, shot, signIn, visit } from "./helpers";

const CLIENT = "client@demo.isotrope.test";

async function signOut(page: Page) {
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
}

test("engineer drafts a letter, reviewer issues it, the client downloads it from the portal and got the e-mail", async ({ page }, info) => {
  test.setTimeout(300_000);
  const started = Date.now();

  // The engineer drafts the letter from the frozen assessment and sends it for review.
  await signIn(page, "engineer@demo.isotrope.test");
  await visit(page, "/sites");
  await page.getByRole("link", { name: "Calloway House" }).first().click();
  await page.getByRole("navigation", { name: "Site sections" }).getByRole("link", { name: "Documents" }).click();
  await expect(page.getByRole("heading", { name: "Documents", level: 2 })).toBeVisible();
  await page.getByLabel("Kind").selectOption({ label: "Landlord letter" });
  await page.getByRole("button", { name: "Draft it" }).click();
  await expect(page.getByText("Landlord letter drafted.")).toBeVisible({ timeout: 30_000 });
  const documentPath = new URL(page.url()).pathname;
  const documentId = documentPath.split("/").pop()!;
  await page.getByRole("button", { name: "Submit for review" }).click();
  await expect(page.getByText("Sent for review")).toBeVisible({ timeout: 30_000 });
  await signOut(page);

  // The reviewer (not the author) issues it; the final PDF is made in the background.
  await signIn(page, "reviewer@demo.isotrope.test");
  await visit(page, documentPath);
  await page.getByRole("button", { name: "Issue", exact: true }).click();
  await expect(page.getByText(/^Issued\./)).toBeVisible({ timeout: 30_000 });
  await expect(page.getByRole("link", { name: "Download PDF" })).toBeVisible({ timeout: 120_000 });
  await signOut(page);

  // The client lands on the portal and sees the site with its status and the new letter.
  await signIn(page, CLIENT);
  await expect(page).toHaveURL(/\/portal$/);
  await expect(page.getByRole("heading", { name: "Your sites", level: 1 })).toBeVisible();
  const nav = page.getByRole("navigation", { name: "Main" });
  await expect(nav.getByRole("link")).toHaveText(["Your sites", "Invoices", "Certificates", "Account"]);
  await expect(page.getByRole("link", { name: "Calloway House" })).toBeVisible();
  await expect(page.getByText(/areas? to keep people out of/).first()).toBeVisible();
  await expect(page.getByRole("complementary", { name: "RF safety cautions" })).toBeVisible();
  await shot(page, info, "1280-portal");
  expect((await new AxeBuilder({ page }).analyze()).violations).toEqual([]);

  await page.getByRole("link", { name: "Calloway House" }).click();
  await expect(page.getByRole("heading", { name: "Calloway House", level: 1 })).toBeVisible();
  await expect(page.getByRole("heading", { name: "Where it is safe to go" })).toBeVisible();
  await expect(page.getByText("Keep locked or supervised:")).toBeVisible();
  await expect(page.getByRole("img", { name: /exposure classes/ }).first()).toBeVisible();
  await expect(page.getByRole("complementary", { name: "RF safety cautions" })).toBeVisible();
  // Nothing internal: no access notes, no emitters' operators, no drafts.
  await expect(page.getByText(/alarmed: call the building manager/)).toHaveCount(0);
  const link = page.locator(`a[href="/documents/${documentId}/pdf"]`);
  await expect(link).toHaveText("Download PDF");
  await shot(page, info, "1280-portal-site");
  expect((await new AxeBuilder({ page }).analyze()).violations).toEqual([]);

  const [download] = await Promise.all([page.waitForEvent("download"), link.click()]);
  const bytes = readFileSync((await download.path())!);
  expect(bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-");
  expect(download.suggestedFilename()).toMatch(/^isotrope-letter-v1-.*\.pdf$/);

  // The consultancy's own pages are not for the client.
  await visit(page, "/sites");
  await expect(page.getByRole("heading", { name: "Not allowed" })).toBeVisible();
  await visit(page, documentPath);
  await expect(page.getByRole("heading", { name: "Not allowed" })).toBeVisible();

  // The narrow screen.
  await page.setViewportSize({ width: 390, height: 844 });
  await visit(page, "/portal");
  await shot(page, info, "390-portal");
  await page.getByRole("link", { name: "Calloway House" }).click();
  await expect(page.getByRole("heading", { name: "Calloway House", level: 1 })).toBeVisible();
  await shot(page, info, "390-portal-site");
  expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);

  // The e-mail to the client, with the letter attached.
  const mail = await latestMail(CLIENT, /^Issued: Letter to the property manager for Calloway House/, started);
  expect(mail.text).toContain(`/documents/${documentId}/pdf`);
  expect(mail.text).toMatch(/\/portal\/sites\/[\w-]+/);
  expect((mail as unknown as { attachments?: { contentType: string }[] }).attachments?.[0]?.contentType).toBe("application/pdf");
});
