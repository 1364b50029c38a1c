// Errors shaped as Stripe's: { error: { type, code, message, param, doc_url } } with a 4xx status.
// stripe-stateful-mock's own RestError is reused so that errors thrown by its modules (charges,
// refunds, prices) come out the same way.
import { createRequire } from "node:module";

const require = createRequire(import.meta.url);
/** @type {new (status: number, error: Record<string, unknown>) => Error & { statusCode: number, error: Record<string, unknown> }} */
export const RestError = require("stripe-stateful-mock/dist/api/RestError").RestError;

const doc = (code) => (code ? `https://docs.stripe.com/error-codes/${code.replaceAll("_", "-")}` : undefined);

/** 400 invalid_request_error */
export function invalid(message, param, code) {
  return new RestError(400, { type: "invalid_request_error", message, ...(param ? { param } : {}), ...(code ? { code, doc_url: doc(code) } : {}) });
}

export function missingParam(param) {
  return invalid(`Missing required param: ${param}.`, param, "parameter_missing");
}

/** An id in the path that does not exist: 404; an id inside the parameters: 400 (as Stripe answers). */
export function noSuch(what, id, param, status = 404) {
  return new RestError(status, {
    type: "invalid_request_error",
    code: "resource_missing",
    doc_url: doc("resource_missing"),
    message: `No such ${what}: '${id}'`,
    ...(param ? { param } : {}),
  });
}

/** Wraps an async express handler so its errors reach the error handler. */
export const wrap = (fn) => (req, res, next) => Promise.resolve(fn(req, res, next)).catch(next);

export function errorHandler(err, req, res, next) {
  if (res.headersSent) return next(err);
  if (err instanceof RestError || (err && typeof err.statusCode === "number" && err.error)) {
    res.status(err.statusCode).json({ error: err.error });
    return;
  }
  if (err && err.type === "entity.parse.failed") {
    res.status(400).json({ error: { type: "invalid_request_error", message: "Invalid request body." } });
    return;
  }
  console.error("payment fake: unexpected error", err);
  res.status(500).json({ error: { type: "api_error", message: "The payment fake failed on this request." } });
}
