// The client's network address, as the HTTP server established it. The server sets this
// header on every request from the socket's peer address, or, when that peer is one of the
// proxies named in TRUSTED_PROXIES, from X-Forwarded-For; any copy a client sends is dropped.
// Rate limits and throttles key on this, never on X-Forwarded-For as the client sent it.
export const CLIENT_ADDRESS_HEADER = "x-isotrope-client-ip";

export function clientAddress(request: Request): string {
  return request.headers.get(CLIENT_ADDRESS_HEADER) ?? "unknown";
}
