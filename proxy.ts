import { NextResponse, type NextRequest } from "next/server";
import { getDb } from "@/db";
import { previewInvitation } from "@/db/invitations";
import { shareLinkIsLive } from "@/db/share-links";

/**
 * Answers a dead share link, embed (its token is a share link's) or invitation link with a real 404 status. The
 * pages check their token themselves (and show the not-found text), but the root loading state makes every page stream, and a streamed page keeps
 * its 200; so the status is settled here, before rendering starts. Not a security check: the pages and the API
 * decide access on their own.
 */
export const config = { matcher: ["/share/:token", "/embed/:token", "/invitations/:token"] };

function tokenOf(segment: string): string | null {
  try {
    return decodeURIComponent(segment);
  } catch {
    return null;
  }
}

export async function proxy(req: NextRequest) {
  const [, kind, segment] = req.nextUrl.pathname.split("/");
  const token = tokenOf(segment ?? "");
  const db = getDb();
  const live = token !== null && (kind === "share" || kind === "embed" ? await shareLinkIsLive(db, token) : (await previewInvitation(db, token)) !== null);
  return live ? NextResponse.next() : NextResponse.rewrite(req.nextUrl, { status: 404 });
}
