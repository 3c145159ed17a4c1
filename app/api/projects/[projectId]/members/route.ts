import { getDb } from "@/db";
import { addMemberByEmail, listMembers } from "@/db/members";
import { memberAddSchema } from "@/contracts/requests";
import { json, readJson, requireActor, route } from "@/lib/http";

type Params = { projectId: string };

export const GET = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  return json({ members: await listMembers(getDb(), actor, projectId) });
});

export const POST = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  const { email, role } = await readJson(req, memberAddSchema);
  return json({ member: await addMemberByEmail(getDb(), actor, projectId, email, role) }, 201);
});
