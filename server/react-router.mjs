// @ts-check
// Express → React Router: builds the Fetch Request (with the body the gate buffered, or the raw
// stream for routes that stream their own uploads), runs the app, writes the Response back.
// The URL is always on APP_URL's origin: the app never trusts a Host header.
import { createReadableStreamFromReadable, writeReadableStreamToWritable } from "@react-router/node";

/** @typedef {(request: Request) => Promise<Response>} FetchHandler */

/** @param {import("node:http").IncomingHttpHeaders} incoming */
function toHeaders(incoming) {
  const headers = new Headers();
  for (const [name, value] of Object.entries(incoming)) {
    if (value === undefined) continue;
    for (const v of Array.isArray(value) ? value : [value]) headers.append(name, v);
  }
  return headers;
}

/**
 * @param {import("express").Request} req
 * @param {import("express").Response} res
 * @param {string} origin
 */
export function toFetchRequest(req, res, origin) {
  const controller = new AbortController();
  res.on("close", () => {
    if (!res.writableFinished) controller.abort();
  });
  /** @type {RequestInit & { duplex?: "half" }} */
  const init = { method: req.method, headers: toHeaders(req.headers), signal: controller.signal };
  if (req.method !== "GET" && req.method !== "HEAD") {
    /** @type {Buffer | undefined} */
    const buffered = /** @type {any} */ (req).gatedBody;
    if (buffered) {
      const headers = /** @type {Headers} */ (init.headers);
      headers.delete("transfer-encoding");
      headers.set("content-length", String(buffered.length));
      init.body = /** @type {Uint8Array<ArrayBuffer>} */ (buffered);
    } else {
      init.body = createReadableStreamFromReadable(req);
      init.duplex = "half";
    }
  }
  return new Request(origin + req.originalUrl, init);
}

/**
 * Copies status, headers and body. The app's headers replace the server's defaults of the same
 * name (an HTML page's own Content-Security-Policy replaces the strict default).
 * @param {import("express").Response} res @param {Response} response
 */
export async function sendFetchResponse(res, response) {
  if (res.destroyed || res.writableEnded) return void (await response.body?.cancel());
  res.statusMessage = response.statusText;
  res.status(response.status);
  for (const [name, value] of response.headers) if (name !== "set-cookie") res.setHeader(name, value);
  const cookies = response.headers.getSetCookie();
  if (cookies.length) res.setHeader("set-cookie", cookies);
  if (!response.body) return void res.end();
  try {
    await writeReadableStreamToWritable(response.body, res);
  } catch (error) {
    if (!res.destroyed) throw error; // the client went away mid-answer: nothing to tell it
  }
}

/** @param {() => Promise<FetchHandler>} getHandler @param {string} origin @returns {import("express").RequestHandler} */
export function reactRouter(getHandler, origin) {
  return async (req, res, next) => {
    try {
      const handle = await getHandler();
      await sendFetchResponse(res, await handle(toFetchRequest(req, res, origin)));
    } catch (error) {
      next(error);
    }
  };
}
