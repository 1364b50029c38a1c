// Served over HTTPS (APP_URL https://…), every cookie the app sets is Secure.
import { afterEach, describe, expect, it, vi } from "vitest";

const saved = process.env.APP_URL;
afterEach(() => {
  process.env.APP_URL = saved;
  vi.resetModules();
});

async function importWith(appUrl: string) {
  vi.resetModules();
  process.env.APP_URL = appUrl;
  const { auth } = await import("~/features/auth/auth.server");
  const { redirectWithFlash } = await import("~/infra/flash.server");
  const cookies = (await auth.$context).authCookies;
  const flash = (await redirectWithFlash("/", { kind: "info", message: "x" })).headers.get("set-cookie") ?? "";
  return { cookies, flash };
}

describe("cookies", () => {
  it("are Secure (and __Secure- prefixed for sessions) when APP_URL is https", async () => {
    const { cookies, flash } = await importWith("https://isotrope.example");
    expect(cookies.sessionToken.name).toBe("__Secure-better-auth.session_token");
    expect(cookies.sessionToken.attributes).toMatchObject({ secure: true, httpOnly: true, sameSite: "lax" });
    expect(flash).toMatch(/;\s*Secure/i);
  });

  it("are not Secure on plain http (local development)", async () => {
    const { cookies, flash } = await importWith("http://127.0.0.1:3000");
    expect(cookies.sessionToken.attributes.secure).toBe(false);
    expect(flash).not.toMatch(/;\s*Secure/i);
  });
});
