import { getDb } from "@/db";
import { listScenarioMaps } from "@/db/parameter-maps";
import { json, requireActor, route } from "@/lib/http";

type Params = { projectId: string; scenarioId: string };

/** The parameter maps kept with a saved scenario, newest first, with status and progress (grids at each map's URL). */
export const GET = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  return json({ maps: await listScenarioMaps(getDb(), actor, projectId, scenarioId) });
});
