import { getDb } from "@/db";
import { listUsers } from "@/db/users";
import { json, requireActor, route } from "@/lib/http";

export const GET = route(async (req) => {
  const actor = await requireActor(req);
  return json({ users: await listUsers(getDb(), actor) });
});
