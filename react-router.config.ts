import type { Config } from "@react-router/dev/config";

export default {
  ssr: true,
  appDirectory: "app",
  // npm test builds into build-test/ (scripts/stack.mjs) so a running npm start keeps its assets.
  buildDirectory: process.env.BUILD_DIR ?? "build",
  // Root middleware resolves the signed-in member once per request (features/auth/session-context.server.ts).
  future: { v8_middleware: true },
} satisfies Config;
