/**
 * Which requests pass through proxy.ts, matched the way Next.js matches a proxy's `matcher` (its own
 * path-to-regexp conversion): every page, and an API path only when it carries a percent-escape that may not
 * decode — so ordinary API requests (and their bodies) never go through the proxy.
 */
import { describe, expect, it } from "vitest";
import { getPathMatch } from "next/dist/shared/lib/router/utils/path-match";
import { NextRequest } from "next/server";
import { config, proxy } from "@/proxy";

const sources = config.matcher.map((m) => (typeof m === "string" ? m : m.source));
const proxied = (path: string) => sources.some((source) => getPathMatch(source)(path) !== false);

describe("the proxy's matcher", () => {
  it.each(["/", "/projects", "/projects/abc/scenarios/def", "/share/tok", "/embed/tok", "/sign-in", "/methods", "/share/%ff"])("takes the page %s", (path) => {
    expect(proxied(path)).toBe(true);
  });

  it.each(["/api/compute", "/api/projects/0b0e7c2e-9a3c-4c1e-8d5e-2f3a4b5c6d7e/scenarios", "/api/share/abc_DEF-123", "/api/auth/session", "/_next/static/chunks/a.js"])(
    "leaves %s alone",
    (path) => {
      expect(proxied(path)).toBe(false);
    },
  );

  it.each(["/api/share/%ff", "/api/projects/%FF/scenarios", "/api/projects/%e0%a4%a/x", "/api/share/%zz", "/api/share/%"])("takes the API path %s, which may not decode", (path) => {
    expect(proxied(path)).toBe(true);
  });

  it("answers 400 in the API's error shape for an API path that does not decode, and lets one that does through", async () => {
    const bad = await proxy(new NextRequest(new URL("/api/share/%ff", "http://localhost:3999")));
    expect(bad.status).toBe(400);
    expect((await bad.json()).error).toMatchObject({ code: "bad_request", message: expect.stringContaining("percent-encoded") });
    const fine = await proxy(new NextRequest(new URL("/api/share/caf%C3%A9", "http://localhost:3999")));
    expect(fine.headers.get("x-middleware-next")).toBe("1");
  });
});
