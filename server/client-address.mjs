// @ts-check
// The client's network address, in the one header the app reads (app/infra/client-address.server.ts).
// Any copy a client sends is dropped. Without TRUSTED_PROXIES it is the socket's peer; when the
// peer is a trusted proxy, Express (proxy-addr) walks X-Forwarded-For from the right and takes
// the first address that is not a trusted proxy.
export const CLIENT_ADDRESS_HEADER = "x-isotrope-client-ip";

/**
 * TRUSTED_PROXIES: comma-separated addresses or CIDR ranges (also proxy-addr's names
 * `loopback`, `linklocal`, `uniquelocal`). Express's "trust proxy" setting validates them.
 * @param {string | undefined} value
 * @returns {string[]}
 */
export const parseTrustedProxies = (value) => (value ?? "").split(",").map((s) => s.trim()).filter(Boolean);

/** "::ffff:10.0.0.1" → "10.0.0.1". @param {string} address */
const plain = (address) => (address.startsWith("::ffff:") && address.includes(".") ? address.slice(7) : address);

/** @type {import("express").RequestHandler} */
export function setClientAddress(req, _res, next) {
  delete req.headers[CLIENT_ADDRESS_HEADER];
  const address = req.ip ?? req.socket.remoteAddress;
  req.headers[CLIENT_ADDRESS_HEADER] = address ? plain(address) : "unknown";
  next();
}
