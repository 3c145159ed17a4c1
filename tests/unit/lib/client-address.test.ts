import { afterEach, describe, expect, it } from "vitest";
import { SOCKET_ADDRESS_HEADER, clientAddress } from "@/lib/client-address";

const request = (headers: Record<string, string>) => new Request("http://localhost/api/compute", { headers });
const saved = process.env.TRUST_PROXY;

afterEach(() => {
  if (saved === undefined) delete process.env.TRUST_PROXY;
  else process.env.TRUST_PROXY = saved;
});

describe("the client address", () => {
  it("is the socket's, whatever X-Forwarded-For says, while no proxy is trusted", () => {
    delete process.env.TRUST_PROXY;
    expect(clientAddress(request({ [SOCKET_ADDRESS_HEADER]: "192.0.2.4", "x-forwarded-for": "198.51.100.7" }))).toBe("192.0.2.4");
    expect(clientAddress(request({}))).toBe("unknown");
  });

  it("is the entry the farthest trusted proxy saw, never one the client wrote before it", () => {
    process.env.TRUST_PROXY = "1";
    // The client forged 203.0.113.9; the one trusted proxy appended the address it saw, 198.51.100.7.
    expect(clientAddress(request({ [SOCKET_ADDRESS_HEADER]: "10.0.0.2", "x-forwarded-for": "203.0.113.9, 198.51.100.7" }))).toBe("198.51.100.7");
    process.env.TRUST_PROXY = "2";
    expect(clientAddress(request({ [SOCKET_ADDRESS_HEADER]: "10.0.0.2", "x-forwarded-for": "203.0.113.9, 198.51.100.7, 10.0.0.1" }))).toBe("198.51.100.7");
  });

  it("falls back to the socket when a trusted proxy sent no X-Forwarded-For", () => {
    process.env.TRUST_PROXY = "1";
    expect(clientAddress(request({ [SOCKET_ADDRESS_HEADER]: "10.0.0.2" }))).toBe("10.0.0.2");
  });
});
