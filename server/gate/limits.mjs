// @ts-check
// How large a request body may be, by path. Forms and JSON get the default; a route that takes
// uploads is listed here with its own limit. For listed routes the gate checks only the declared
// Content-Length and hands the stream to the route, which reads and bounds it itself.
import { matchPath } from "react-router";

export const DEFAULT_BODY_LIMIT = 64 * 1024;
export const MiB = 1024 * 1024;

/**
 * Larger limits, as React Router path patterns (the syntax of app/routes.ts). Each feature keeps
 * its numbers in its own limits module; server/gate/limits.test.ts checks they agree.
 * @type {{ path: string; limit: number }[]}
 */
export const largeBodyRoutes = [
  { path: "/api/v1/visits/:visitId/photos", limit: 10 * MiB + 64 * 1024 }, // app/features/visits/limits.ts
  { path: "/api/v1/visits/:visitId/readings", limit: 2 * MiB },
  { path: "/api/v1/sites/:siteId/surfaces", limit: 2 * MiB }, // app/features/layout/limits.ts
  { path: "/api/v1/sites/:siteId/backdrop", limit: 10 * MiB + 64 * 1024 },
  { path: "/api/v1/sites/:siteId/emitters", limit: 2 * MiB }, // app/features/emitters/limits.ts
  { path: "/api/v1/sites/:siteId/emitters/csv", limit: 5 * MiB },
  { path: "/api/v1/patterns", limit: 1 * MiB },
];

/**
 * The body limit for a request path, and whether the route streams the body itself.
 * React Router's data requests (`/members.data`, `/_root.data` for the index) count as their page.
 * @param {string} pathname
 * @param {{ path: string; limit: number }[]} table
 */
export function bodyLimitFor(pathname, table = largeBodyRoutes) {
  const page = pagePath(pathname);
  for (const route of table) {
    if (matchPath({ path: route.path, end: true }, page)) return { limit: route.limit, streamed: true };
  }
  return { limit: DEFAULT_BODY_LIMIT, streamed: false };
}

/** The page a single-fetch data URL stands for. @param {string} pathname */
export function pagePath(pathname) {
  if (pathname === "/_root.data") return "/";
  return pathname.endsWith(".data") ? pathname.slice(0, -".data".length) : pathname;
}

/** JSON API paths answer refusals in JSON and may take JSON bodies. @param {string} pathname */
export const isApiPath = (pathname) => pathname === "/api" || pathname.startsWith("/api/");
