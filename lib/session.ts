import "server-only";
import { getServerSession } from "next-auth";
import { getToken } from "next-auth/jwt";
import type { NextRequest } from "next/server";
import { getDb } from "../db";
import type { Actor } from "../db/access";
import type { UserDto } from "../contracts/dto";
import { findUserById, toUserDto } from "../db/users";
import { authOptions, tokenSessionVersion, useSecureCookies } from "./auth";

/**
 * The signed-in caller of a route handler, read from the session cookie and checked against the database on
 * every request: a deleted account, a changed site role, or a session ended since the token was issued (sign-out,
 * password reset, "sign out everywhere": the account's session version moved on) take effect at once. Null when
 * signed out.
 */
export async function actorFromRequest(req: NextRequest): Promise<Actor | null> {
  const token = await getToken({ req, secureCookie: useSecureCookies() });
  if (!token?.sub) return null;
  const user = await findUserById(getDb(), token.sub);
  if (!user || user.sessionVersion !== tokenSessionVersion(token)) return null;
  return { userId: user.id, siteRole: user.siteRole };
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
