// POST /api/stripe/webhook: Stripe's (or the local fake's) signed events. No session or token: the
// signature over the raw body is the authentication (app/features/billing/webhook.server.ts).
import { receiveWebhook } from "~/features/billing/webhook.server";
import { methodNotAllowed } from "~/lib/api.server";
import type { Route } from "./+types/webhook";

export async function action({ request }: Route.ActionArgs) {
  if (request.method !== "POST") return methodNotAllowed("POST");
  const raw = Buffer.from(await request.arrayBuffer());
  try {
    const answer = await receiveWebhook(raw, request.headers.get("stripe-signature"));
    return Response.json(answer.body, { status: answer.status });
  } catch (error) {
    // Nothing was written (one transaction): answer 500 so Stripe sends it again.
    console.error("[billing] webhook handling failed:", error instanceof Error ? error.message : error);
    return Response.json({ error: { message: "The event could not be handled; it was not stored. Send it again." } }, { status: 500 });
  }
}
