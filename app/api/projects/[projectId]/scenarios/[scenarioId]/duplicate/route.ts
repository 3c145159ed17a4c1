import { getDb } from "@/db";
import { duplicateScenario } from "@/db/scenarios";
import { scenarioDuplicateSchema } from "@/contracts/requests";
import { json, readJson, requireActor, route } from "@/lib/http";

type Params = { projectId: string; scenarioId: string };

export const POST = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  const { title } = await readJson(req, scenarioDuplicateSchema.optional().transform((v) => v ?? {}));
  return json({ scenario: await duplicateScenario(getDb(), actor, projectId, scenarioId, title) }, 201);
});
