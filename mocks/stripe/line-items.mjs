// A Checkout Session's line_items: `price` (an id in stripe-stateful-mock) or inline `price_data`.
import { createRequire } from "node:module";
import { RestError, invalid, missingParam, noSuch } from "./errors.mjs";
import { asArray, currency, integer, isObject, metadata, rejectUnknown, string } from "./params.mjs";
import { newId, now } from "./util.mjs";

const require = createRequire(import.meta.url);
const { prices } = require("stripe-stateful-mock/dist/api/prices");
const { products } = require("stripe-stateful-mock/dist/api/products");

const ACCOUNT = "acct_default";
const MAX_AMOUNT = 99_999_999;

function productName(productId) {
  try {
    return products.retrieve(ACCOUNT, productId, "product").name;
  } catch (error) {
    if (error instanceof RestError) return null;
    throw error;
  }
}

function storedPrice(id, param) {
  let price;
  try {
    price = prices.retrieve(ACCOUNT, String(id), param);
  } catch (error) {
    if (error instanceof RestError) throw noSuch("price", id, param, 400);
    throw error;
  }
  if (price.active === false || price.active === "false") throw invalid(`The price specified is inactive. This field only accepts active prices.`, param);
  if (price.type === "recurring") throw invalid("You must be in `subscription` mode to use a recurring price.", param);
  if (!Number.isInteger(price.unit_amount)) throw invalid("The fake only supports prices with an integer unit_amount.", param);
  return { price, name: productName(price.product) ?? price.nickname ?? price.id };
}

function inlinePrice(data, param) {
  if (!isObject(data)) throw invalid("Invalid object", param);
  rejectUnknown(data, ["currency", "unit_amount", "unit_amount_decimal", "product", "product_data", "tax_behavior", "recurring"], `${param}[`);
  if (data.recurring !== undefined) throw invalid("You must be in `subscription` mode to use a recurring price.", `${param}[recurring]`);
  if (data.currency === undefined) throw missingParam(`${param}[currency]`);
  const cur = currency(data.currency, `${param}[currency]`);
  if (data.unit_amount === undefined) throw missingParam(`${param}[unit_amount]`);
  const unitAmount = integer(data.unit_amount, `${param}[unit_amount]`, { min: 0, max: MAX_AMOUNT });
  let productId;
  let name;
  if (data.product !== undefined) {
    productId = String(data.product);
    name = productName(productId);
    if (name === null) throw noSuch("product", productId, `${param}[product]`, 400);
  } else {
    const pd = data.product_data;
    if (!isObject(pd)) throw missingParam(`${param}[product_data]`);
    rejectUnknown(pd, ["name", "description", "images", "metadata", "tax_code", "unit_label"], `${param}[product_data][`);
    if (pd.name === undefined || pd.name === "") throw missingParam(`${param}[product_data][name]`);
    name = string(pd.name, `${param}[product_data][name]`, 250);
    metadata(pd.metadata, `${param}[product_data][metadata]`);
    productId = newId("prod", 14);
  }
  const price = {
    id: newId("price", 24),
    object: "price",
    active: false,
    billing_scheme: "per_unit",
    created: now(),
    currency: cur,
    custom_unit_amount: null,
    livemode: false,
    lookup_key: null,
    metadata: {},
    nickname: null,
    product: productId,
    recurring: null,
    tax_behavior: data.tax_behavior ?? "unspecified",
    tiers_mode: null,
    transform_quantity: null,
    type: "one_time",
    unit_amount: unitAmount,
    unit_amount_decimal: String(unitAmount),
  };
  return { price, name };
}

/** @returns {any[]} Stripe `item` objects */
export function resolveLineItems(value) {
  if (value === undefined || value === "") throw missingParam("line_items");
  const rows = asArray(value, "line_items");
  if (rows.length === 0) throw missingParam("line_items");
  if (rows.length > 100) throw invalid("A Checkout Session can have at most 100 line items.", "line_items");
  const items = rows.map((row, i) => {
    const param = `line_items[${i}]`;
    if (!isObject(row)) throw invalid("Invalid object", param);
    rejectUnknown(row, ["price", "price_data", "quantity", "adjustable_quantity", "dynamic_tax_rates", "tax_rates"], `${param}[`);
    if ((row.price === undefined) === (row.price_data === undefined)) {
      throw invalid(`You must specify either \`price\` or \`price_data\` in ${param}.`, param);
    }
    if (row.quantity === undefined) throw missingParam(`${param}[quantity]`);
    const quantity = integer(row.quantity, `${param}[quantity]`, { min: 1, max: 999_999 });
    const { price, name } = row.price !== undefined ? storedPrice(row.price, `${param}[price]`) : inlinePrice(row.price_data, `${param}[price_data]`);
    const total = price.unit_amount * quantity;
    return {
      id: newId("li", 24),
      object: "item",
      amount_discount: 0,
      amount_subtotal: total,
      amount_tax: 0,
      amount_total: total,
      currency: String(price.currency).toLowerCase(),
      description: name,
      price,
      quantity,
    };
  });
  const currencies = new Set(items.map((item) => item.currency));
  if (currencies.size > 1) throw invalid("All line items in a Checkout Session must use the same currency.", "line_items");
  return items;
}
