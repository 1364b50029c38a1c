// Test helpers for the HTTP server (server/): start an app on a free loopback port, send raw HTTP requests.
import { request as httpRequest, createServer, type IncomingHttpHeaders, type Server } from "node:http";
import { connect } from "node:net";
import type { Express } from "express";
import { refuseConnect } from "../../server/methods.mjs";

export async function listen(app: Express): Promise<{ base: string; port: number; close: () => Promise<void> }> {
  const server: Server = createServer(app);
  server.on("connect", refuseConnect);
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const port = (server.address() as { port: number }).port;
  return {
    base: `http://127.0.0.1:${port}`,
    port,
    close: () => new Promise((resolve) => { server.closeAllConnections(); server.close(() => resolve()); }),
  };
}

export type Reply = { status: number; headers: IncomingHttpHeaders; text: string };

/** One request; `chunks` sends the body with chunked transfer encoding, `body` with Content-Length. */
export function send(
  port: number,
  options: { method?: string; path?: string; headers?: Record<string, string>; body?: string | Buffer; chunks?: (string | Buffer)[] },
): Promise<Reply> {
  // Node's client frames a body on DELETE or OPTIONS with neither length nor chunks, so the server
  // would read it as the start of the next request on the kept-alive connection: say its length.
  const headers = { ...options.headers };
  const named = Object.keys(headers).map((h) => h.toLowerCase());
  if (options.body !== undefined && !options.chunks && !named.includes("content-length") && !named.includes("transfer-encoding")) {
    headers["content-length"] = String(Buffer.byteLength(options.body));
  }
  return new Promise((resolve, reject) => {
    const req = httpRequest({ host: "127.0.0.1", port, method: options.method ?? "GET", path: options.path ?? "/", headers }, (res) => {
      const parts: Buffer[] = [];
      res.on("data", (c: Buffer) => parts.push(c));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text: Buffer.concat(parts).toString("utf8") }));
    });
    req.on("error", reject);
    if (options.chunks) for (const c of options.chunks) req.write(c);
    req.end(options.body);
  });
}

/** Writes raw bytes on a socket and returns the first line of the answer. */
export function rawStatusLine(port: number, raw: string): Promise<string> {
  return new Promise((resolve, reject) => {
    const socket = connect(port, "127.0.0.1", () => socket.write(raw));
    let got = "";
    socket.on("data", (d) => (got += d.toString()));
    socket.on("close", () => resolve(got.split("\r\n")[0]));
    socket.on("error", reject);
  });
}
