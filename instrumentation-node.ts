/**
 * Server start, in the Node.js runtime (instrumentation.ts):
 * - stamps every request with the address of its socket (lib/client-address.ts reads it), overwriting any value
 *   a client sent, because route handlers see headers but not the socket;
 * - starts the compute pool's threads, so that the first computation does not wait for them to load.
 */
import http, { type IncomingMessage } from "node:http";
import { SOCKET_ADDRESS_HEADER } from "./lib/client-address";
import { computePool } from "./lib/compute-pool";

const emit = http.Server.prototype.emit as (this: unknown, event: string, ...args: unknown[]) => boolean;
http.Server.prototype.emit = function stampSocketAddress(this: unknown, event: string, ...args: unknown[]): boolean {
  if (event === "request") {
    const request = args[0] as IncomingMessage;
    request.headers[SOCKET_ADDRESS_HEADER] = request.socket.remoteAddress ?? "unknown";
  }
  return emit.call(this, event, ...args);
} as typeof http.Server.prototype.emit;

computePool();
