// GET /v1/events[/:id] (Stripe's events API, authenticated) and the fake's own test helpers,
// unauthenticated, loopback only:
//   GET  /_fake/events[?type=]        events sent, newest first, with their delivery attempts
//   GET  /_fake/events/:id
//   POST /_fake/events/:id/resend     posts the same event again (same id and body, new signature)
//   GET  /_fake/webhook               { url }
//   PUT  /_fake/webhook  { url }      changes where events go (null: nowhere); for the fake's own tests
import express from "express";
import { invalid, noSuch, wrap } from "./errors.mjs";
import { url as urlParam } from "./params.mjs";
import { clone, paginate } from "./util.mjs";

const view = (record) => ({ id: record.event.id, type: record.event.type, created: record.event.created, deliveries: record.deliveries, event: record.event });

export function eventRoutes(state) {
  const router = express.Router();
  const find = (id) => {
    const record = state.events.get(id);
    if (!record) throw noSuch("event", id, "id");
    return record;
  };

  router.get("/v1/events", (req, res) => {
    let data = state.events.all().map((r) => r.event);
    if (req.query.type !== undefined) data = data.filter((e) => e.type === String(req.query.type));
    res.json(paginate(clone(data), req.query, "/v1/events", invalid));
  });
  router.get("/v1/events/:id", (req, res) => res.json(clone(find(req.params.id).event)));

  router.get("/_fake/events", (req, res) => {
    let data = state.events.all();
    if (req.query.type !== undefined) data = data.filter((r) => r.event.type === String(req.query.type));
    res.json({ object: "list", data: data.map(view) });
  });
  router.get("/_fake/events/:id", (req, res) => res.json(view(find(req.params.id))));
  router.post(
    "/_fake/events/:id/resend",
    wrap(async (req, res) => {
      const record = find(req.params.id);
      const delivery = await state.events.resend(record);
      res.json({ id: record.event.id, type: record.event.type, delivered: state.events.succeeded(delivery), delivery });
    }),
  );

  router.get("/_fake/webhook", (req, res) => res.json({ url: state.config.webhookUrl }));
  router.put("/_fake/webhook", express.json(), (req, res) => {
    const value = req.body?.url;
    state.config.webhookUrl = value === null || value === undefined || value === "" ? null : urlParam(value, "url");
    res.json({ url: state.config.webhookUrl });
  });

  return router;
}
