// @ts-check
// Headers on every response. Non-HTML answers get a CSP that allows nothing; HTML documents
// replace it with the app's own policy and nonce (app/infra/content-security-policy.server.ts,
// set in app/entry.server.tsx).
/** @param {{ https: boolean }} options @returns {import("express").RequestHandler} */
export function securityHeaders({ https }) {
  /** @type {Record<string, string>} */
  const headers = {
    "content-security-policy": "default-src 'none'; frame-ancestors 'none'",
    "x-content-type-options": "nosniff",
    "referrer-policy": "strict-origin-when-cross-origin",
    "x-frame-options": "DENY",
    "cross-origin-opener-policy": "same-origin",
  };
  if (https) headers["strict-transport-security"] = "max-age=31536000";
  return (_req, res, next) => {
    for (const [name, value] of Object.entries(headers)) res.setHeader(name, value);
    next();
  };
}
