// Every page at 1280 and 390 px: a full-page screenshot kept as a test artefact (test-results/e2e/…),
// and on each page the things a reader would notice first: the main heading is visible, nothing
// overflows sideways, and axe finds no serious or critical violation (contrast included).
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Browser, type Page, type TestInfo } from "@playwright/test";
import { latestMail, linkIn, signIn, unique, visit } from "./helpers";

const widths = [
  { width: 1280, height: 800 },
  { width: 390, height: 844 },
];

/** Checks the page as a reader sees it, then keeps a full-page screenshot named by width and page. */
async function look(page: Page, info: TestInfo, name: string) {
  await expect(page.getByRole("heading", { level: 1 }).first()).toBeVisible();
  await page.evaluate(() => document.fonts.ready);
  const overflow = await page.evaluate(() => document.scrollingElement!.scrollWidth - window.innerWidth);
  expect.soft(overflow, `${name}: page wider than the window by ${overflow}px`).toBeLessThanOrEqual(0);
  const axe = await new AxeBuilder({ page }).analyze();
  const serious = axe.violations.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => `${v.id}: ${v.help}`);
  expect.soft(serious, `${name}: accessibility`).toEqual([]);
  const path = info.outputPath(`${page.viewportSize()!.width}-${name}.png`);
  await page.screenshot({ fullPage: true, path });
  await info.attach(name, { path, contentType: "image/png" });
}

async function signedInPage(browser: Browser, viewport: { width: number; height: number }, email: string) {
  const page = await (await browser.newContext({ viewport })).newPage();
  await signIn(page, email);
  return page;
}

