// Pieces the benchmark scripts share. Figures only; nothing here asserts.
import { readFileSync } from "node:fs";

/** The app's pid when `with-stack` started it (WITH_APP=1), for the server's CPU per request. */
export const appPid = process.env.APP_PID;

/** The server process's user + system CPU time in ms (Linux /proc), or null without APP_PID. */
export function serverCpuMs() {
  if (!appPid) return null;
  try {
    const fields = readFileSync(`/proc/${appPid}/stat`, "utf8").split(") ")[1].split(" ");
    return (Number(fields[11]) + Number(fields[12])) * 10; // clock ticks of 10 ms
  } catch {
    return null;
  }
}

/**
 * Signs the page in as the demo engineer and returns the URL of the demo rooftop's (Calloway House)
 * Exposure section. @param {import("playwright-core").Page} page
 */
export async function demoExposureUrl(page, base) {
  await page.goto(`${base}/sign-in`);
  await page.locator("html[data-hydrated]").waitFor({ state: "attached" });
  await page.getByLabel("E-mail").fill("engineer@demo.isotrope.test");
  await page.getByLabel("Password").fill(process.env.DEMO_PASSWORD ?? "isotrope-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.getByRole("button", { name: "Sign out" }).waitFor();
  await page.goto(`${base}/sites`);
  const href = await page.getByRole("link", { name: "Calloway House" }).first().getAttribute("href");
  return `${base}${href}/exposure`;
}
