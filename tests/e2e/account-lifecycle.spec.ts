// Sign up, confirm the e-mail through the mail catcher, sign out and in, reset the password.
import { expect, test } from "@playwright/test";
import { latestMail, linkIn, shot, unique, visit } from "./helpers";

test("a new consultant signs up, confirms, signs out and in, and resets the password", async ({ page }, info) => {
  const email = unique("consultant");
  const password = "first-Password-42";
  const start = Date.now() - 1000;

  await visit(page, "/sign-up");
  await page.getByLabel("Your name").fill("Nell Example");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByLabel("Repeat the password").fill(password);
  await shot(page, info, "01-sign-up");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();
  await expect(page.getByText(email)).toBeVisible();

  // Not confirmed yet: sign-in is refused with a clear message.
  await visit(page, "/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "Confirm your e-mail address first" })).toBeVisible();

  const confirm = await latestMail(email, /Confirm your e-mail/, start);
  await visit(page, linkIn(confirm));
  await expect(page.getByRole("heading", { name: "E-mail confirmed" })).toBeVisible();
  await shot(page, info, "02-confirmed");

  // Signed in, without an organisation: the welcome page offers to create one.
  await page.getByRole("link", { name: "Continue to Isotrope" }).click();
  await expect(page.getByRole("heading", { name: "Set up your organisation" })).toBeVisible();
  await page.getByLabel("Consultancy name").fill("Nell's Test Surveys");
  await page.getByRole("button", { name: "Create the organisation" }).click();
  await expect(page.getByText("Nell's Test Surveys is set up")).toBeVisible();
  await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Members" })).toBeVisible();
  await shot(page, info, "03-overview-owner");

  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByText("You are signed out.")).toBeVisible();

  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("heading", { name: "Overview" })).toBeVisible();
  await expect(page.getByRole("main").getByText("Nell Example")).toBeVisible();
  await page.getByRole("button", { name: "Sign out" }).click();

  // Password reset by e-mail; the link works once.
  const resetStart = Date.now() - 1000;
  await page.getByRole("link", { name: "Forgot your password?" }).click();
  await expect(page.getByRole("heading", { name: "Reset your password" })).toBeVisible();
  await page.getByLabel("E-mail").fill(email);
  await page.getByRole("button", { name: "Send the link" }).click();
  await expect(page.getByText("If that address has an account")).toBeVisible();
  const resetMail = await latestMail(email, /Reset your Isotrope password/, resetStart);
  const resetLink = linkIn(resetMail);
  await visit(page, resetLink);
  await expect(page.getByRole("heading", { name: "Choose a new password" })).toBeVisible();
  const newPassword = "second-Password-77";
  await page.getByLabel("New password", { exact: true }).fill(newPassword);
  await page.getByLabel("Repeat the new password").fill(newPassword);
  await shot(page, info, "04-reset");
  await page.getByRole("button", { name: "Save the new password" }).click();
  await expect(page.getByText("Your password is changed")).toBeVisible();

  await visit(page, resetLink);
  await expect(page.getByRole("heading", { name: "Link not accepted" })).toBeVisible();
  await shot(page, info, "05-reset-link-reused");

  await visit(page, "/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "do not match" })).toBeVisible();
  await page.getByLabel("Password").fill(newPassword);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("heading", { name: "Overview" })).toBeVisible();
  await expect(page.getByRole("main").getByText("Nell Example")).toBeVisible();
});

test("sign-up refuses a weak password in place, and answers a taken e-mail as a new one", async ({ page }) => {
  await visit(page, "/sign-up");
  await page.getByLabel("Your name").fill("Weak Example");
  await page.getByLabel("E-mail").fill(unique("weak"));
  await page.getByLabel("Password", { exact: true }).fill("short");
  await page.getByLabel("Repeat the password").fill("short");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByText("Use at least 10 characters.")).toBeVisible();

  await page.getByLabel("E-mail").fill("owner@demo.isotrope.test");
  await page.getByLabel("Password", { exact: true }).fill("perfectly-fine-42");
  await page.getByLabel("Repeat the password").fill("perfectly-fine-42");
  await page.getByRole("button", { name: "Create account" }).click();
  // No tell-tale "already exists": the same page as for a new address (the owner is told by mail).
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();
});
