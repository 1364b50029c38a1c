// The payment fake: our routes first (Checkout Sessions, the hosted page, PaymentIntents, refunds
// with events, events), then stripe-stateful-mock's app (customers, products, prices, charges, refunds…).
import express from "express";
import { createRequire } from "node:module";
import { catalogRoutes } from "./catalog-routes.mjs";
import { checkoutRoutes } from "./checkout-routes.mjs";
import { errorHandler } from "./errors.mjs";
import { eventRoutes } from "./event-routes.mjs";
import { createEvents } from "./events.mjs";
import { moneyRoutes } from "./money-routes.mjs";
import { pageRoutes } from "./page-routes.mjs";
import { allSessions } from "./sessions.mjs";

const require = createRequire(import.meta.url);
const { createExpressApp } = require("stripe-stateful-mock");

/** The API key must be the configured one, as Stripe refuses any other. */
function requireKey(config) {
  return (req, res, next) => {
    const header = req.get("authorization") ?? "";
    let key = header.startsWith("Bearer ") ? header.slice(7) : null;
    if (!key && header.startsWith("Basic ")) key = Buffer.from(header.slice(6), "base64").toString().split(":")[0];
    if (!key) {
      return res.status(401).json({ error: { type: "invalid_request_error", message: "You did not provide an API key. Send it as `Authorization: Bearer <key>`." } });
    }
    if (key !== config.secretKey) {
      const shown = `${key.slice(0, 8)}${"*".repeat(Math.max(0, key.length - 12))}${key.slice(-4)}`;
      return res.status(401).json({ error: { type: "invalid_request_error", code: "api_key_invalid", message: `Invalid API Key provided: ${shown}` } });
    }
    next();
  };
}

/** Idempotency-Key on API POSTs: the same key and body replays the first answer; another body is a 400. */
function idempotency() {
  const seen = new Map();
  return (req, res, next) => {
    const key = req.get("idempotency-key");
    if (req.method !== "POST" || !key) return next();
    const id = `${req.path}\n${key}`;
    const body = JSON.stringify(req.body ?? {});
    const stored = seen.get(id);
    if (stored) {
      if (stored.body !== body) {
        return res.status(400).json({ error: { type: "idempotency_error", message: `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.` } });
      }
      return res.status(stored.status).set("idempotent-replayed", "true").json(stored.response);
    }
    const json = res.json.bind(res);
    res.json = (response) => {
      if (res.statusCode < 500) seen.set(id, { body, status: res.statusCode, response });
      return json(response);
    };
    next();
  };
}

export function createFakeStripeApp(config) {
  const state = { config, events: createEvents(config), sessions: new Map(), intents: new Map() };
  const app = express();
  app.disable("x-powered-by");
  app.get("/_fake/health", (req, res) => res.json({ ok: true }));
  app.use(pageRoutes(state));
  app.use(eventRoutes(state));
  app.use("/v1", requireKey(config), express.urlencoded({ extended: true, limit: "1mb" }));
  const ours = express.Router();
  ours.use(idempotency());
  ours.use(checkoutRoutes(state));
  ours.use(moneyRoutes(state));
  ours.use(catalogRoutes());
  app.use(ours);
  app.use(errorHandler);
  // Stripe expires sessions on its own at expires_at: look every 30 s (reads also expire them).
  setInterval(() => allSessions(state), 30_000).unref();
  app.use(createExpressApp());
  return { app, state };
}
