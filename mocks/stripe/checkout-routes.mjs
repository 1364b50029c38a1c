// /v1/checkout/sessions: create, retrieve, list (payment_intent / status / customer filters),
// line_items, expire.
import express from "express";
import { invalid, wrap } from "./errors.mjs";
import { presentIntent } from "./money-routes.mjs";
import { allSessions, createSession, expireSession, requireSession } from "./sessions.mjs";
import { clone, expandList, paginate } from "./util.mjs";

/** The session as the API returns it, with `expand[]` line_items / payment_intent filled in. */
export function presentSession(state, session, expand) {
  const out = clone(session);
  const names = expandList(expand);
  if (names.includes("line_items")) {
    const { items } = state.sessions.get(session.id);
    out.line_items = { object: "list", data: clone(items), has_more: false, url: `/v1/checkout/sessions/${session.id}/line_items` };
  }
  if (names.some((n) => n === "payment_intent" || n.startsWith("payment_intent.")) && session.payment_intent) {
    out.payment_intent = presentIntent(state.intents.get(session.payment_intent), names.includes("payment_intent.latest_charge") ? ["latest_charge"] : []);
  }
  return out;
}

export function checkoutRoutes(state) {
  const router = express.Router();

  router.post("/v1/checkout/sessions", (req, res) => {
    const session = createSession(state, req.body);
    res.json(presentSession(state, session, req.body?.expand));
  });

  router.get("/v1/checkout/sessions", (req, res) => {
    let data = allSessions(state);
    for (const key of ["payment_intent", "status", "customer", "client_reference_id"]) {
      if (req.query[key] !== undefined) data = data.filter((s) => s[key] === String(req.query[key]));
    }
    const list = paginate(data, req.query, "/v1/checkout/sessions", invalid);
    // List expansions name the items' fields as `data.<field>`.
    const expand = expandList(req.query.expand).map((name) => name.replace(/^data\./, ""));
    list.data = list.data.map((s) => presentSession(state, s, expand));
    res.json(list);
  });

  router.get("/v1/checkout/sessions/:id", (req, res) => {
    const { session } = requireSession(state, req.params.id, "session");
    res.json(presentSession(state, session, req.query.expand));
  });

  router.get("/v1/checkout/sessions/:id/line_items", (req, res) => {
    const { items } = requireSession(state, req.params.id, "session");
    res.json(paginate(clone(items), req.query, `/v1/checkout/sessions/${req.params.id}/line_items`, invalid));
  });

  router.post(
    "/v1/checkout/sessions/:id/expire",
    wrap(async (req, res) => {
      const record = requireSession(state, req.params.id, "session");
      if (record.session.status !== "open") {
        throw invalid(
          `Only Checkout Sessions with a status in ["open"] can be expired. This Checkout Session has a status of "${record.session.status}".`,
          undefined,
          "checkout_session_not_open",
        );
      }
      expireSession(state, record);
      res.json(presentSession(state, record.session, req.body?.expand));
    }),
  );

  return router;
}
