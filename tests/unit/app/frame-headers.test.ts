/**
 * Who may frame which page, as next.config.mjs answers it, matched the way Next.js matches header rules (its own
 * path matcher). Header meanings: CSP Level 3 frame-ancestors (W3C) and X-Frame-Options (RFC 7034).
 */
import { describe, expect, it } from "vitest";
import { getPathMatch } from "next/dist/shared/lib/router/utils/path-match";
import nextConfig, { everyResponseHeaders, frameHeaderRules } from "@/next.config.mjs";

function headersFor(pathname: string): Record<string, string> {
  const found: Record<string, string> = {};
  for (const rule of frameHeaderRules) {
    if (getPathMatch(rule.source)(pathname) === false) continue;
    for (const h of rule.headers) {
      if (h.key in found) throw new Error(`${h.key} set twice for ${pathname}`);
      found[h.key] = h.value;
    }
  }
  return found;
}

describe("frame headers", () => {
  it("are what next.config.mjs hands to Next.js", async () => {
    expect(await nextConfig.headers!()).toEqual([...frameHeaderRules, everyResponseHeaders]);
  });

  it.each(["/embed/abc123", "/embed/abc123?theme=dark&scrub=1".split("?")[0]])("let any origin frame an embed (%s), without X-Frame-Options", (path) => {
    expect(headersFor(path)).toEqual({ "Content-Security-Policy": "frame-ancestors *" });
  });

  it.each(["/", "/share/abc123", "/projects", "/projects/p/scenarios/s", "/sign-in", "/methods", "/api/share/abc123", "/embedded", "/invitations/t"])(
    "let no one frame %s",
    (path) => {
      expect(headersFor(path)).toEqual({ "Content-Security-Policy": "frame-ancestors 'none'", "X-Frame-Options": "DENY" });
    },
  );
});
