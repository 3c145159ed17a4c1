import { budgetExport, exportQuerySchema, fileResponse, scenarioExport } from "@/lib/export-files";
import { getDb } from "@/db";
import { AppError } from "@/db/errors";
import { getScenario } from "@/db/scenarios";
import { readQuery, requireActor, route } from "@/lib/http";
import { computeSaved, requireResult } from "@/lib/scenario-compute";

type Params = { projectId: string; scenarioId: string };

/**
 * The scenario as a file to download, for every member who can read it: ?what=scenario (the scenario file, JSON)
 * or ?what=budget (the Budget as CSV, computed once per version in the compute pool). A document that cannot be read or computed is 422.
 */
export const GET = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  const { what } = readQuery(req, exportQuerySchema);
  const db = getDb();
  const scenario = await getScenario(db, actor, projectId, scenarioId);
  if (!scenario.document) throw new AppError("unprocessable", "this scenario's stored document cannot be read by this version of Branchline");
  if (what === "scenario") return fileResponse(scenarioExport({ title: scenario.title, document: scenario.document }));
  const result = requireResult(await computeSaved(db, { scenarioId: scenario.id, version: scenario.version, document: scenario.document }));
  return fileResponse(budgetExport(scenario.title, result, scenario.document));
});
