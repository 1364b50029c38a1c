// Local stand-in for Stripe's API (mocks/stripe/): Checkout Sessions with a hosted test payment
// page, PaymentIntents, refunds and signed webhook events, on top of stripe-stateful-mock's app
// (customers, products, prices, charges, refunds), bound to loopback.
// Usage: node mocks/stripe-server.mjs PORT
// Environment: STRIPE_SECRET_KEY, STRIPE_WEBHOOK_SECRET, STRIPE_WEBHOOK_URL, STRIPE_API_BASE (its own
// public address; default http://127.0.0.1:PORT), STRIPE_FAKE_RETRY_DELAYS_MS, STRIPE_FAKE_QUIET=1.
import { createRequire } from "node:module";
import { configFromEnv } from "./stripe/config.mjs";
import { createFakeStripeApp } from "./stripe/app.mjs";

const require = createRequire(import.meta.url);
const log = require("loglevel");
log.setDefaultLevel(process.env.LOG_LEVEL ?? "warn");

const port = Number(process.argv[2] ?? process.env.STRIPE_MOCK_PORT ?? 12111);
const config = configFromEnv(process.env, port);
const { app } = createFakeStripeApp(config);
app.listen(port, "127.0.0.1", () => {
  console.log(`payment fake on http://127.0.0.1:${port} (webhooks → ${config.webhookUrl ?? "nowhere: STRIPE_WEBHOOK_URL unset"})`);
});
