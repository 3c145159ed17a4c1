/**
 * `branchline sweep FILE|-`: one parameter of a scenario over points spaced evenly in its logarithm, computed here
 * (a progress bar on standard error) or, with --remote, by the server (POST /api/sweeps, at most its stated number
 * of points).
 */
import { apiPaths } from "../../../contracts/api-paths";
import { API_SWEEP_MAX_POINTS } from "../../../contracts/requests";
import { ScenarioInputError } from "../../../physics/scenario/input-error";
import { parseScenarioDocument } from "../../../physics/scenario/schema";
import { MAX_SWEEP_POINTS, SWEEP_PARAMETERS, sweepScenario, type SweepResult } from "../../../physics/sweeps";
import { readInputJson, refuse, refuseIssues, type InputIssue } from "../../scenario-input";
import { sweepBounds } from "../../sweep-options";
import { outputFormat, readArgs } from "../args";
import { sweepOutput } from "../output";
import { progressBar } from "../progress";
import { remoteFromEnv, send } from "../remote";

export const sweepUsage = [
  "usage: branchline sweep FILE.json [--vary PARAMETER] [--from QUANTITY] [--to QUANTITY] [--points N]",
  "                       [--format json|csv|table] [--remote]   (FILE - reads standard input)",
  `  PARAMETER: ${SWEEP_PARAMETERS.join(", ")} (default: recombination-time, or lab-distance without segments)`,
  "  QUANTITY: a number with its unit, e.g. 5ms, 2 s, 3e6 m (default: the editor's range around the scenario's value)",
  `  --points: 1 to ${MAX_SWEEP_POINTS} here (default 41); with --remote at most ${API_SWEEP_MAX_POINTS}, computed by the server at`,
  "  BRANCHLINE_URL (with BRANCHLINE_TOKEN when set) within its cost ceiling.",
];

const DEFAULT_POINTS = 41;

export async function sweepCommand(argv: string[]): Promise<string> {
  const args = readArgs(
    argv,
    { vary: { type: "string" }, from: { type: "string" }, to: { type: "string" }, points: { type: "string" }, format: { type: "string" }, remote: { type: "boolean", default: false } },
    sweepUsage,
  );
  if (args.positionals.length !== 1) refuse(sweepUsage);
  const issues: InputIssue[] = [];
  const format = outputFormat(args.values.format, issues);
  const most = args.values.remote ? API_SWEEP_MAX_POINTS : MAX_SWEEP_POINTS;
  const points = args.values.points === undefined ? Math.min(DEFAULT_POINTS, most) : Number(args.values.points);
  if (!Number.isInteger(points) || points < 1 || points > most) issues.push({ path: "--points", message: `must be a whole number from 1 to ${most}; got "${args.values.points}"` });
  const parsed = parseScenarioDocument(readInputJson(args.positionals[0]));
  if (!parsed.ok) refuseIssues("the scenario cannot be swept:", parsed.issues);
  const bounds = sweepBounds(parsed.document, args.values, issues);
  if (issues.length > 0) refuseIssues("the options cannot be used:", issues);
  const request = { ...bounds, points };

  if (args.values.remote) {
    const body = { document: parsed.document, ...request, format: format === "csv" ? "csv" : "json" };
    const answer = await send(remoteFromEnv(), "POST", apiPaths.sweeps, body);
    if (format === "csv") return answer.text;
    return sweepOutput(answer.json<{ sweep: SweepResult }>().sweep, parsed.document, format);
  }
  const progress = progressBar(`sweeping ${bounds.parameter}`);
  try {
    return sweepOutput(sweepScenario(parsed.document, request, { onProgress: (done, total) => progress.update(done, total) }), parsed.document, format);
  } catch (error) {
    if (error instanceof ScenarioInputError) refuseIssues("the sweep cannot be computed:", [{ path: error.path, message: error.message }]);
    throw error;
  } finally {
    progress.stop();
  }
}
