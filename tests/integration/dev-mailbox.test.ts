/**
 * Who gets the development mailbox (it lists password-reset and invitation links): only a site administrator, only
 * on a server whose public URL is loopback, only for a request that came over loopback. The page itself answers
 * 404 otherwise (tests/e2e/sessions.spec.ts asks the production build).
 */
import { afterEach, describe, expect, it } from "vitest";
import { withSocketAddress } from "@/lib/client-address";
import { mailboxUrlFor } from "@/lib/dev-mailbox";

const saved = { url: process.env.NEXTAUTH_URL, mailbox: process.env.BRANCHLINE_MAILBOX_URL };
const restore = (name: string, value: string | undefined) => (value === undefined ? delete process.env[name] : (process.env[name] = value));
afterEach(() => {
  restore("NEXTAUTH_URL", saved.url);
  restore("BRANCHLINE_MAILBOX_URL", saved.mailbox);
});

const admin = { siteRole: "admin" as const };
const member = { siteRole: "member" as const };

describe("development mailbox access", () => {
  it("is for a site administrator over loopback on a loopback server", () => {
    process.env.NEXTAUTH_URL = "http://localhost:3000";
    for (const peer of ["127.0.0.1", "::1", "::ffff:127.0.0.1"]) {
      expect(withSocketAddress(peer, () => mailboxUrlFor(admin))).toBe(process.env.BRANCHLINE_MAILBOX_URL);
    }
    process.env.NEXTAUTH_URL = "http://[::1]:3000";
    expect(withSocketAddress("::1", () => mailboxUrlFor(admin))).toBe(process.env.BRANCHLINE_MAILBOX_URL);
  });

  it("is for no one signed out and for no member", () => {
    process.env.NEXTAUTH_URL = "http://localhost:3000";
    expect(withSocketAddress("127.0.0.1", () => mailboxUrlFor(null))).toBeNull();
    expect(withSocketAddress("127.0.0.1", () => mailboxUrlFor(member))).toBeNull();
  });

  it("is for no one when the request came from another machine, or the server's public URL is not loopback", () => {
    process.env.NEXTAUTH_URL = "http://localhost:3000";
    expect(withSocketAddress("192.0.2.10", () => mailboxUrlFor(admin))).toBeNull();
    process.env.NEXTAUTH_URL = "https://branchline.example";
    expect(withSocketAddress("127.0.0.1", () => mailboxUrlFor(admin))).toBeNull();
  });

  it("does not exist without BRANCHLINE_MAILBOX_URL", () => {
    process.env.NEXTAUTH_URL = "http://localhost:3000";
    delete process.env.BRANCHLINE_MAILBOX_URL;
    expect(withSocketAddress("127.0.0.1", () => mailboxUrlFor(admin))).toBeNull();
  });
});
