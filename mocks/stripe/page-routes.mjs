// GET /checkout/pay/:id shows the page; POST with outcome=pay|decline|cancel acts and redirects (303).
// Pay and decline wait (up to config.redirectWaitMs) for the first webhook attempt before redirecting,
// so the portal has usually seen the event when the browser arrives; retries go on afterwards.
import express from "express";
import { wrap } from "./errors.mjs";
import { checkoutPage, statePage } from "./page-html.mjs";
import { declineSession, paySession } from "./payments.mjs";
import { findSession } from "./sessions.mjs";

const successTarget = (session) => session.success_url.replaceAll("{CHECKOUT_SESSION_ID}", session.id);
const cancelTarget = (session) => session.cancel_url ?? successTarget(session);

function send(res, status, html) {
  res
    .status(status)
    .set({
      "content-type": "text/html; charset=utf-8",
      "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'; frame-ancestors 'none'",
      "cache-control": "no-store",
      "referrer-policy": "no-referrer",
    })
    .send(html);
}

function closedPage(res, session) {
  if (session.status === "complete") return send(res, 200, statePage("Payment complete", "This checkout has been paid.", successTarget(session)));
  return send(res, 410, statePage("Checkout expired", "This checkout has expired; start again from the site.", session.cancel_url, true));
}

export function pageRoutes(state) {
  const router = express.Router();
  const waitFor = (promise) => Promise.race([promise, new Promise((r) => setTimeout(r, state.config.redirectWaitMs).unref?.())]);

  router.get("/checkout/pay/:id", (req, res) => {
    const record = findSession(state, req.params.id);
    if (!record) return send(res, 404, statePage("Checkout not found", "There is no checkout with this address.", null, true));
    if (record.session.status !== "open") return closedPage(res, record.session);
    send(res, 200, checkoutPage(record.session, record.items));
  });

  router.post(
    "/checkout/pay/:id",
    express.urlencoded({ extended: false }),
    wrap(async (req, res) => {
      const record = findSession(state, req.params.id);
      if (!record) return send(res, 404, statePage("Checkout not found", "There is no checkout with this address.", null, true));
      const { session } = record;
      if (session.status !== "open") {
        if (session.status === "complete") return res.redirect(303, successTarget(session));
        return closedPage(res, session);
      }
      const outcome = req.body?.outcome;
      if (outcome === "pay") {
        await waitFor(paySession(state, record).delivered);
        return res.redirect(303, successTarget(session));
      }
      if (outcome === "decline") {
        await waitFor(declineSession(state, record).delivered);
        return res.redirect(303, cancelTarget(session));
      }
      if (outcome === "cancel") return res.redirect(303, cancelTarget(session));
      send(res, 400, statePage("Unknown choice", "Choose one of the buttons on the checkout page.", `/checkout/pay/${session.id}`, true));
    }),
  );

  return router;
}
