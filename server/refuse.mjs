// @ts-check
// The one shape of every refusal the server gives before the app runs: short JSON on /api/
// paths, a short plain-text line elsewhere. Never a stack trace, never the request echoed.
import { isApiPath } from "./gate/limits.mjs";

/**
 * @param {import("express").Request} req
 * @param {import("express").Response} res
 * @param {number} status
 * @param {string} message
 * @param {{ unread?: boolean; headers?: Record<string, string> }} [options]
 *   unread: the body was not (fully) read. What is left of it is read and dropped (drainRefused),
 *   or, when that is more than the drain takes, the connection is closed after the answer.
 */
export function refuse(req, res, status, message, options = {}) {
  if (res.headersSent) return void res.destroy();
  for (const [name, value] of Object.entries(options.headers ?? {})) res.setHeader(name, value);
  if (options.unread && !drainRefused(req)) res.setHeader("connection", "close");
  const api = isApiPath(pathOf(req));
  res.statusCode = status;
  res.setHeader("content-type", api ? "application/json; charset=utf-8" : "text/plain; charset=utf-8");
  res.setHeader("cache-control", "no-store");
  res.end(api ? JSON.stringify({ error: { message } }) : `${message}\n`);
}

/** At most this much of a refused body is still read, within this time. */
export const DRAIN_MAX_BYTES = 1024 * 1024;
export const DRAIN_MAX_MS = 2000;

/**
 * Reads and drops what the client still sends of a refused body, so that it gets the answer: a
 * socket closed with unread bytes is reset by the kernel, and the client (a browser mid-upload)
 * then shows "connection reset" instead of our 413. Dropping bytes costs next to nothing; past
 * DRAIN_MAX_BYTES or DRAIN_MAX_MS the connection is cut. Answers false (nothing done) when the
 * declared length is already more than the drain takes.
 * @param {import("express").Request} req
 */
function drainRefused(req) {
  if (req.complete) return true;
  const declared = Number(req.headers["content-length"]);
  if (Number.isFinite(declared) && declared > DRAIN_MAX_BYTES) return false;
  let dropped = 0;
  const cut = () => req.socket?.destroy();
  const timer = setTimeout(cut, DRAIN_MAX_MS);
  timer.unref();
  req.on("data", (/** @type {Buffer} */ chunk) => {
    dropped += chunk.length;
    if (dropped > DRAIN_MAX_BYTES) cut();
  });
  req.on("end", () => clearTimeout(timer)).on("close", () => clearTimeout(timer)).on("error", () => clearTimeout(timer));
  req.resume();
  return true;
}

/** The path of the request target without its query. @param {import("express").Request} req */
export const pathOf = (req) => {
  const target = req.originalUrl ?? req.url ?? "/";
  const query = target.indexOf("?");
  return query < 0 ? target : target.slice(0, query);
};
