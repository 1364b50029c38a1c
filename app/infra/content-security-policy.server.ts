// The Content-Security-Policy of the app's HTML pages, in one place. Scripts run only from this
// origin or with the per-request nonce React Router puts on its inline hydration scripts.
// Non-HTML answers get the server's stricter default (server/security-headers.mjs).
// Later work extends the directives here.
import { randomBytes } from "node:crypto";
import { env } from "~/infra/env.server";

/** Where a checkout form may lead (a form post answered by a redirect to the payment page): the local fake, or Stripe's checkout. */
const checkoutOrigins = () => [env.STRIPE_API_BASE ? new URL(env.STRIPE_API_BASE).origin : "https://checkout.stripe.com"];

export const createNonce = () => randomBytes(16).toString("base64");

export function contentSecurityPolicy(nonce: string, { dev = false } = {}) {
  const directives: Record<string, string[]> = {
    "default-src": ["'self'"],
    "script-src": ["'self'", `'nonce-${nonce}'`],
    // Development only: Vite injects each module's CSS as a <style> element.
    "style-src": dev ? ["'self'", "'unsafe-inline'"] : ["'self'"],
    "img-src": ["'self'", "data:", "blob:"],
    "font-src": ["'self'"],
    "connect-src": ["'self'"],
    // The exposure pages' Web Workers (what-if, the 3D view's grid and marching cubes): same-origin
    // module scripts, or blob: URLs where a bundler inlines a worker. No 'unsafe-eval' anywhere.
    "worker-src": ["'self'", "blob:"],
    "frame-ancestors": ["'none'"],
    "base-uri": ["'none'"],
    "form-action": ["'self'", ...checkoutOrigins()],
    "object-src": ["'none'"],
  };
  return Object.entries(directives)
    .map(([name, values]) => `${name} ${values.join(" ")}`)
    .join("; ");
}
