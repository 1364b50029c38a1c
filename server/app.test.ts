// The server's gate over real HTTP, with a stand-in for React Router that echoes what reached it.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { connect } from "node:net";
import { createApp } from "./app.mjs";
import { DRAIN_MAX_BYTES } from "./refuse.mjs";
import { CLIENT_ADDRESS_HEADER } from "./client-address.mjs";
import { CLIENT_ADDRESS_HEADER as APP_HEADER } from "../app/infra/client-address.server";
import { listen, rawStatusLine, send } from "../tests/support/http";

const APP_URL = "http://127.0.0.1:3999";
const seen: { method: string; url: string; body: string; clientIp: string | null }[] = [];

function standIn(headers: Record<string, string> = {}) {
  return async () => async (request: Request) => {
    const body = request.body ? await request.text() : "";
    seen.push({ method: request.method, url: request.url, body, clientIp: request.headers.get(CLIENT_ADDRESS_HEADER) });
    return Response.json({ ok: true, body }, { headers });
  };
}

let port = 0;
let close: () => Promise<void>;
beforeAll(async () => {
  const app = createApp({ appUrl: APP_URL, getHandler: standIn(), bodyLimits: [{ path: "/uploads/:id", limit: 1024 * 1024 }] });
  ({ port, close } = await listen(app));
});
afterAll(() => close());

const form = { "content-type": "application/x-www-form-urlencoded" };
const lastSeen = () => seen.at(-1);

describe("methods", () => {
  it("answers TRACE and PROPFIND with 405 and Allow, before the app", async () => {
    const before = seen.length;
    for (const method of ["TRACE", "PROPFIND"]) {
      const reply = await send(port, { method, path: "/" });
      expect(reply.status).toBe(405);
      expect(reply.headers.allow).toBe("GET, HEAD, POST, PUT, PATCH, DELETE, OPTIONS");
    }
    expect(seen.length).toBe(before);
  });
  it("answers CONNECT with 405 instead of dropping the socket", async () => {
    expect(await rawStatusLine(port, "CONNECT elsewhere.test:443 HTTP/1.1\r\nHost: elsewhere.test:443\r\n\r\n")).toBe("HTTP/1.1 405 Method Not Allowed");
  });
});

