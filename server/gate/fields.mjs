// @ts-check
// Rules on the fields of a urlencoded or multipart body, checked before any form parser runs:
// how many, how long a name may be, how large an array index (`a[1000]`) may get, and no NUL.
import busboy from "busboy";

export const MAX_FIELDS = 200;
export const MAX_FIELD_NAME = 200;
export const MAX_INDEX = 1000;

/** @typedef {{ status: number; message: string }} Refusal */

/** @type {Refusal} */
export const NUL_REFUSED = { status: 400, message: "The request contains a NUL character." };
/** @type {Refusal} */
const TOO_MANY = { status: 413, message: `The form has more than ${MAX_FIELDS} fields.` };

/** @param {string} name @returns {Refusal | null} */
export function checkFieldName(name) {
  if (name.length > MAX_FIELD_NAME) return { status: 400, message: `A field name is longer than ${MAX_FIELD_NAME} characters.` };
  if (name.includes("\0")) return NUL_REFUSED;
  for (const match of name.matchAll(/\[(\d+)\]/g)) {
    if (Number(match[1]) > MAX_INDEX) return { status: 400, message: `A field index is above ${MAX_INDEX}.` };
  }
  return null;
}

/** application/x-www-form-urlencoded. @param {Buffer} body @returns {Refusal | null} */
export function inspectUrlencoded(body) {
  if (body.includes(0)) return NUL_REFUSED;
  // Count the pairs before parsing, so that a flood of `a=1&` costs one pass over the bytes.
  let pairs = 0;
  let start = 0;
  for (let i = 0; i <= body.length; i++) {
    if (i === body.length || body[i] === 0x26) {
      if (i > start) pairs++;
      if (pairs > MAX_FIELDS) return TOO_MANY;
      start = i + 1;
    }
  }
  for (const [name, value] of new URLSearchParams(body.toString("utf8"))) {
    const refusal = checkFieldName(name);
    if (refusal) return refusal;
    if (value.includes("\0")) return NUL_REFUSED;
  }
  return null;
}

/**
 * multipart/form-data, parsed by busboy from the buffered body. File contents may hold any byte;
 * names, file names and text fields may not hold NUL.
 * @param {Buffer} body @param {string} contentType @returns {Promise<Refusal | null>}
 */
export function inspectMultipart(body, contentType) {
  /** @type {import("busboy").Busboy} */
  let parser;
  try {
    parser = busboy({ headers: { "content-type": contentType }, limits: { parts: MAX_FIELDS, fieldSize: body.length + 1 } });
  } catch {
    return Promise.resolve({ status: 400, message: "The multipart body has no boundary." });
  }
  return new Promise((resolve) => {
    /** @type {Refusal | null} */
    let refusal = null;
    const refuse = (/** @type {Refusal} */ r) => (refusal ??= r);
    // busboy reports a part without a name (name="") with an undefined name.
    parser.on("field", (name, value) => {
      const r = checkFieldName(name ?? "") ?? (value.includes("\0") ? NUL_REFUSED : null);
      if (r) refuse(r);
    });
    parser.on("file", (name, stream, info) => {
      const r = checkFieldName(name ?? "") ?? (info.filename?.includes("\0") ? NUL_REFUSED : null);
      if (r) refuse(r);
      stream.resume();
    });
    parser.on("partsLimit", () => refuse(TOO_MANY));
    parser.on("error", () => resolve(refusal ?? { status: 400, message: "The multipart body is malformed." }));
    parser.on("close", () => resolve(refusal));
    try {
      parser.end(body);
    } catch {
      resolve({ status: 400, message: "The multipart body is malformed." });
    }
  });
}

/** JSON (for /api/ routes): well formed, and no NUL in any key or string. @param {Buffer} body @returns {Refusal | null} */
export function inspectJson(body) {
  if (body.length === 0) return null;
  if (body.includes(0)) return NUL_REFUSED;
  let value;
  try {
    value = JSON.parse(body.toString("utf8"));
  } catch {
    return { status: 400, message: "The JSON body is malformed." };
  }
  // Iterative walk: JSON.parse accepts nesting far deeper than a recursive walk could follow.
  const stack = [value];
  while (stack.length) {
    const item = stack.pop();
    if (typeof item === "string") {
      if (item.includes("\0")) return NUL_REFUSED;
    } else if (item && typeof item === "object") {
      for (const [key, child] of Object.entries(item)) {
        if (key.includes("\0")) return NUL_REFUSED;
        stack.push(child);
      }
    }
  }
  return null;
}
