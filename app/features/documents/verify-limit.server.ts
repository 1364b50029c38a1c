// The public verification page's rate limit, per client address (the address the HTTP server
// established, TRUSTED_PROXIES respected: app/infra/client-address.server.ts), counted in the same
// PostgreSQL table as the sign-in throttle so every app server shares it. Every look-up counts,
// found or not: 30 free, then each further look-up waits 2 s, 4 s, 8 s … up to 15 min; ten quiet
// minutes start the count again. Our numbers (a person checks a handful of codes; a scanner is
// slowed to a crawl), no published source.
import { takeAttempt } from "~/features/auth/throttle.server";
import type { Policy } from "~/features/auth/throttle-policy";
import { clientAddress } from "~/infra/client-address.server";

export const verifyPolicy: Policy = { free: 30, baseSeconds: 2, capSeconds: 15 * 60, quietSeconds: 10 * 60 };

/** 0 when the look-up may go ahead, else the seconds to wait. */
export function takeVerifyLookup(request: Request): Promise<number> {
  return takeAttempt([{ key: `verify-ip:${clientAddress(request)}`, policy: verifyPolicy }]);
}
