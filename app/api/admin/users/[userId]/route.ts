import { getDb } from "@/db";
import { setSiteRole } from "@/db/users";
import { siteRoleUpdateSchema } from "@/contracts/requests";
import { json, readJson, requireActor, route } from "@/lib/http";

export const PATCH = route<{ userId: string }>(async (req, { userId }) => {
  const actor = await requireActor(req);
  const { siteRole } = await readJson(req, siteRoleUpdateSchema);
  return json({ user: await setSiteRole(getDb(), actor, userId, siteRole) });
});