describe("security headers", () => {
  it("puts the strict defaults on every answer, refusals included", async () => {
    for (const reply of [await send(port, { path: "/api/x" }), await send(port, { method: "TRACE" })]) {
      expect(reply.headers["content-security-policy"]).toBe("default-src 'none'; frame-ancestors 'none'");
      expect(reply.headers["x-content-type-options"]).toBe("nosniff");
      expect(reply.headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
    }
  });
  it("lets the app's own policy replace the default (one header, not two)", async () => {
    const app = createApp({ appUrl: APP_URL, getHandler: standIn({ "content-security-policy": "default-src 'self'" }) });
    const server = await listen(app);
    const reply = await send(server.port, { path: "/page" });
    await server.close();
    expect(reply.headers["content-security-policy"]).toBe("default-src 'self'");
  });
});

describe("client address", () => {
  it("is the socket peer, whatever the client claims", async () => {
    await send(port, { path: "/", headers: { [CLIENT_ADDRESS_HEADER]: "203.0.113.9", "x-forwarded-for": "198.51.100.7" } });
    expect(lastSeen()?.clientIp).toBe("127.0.0.1");
  });
  it("behind a trusted proxy, is the right-most untrusted X-Forwarded-For entry", async () => {
    const app = createApp({ appUrl: APP_URL, trustedProxies: ["127.0.0.1", "10.0.0.0/8"], getHandler: standIn() });
    const server = await listen(app);
    await send(server.port, { path: "/", headers: { "x-forwarded-for": "198.51.100.7, 203.0.113.9, 10.1.2.3", [CLIENT_ADDRESS_HEADER]: "1.1.1.1" } });
    await server.close();
    expect(lastSeen()?.clientIp).toBe("203.0.113.9");
  });
  it("names the same header as the app reads", () => {
    expect(CLIENT_ADDRESS_HEADER).toBe(APP_HEADER);
  });
  it("refuses a malformed TRUSTED_PROXIES entry at start-up", () => {
    expect(() => createApp({ appUrl: APP_URL, trustedProxies: ["not-an-address"], getHandler: standIn() })).toThrow(/TRUSTED_PROXIES/);
  });
});

describe("origin", () => {
  it("refuses writes from another origin before the app runs", async () => {
    const before = seen.length;
    for (const method of ["POST", "PUT", "PATCH", "DELETE"]) {
      const reply = await send(port, { method, path: "/sign-out", headers: { origin: "https://elsewhere.test" } });
      expect(reply.status).toBe(403);
    }
    expect((await send(port, { method: "POST", path: "/sign-out", headers: { origin: "null" } })).status).toBe(403);
    expect(seen.length).toBe(before);
  });
  it("lets same-origin writes, its loopback twin and Origin-less clients through", async () => {
    for (const headers of [{ origin: APP_URL }, { origin: "http://localhost:3999" }, {}] as Record<string, string>[]) {
      expect((await send(port, { method: "POST", path: "/sign-out", headers })).status).toBe(200);
    }
  });
  it("does not judge reads", async () => {
    expect((await send(port, { path: "/", headers: { origin: "https://elsewhere.test" } })).status).toBe(200);
  });
});

describe("body gate", () => {
  it("hands the buffered body to the app unchanged", async () => {
    const text = "email=a%40b.test&name=Caf%C3%A9+%3Cb%3E";
    await send(port, { method: "POST", path: "/sign-in", headers: form, body: text });
    expect(lastSeen()).toMatchObject({ method: "POST", url: `${APP_URL}/sign-in`, body: text });
  });
  it("refuses a declared length over 64 KiB at once, without the app", async () => {
    const before = seen.length;
    const reply = await send(port, { method: "POST", path: "/sign-in", headers: form, body: "a=1&".repeat(40_000) });
    expect(reply.status).toBe(413);
    expect(seen.length).toBe(before);
  });
  it("drains a refused body, so its sender reads the 413 instead of a reset connection", async () => {
    // The client sends the headers and waits for the answer, then sends the 800 kB it declared, then a
    // second request on the same connection. Closing on unread bytes would reset the connection
    // (EPIPE or ECONNRESET on the writes); drained, both answers arrive on one socket.
    const body = "a=1&".repeat(200_000);
    const answers = await new Promise<string>((resolve, reject) => {
      const socket = connect(port, "127.0.0.1");
      let got = "";
      socket.on("error", reject);
      socket.on("data", (d) => {
        got += d.toString();
        if (got.includes("413 Payload Too Large") && !got.includes("HTTP/1.1 200") && !socket.writableEnded) {
          socket.write(body, () => socket.end(`GET /api/health-of-the-stand-in HTTP/1.1\r\nHost: 127.0.0.1\r\nConnection: close\r\n\r\n`));
        }
      });
      socket.on("close", () => resolve(got));
      socket.write(`POST /sign-in HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: application/x-www-form-urlencoded\r\nContent-Length: ${body.length}\r\n\r\n`);
    });
    expect(answers.match(/^HTTP\/1\.1 \d+/gm)).toEqual(["HTTP/1.1 413", "HTTP/1.1 200"]);
  });
  it("closes at once on a declared body beyond what it drains", async () => {
    const declared = `POST /sign-in HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: application/x-www-form-urlencoded\r\nContent-Length: ${DRAIN_MAX_BYTES + 1}\r\n\r\n`;
    expect(await rawStatusLine(port, declared)).toBe("HTTP/1.1 413 Payload Too Large");
  });
  it("cuts a chunked body off at the limit", async () => {
    const reply = await send(port, { method: "POST", path: "/sign-in", headers: form, chunks: Array(20).fill("a".repeat(8 * 1024)) });
    expect(reply.status).toBe(413);
  });
  it("refuses 201 fields, a huge index and a long name; keeps the reply short", async () => {
    const cases: [string, number][] = [
      [Array(201).fill("a=1").join("&"), 413],
      ["email%5B100000000%5D=x&password=p", 400],
      [`${"n".repeat(300)}=1`, 400],
    ];
    for (const [text, status] of cases) {
      const reply = await send(port, { method: "POST", path: "/sign-in", headers: form, body: text });
      expect(reply.status).toBe(status);
      expect(reply.text.length).toBeLessThan(200);
    }
  });
  it("refuses JSON and text on pages (415) and multipart without a boundary (400)", async () => {
    expect((await send(port, { method: "POST", path: "/sign-in", headers: { "content-type": "application/json" }, body: "{}" })).status).toBe(415);
    expect((await send(port, { method: "POST", path: "/sign-in", headers: { "content-type": "text/plain" }, body: "x" })).status).toBe(415);
    expect((await send(port, { method: "POST", path: "/sign-in", headers: { "content-type": "multipart/form-data" }, body: "" })).status).toBe(400);
  });
  it("lets an empty post without a type through to the form's own validation", async () => {
    expect((await send(port, { method: "POST", path: "/sign-out" })).status).toBe(200);
  });
  it("answers /api/ refusals in short JSON", async () => {
    const reply = await send(port, { method: "POST", path: "/api/auth/sign-in/email", headers: { "content-type": "application/json" }, body: '{"email":"\\u0000"}' });
    expect(reply.status).toBe(400);
    expect(JSON.parse(reply.text)).toEqual({ error: { message: "The request contains a NUL character." } });
  });
  it("refuses NUL in the path and in the query", async () => {
    expect((await send(port, { path: "/invite/%00" })).status).toBe(400);
    expect((await send(port, { path: "/reset-password?token=a%00" })).status).toBe(400);
  });
  it("checks only the declared length on a streamed route and passes its body as a stream", async () => {
    const big = "x".repeat(200 * 1024);
    const reply = await send(port, { method: "POST", path: "/uploads/1", headers: { "content-type": "application/octet-stream" }, body: big });
    expect(reply.status).toBe(200);
    expect(lastSeen()?.body.length).toBe(big.length);
    const declared = `POST /uploads/1 HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Length: ${2 * 1024 * 1024}\r\n\r\n`;
    expect(await rawStatusLine(port, declared)).toBe("HTTP/1.1 413 Payload Too Large");
  });
});
