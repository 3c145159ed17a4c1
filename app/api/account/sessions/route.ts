import { getDb } from "@/db";
import { endAllSessions } from "@/db/users";
import { noContent, requireSessionActor, route } from "@/lib/http";

/** "Sign out everywhere": ends every session of the caller's account, this one included. Reads no body. */
export const DELETE = route(async (req) => {
  const actor = await requireSessionActor(req);
  await endAllSessions(getDb(), actor.userId);
  return noContent();
});
