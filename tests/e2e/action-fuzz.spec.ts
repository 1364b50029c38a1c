// Property: no request to any action route of app/routes.ts is answered with a 5xx, whatever its
// method (mostly writes; reads and OPTIONS too), content type, body, parameters or session. Random bodies come from fast-check; a
// failure prints the shrunk request and the seed to replay it.
import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import fc from "fast-check";
import routeConfig from "../../app/routes";
import { send } from "../support/http";
import { demoPassword } from "./helpers";

const base = process.env.APP_URL ?? "http://127.0.0.1:3100";
const port = Number(new URL(base).port);

type Entry = { path?: string; index?: boolean; file: string; children?: Entry[] };

/** Every route with an `action` export, as a URL pattern ("/invite/:invitationId"). */
function actionRoutes(entries: Entry[], parent = ""): { pattern: string; index: boolean }[] {
  return entries.flatMap((entry) => {
    const pattern = entry.path ? `${parent.replace(/\/$/, "")}/${entry.path}` : parent || "/";
    const source = readFileSync(new URL(`../../app/${entry.file}`, import.meta.url), "utf8");
    const own = /export\s+(async\s+)?function\s+action\b|export\s+const\s+action\b/.test(source) ? [{ pattern, index: Boolean(entry.index) }] : [];
    return [...own, ...actionRoutes(entry.children ?? [], pattern)];
  });
}

const routes = actionRoutes(routeConfig as Entry[]);
const knownKeys = ["email", "password", "confirm", "current", "name", "token", "intent", "memberId", "invitationId", "role", "redirectTo", "__intent__", "__state__"];
const authPaths = ["sign-in/email", "sign-up/email", "request-password-reset", "reset-password", "verify-email", "send-verification-email", "change-password", "get-session", "list-sessions", "organization/list-members"];
const oddValues = ["invite", "change-role", "remove", "cancel-invite", "owner", "engineer", "<script>alert(1)</script>", "'; drop table member; --", "x".repeat(5000), "\u202e\u0301", "😀", "%00", "{", "[]", "-1", "1e309", "../../etc"];

const segment = fc.oneof(fc.uuid(), fc.string({ maxLength: 12 }), fc.constantFrom("..", "%2e%2e", "a%2Fb", "%E0%A4%A", "%ff"));
const key = fc.oneof(
  fc.constantFrom(...knownKeys),
  fc.string({ maxLength: 20 }),
  fc.tuple(fc.constantFrom(...knownKeys), fc.nat(2000)).map(([k, i]) => `${k}[${i}]`),
  fc.tuple(fc.constantFrom(...knownKeys), fc.string({ maxLength: 6 })).map(([k, s]) => `${k}.${s}`),
);
const value = fc.oneof(fc.string({ maxLength: 40 }), fc.string({ unit: "binary", maxLength: 20 }), fc.constantFrom(...oddValues));
const fields = fc.array(fc.tuple(key, value), { maxLength: 25 });

const multipart = (pairs: [string, string][], boundary: string) =>
  pairs.map(([k, v]) => `--${boundary}\r\nContent-Disposition: form-data; name="${k.replace(/"/g, "%22")}"\r\n\r\n${v}\r\n`).join("") + `--${boundary}--\r\n`;

const body = fc.oneof(
  fields.map((p) => ({ type: "application/x-www-form-urlencoded", text: new URLSearchParams(p).toString() })),
  fields.map((p) => ({ type: "multipart/form-data; boundary=fz0", text: multipart(p, "fz0") })),
  fields.map((p) => ({ type: "multipart/form-data", text: multipart(p, "fz1") })),
  fc.jsonValue().map((j) => ({ type: "application/json", text: JSON.stringify(j) ?? "null" })),
  fc.tuple(fc.constantFrom("text/plain", "application/xml", "application/octet-stream", "", "garbage/;;=", "application/x-www-form-urlencoded"), fc.string({ unit: "binary", maxLength: 200 })).map(([type, text]) => ({ type, text })),
  fc.constant({ type: "", text: "" }),
);

test("no action answers 5xx to random and malformed requests", async () => {
  expect(routes.map((r) => r.pattern).sort()).toEqual(expect.arrayContaining(["/sign-in", "/members", "/api/auth/*"]));
  const signIn = await send(port, {
    method: "POST", path: "/sign-in",
    headers: { "content-type": "application/x-www-form-urlencoded", origin: base },
    body: new URLSearchParams({ email: "owner@demo.isotrope.test", password: demoPassword }).toString(),
  });
  const ownerCookie = ([] as string[]).concat(signIn.headers["set-cookie"] ?? []).map((c) => c.split(";")[0]).join("; ");
  expect(ownerCookie).toContain("session_token");

  const request = fc.record({
    route: fc.constantFrom(...routes),
    params: fc.array(segment, { minLength: 3, maxLength: 3 }),
    auth: fc.constantFrom(...authPaths),
    dataRequest: fc.boolean(),
    method: fc.constantFrom("POST", "POST", "POST", "PUT", "PATCH", "DELETE", "OPTIONS", "GET", "HEAD"),
    body,
    signedIn: fc.boolean(),
    withOrigin: fc.boolean(),
  });
  let sent = 0;
  await fc.assert(
    fc.asyncProperty(request, async (r) => {
      let path = r.route.pattern.replace(/:[A-Za-z]+/g, () => r.params[0]).replace("*", () => (r.params[1].length % 3 === 0 ? r.params[1] : r.auth));
      if (r.dataRequest) path = path === "/" ? "/_root.data" : `${path}.data`;
      if (r.route.index && r.params[2].length % 2 === 0) path += "?index";
      // The signed-in arm never signs itself out, so the session lasts the whole run.
      const cookie = r.signedIn && !/sign-out|revoke/.test(path) ? ownerCookie : undefined;
      const headers: Record<string, string> = {};
      if (r.body.type) headers["content-type"] = r.body.type;
      if (r.withOrigin) headers.origin = base;
      if (cookie) headers.cookie = cookie;
      const bodyless = r.method === "GET" || r.method === "HEAD";
      const reply = await send(port, { method: r.method, path: encodeURI(path).replace(/%25/g, "%"), headers, body: bodyless ? undefined : r.body.text });
      sent++;
      expect(reply.status, `${r.method} ${path} (${r.body.type || "no type"}) → ${reply.status}: ${reply.text.slice(0, 200)}`).toBeLessThan(500);
    }),
    { numRuns: Number(process.env.FUZZ_RUNS ?? 300) },
  );
  console.log(`${sent} requests to ${routes.length} action routes (${routes.map((r) => r.pattern).join(", ")}), none answered 5xx`);
  expect((await send(port, { path: "/api/v1/me", headers: { cookie: ownerCookie } })).status).toBe(200);
});
