// The sign-in pages as a person meets them: honest answers, no dead ends, nothing echoed.
import { expect, test, type Page } from "@playwright/test";
import { latestMail, linkIn, shot, signIn, unique, visit } from "./helpers";

const mailApi = () => process.env.MAILDEV_API ?? "http://127.0.0.1:1090";

/** Signs up through the form and confirms through the mailed link; ends signed in on /verified. */
async function signUpAndConfirm(page: Page, email: string, name: string, password: string) {
  const start = Date.now() - 1000;
  await visit(page, "/sign-up");
  await page.getByLabel("Your name").fill(name);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByLabel("Repeat the password").fill(password);
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();
  await visit(page, linkIn(await latestMail(email, /Confirm your e-mail/, start)));
  await expect(page.getByRole("heading", { name: "E-mail confirmed" })).toBeVisible();
}

test("check-email names only the address signed up with, resends, and /verified claims no session it hasn't", async ({ page }, info) => {
  await visit(page, "/check-email?email=%3Cb%3EYour%20account%20is%20locked%3C%2Fb%3E");
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();
  await expect(page.getByText("Your account is locked")).toHaveCount(0);
  await shot(page, info, "01-check-email-direct");

  // A taken address gets the same page as a new one; its owner gets a warning by mail.
  const start = Date.now() - 1000;
  await visit(page, "/sign-up");
  await page.getByLabel("Your name").fill("Someone Else");
  await page.getByLabel("E-mail").fill("billing@demo.isotrope.test");
  await page.getByLabel("Password", { exact: true }).fill("perfectly-fine-42");
  await page.getByLabel("Repeat the password").fill("perfectly-fine-42");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();
  await expect(page.getByText("billing@demo.isotrope.test")).toBeVisible();
  await page.getByRole("button", { name: "Send the link again" }).click();
  await expect(page.getByText("If that address is waiting for confirmation, a new link is on its way.")).toBeVisible();
  await shot(page, info, "02-check-email-resent");
  const warning = await latestMail("billing@demo.isotrope.test", /Someone tried to sign up with your address/, start);
  expect(warning.text).toContain("/forgot-password");

  await visit(page, "/verified");
  await expect(page.getByRole("heading", { name: "Sign in to continue" })).toBeVisible();
  await expect(page.getByText("you are signed in")).toHaveCount(0);
  await shot(page, info, "03-verified-direct");
});

test("a consultant joins a second organisation knowingly, switches back, and changes the password", async ({ browser }, info) => {
  const email = unique("two-orgs");
  const password = "first-Password-42";
  const person = await (await browser.newContext()).newPage();
  await signUpAndConfirm(person, email, "Ada Twofold", password);
  await person.getByRole("link", { name: "Continue to Isotrope" }).click();
  await person.getByLabel("Consultancy name").fill("Twofold Surveys");
  await person.getByRole("button", { name: "Create the organisation" }).click();
  await expect(person.getByText("Twofold Surveys is set up")).toBeVisible();

  const owner = await (await browser.newContext()).newPage();
  await signIn(owner, "owner@demo.isotrope.test");
  await visit(owner, "/members");
  const start = Date.now() - 1000;
  await owner.getByLabel("E-mail").fill(email);
  await owner.getByLabel("Role", { exact: true }).selectOption("engineer");
  await owner.getByRole("button", { name: "Send invitation" }).click();
  await expect(owner.getByText(`Invitation sent to ${email}`)).toBeVisible();

  await visit(person, linkIn(await latestMail(email, /Join Kestrel Lane RF Consulting/, start)));
  await expect(person.getByText("You are a member of Twofold Surveys. Joining adds Kestrel Lane RF Consulting")).toBeVisible();
  await shot(person, info, "04-join-second-organisation");
  await person.getByRole("button", { name: "Join the organisation" }).click();
  await expect(person.getByText("Welcome to Kestrel Lane RF Consulting.")).toBeVisible();

  await visit(person, "/account");
  await expect(person.getByRole("heading", { name: "Your other organisations" })).toBeVisible();
  await shot(person, info, "05-account-other-organisations");
  await person.getByRole("button", { name: "Work in Twofold Surveys" }).click();
  await expect(person.getByText("You are now working in Twofold Surveys.")).toBeVisible();

  await visit(person, "/account");
  await person.getByLabel("Current password").fill(password);
  await person.getByLabel("New password", { exact: true }).fill("second-Password-77");
  await person.getByLabel("Repeat the new password").fill("second-Password-77");
  await person.getByRole("button", { name: "Change password" }).click();
  await expect(person.getByText("Password changed. Other devices are signed out.")).toBeVisible();
  await expect(person.getByLabel("Current password")).toHaveValue("");
  await expect(person.getByLabel("New password", { exact: true })).toHaveValue("");
  await shot(person, info, "06-password-changed");
});

test("a replaced invitation says so, and repeated wrong passwords say how long to wait", async ({ browser, page }, info) => {
  const email = unique("replaced");
  const owner = await (await browser.newContext()).newPage();
  await signIn(owner, "owner@demo.isotrope.test");
  await visit(owner, "/members");
  const start = Date.now() - 1000;
  for (const role of ["engineer", "reviewer"]) {
    await owner.getByLabel("E-mail").fill(email);
    await owner.getByLabel("Role", { exact: true }).selectOption(role);
    await owner.getByRole("button", { name: "Send invitation" }).click();
    await expect(owner.getByText(`Invitation sent to ${email}`)).toBeVisible();
  }
  // Mail goes out after the page answers, and maildev stamps whole seconds:
  // wait for both, and tell them apart by the role each one names.
  type Mail = { to: { address: string }[]; time: string; text: string };
  const mailsTo = async () =>
    ((await (await fetch(`${mailApi()}/api/email`)).json()) as Mail[]).filter(
      (m) => m.to.some((t) => t.address === email) && Date.parse(m.time) >= start,
    );
  await expect.poll(async () => (await mailsTo()).length, { timeout: 15_000 }).toBe(2);
  const all = await mailsTo();
  const mails = [all.find((m) => m.text.includes("as Engineer")), all.find((m) => m.text.includes("as Reviewing engineer"))];
  expect(mails[0]).toBeDefined();
  expect(mails[1]).toBeDefined();
  await visit(page, linkIn(mails[0] as never));
  await expect(page.getByText("sent you a newer invitation, which replaces this one")).toBeVisible();
  await expect(page.getByRole("link", { name: "Go to sign-in" })).toBeVisible();
  await shot(page, info, "07-invitation-replaced");

  await visit(page, "/sign-in");
  const target = unique("guess");
  for (let i = 0; i < 10; i++) {
    await page.getByLabel("E-mail").fill(target);
    await page.getByLabel("Password").fill(`wrong-guess-${i}`);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByRole("button", { name: "Sign in", exact: true })).toBeEnabled();
    await expect(page.getByRole("alert").first()).toBeVisible();
    if (await page.getByText(/Too many failed attempts\. Wait \d+ seconds?, then try again\./).count()) break;
  }
  await expect(page.getByText(/Too many failed attempts\. Wait \d+ seconds?, then try again\./)).toBeVisible();
  await shot(page, info, "08-sign-in-throttled");
});
