import { budgetExport, exportQuerySchema, fileResponse, scenarioExport } from "@/lib/export-files";
import { getDb } from "@/db";
import { AppError } from "@/db/errors";
import { openSharedScenarioRecord } from "@/db/share-links";
import { readQuery, route } from "@/lib/http";
import { computeSaved, requireResult } from "@/lib/scenario-compute";

type Params = { token: string };

/**
 * The shared scenario as a file, for whoever holds a live share link (no sign-in): ?what=scenario (the scenario
 * file) or ?what=budget (the Budget as CSV). A revoked, expired or unknown token is 404. Counts a view.
 */
export const GET = route<Params>(async (req, { token }) => {
  const { what } = readQuery(req, exportQuerySchema);
  const db = getDb();
  const { scenarioId, scenario } = await openSharedScenarioRecord(db, token);
  if (!scenario.document) throw new AppError("unprocessable", "this scenario's stored document cannot be read by this version of Branchline");
  if (what === "scenario") return fileResponse(scenarioExport({ title: scenario.title, document: scenario.document }));
  const result = requireResult(await computeSaved(db, { scenarioId, version: scenario.version, document: scenario.document }));
  return fileResponse(budgetExport(scenario.title, result, scenario.document));
});
