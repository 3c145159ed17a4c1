import "server-only";
import { getServerSession } from "next-auth";
import { getToken } from "next-auth/jwt";
import type { NextRequest } from "next/server";
import { getDb } from "../db";
import type { Actor } from "../db/access";
import { findUserById, type UserDto, toUserDto } from "../db/users";
import { authOptions } from "./auth";

/**
 * The signed-in caller of a route handler, read from the session cookie and checked against the database on
 * every request (a deleted account or a changed site role takes effect at once). Null when signed out.
 */
export async function actorFromRequest(req: NextRequest): Promise<Actor | null> {
  const token = await getToken({ req });
  if (!token?.sub) return null;
  const user = await findUserById(getDb(), token.sub);
  return user ? { userId: user.id, siteRole: user.siteRole } : null;
}

/** The signed-in user for a server component, or null. */
export async function currentUser(): Promise<UserDto | null> {
  const session = await getServerSession(authOptions);
  const id = (session?.user as { id?: string } | undefined)?.id;
  if (!id) return null;
  const user = await findUserById(getDb(), id);
  return user ? toUserDto(user) : null;
}
