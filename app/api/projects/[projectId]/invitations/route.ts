import { getDb } from "@/db";
import { createInvitation, listInvitations } from "@/db/invitations";
import { invitationCreateSchema } from "@/contracts/requests";
import { json, readJson, requireActor, route } from "@/lib/http";
import { sendInvitationMail } from "@/lib/invitation-mail";

type Params = { projectId: string };

/** Open invitations of the project (owners only). */
export const GET = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  return json({ invitations: await listInvitations(getDb(), actor, projectId) });
});

/** Invites an address as editor or viewer and e-mails the link (owners only). */
export const POST = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  const input = await readJson(req, invitationCreateSchema);
  return json({ invitation: await createInvitation(getDb(), actor, projectId, input, sendInvitationMail) }, 201);
});
