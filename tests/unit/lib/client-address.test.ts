/** Which address a request is counted under: the socket's, and X-Forwarded-For only through proxies TRUST_PROXY names. */
import { afterEach, describe, expect, it } from "vitest";
import { clientAddress, clientAddressFrom, isLoopbackAddress, normaliseAddress, UNKNOWN_ADDRESS, withSocketAddress } from "@/lib/client-address";

const forwarded = (value: string) => new Request("http://localhost/x", { headers: { "x-forwarded-for": value } });

afterEach(() => {
  delete process.env.TRUST_PROXY;
});

describe("client address", () => {
  it("is the socket's address, whatever X-Forwarded-For says, when TRUST_PROXY is unset", () => {
    expect(withSocketAddress("198.51.100.4", () => clientAddress(forwarded("192.0.2.1")))).toBe("198.51.100.4");
  });

  it("is unknown (one shared key) where no server stamped the socket address, even with X-Forwarded-For", () => {
    expect(clientAddress(forwarded("192.0.2.1"))).toBe(UNKNOWN_ADDRESS);
  });

  it("reads a v4 client of a dual-stack socket as its v4 address", () => {
    expect(withSocketAddress("::ffff:198.51.100.4", () => clientAddressFrom(null))).toBe("198.51.100.4");
    expect(normaliseAddress("[2001:DB8::1]")).toBe("2001:db8::1");
  });

  it("believes the hop a trusted proxy appended, and stops at the first address it does not trust", () => {
    process.env.TRUST_PROXY = "loopback, 10.0.0.0/8";
    // Client → 10.1.2.3 (trusted) → 127.0.0.1 (trusted, the socket): the client is the rightmost untrusted hop.
    expect(withSocketAddress("127.0.0.1", () => clientAddress(forwarded("192.0.2.9, 10.1.2.3")))).toBe("192.0.2.9");
    // Whatever the client wrote before that (here a forged first entry) is not believed.
    expect(withSocketAddress("127.0.0.1", () => clientAddress(forwarded("203.0.113.1, 192.0.2.9")))).toBe("192.0.2.9");
  });

  it("ignores X-Forwarded-For from a socket that TRUST_PROXY does not name", () => {
    process.env.TRUST_PROXY = "10.0.0.1";
    expect(withSocketAddress("198.51.100.4", () => clientAddress(forwarded("192.0.2.9")))).toBe("198.51.100.4");
  });

  it("stops at garbage in the header and keeps the last trusted hop's address", () => {
    process.env.TRUST_PROXY = "loopback";
    expect(withSocketAddress("127.0.0.1", () => clientAddress(forwarded("not-an-address")))).toBe("127.0.0.1");
  });

  it("refuses a TRUST_PROXY entry that is neither an address, a range nor loopback", () => {
    process.env.TRUST_PROXY = "my-proxy.internal";
    expect(() => withSocketAddress("127.0.0.1", () => clientAddress(forwarded("192.0.2.9")))).toThrow(/TRUST_PROXY/);
  });

  it("knows loopback addresses", () => {
    expect(["127.0.0.1", "127.3.4.5", "::1", "::ffff:127.0.0.1", "[::1]"].every(isLoopbackAddress)).toBe(true);
    expect(["192.0.2.1", "::2", "localhost", "128.0.0.1"].some(isLoopbackAddress)).toBe(false);
  });
});
