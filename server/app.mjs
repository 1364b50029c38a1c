// @ts-check
// The Express app in front of React Router, in the order every request meets it:
// security headers → method allow-list → client address → request target → compression and
// static files → same-origin writes → body gate → the app. server/index.mjs supplies the app
// (the production build, or Vite's in development); tests supply a stand-in.
import compression from "compression";
import express from "express";
import { allowMethods } from "./methods.mjs";
import { appOrigins, sameOriginWrites } from "./origin.mjs";
import { bodyGate } from "./gate/read-body.mjs";
import { inspectTarget } from "./gate/inspect.mjs";
import { largeBodyRoutes } from "./gate/limits.mjs";
import { reactRouter } from "./react-router.mjs";
import { refuse } from "./refuse.mjs";
import { securityHeaders } from "./security-headers.mjs";
import { setClientAddress } from "./client-address.mjs";

/**
 * @typedef {object} AppOptions
 * @property {string} appUrl APP_URL: the public origin; writes from other origins are refused
 * @property {string[]} [trustedProxies] TRUSTED_PROXIES, parsed
 * @property {() => Promise<import("./react-router.mjs").FetchHandler>} getHandler the app's fetch handler
 * @property {(app: import("express").Express) => void} [mountAssets] static files (or Vite's middlewares in dev)
 * @property {typeof largeBodyRoutes} [bodyLimits] routes with a larger body limit
 */

/** @param {AppOptions} options */
export function createApp({ appUrl, trustedProxies = [], getHandler, mountAssets, bodyLimits = largeBodyRoutes }) {
  const origin = new URL(appUrl).origin;
  const app = express();
  app.disable("x-powered-by");
  app.set("query parser", false); // the app reads the URL itself
  try {
    app.set("trust proxy", trustedProxies.length ? trustedProxies : false);
  } catch (error) {
    throw new Error(`TRUSTED_PROXIES: ${error instanceof Error ? error.message : error}`);
  }
  app.use(securityHeaders({ https: origin.startsWith("https:") }));
  app.use(allowMethods);
  app.use(setClientAddress);
  app.use((req, res, next) => {
    const refusal = inspectTarget(req.originalUrl);
    if (refusal) return refuse(req, res, refusal.status, refusal.message, { unread: true });
    next();
  });
  app.use(compression());
  mountAssets?.(app);
  app.use(sameOriginWrites(appOrigins(appUrl)));
  app.use(bodyGate({ table: bodyLimits }));
  app.all("*", reactRouter(getHandler, origin));
  /** @type {import("express").ErrorRequestHandler} */
  const lastResort = (error, req, res, _next) => {
    console.error(error);
    refuse(req, res, 500, "Something went wrong on our side.");
  };
  app.use(lastResort);
  return app;
}