for (const viewport of widths) {
  test.describe(`at ${viewport.width} px`, () => {
    test.use({ viewport });
    // Every page runs axe; on a loaded machine that takes a while.
    test.describe.configure({ timeout: 240_000 });

    test("signed-out pages", async ({ page }, info) => {
      await visit(page, "/sign-in");
      await look(page, info, "sign-in");
      await visit(page, "/sign-up");
      await look(page, info, "sign-up");
      await page.getByRole("button", { name: "Create account" }).click();
      await expect(page.getByLabel("E-mail")).toHaveAttribute("aria-invalid", "true");
      await look(page, info, "sign-up-errors");
      await visit(page, "/forgot-password");
      await look(page, info, "forgot-password");
      await visit(page, `/check-email?email=${encodeURIComponent("a.very.long.address.for.a.surveyor@field-office.example.test")}`);
      await look(page, info, "check-email");
      await visit(page, "/verified?error=INVALID_TOKEN");
      await look(page, info, "verified-bad-link");
      await visit(page, "/reset-password");
      await look(page, info, "reset-bad-link");
      const response = await visit(page, "/no-such-page");
      expect(response?.status()).toBe(404);
      await look(page, info, "not-found-signed-out");
      expect((await visit(page, "/verify/AAAA-BBBB-CCCC-DDDD-EEEE"))?.status()).toBe(404);
      await look(page, info, "verify-unknown");
    });

    test("a new consultant with a long name and address", async ({ page }, info) => {
      const email = unique(`new.consultant.with.a.rather.long.address.${viewport.width}`);
      const password = "looks-Password-42";
      const start = Date.now() - 1000;
      await visit(page, "/sign-up");
      await page.getByLabel("Your name").fill("Zoë Ångström-Lindqvist <b>Papadopoulou</b>");
      await page.getByLabel("E-mail").fill(email);
      await page.getByLabel("Password", { exact: true }).fill(password);
      await page.getByLabel("Repeat the password").fill(password);
      await page.getByRole("button", { name: "Create account" }).click();
      await expect(page.getByText(email)).toBeVisible();
      await look(page, info, "check-email-real");
      await visit(page, linkIn(await latestMail(email, /Confirm your e-mail/, start)));
      await look(page, info, "verified");
      await visit(page, "/welcome");
      await look(page, info, "welcome");
      await page.getByLabel("Consultancy name").fill("Ångström & Papadopoulou Field Surveys <script>x</script>");
      await page.getByRole("button", { name: "Create the organisation" }).click();
      await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Members" })).toBeVisible();
      await look(page, info, "overview-new-owner");
      await visit(page, "/account");
      await expect(page.getByText(email)).toBeVisible();
      await look(page, info, "account-long-address");
    });

    test("a reset link from the mail", async ({ page }, info) => {
      const email = "regulator@demo.isotrope.test";
      const start = Date.now() - 1000;
      await visit(page, "/forgot-password");
      await page.getByLabel("E-mail").fill(email);
      await page.getByRole("button", { name: "Send the link" }).click();
      await expect(page.getByText("If that address has an account")).toBeVisible();
      await look(page, info, "sign-in-with-message");
      await visit(page, linkIn(await latestMail(email, /Reset your Isotrope password/, start)));
      await expect(page.getByLabel("New password", { exact: true })).toBeVisible();
      await look(page, info, "reset-password");
    });

    test("each role's overview, the account page and the 404 signed in", async ({ browser }, info) => {
      test.setTimeout(360_000);
      for (const role of ["owner", "engineer", "reviewer", "billing", "client", "regulator"]) {
        const page = await signedInPage(browser, viewport, `${role}@demo.isotrope.test`);
        await look(page, info, `overview-${role}`);
        if (role === "client") {
          // A client's home is the portal; its site page has the keep-out map.
          await page.getByRole("link", { name: "Calloway House" }).first().click();
          await expect(page.getByRole("heading", { name: "Calloway House", level: 1 })).toBeVisible();
          await look(page, info, "portal-site");
        }
        if (role === "regulator" || role === "engineer") {
          await visit(page, "/filings");
          await expect(page.getByRole("heading", { level: 1, name: role === "regulator" ? "Filings received" : "Filings" })).toBeVisible();
          await look(page, info, `filings-${role}`);
        }
        if (role === "engineer") {
          await visit(page, "/account");
          await look(page, info, "account");
          const response = await visit(page, "/no-such-page");
          expect(response?.status()).toBe(404);
          await look(page, info, "not-found-signed-in");
          await visit(page, "/members");
          await look(page, info, "members-refused");
        }
        await page.context().close();
      }
    });

    test("a header link's focus ring is drawn inside the navigation strip", async ({ browser }, info) => {
      const page = await signedInPage(browser, viewport, "owner@demo.isotrope.test");
      const link = page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Account" });
      for (let i = 0; i < 12 && !(await link.evaluate((el) => el === document.activeElement)); i++) await page.keyboard.press("Tab");
      await expect(link).toBeFocused();
      const { ring, strip, width } = await link.evaluate((el) => {
        const style = getComputedStyle(el);
        const grow = parseFloat(style.outlineOffset) + parseFloat(style.outlineWidth);
        const r = el.getBoundingClientRect();
        const n = el.closest("nav")!.getBoundingClientRect();
        return { ring: { top: r.top - grow, bottom: r.bottom + grow }, strip: { top: n.top, bottom: n.bottom }, width: parseFloat(style.outlineWidth) };
      });
      expect(width).toBeGreaterThanOrEqual(2);
      expect(ring.top).toBeGreaterThanOrEqual(strip.top);
      expect(ring.bottom).toBeLessThanOrEqual(strip.bottom);
      const path = info.outputPath(`${viewport.width}-header-focus.png`);
      await page.screenshot({ path, clip: { x: 0, y: 0, width: viewport.width, height: 140 } });
      await info.attach("header-focus", { path, contentType: "image/png" });
    });

    test("the members page and an invitation", async ({ browser }, info) => {
      const owner = await signedInPage(browser, viewport, "owner@demo.isotrope.test");
      const email = unique(`invited.${viewport.width}`);
      const start = Date.now() - 1000;
      await visit(owner, "/members");
      await owner.getByLabel("E-mail").fill(email);
      await owner.getByLabel("Role", { exact: true }).selectOption("billing");
      await owner.getByRole("button", { name: "Send invitation" }).click();
      await expect(owner.getByText(`Invitation sent to ${email}`)).toBeVisible();
      await look(owner, info, "members");
      // Every member's controls are on screen, without scrolling sideways.
      const row = owner.getByRole("row").filter({ hasText: "engineer@demo.isotrope.test" });
      for (const control of [row.getByLabel(/Role of/), row.getByRole("button", { name: "Save" }), row.getByRole("button", { name: "Remove" })]) {
        const box = (await control.boundingBox())!;
        expect(box.x + box.width).toBeLessThanOrEqual(viewport.width);
      }
      await row.getByRole("button", { name: "Remove" }).click();
      await expect(owner.getByRole("dialog")).toBeVisible();
      const path = info.outputPath(`${viewport.width}-members-remove-dialog.png`);
      await owner.screenshot({ path });
      await info.attach("members-remove-dialog", { path, contentType: "image/png" });
      await owner.getByRole("dialog").getByRole("button", { name: "Keep" }).click();
      await expect(owner.getByRole("dialog")).toBeHidden();
      const invitee = await (await browser.newContext({ viewport })).newPage();
      await visit(invitee, linkIn(await latestMail(email, /Join /, start)));
      await look(invitee, info, "invite");
    });
  });
}
