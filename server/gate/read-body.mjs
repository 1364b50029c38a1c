// @ts-check
// Express middleware: the body gate. Refuses a body over the route's limit before reading it
// (declared Content-Length) or as soon as the running count passes it (chunked), then hands the
// buffered body to inspect.mjs. A passed body travels on as `req.gatedBody`. Routes listed in
// limits.mjs with a larger limit get only the declared-length check and their stream untouched.
import { refuse, pathOf } from "../refuse.mjs";
import { bodyLimitFor, largeBodyRoutes } from "./limits.mjs";
import { inspectBody } from "./inspect.mjs";

const tooLarge = (/** @type {number} */ limit) => `The request body is larger than ${Math.round(limit / 1024)} KiB.`;

/** @param {{ table?: typeof largeBodyRoutes }} [options] @returns {import("express").RequestHandler} */
export function bodyGate({ table = largeBodyRoutes } = {}) {
  return (req, res, next) => {
    if (req.method === "GET" || req.method === "HEAD") return next();
    const pathname = pathOf(req);
    const { limit, streamed } = bodyLimitFor(pathname, table);
    const declared = req.headers["content-length"];
    if (declared !== undefined && Number(declared) > limit) return refuse(req, res, 413, tooLarge(limit), { unread: true });
    if (streamed) return next();

    /** @type {Buffer[]} */
    const chunks = [];
    let size = 0;
    let done = false;
    const onData = (/** @type {Buffer} */ chunk) => {
      size += chunk.length;
      if (size > limit) {
        finish();
        refuse(req, res, 413, tooLarge(limit), { unread: true });
      } else chunks.push(chunk);
    };
    const onEnd = () => {
      finish();
      const body = Buffer.concat(chunks, size);
      inspectBody({ pathname, contentType: req.headers["content-type"], body }).then((refusal) => {
        if (refusal) return refuse(req, res, refusal.status, refusal.message);
        /** @type {any} */ (req).gatedBody = body;
        next();
      }, next);
    };
    const onError = () => finish();
    function finish() {
      if (done) return;
      done = true;
      req.off("data", onData).off("end", onEnd).off("error", onError).off("close", onError);
    }
    req.on("data", onData).on("end", onEnd).on("error", onError).on("close", onError);
  };
}
