// An owner invites a member by e-mail; the invitee signs up through the link and lands in the organisation.
import { expect, test } from "@playwright/test";
import { hydrated, latestMail, linkIn, shot, signIn, unique, visit } from "./helpers";

test("an owner invites a reviewer who accepts and sees the reviewer's view", async ({ browser }, info) => {
  const email = unique("reviewer");
  const owner = await (await browser.newContext()).newPage();
  await signIn(owner, "owner@demo.isotrope.test");
  await owner.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Members" }).click();
  await expect(owner.getByRole("heading", { name: "Members" })).toBeVisible();
  const start = Date.now() - 1000;
  await owner.getByLabel("E-mail").fill(email);
  await owner.getByLabel("Role", { exact: true }).selectOption("reviewer");
  await owner.getByRole("button", { name: "Send invitation" }).click();
  await expect(owner.getByText(`Invitation sent to ${email}`)).toBeVisible();
  await expect(owner.getByRole("listitem").filter({ hasText: email })).toBeVisible();
  await shot(owner, info, "01-members-with-invitation");

  const mail = await latestMail(email, /Join Kestrel Lane RF Consulting/, start);
  const invitee = await (await browser.newContext()).newPage();
  await visit(invitee, linkIn(mail));
  await expect(invitee.getByRole("heading", { name: "Join Kestrel Lane RF Consulting" })).toBeVisible();
  await expect(invitee.getByText("Reviewing engineer")).toBeVisible();
  await invitee.getByLabel("Your name").fill("Rhea Invited");
  await invitee.getByLabel("Password", { exact: true }).fill("reviewer-Pass-31");
  await invitee.getByLabel("Repeat the password").fill("reviewer-Pass-31");
  await shot(invitee, info, "02-accept");
  await invitee.getByRole("button", { name: "Create my account and join" }).click();
  await expect(invitee.getByRole("heading", { name: "Overview" })).toBeVisible();
  await expect(invitee.getByRole("main").getByText("Rhea Invited")).toBeVisible();
  await expect(invitee.getByText("Reviewing engineer").first()).toBeVisible();
  await expect(invitee.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Members" })).toHaveCount(0);
  await shot(invitee, info, "03-reviewer-overview");

  // The link is spent.
  await visit(invitee, linkIn(mail));
  await expect(invitee.getByText("This invitation has already been used.")).toBeVisible();

  // The reviewer cannot open the members page.
  const response = await visit(invitee, "/members");
  expect(response?.status()).toBe(403);
  await expect(invitee.getByText("Your role does not give access to this page.")).toBeVisible();
  await expect(invitee.getByRole("navigation", { name: "Main" })).toBeVisible();
  await shot(invitee, info, "04-reviewer-refused-members");

  // The owner sees the new member and changes the role.
  await owner.reload();
  await hydrated(owner);
  const row = owner.getByRole("row").filter({ hasText: email });
  await expect(row).toBeVisible();
  await row.getByLabel(/Role of/).selectOption("engineer");
  await row.getByRole("button", { name: "Save" }).click();
  await expect(owner.getByText("Role changed to Engineer.")).toBeVisible();

  await owner.getByRole("row").filter({ hasText: email }).getByRole("button", { name: "Remove" }).click();
  await owner.getByRole("dialog").getByRole("button", { name: "Remove" }).click();
  await expect(owner.getByText("Member removed.")).toBeVisible();
  await expect(owner.getByRole("row").filter({ hasText: email })).toHaveCount(0);
});
