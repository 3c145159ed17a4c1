import { getDb } from "@/db";
import { changeMemberRole, removeMember } from "@/db/members";
import { memberUpdateSchema } from "@/contracts/requests";
import { json, noContent, readJson, requireActor, route } from "@/lib/http";

type Params = { projectId: string; userId: string };

export const PATCH = route<Params>(async (req, { projectId, userId }) => {
  const actor = await requireActor(req);
  const { role } = await readJson(req, memberUpdateSchema);
  return json({ member: await changeMemberRole(getDb(), actor, projectId, userId, role) });
});

export const DELETE = route<Params>(async (req, { projectId, userId }) => {
  const actor = await requireActor(req);
  await removeMember(getDb(), actor, projectId, userId);
  return noContent();
});
