// Local stand-in for Stripe's API: stripe-stateful-mock's app, bound to loopback.
// Usage: node mocks/stripe-server.mjs PORT
import { createRequire } from "node:module";

const require = createRequire(import.meta.url);
const log = require("loglevel");
log.setDefaultLevel(process.env.LOG_LEVEL ?? "warn");
const { createExpressApp } = require("stripe-stateful-mock");

const port = Number(process.argv[2] ?? process.env.STRIPE_MOCK_PORT ?? 12111);
const app = createExpressApp();
app.listen(port, "127.0.0.1", () => console.log(`payment fake on http://127.0.0.1:${port}`));
