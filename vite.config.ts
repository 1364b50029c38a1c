import { reactRouter } from "@react-router/dev/vite";
import tailwindcss from "@tailwindcss/vite";
import { defineConfig } from "vitest/config";

const underTest = Boolean(process.env.VITEST);

export default defineConfig({
  plugins: underTest ? [] : [tailwindcss(), reactRouter()],
  resolve: { alias: { "~": new URL("./app", import.meta.url).pathname } },
  test: {
    projects: [
      {
        extends: true,
        test: { name: "unit", include: ["app/**/*.test.ts", "server/**/*.test.ts", "tests/cli/**/*.test.ts"], environment: "node" },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/integration/global-setup.ts"],
          env: { SIGN_IN_LIMIT: "5", SIGN_IN_WINDOW_SECONDS: "60" },
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
