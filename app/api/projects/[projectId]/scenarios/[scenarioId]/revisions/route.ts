import { getDb } from "@/db";
import { listRevisions } from "@/db/revisions";
import { json, requireActor, route } from "@/lib/http";

type Params = { projectId: string; scenarioId: string };

export const GET = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  return json({ revisions: await listRevisions(getDb(), actor, projectId, scenarioId) });
});
