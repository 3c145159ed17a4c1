import "server-only";
import type { SiteRole } from "../db/schema";
import { isLoopbackAddress, socketAddress } from "./client-address";
import { appUrl } from "./mailer";

/**
 * True when this server is meant for one machine: its public URL (NEXTAUTH_URL) names a loopback host, and the
 * request being served came in over loopback (where the socket address is known; see lib/client-address.ts).
 */
export function servedOnLoopback(): boolean {
  const host = new URL(appUrl()).hostname;
  if (host !== "localhost" && !isLoopbackAddress(host)) return false;
  const peer = socketAddress();
  return peer === null || isLoopbackAddress(peer);
}

/**
 * The fake SMTP server's mailbox API, for the /dev/mailbox page, or null when the page must not exist: it lists
 * password-reset and invitation links, so only a signed-in site administrator on a loopback-only server sees it,
 * and only when BRANCHLINE_MAILBOX_URL is set (demo, tests).
 */
export function mailboxUrlFor(user: { siteRole: SiteRole } | null): string | null {
  const base = process.env.BRANCHLINE_MAILBOX_URL;
  if (!base || user?.siteRole !== "admin" || !servedOnLoopback()) return null;
  return base;
}
