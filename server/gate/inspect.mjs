// @ts-check
// The body gate's decision for one request, from its path, content type and buffered body.
// Pure, so unit tests call it directly; gate/read-body.mjs feeds it from the socket.
import { inspectJson, inspectMultipart, inspectUrlencoded, NUL_REFUSED } from "./fields.mjs";
import { isApiPath } from "./limits.mjs";

/** @typedef {import("./fields.mjs").Refusal} Refusal */

/** The media type without parameters, lower case. @param {string | undefined} contentType */
export const mediaType = (contentType) => (contentType ?? "").split(";")[0].trim().toLowerCase();

const isJson = (/** @type {string} */ type) => type === "application/json" || type.endsWith("+json");
const isText = (/** @type {string} */ type) => type.startsWith("text/");

/**
 * Pages take forms (urlencoded or multipart) or nothing; /api/ routes take those and JSON too.
 * @param {{ pathname: string; contentType: string | undefined; body: Buffer }} request
 * @returns {Promise<Refusal | null>}
 */
export async function inspectBody({ pathname, contentType, body }) {
  const type = mediaType(contentType);
  if (type === "application/x-www-form-urlencoded") return inspectUrlencoded(body);
  if (type === "multipart/form-data") return inspectMultipart(body, contentType ?? "");
  if (isApiPath(pathname)) {
    if (isJson(type)) return inspectJson(body);
    if ((type === "" || isText(type)) && body.includes(0)) return NUL_REFUSED;
    return null;
  }
  if (type === "" && body.length === 0) return null;
  return { status: 415, message: "This address takes form submissions only (urlencoded or multipart)." };
}

/**
 * The request target: origin-form only, a path that decodes, and no NUL anywhere.
 * @param {string} target the raw request target, e.g. `/invite/abc?x=1`
 * @returns {Refusal | null}
 */
export function inspectTarget(target) {
  if (!target.startsWith("/")) return { status: 400, message: "The request address is malformed." };
  if (target.includes("\0") || /%00/i.test(target)) return NUL_REFUSED;
  const query = target.indexOf("?");
  try {
    decodeURIComponent(query < 0 ? target : target.slice(0, query));
  } catch {
    return { status: 400, message: "The request address is malformed." };
  }
  return null;
}
