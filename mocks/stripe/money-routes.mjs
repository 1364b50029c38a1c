// PaymentIntents (read), refunds by payment_intent or charge (with charge.refunded), and the
// payment_intent filter on charge and refund lists. Charges and refunds themselves live in
// stripe-stateful-mock; its other routes (GET /v1/refunds/:id, /v1/charges/:id …) serve them.
import express from "express";
import { createRequire } from "node:module";
import { invalid, noSuch, RestError } from "./errors.mjs";
import { integer, metadata, rejectUnknown } from "./params.mjs";
import { clone, expandList, paginate } from "./util.mjs";

const require = createRequire(import.meta.url);
const { charges } = require("stripe-stateful-mock/dist/api/charges");
const { refunds } = require("stripe-stateful-mock/dist/api/refunds");
const ACCOUNT = "acct_default";

export function presentIntent(intent, expand) {
  const out = clone(intent);
  if (expandList(expand).includes("latest_charge") && intent.latest_charge) out.latest_charge = clone(charges.retrieve(ACCOUNT, intent.latest_charge, "id"));
  return out;
}

function chargeOf(id, param) {
  try {
    return charges.retrieve(ACCOUNT, String(id), param);
  } catch (error) {
    if (error instanceof RestError) throw noSuch("charge", id, param, 400);
    throw error;
  }
}

export function moneyRoutes(state) {
  const router = express.Router();

  router.get("/v1/payment_intents", (req, res) => {
    const data = [...state.intents.values()].reverse().map((pi) => presentIntent(pi, req.query.expand));
    res.json(paginate(data, req.query, "/v1/payment_intents", invalid));
  });

  router.get("/v1/payment_intents/:id", (req, res) => {
    const intent = state.intents.get(req.params.id);
    if (!intent) throw noSuch("payment_intent", req.params.id, "intent");
    res.json(presentIntent(intent, req.query.expand));
  });

  router.post("/v1/refunds", (req, res) => {
    const params = req.body ?? {};
    rejectUnknown(params, ["payment_intent", "charge", "amount", "metadata", "reason", "expand", "instructions_email"]);
    if ((params.payment_intent === undefined) === (params.charge === undefined)) {
      throw invalid("One of `charge` or `payment_intent` is required (not both).", params.charge === undefined ? "payment_intent" : "charge");
    }
    let charge;
    if (params.payment_intent !== undefined) {
      const intent = state.intents.get(String(params.payment_intent));
      if (!intent) throw noSuch("payment_intent", params.payment_intent, "payment_intent", 400);
      if (intent.status !== "succeeded" || !intent.latest_charge) {
        throw invalid(`This PaymentIntent (${intent.id}) does not have a successful charge to refund.`, "payment_intent", "charge_not_refundable");
      }
      charge = chargeOf(intent.latest_charge, "payment_intent");
    } else {
      charge = chargeOf(params.charge, "charge");
    }
    const reasons = ["duplicate", "fraudulent", "requested_by_customer"];
    if (params.reason !== undefined && !reasons.includes(params.reason)) throw invalid(`Invalid reason: must be one of ${reasons.join(", ")}`, "reason");
    const refund = refunds.create(ACCOUNT, {
      charge: charge.id,
      ...(params.amount !== undefined ? { amount: integer(params.amount, "amount", { min: 1 }) } : {}),
      metadata: metadata(params.metadata),
      reason: params.reason,
    });
    refund.payment_intent = charge.payment_intent ?? null;
    state.events.emit("charge.refunded", charge);
    res.json(clone(refund));
  });

  router.get("/v1/refunds", (req, res, next) => {
    if (req.query.payment_intent === undefined) return next();
    const data = refunds.list(ACCOUNT, {}).data.filter((r) => r.payment_intent === String(req.query.payment_intent));
    res.json(paginate(clone(data), req.query, "/v1/refunds", invalid));
  });

  router.get("/v1/charges", (req, res, next) => {
    if (req.query.payment_intent === undefined) return next();
    const data = charges.list(ACCOUNT, {}).data.filter((c) => c.payment_intent === String(req.query.payment_intent));
    res.json(paginate(clone(data), req.query, "/v1/charges", invalid));
  });

  return router;
}
