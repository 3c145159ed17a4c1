import { getDb } from "@/db";
import { restoreRevision, revisionNumber } from "@/db/revisions";
import { json, requireActor, route } from "@/lib/http";

type Params = { projectId: string; scenarioId: string; version: string };

/** Stores an old revision's title and document as the scenario's next version; deletes nothing (editors and owners). */
export const POST = route<Params>(async (req, { projectId, scenarioId, version }) => {
  const actor = await requireActor(req);
  return json({ scenario: await restoreRevision(getDb(), actor, projectId, scenarioId, revisionNumber(version)) }, 201);
});
