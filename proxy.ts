import { NextResponse, type NextRequest } from "next/server";
import { getDb } from "@/db";
import { previewInvitation } from "@/db/invitations";
import { shareLinkIsLive } from "@/db/share-links";
import { newNonce, pageContentSecurityPolicy } from "@/lib/content-security-policy";

/**
 * Runs before every page (not the API, whose bodies it would otherwise buffer, and not static files), and before an
 * API path with a suspicious percent-escape:
 * - a path whose percent-encoding does not decode (e.g. a `%ff` segment) answers 400 at once (in the API's error
 *   shape under /api); an API path that does decode goes on untouched;
 * - every page gets its Content-Security-Policy with a fresh nonce (lib/content-security-policy.ts), on the request
 *   too, so Next.js stamps the nonce on its scripts;
 * - a dead share link, embed (its token is a share link's) or invitation link answers with a real 404 status. The
 *   pages check their token themselves (and show the not-found text), but the root loading state makes every page
 *   stream, and a streamed page keeps its 200; so the status is settled here, before rendering starts. Not a
 *   security check: the pages and the API decide access on their own.
 */
export const config = {
  matcher: [
    // API paths only when they carry a percent-escape that may not decode (a byte of 0x80 or above, or a "%" without
    // two hex digits): Next.js answers those with a bare 500 before any route runs. No well-formed API path has one
    // (ids are UUIDs, tokens base64url), and every other API request stays out of the proxy, whose body copy would
    // buffer what lib/request-body.ts reads as a stream.
    "/api/:path((?:.*)%(?:[89a-fA-F]|(?![0-9a-fA-F]{2})).*)",
    {
      source: "/((?!api/|_next/static|_next/image|favicon\\.ico).*)",
      missing: [
        { type: "header", key: "next-router-prefetch" },
        { type: "header", key: "purpose", value: "prefetch" },
      ],
    },
  ],
};

function decoded(segment: string): string | null {
  try {
    return decodeURIComponent(segment);
  } catch {
    return null;
  }
}

const TOKEN_PAGES = new Set(["share", "embed", "invitations"]);

async function tokenIsLive(kind: string, token: string | null): Promise<boolean> {
  if (token === null) return false;
  const db = getDb();
  return kind === "invitations" ? (await previewInvitation(db, token)) !== null : await shareLinkIsLive(db, token);
}

export async function proxy(req: NextRequest) {
  const pathname = req.nextUrl.pathname;
  const segments = pathname.split("/");
  const api = pathname.startsWith("/api/");
  if (segments.some((s) => decoded(s) === null)) {
    const message = "the address is not valid percent-encoded UTF-8";
    return api
      ? NextResponse.json({ error: { code: "bad_request", message } }, { status: 400 })
      : new NextResponse(`Bad request: ${message}.\n`, { status: 400, headers: { "content-type": "text/plain; charset=utf-8" } });
  }
  if (api) return NextResponse.next();
  const nonce = newNonce();
  const policy = pageContentSecurityPolicy({ nonce, pathname, development: process.env.NODE_ENV === "development" });
  const requestHeaders = new Headers(req.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("content-security-policy", policy);

  const [, kind, segment, ...rest] = segments;
  const tokenPage = TOKEN_PAGES.has(kind) && segment !== undefined && segment !== "" && rest.length === 0;
  const live = !tokenPage || (await tokenIsLive(kind, decoded(segment)));
  const res = live ? NextResponse.next({ request: { headers: requestHeaders } }) : NextResponse.rewrite(req.nextUrl, { status: 404, request: { headers: requestHeaders } });
  res.headers.set("content-security-policy", policy);
  return res;
}
