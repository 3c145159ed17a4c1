import { getDb } from "@/db";
import { revokeShareLink } from "@/db/share-links";
import { noContent, requireActor, route } from "@/lib/http";

type Params = { projectId: string; scenarioId: string; linkId: string };

/** Revokes a share link; it answers 404 from now on (editors and owners). */
export const DELETE = route<Params>(async (req, { projectId, scenarioId, linkId }) => {
  const actor = await requireActor(req);
  await revokeShareLink(getDb(), actor, projectId, scenarioId, linkId);
  return noContent();
});
