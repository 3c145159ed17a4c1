import { getDb } from "@/db";
import { resendInvitation } from "@/db/invitations";
import { json, requireActor, route } from "@/lib/http";
import { sendInvitationMail } from "@/lib/invitation-mail";

type Params = { projectId: string; invitationId: string };

/** Sends an open invitation again with a new link and a new expiry; the old link stops working (owners only). */
export const POST = route<Params>(async (req, { projectId, invitationId }) => {
  const actor = await requireActor(req);
  return json({ invitation: await resendInvitation(getDb(), actor, projectId, invitationId, sendInvitationMail) });
});
