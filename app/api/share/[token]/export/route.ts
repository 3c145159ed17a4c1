import { budgetExport, exportQuerySchema, fileResponse, scenarioExport } from "@/components/export/export-files";
import { getDb } from "@/db";
import { AppError } from "@/db/errors";
import { openSharedScenario } from "@/db/share-links";
import { readQuery, route } from "@/lib/http";
import { computeShared } from "@/lib/shared-budget";

type Params = { token: string };

/**
 * The shared scenario as a file, for whoever holds a live share link (no sign-in): ?what=scenario (the scenario
 * file) or ?what=budget (the Budget as CSV). A revoked, expired or unknown token is 404. Counts a view.
 */
export const GET = route<Params>(async (req, { token }) => {
  const { what } = readQuery(req, exportQuerySchema);
  const scenario = await openSharedScenario(getDb(), token);
  if (!scenario.document) throw new AppError("unprocessable", "this scenario's stored document cannot be read by this version of Branchline");
  if (what === "scenario") return fileResponse(scenarioExport({ title: scenario.title, document: scenario.document }));
  const { result, resultIssues } = computeShared(scenario.document);
  if (!result) throw new AppError("unprocessable", `this scenario cannot be computed: ${(resultIssues ?? []).map((i) => i.message).join("; ")}`);
  return fileResponse(budgetExport(scenario.title, result, scenario.document));
});
