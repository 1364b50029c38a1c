// Stripe's webhook signature: `Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256(secret, "<t>.<payload>")>`,
// the secret used as given (the whole `whsec_…` string), as the SDK's generateTestHeaderString does.
import { createHmac } from "node:crypto";

export function signatureHeader(payload, secret, timestamp = Math.floor(Date.now() / 1000)) {
  const v1 = createHmac("sha256", secret).update(`${timestamp}.${payload}`, "utf8").digest("hex");
  return `t=${timestamp},v1=${v1}`;
}
