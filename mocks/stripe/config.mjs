// The fake's settings, from the same environment variables the portal reads.
export const DEFAULT_SECRET_KEY = "sk_test_isotrope_local";
export const DEFAULT_WEBHOOK_SECRET = "whsec_isotrope_local";
// The API version the pinned `stripe` SDK asks for (node_modules/stripe/cjs/apiVersion.js); events carry it.
export const API_VERSION = "2026-11-18.endive";

/**
 * @param {NodeJS.ProcessEnv} env
 * @param {number} port the port the fake listens on (its public base when STRIPE_API_BASE is unset)
 */
export function configFromEnv(env, port) {
  const delays = (env.STRIPE_FAKE_RETRY_DELAYS_MS ?? "500,2000,6000,15000")
    .split(",")
    .map((s) => Number(s.trim()))
    .filter((n) => Number.isFinite(n) && n >= 0);
  return {
    secretKey: env.STRIPE_SECRET_KEY || DEFAULT_SECRET_KEY,
    webhookSecret: env.STRIPE_WEBHOOK_SECRET || DEFAULT_WEBHOOK_SECRET,
    /** Where events go; null: kept in the event log, not delivered. Changeable at run time (PUT /_fake/webhook). */
    webhookUrl: env.STRIPE_WEBHOOK_URL || null,
    publicBase: (env.STRIPE_API_BASE || `http://127.0.0.1:${port}`).replace(/\/$/, ""),
    retryDelaysMs: delays,
    /** How long the hosted page waits for the first delivery attempt before redirecting the browser. */
    redirectWaitMs: Number(env.STRIPE_FAKE_REDIRECT_WAIT_MS ?? 5000),
  };
}
