import type { Config } from "@react-router/dev/config";

export default {
  ssr: true,
  appDirectory: "app",
  // npm test builds into build-test/ (scripts/stack.mjs) so a running npm start keeps its assets.
  buildDirectory: process.env.BUILD_DIR ?? "build",
} satisfies Config;
