import { getDb } from "@/db";
import { getRevision, revisionNumber } from "@/db/revisions";
import { json, requireActor, route } from "@/lib/http";

type Params = { projectId: string; scenarioId: string; version: string };

export const GET = route<Params>(async (req, { projectId, scenarioId, version }) => {
  const actor = await requireActor(req);
  return json({ revision: await getRevision(getDb(), actor, projectId, scenarioId, revisionNumber(version)) });
});
