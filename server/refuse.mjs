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
 *   unread: the body was not (fully) read, so the connection is closed after the answer.
 */
export function refuse(req, res, status, message, options = {}) {
  if (res.headersSent) return void res.destroy();
  for (const [name, value] of Object.entries(options.headers ?? {})) res.setHeader(name, value);
  if (options.unread) res.setHeader("connection", "close");
  const api = isApiPath(pathOf(req));
  res.statusCode = status;
  res.setHeader("content-type", api ? "application/json; charset=utf-8" : "text/plain; charset=utf-8");
  res.setHeader("cache-control", "no-store");
  res.end(api ? JSON.stringify({ error: { message } }) : `${message}\n`);
}

/** The path of the request target without its query. @param {import("express").Request} req */
export const pathOf = (req) => {
  const target = req.originalUrl ?? req.url ?? "/";
  const query = target.indexOf("?");
  return query < 0 ? target : target.slice(0, query);
};
