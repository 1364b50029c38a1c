// Products and prices are stripe-stateful-mock's; this mends what a price list needs from them:
// `active` stored as a boolean (the mock keeps the form's "true"/"false" strings, so the
// active filters miss), product updates (POST /v1/products/:id, absent there), and the
// lookup_keys filter on GET /v1/prices.
import express from "express";
import { createRequire } from "node:module";
import { invalid } from "./errors.mjs";
import { metadata, rejectUnknown, string } from "./params.mjs";
import { clone, paginate } from "./util.mjs";

const require = createRequire(import.meta.url);
const { products } = require("stripe-stateful-mock/dist/api/products");
const { prices } = require("stripe-stateful-mock/dist/api/prices");
const ACCOUNT = "acct_default";

function flag(value, param) {
  if (value === undefined) return true;
  if (value === true || value === "true") return true;
  if (value === false || value === "false") return false;
  throw invalid(`Invalid boolean: ${value}`, param);
}

export function catalogRoutes() {
  const router = express.Router();

  router.post("/v1/products", (req, res) => {
    const body = req.body ?? {};
    const active = flag(body.active, "active");
    const product = products.create(ACCOUNT, { ...body, active });
    res.json(clone(product));
  });

  router.post("/v1/products/:id", (req, res) => {
    const product = products.retrieve(ACCOUNT, req.params.id, "id");
    const body = req.body ?? {};
    rejectUnknown(body, ["name", "description", "active", "metadata", "default_price", "expand", "statement_descriptor", "unit_label", "images", "url"]);
    if (body.name !== undefined) product.name = string(body.name, "name", 250);
    if (body.description !== undefined) product.description = body.description === "" ? null : string(body.description, "description", 40000);
    if (body.active !== undefined) product.active = flag(body.active, "active");
    if (body.metadata !== undefined) product.metadata = { ...product.metadata, ...metadata(body.metadata) };
    if (body.default_price !== undefined) product.default_price = body.default_price === "" ? null : String(body.default_price);
    product.updated = Math.floor(Date.now() / 1000);
    res.json(clone(product));
  });

  router.get("/v1/products", (req, res, next) => {
    if (req.query.active === undefined) return next();
    const active = flag(req.query.active, "active");
    const data = products.list(ACCOUNT, {}).data.filter((p) => flag(p.active, "active") === active);
    res.json(paginate(clone(data), req.query, "/v1/products", invalid));
  });

  router.post("/v1/prices", (req, res) => {
    const body = req.body ?? {};
    const active = flag(body.active, "active");
    const price = prices.create(ACCOUNT, { ...body, active });
    res.json(clone(price));
  });

  router.get("/v1/prices", (req, res, next) => {
    if (req.query.lookup_keys === undefined) return next();
    const keys = [].concat(req.query.lookup_keys).map(String);
    let data = prices.list(ACCOUNT, {}).data.filter((p) => keys.includes(p.lookup_key));
    if (req.query.active !== undefined) data = data.filter((p) => p.active === flag(req.query.active, "active"));
    res.json(paginate(clone(data), req.query, "/v1/prices", invalid));
  });

  return router;
}
