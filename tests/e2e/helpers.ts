import { expect, type Page, type TestInfo } from "@playwright/test";

const mailApi = () => process.env.MAILDEV_API ?? "http://127.0.0.1:1090";
export const demoPassword = process.env.DEMO_PASSWORD ?? "isotrope-demo";

type Mail = { id: string; subject: string; text: string; to: { address: string }[]; time: string };

/** Waits for the newest message to `address` whose subject matches, via maildev's HTTP API. */
export async function latestMail(address: string, subject: RegExp, after = 0): Promise<Mail> {
  for (let i = 0; i < 60; i++) {
    const mails = (await (await fetch(`${mailApi()}/api/email`)).json()) as Mail[];
    const match = mails
      .filter((m) => m.to.some((t) => t.address === address) && subject.test(m.subject) && Date.parse(m.time) >= after)
      .sort((a, b) => Date.parse(b.time) - Date.parse(a.time))[0];
    if (match) return match;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no mail to ${address} matching ${subject}`);
}

export function linkIn(mail: Mail): string {
  const url = mail.text.match(/https?:\/\/\S+/)?.[0];
  if (!url) throw new Error(`no link in mail "${mail.subject}"`);
  return url;
}

/** Opens a page and waits for it to become interactive. */
export async function visit(page: Page, url: string) {
  const response = await page.goto(url);
  await hydrated(page);
  return response;
}

export async function signIn(page: Page, email: string, password = demoPassword) {
  await visit(page, "/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("button", { name: "Sign out" })).toBeVisible();
}

export async function shot(page: Page, info: TestInfo, name: string) {
  const path = info.outputPath(`${name}.png`);
  await page.screenshot({ fullPage: true, path });
  await info.attach(name, { path, contentType: "image/png" });
}

export const unique = (prefix: string) => `${prefix}-${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}@example.test`;

/** Waits until React has hydrated the page, so controls keep what the test sets. */
export async function hydrated(page: Page) {
  await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
}
