import { getDb } from "@/db";
import { revokeInvitation } from "@/db/invitations";
import { noContent, requireActor, route } from "@/lib/http";

type Params = { projectId: string; invitationId: string };

/** Revokes an open invitation; its link answers 404 from now on (owners only). */
export const DELETE = route<Params>(async (req, { projectId, invitationId }) => {
  const actor = await requireActor(req);
  await revokeInvitation(getDb(), actor, projectId, invitationId);
  return noContent();
});
