import "server-only";
import { getServerSession } from "next-auth";
import { getToken } from "next-auth/jwt";
import type { NextRequest } from "next/server";
import { getDb } from "../db";
import type { Actor } from "../db/access";
import type { UserDto } from "../contracts/dto";
import { actorFromApiToken } from "../db/api-tokens";
import { AppError } from "../db/errors";
import { findUserById, toUserDto } from "../db/users";
import { authOptions, tokenSessionVersion, useSecureCookies } from "./auth";
import { clientAddress } from "./client-address";

/**
 * The signed-in caller of a route handler, read from the session cookie and checked against the database on
 * every request: a deleted account, a changed site role, or a session ended since the token was issued (sign-out,
 * password reset, "sign out everywhere": the account's session version moved on) take effect at once. Null when
 * signed out.
 *
 * A request with `Authorization: Bearer …` is a personal API token's instead (db/api-tokens.ts), and its cookie is
 * not read: a token that does not work answers 401 (or 429 after many unknown ones) rather than falling back to a
 * session or to an anonymous caller.
 */
export async function actorFromRequest(req: NextRequest): Promise<Actor | null> {
  const bearer = bearerToken(req);
  if (bearer !== null) return actorFromApiToken(getDb(), bearer, clientAddress(req));
  const token = await getToken({ req, secureCookie: useSecureCookies() });
  if (!token?.sub) return null;
  const user = await findUserById(getDb(), token.sub);
  if (!user || user.sessionVersion !== tokenSessionVersion(token)) return null;
  return { userId: user.id, siteRole: user.siteRole };
}

/** The credentials of an `Authorization: Bearer` header (an empty one is refused), or null without one. */
function bearerToken(req: Request): string | null {
  const header = req.headers.get("authorization");
  const match = header ? /^bearer(?:\s+(.*))?$/i.exec(header.trim()) : null;
  if (!match) return null;
  const token = match[1]?.trim();
  if (!token) throw new AppError("unauthenticated", "the Authorization header names no token: send `Authorization: Bearer <token>`");
  return token;
}

/**
 * The signed-in user for a server component, or null. getServerSession runs the jwt callback of lib/auth.ts,
 * which refuses a token whose session has ended.
 */
export async function currentUser(): Promise<UserDto | null> {
  const session = await getServerSession(authOptions);
  const id = (session?.user as { id?: string } | undefined)?.id;
  if (!id) return null;
  const user = await findUserById(getDb(), id);
  return user ? toUserDto(user) : null;
}
