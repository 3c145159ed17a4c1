/**
 * The address a request came from, for per-client limits. Taken from the connection's socket, which the server
 * stamps on every request as SOCKET_ADDRESS_HEADER (instrumentation.ts; a client's own value of that header is
 * overwritten there). Only when TRUST_PROXY is set — the number of proxies in front of Branchline that append to
 * X-Forwarded-For, e.g. 1 behind one load balancer — is that header believed, and then only the entry the
 * nearest trusted proxy saw, never what the client wrote before it.
 *
 * Minimal version written for the compute rate limit; the sign-in limits share it.
 */
export const SOCKET_ADDRESS_HEADER = "x-branchline-socket-address";

function trustedProxyHops(): number {
  const hops = Number(process.env.TRUST_PROXY ?? 0);
  return Number.isInteger(hops) && hops > 0 ? hops : 0;
}

export function clientAddress(request: Request): string {
  const socket = request.headers.get(SOCKET_ADDRESS_HEADER)?.trim() || "unknown";
  const hops = trustedProxyHops();
  if (hops === 0) return socket;
  const forwarded = (request.headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((entry) => entry.trim())
    .filter(Boolean);
  // Each trusted proxy appends the address it saw; the one the farthest trusted proxy saw is hops from the end.
  return forwarded.at(-hops) ?? socket;
}
