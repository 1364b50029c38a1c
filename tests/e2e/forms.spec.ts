// Form behaviour a person notices: a click right after fixing a field is not lost, and re-inviting
// someone keeps the role they were invited as.
import { expect, test } from "@playwright/test";
import { signIn, unique, visit } from "./helpers";

test("the first click after fixing a field error submits the form", async ({ page }) => {
  await visit(page, "/forgot-password");
  const field = page.getByLabel("E-mail");
  await field.fill("not-an-address");
  await field.blur();
  await expect(field).toHaveAttribute("aria-invalid", "true");
  await field.fill("nobody-in-particular@example.test");
  // The field is still focused: the click blurs it, the error goes, and the button must stay under the pointer.
  await page.getByRole("button", { name: "Send the link" }).click();
  await expect(page.getByText("If that address has an account")).toBeVisible();
});

test("re-inviting someone keeps the role of the invitation waiting", async ({ page }) => {
  await signIn(page, "owner@demo.isotrope.test");
  await visit(page, "/members");
  const email = unique("reinvited");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Role", { exact: true }).selectOption("billing");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByText(`Invitation sent to ${email}`)).toBeVisible();
  await expect(page.getByLabel("Role", { exact: true })).toHaveValue("engineer");

  // Typing the address again picks up the waiting invitation's role and says so.
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("E-mail").blur();
  await expect(page.getByLabel("Role", { exact: true })).toHaveValue("billing");
  await expect(page.getByText(/already has an invitation waiting, as Billing/)).toBeVisible();

  // Sending again from the list keeps the role too.
  const item = page.getByRole("listitem").filter({ hasText: email });
  await item.getByRole("button", { name: `Send the invitation to ${email} again` }).click();
  await expect(page.getByText(`Invitation sent to ${email}`)).toBeVisible();
  await expect(page.getByRole("listitem").filter({ hasText: email })).toContainText("Billing");
});
