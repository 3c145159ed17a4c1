import { getDb } from "@/db";
import { acceptInvitation } from "@/db/invitations";
import { json, requireSessionActor, route } from "@/lib/http";

type Params = { token: string };

/** Joins the project as the signed-in account the invitation was sent to; 404 once used, revoked or expired. */
export const POST = route<Params>(async (req, { token }) => {
  const actor = await requireSessionActor(req);
  return json(await acceptInvitation(getDb(), actor, token));
});
