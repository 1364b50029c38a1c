// The request gate against the built server: floods and huge indexes are answered at once with
// 4xx while /api/health stays answered; malformed requests get 4xx; security headers on HTML and
// JSON; a sign-out posted from another origin is refused and the session lives on.
import { expect, test } from "@playwright/test";
import { rawStatusLine, send } from "../support/http";
import { demoPassword } from "./helpers";

const base = process.env.APP_URL ?? "http://127.0.0.1:3100";
const port = Number(new URL(base).port);
const form = { "content-type": "application/x-www-form-urlencoded", origin: base };

async function signInOverHttp(email: string) {
  const reply = await send(port, { method: "POST", path: "/sign-in", headers: form, body: new URLSearchParams({ email, password: demoPassword }).toString() });
  expect(reply.status).toBe(302);
  const cookies = ([] as string[]).concat(reply.headers["set-cookie"] ?? []).map((c) => c.split(";")[0]);
  return cookies.join("; ");
}

test("floods of repeated keys get 413 while /api/health keeps answering", async () => {
  const started = performance.now();
  let flooding = true;
  const healthStatuses: number[] = [];
  const health = (async () => {
    while (flooding) healthStatuses.push((await send(port, { path: "/api/health" })).status);
  })();
  const sizes = [160_000, 800_000, 160_000, 800_000, 800_000];
  const floods = await Promise.all(
    sizes.map(async (size) => {
      const t = performance.now();
      const reply = await send(port, { method: "POST", path: "/sign-in", headers: form, body: "a=1&".repeat(size / 4) });
      return { size, status: reply.status, ms: Math.round(performance.now() - t) };
    }),
  );
  flooding = false;
  await health;
  console.log(`floods: ${floods.map((f) => `${f.size / 1000} kB → ${f.status} in ${f.ms} ms`).join(", ")}; ` +
    `/api/health answered ${healthStatuses.length}× meanwhile; ${Math.round(performance.now() - started)} ms in all`);
  expect(floods.map((f) => f.status)).toEqual(sizes.map(() => 413));
  expect(healthStatuses.length).toBeGreaterThan(0);
  expect(healthStatuses.every((s) => s === 200)).toBe(true);
});

test("a huge array index is a short 400, not an out-of-memory crash or a megabyte echo", async () => {
  const reply = await send(port, { method: "POST", path: "/sign-in", headers: form, body: "email%5B100000000%5D=x&password=p" });
  expect(reply.status).toBe(400);
  expect(reply.text.length).toBeLessThan(200);
  const smaller = await send(port, { method: "POST", path: "/sign-in", headers: form, body: "email%5B999%5D=x&password=p" });
  expect(smaller.status).toBe(400);
  expect(smaller.text.length).toBeLessThan(20_000); // the page with its form errors, not an echoed array
  expect((await send(port, { path: "/api/health" })).status).toBe(200);
});

test("malformed requests get 4xx, never 5xx", async () => {
  const cases: [string, Parameters<typeof send>[1], number][] = [
    ["no body, no type", { method: "POST", path: "/sign-in", headers: { origin: base } }, 400],
    ["JSON to a form", { method: "POST", path: "/sign-in", headers: { "content-type": "application/json", origin: base }, body: '{"email":"a@b.test"}' }, 415],
    ["text to a form", { method: "POST", path: "/forgot-password", headers: { "content-type": "text/plain", origin: base }, body: "email=x" }, 415],
    ["multipart without boundary", { method: "POST", path: "/sign-up", headers: { "content-type": "multipart/form-data", origin: base }, body: "x" }, 400],
    ["NUL in an id", { path: "/invite/%00abc" }, 400],
    ["NUL in a posted id", { method: "POST", path: "/invite/abc%00", headers: form, body: "name=x" }, 400],
    ["TRACE", { method: "TRACE", path: "/" }, 405],
    ["PROPFIND", { method: "PROPFIND", path: "/members" }, 405],
    ["bad JSON to the API", { method: "POST", path: "/api/auth/sign-in/email", headers: { "content-type": "application/json", origin: base }, body: "{" }, 400],
  ];
  for (const [name, request, status] of cases) {
    const reply = await send(port, request);
    expect(reply.status, name).toBe(status);
  }
  expect(await rawStatusLine(port, "CONNECT elsewhere.test:443 HTTP/1.1\r\nHost: elsewhere.test\r\n\r\n")).toContain("405");
});

test("security headers on HTML and JSON", async () => {
  const page = await send(port, { path: "/sign-in" });
  const csp = String(page.headers["content-security-policy"]);
  const nonce = csp.match(/'nonce-([^']+)'/)?.[1];
  expect(nonce).toBeTruthy();
  expect(csp).toContain("script-src 'self' 'nonce-");
  expect(csp).toContain("frame-ancestors 'none'");
  expect(csp).toContain("object-src 'none'");
  expect(csp).not.toContain("unsafe-inline");
  // Every inline script of the page carries this response's nonce.
  const inline = [...page.text.matchAll(/<script(?![^>]*\bsrc=)([^>]*)>/g)].map((m) => m[1]);
  expect(inline.length).toBeGreaterThan(0);
  for (const attributes of inline) expect(attributes).toContain(`nonce="${nonce}"`);
  const again = await send(port, { path: "/sign-in" });
  expect(again.headers["content-security-policy"]).not.toBe(csp);

  const json = await send(port, { path: "/api/health" });
  for (const reply of [page, json]) {
    expect(reply.headers["x-content-type-options"]).toBe("nosniff");
    expect(reply.headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
  }
  expect(json.headers["content-security-policy"]).toBe("default-src 'none'; frame-ancestors 'none'");
});

test("sign-out from another origin is refused and the session lives on", async () => {
  const cookie = await signInOverHttp("reviewer@demo.isotrope.test");
  const me = () => send(port, { path: "/api/v1/me", headers: { cookie } });
  expect((await me()).status).toBe(200);
  const foreign = await send(port, { method: "POST", path: "/sign-out", headers: { cookie, origin: "https://elsewhere.test", "content-type": "application/x-www-form-urlencoded" }, body: "" });
  expect(foreign.status).toBe(403);
  expect(foreign.text).not.toContain("signed out");
  expect((await me()).status).toBe(200);
  const own = await send(port, { method: "POST", path: "/sign-out", headers: { cookie, origin: base, "content-type": "application/x-www-form-urlencoded" }, body: "" });
  expect(own.status).toBe(302);
  expect((await me()).status).toBe(401);
});
