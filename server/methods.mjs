// @ts-check
// The HTTP methods the app answers. Anything else (TRACE, CONNECT, PROPFIND, …) gets 405 with Allow.
import { refuse } from "./refuse.mjs";

export const ALLOWED_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"];
const allow = ALLOWED_METHODS.join(", ");

/** @type {import("express").RequestHandler} */
export function allowMethods(req, res, next) {
  if (ALLOWED_METHODS.includes(req.method)) return next();
  refuse(req, res, 405, `The method ${req.method} is not allowed.`, { unread: true, headers: { allow } });
}

/**
 * CONNECT never reaches a request handler in Node: the server emits "connect" instead, and
 * without a listener drops the socket. Answer it like any other refused method.
 * @param {import("node:http").IncomingMessage} _req @param {import("node:stream").Duplex} socket
 */
export function refuseConnect(_req, socket) {
  socket.end(`HTTP/1.1 405 Method Not Allowed\r\nAllow: ${allow}\r\nContent-Length: 0\r\nConnection: close\r\n\r\n`);
}
