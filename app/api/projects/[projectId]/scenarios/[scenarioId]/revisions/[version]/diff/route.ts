import { getDb } from "@/db";
import { diffRevisions, revisionNumber } from "@/db/revisions";
import { revisionDiffQuerySchema } from "@/contracts/requests";
import { json, readQuery, requireActor, route } from "@/lib/http";

type Params = { projectId: string; scenarioId: string; version: string };

/** What changed from revision ?against=N to this one: document paths with old and new values (every member). */
export const GET = route<Params>(async (req, { projectId, scenarioId, version }) => {
  const actor = await requireActor(req);
  const { against } = readQuery(req, revisionDiffQuerySchema);
  return json({ diff: await diffRevisions(getDb(), actor, projectId, scenarioId, revisionNumber(version), against) });
});
