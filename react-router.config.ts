import type { Config } from "@react-router/dev/config";

export default {
  ssr: true,
  appDirectory: "app",
  // npm test builds into build-test/ (scripts/stack.mjs) so a running npm start keeps its assets.
  buildDirectory: process.env.BUILD_DIR ?? "build",
  // Root middleware resolves the signed-in member once per request (features/auth/session-context.server.ts).
  future: { v8_middleware: true },
  // The whole route manifest in one cached file instead of a partial manifest computed for every
  // document (React Router matches each ancestor path against all routes for it): measured ~0.5 ms
  // less server CPU per signed-in page (docs/decisions/0009).
  routeDiscovery: { mode: "initial" },
} satisfies Config;
