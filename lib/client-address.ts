import { AsyncLocalStorage } from "node:async_hooks";
import { BlockList, isIP } from "node:net";

/**
 * Who is on the other end of a request, for the per-address limits.
 *
 * The App Router hands route handlers a web Request, which has no socket; and Next.js fills in X-Forwarded-For
 * from the socket only when the client did not send one (`??=`), so that header is the client's to choose. So the
 * socket's address is carried separately: `instrumentation.ts` wraps the HTTP server's request event in an
 * AsyncLocalStorage holding `req.socket.remoteAddress` (see `stampSocketAddresses`), and everything that runs for
 * that request — route handlers, next-auth's authorize, server components — reads it here. A client cannot write
 * to it. Where no server stamped the request (a script, a test calling a handler directly, a request that arrived
 * while the server was still starting) the socket address is unknown and every such request shares one key.
 *
 * X-Forwarded-For is believed only when TRUST_PROXY names the proxies in front of us (addresses or CIDR ranges,
 * comma-separated; `loopback` for 127.0.0.0/8 and ::1): walking the header from the right, each hop that a
 * trusted proxy reported is accepted, and the first address not in TRUST_PROXY is the client.
 */
export const UNKNOWN_ADDRESS = "unknown";

const storeKey = Symbol.for("branchline.socketAddress");
const holder = globalThis as unknown as Record<symbol, AsyncLocalStorage<string> | undefined>;
// One store per process, shared by every bundle (instrumentation and route handlers are bundled separately).
const socketAddressStore = (holder[storeKey] ??= new AsyncLocalStorage<string>());

/** Runs `fn` as if for a request whose socket is at `address` (what the server does; tests use it too). */
export function withSocketAddress<T>(address: string, fn: () => T): T {
  return socketAddressStore.run(normaliseAddress(address), fn);
}

/** The socket address of the request being served, or null where no server stamped it. */
export function socketAddress(): string | null {
  return socketAddressStore.getStore() ?? null;
}

/** `::ffff:127.0.0.1` (a v4 client of a dual-stack socket) is 127.0.0.1. */
export function normaliseAddress(address: string): string {
  const trimmed = address.trim().replace(/^\[(.*)\]$/, "$1");
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(trimmed);
  return (mapped ? mapped[1] : trimmed).toLowerCase();
}

export function isLoopbackAddress(address: string): boolean {
  const a = normaliseAddress(address);
  return a === "::1" || (isIP(a) === 4 && a.startsWith("127."));
}

let parsedTrust: { source: string; list: BlockList | null } | undefined;

/** TRUST_PROXY as a BlockList; a malformed entry stops the server's sign-in rather than being ignored. */
function trustedProxies(): BlockList | null {
  const source = process.env.TRUST_PROXY?.trim() ?? "";
  if (parsedTrust?.source === source) return parsedTrust.list;
  let list: BlockList | null = null;
  for (const entry of source.split(",").map((e) => e.trim()).filter(Boolean)) {
    list ??= new BlockList();
    if (entry === "loopback") {
      list.addSubnet("127.0.0.0", 8, "ipv4");
      list.addAddress("::1", "ipv6");
      continue;
    }
    const [address, prefix] = entry.split("/");
    const family = isIP(address);
    if (!family || (prefix !== undefined && !/^\d+$/.test(prefix))) {
      throw new Error(`TRUST_PROXY: "${entry}" is not an address, a CIDR range or "loopback"`);
    }
    const type = family === 4 ? "ipv4" : "ipv6";
    if (prefix === undefined) list.addAddress(address, type);
    else list.addSubnet(address, Number(prefix), type);
  }
  parsedTrust = { source, list };
  return list;
}

function isTrusted(list: BlockList, address: string): boolean {
  const family = isIP(address);
  return family !== 0 && list.check(address, family === 4 ? "ipv4" : "ipv6");
}

/** The client's address from the socket and, behind a trusted proxy, the X-Forwarded-For it appended to. */
export function clientAddressFrom(forwardedFor: string | null | undefined): string {
  const peer = socketAddress();
  if (peer === null) return UNKNOWN_ADDRESS;
  const trusted = trustedProxies();
  if (!trusted || !isTrusted(trusted, peer) || !forwardedFor) return peer;
  const hops = forwardedFor.split(",").map(normaliseAddress).filter(Boolean);
  let client = peer;
  for (let i = hops.length - 1; i >= 0; i--) {
    if (!isIP(hops[i])) return client; // garbage written by someone before the trusted proxies: stop here
    client = hops[i];
    if (!isTrusted(trusted, client)) return client;
  }
  return client;
}

/** The address of the client that sent this request (see above for what is believed). */
export function clientAddress(request: Request): string {
  return clientAddressFrom(request.headers.get("x-forwarded-for"));
}

/**
 * Called once by instrumentation.ts in the Node.js server: every HTTP request event from then on runs inside
 * the store, holding its socket's address.
 */
export async function stampSocketAddresses(): Promise<void> {
  const [http, https] = await Promise.all([import("node:http"), import("node:https")]);
  const marker = Symbol.for("branchline.socketAddressStamped");
  type Emitter = Record<symbol, boolean> & { emit: (event: string | symbol, ...args: unknown[]) => boolean };
  for (const proto of [http.Server.prototype, https.Server.prototype] as unknown as Emitter[]) {
    if (Object.prototype.hasOwnProperty.call(proto, marker)) continue;
    proto[marker] = true;
    const emit = proto.emit;
    proto.emit = function stampedEmit(this: unknown, event: string | symbol, ...args: unknown[]) {
      const request = args[0] as { socket?: { remoteAddress?: string } } | undefined;
      const address = event === "request" ? request?.socket?.remoteAddress : undefined;
      if (address) return socketAddressStore.run(normaliseAddress(address), () => emit.call(this, event, ...args));
      return emit.call(this, event, ...args);
    };
  }
}
