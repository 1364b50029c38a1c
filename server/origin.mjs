// @ts-check
// Cross-site writes stop here: a POST, PUT, PATCH or DELETE whose Origin header is present and is
// not the app's own origin gets 403 and reaches no action. Requests without Origin pass (API
// clients that are not browsers); browsers send Origin on every such request.
import { refuse } from "./refuse.mjs";

const UNSAFE = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** The app's origin and its loopback twin (127.0.0.1 ⇄ localhost), as better-auth trusts them. @param {string} appUrl */
export function appOrigins(appUrl) {
  const origin = new URL(appUrl).origin;
  const twin = origin.includes("://127.0.0.1") ? origin.replace("://127.0.0.1", "://localhost") : origin.replace("://localhost", "://127.0.0.1");
  return new Set([origin, twin]);
}

/** @param {Set<string>} allowed @returns {import("express").RequestHandler} */
export function sameOriginWrites(allowed) {
  return (req, res, next) => {
    const origin = req.headers.origin;
    if (!UNSAFE.has(req.method) || origin === undefined || allowed.has(origin)) return next();
    refuse(req, res, 403, "Requests from other sites are refused.", { unread: true });
  };
}
