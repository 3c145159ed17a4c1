/**
 * Runs once when the server starts (Next's instrumentation hook), in the Node.js runtime only:
 * - stamps every request with the address of its socket (lib/client-address.ts reads it), overwriting any value
 *   a client sent, because route handlers see headers but not the socket;
 * - starts the compute pool's threads, so that the first computation does not wait for them to load.
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const http = await import("node:http");
  const { SOCKET_ADDRESS_HEADER } = await import("./lib/client-address");
  const emit = http.Server.prototype.emit as (this: unknown, event: string, ...args: unknown[]) => boolean;
  http.Server.prototype.emit = function stampSocketAddress(this: unknown, event: string, ...args: unknown[]): boolean {
    if (event === "request") {
      const request = args[0] as import("node:http").IncomingMessage;
      request.headers[SOCKET_ADDRESS_HEADER] = request.socket.remoteAddress ?? "unknown";
    }
    return emit.call(this, event, ...args);
  } as typeof http.Server.prototype.emit;
  const { computePool } = await import("./lib/compute-pool");
  computePool();
}
