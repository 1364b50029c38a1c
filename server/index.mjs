// @ts-check
// Isotrope's HTTP server: `node server/index.mjs` serves the production build (BUILD_DIR, default
// build/); `--dev` mounts Vite in middleware mode instead, so development and production share the
// same gate (server/app.mjs). Settings: PORT, HOST, APP_URL, TRUSTED_PROXIES, BUILD_DIR.
import { createServer } from "node:http";
import { join, resolve } from "node:path";
import { pathToFileURL } from "node:url";
import { createRequestHandler } from "react-router";
import { createApp } from "./app.mjs";
import { parseTrustedProxies } from "./client-address.mjs";
import { refuseConnect } from "./methods.mjs";
import { staticFiles } from "./static-files.mjs";

const dev = process.argv.includes("--dev");
process.env.NODE_ENV ??= dev ? "development" : "production";
const root = resolve(import.meta.dirname, "..");
const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST || undefined;
const appUrl = process.env.APP_URL ?? `http://127.0.0.1:${port}`;
const server = createServer();

/** @typedef {{ startBackgroundWork?: () => Promise<unknown>, stopBackgroundWork?: () => Promise<void> }} Jobs */
/** @returns {Promise<Pick<import("./app.mjs").AppOptions, "getHandler" | "mountAssets"> & { close?: () => Promise<void>, jobs: () => Promise<Jobs> }>} */
async function production() {
  const buildDir = resolve(root, process.env.BUILD_DIR ?? "build");
  const build = await import(pathToFileURL(join(buildDir, "server/index.js")).href);
  const handler = createRequestHandler(build, "production");
  return { getHandler: async () => handler, mountAssets: (app) => app.use(staticFiles(join(buildDir, "client"))), jobs: async () => /** @type {Jobs} */ (build.entry.module) };
}

async function development() {
  const { createServer: createVite } = await import("vite");
  const vite = await createVite({ root, appType: "custom", server: { middlewareMode: true, hmr: { server } } });
  const load = async () => /** @type {import("react-router").ServerBuild} */ (await vite.ssrLoadModule("virtual:react-router/server-build"));
  const handler = createRequestHandler(load, "development");
  const jobs = async () => /** @type {Jobs} */ ((await load()).entry.module);
  return { getHandler: async () => handler, mountAssets: (/** @type {import("express").Express} */ app) => app.use(vite.middlewares), close: () => vite.close(), jobs };
}

try {
  const trustedProxies = parseTrustedProxies(process.env.TRUSTED_PROXIES);
  const mode = dev ? await development() : await production();
  server.on("request", createApp({ appUrl, trustedProxies, ...mode }));
  server.on("connect", refuseConnect);
  server.on("error", (error) => {
    console.error(`[isotrope] the server stopped: ${error.message}`);
    process.exit(1);
  });
  server.listen(port, host, () => console.log(`[isotrope] ${dev ? "development" : "production"} server on ${host ?? "all interfaces"}:${port}, public address ${appUrl}`));
  // PDF rendering and e-mail run here too unless WORKER=off (then run `npm run worker` apart).
  const jobs = await mode.jobs();
  if (process.env.WORKER !== "off") {
    jobs.startBackgroundWork?.().then(
      () => console.log("[isotrope] background worker started (render and mail queues)"),
      (error) => console.error(`[isotrope] the background worker could not start: ${error instanceof Error ? error.message : error}`),
    );
  }
  const stop = () => {
    server.close();
    server.closeIdleConnections();
    void jobs.stopBackgroundWork?.();
    void mode.close?.();
    setTimeout(() => process.exit(0), 2000).unref();
  };
  process.once("SIGTERM", stop);
  process.once("SIGINT", stop);
} catch (error) {
  console.error(`[isotrope] the server could not start: ${error instanceof Error ? error.message : error}`);
  process.exit(1);
}
