// The one Stripe client. STRIPE_API_BASE points it at the local fake (mocks/stripe: host, port and
// protocol come from that URL); unset, it talks to Stripe itself with STRIPE_SECRET_KEY.
import Stripe from "stripe";
import { env } from "~/infra/env.server";

function options(): Stripe.StripeConfig {
  if (!env.STRIPE_API_BASE) return { maxNetworkRetries: 2 };
  const base = new URL(env.STRIPE_API_BASE);
  const protocol = base.protocol === "https:" ? "https" : "http";
  return { host: base.hostname, port: Number(base.port || (protocol === "https" ? 443 : 80)), protocol, maxNetworkRetries: 2 };
}

const globalForStripe = globalThis as unknown as { isotropeStripe?: Stripe };

export const stripe = (globalForStripe.isotropeStripe ??= new Stripe(env.STRIPE_SECRET_KEY, options()));
export type { Stripe };

/** Verifies a webhook's signature over its raw bytes; throws Stripe's signature error when it does not match. */
export function verifiedEvent(rawBody: Buffer, signature: string): Stripe.Event {
  return stripe.webhooks.constructEvent(rawBody, signature, env.STRIPE_WEBHOOK_SECRET);
}

/** A signature header for a payload, as Stripe makes it (tests and the seed). */
export function signPayload(payload: string, secret = env.STRIPE_WEBHOOK_SECRET) {
  return stripe.webhooks.generateTestHeaderString({ payload, secret });
}
