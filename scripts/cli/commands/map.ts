/**
 * `branchline map FILE|-`: one quantity over two parameters of a scenario on a grid (log or linear per axis),
 * computed here, point by point with a progress bar on standard error, or with --remote by the server's workers
 * through its job queue (POST /api/maps, then GET on the map's URL for its progress and grid). With --remote,
 * --scenario PROJECT_ID/SCENARIO_ID maps a saved scenario instead of a file, and the map is kept with it (listed in
 * the editor's Map panel). Ctrl-C during a remote map cancels it on the server.
 */
import { apiPaths } from "../../../contracts/api-paths";
import type { ParameterMapDto } from "../../../contracts/dto";
import { mapParametersFor } from "../../../canvas/kernels/sweep-range";
import { MAP_QUANTITIES, MAX_MAP_SIDE, assembleMap, computeMapPoint, mapRefusal, mapRowOf, type AxisScale, type MapAxis, type MapGrid, type MapQuantity, type MapRequest } from "../../../physics/maps";
import { parseScenarioDocument, type ScenarioDocument } from "../../../physics/scenario/schema";
import { SWEEP_PARAMETERS, type SweepParameter } from "../../../physics/sweeps";
import { readInputJson, refuse, refuseIssues, type InputIssue } from "../../scenario-input";
import { parameterBounds } from "../../sweep-options";
import { outputFormat, readArgs } from "../args";
import { CommandFailure, EXIT } from "../failure";
import { mapOutput } from "../output";
import { progressBar } from "../progress";
import { remoteFromEnv, send, type Remote } from "../remote";

export const mapUsage = [
  "usage: branchline map FILE.json [--x PARAMETER] [--y PARAMETER] [--quantity QUANTITY]",
  "                     [--x-from QUANTITY] [--x-to QUANTITY] [--x-points N] [--x-scale log|linear]   (the same for --y-…)",
  "                     [--format json|csv|table] [--remote]   (FILE - reads standard input)",
  "       branchline map --remote --scenario PROJECT_ID/SCENARIO_ID [options as above]",
  `  PARAMETER: ${SWEEP_PARAMETERS.join(", ")}; by default the first two the scenario can vary, in that`,
  "  order (its segment times, its distance from a horizon, its environment), as the editor's Map panel offers them",
  `  QUANTITY (--quantity): ${MAP_QUANTITIES.join(", ")} (default total-quanta)`,
  "  --x-from, --x-to, …: a number with its unit, e.g. 5ms, 2 s, 3e6 m, 1e-8 Pa (default: the editor's range around",
  "  the scenario's value); --x-points, --y-points: 2 to " + `${MAX_MAP_SIDE} (default 24); --x-scale, --y-scale: log (default) or linear`,
  "  Here: computed on this machine, a progress bar on standard error. --remote: computed by the server's workers at",
  "  BRANCHLINE_URL with BRANCHLINE_TOKEN; --scenario maps a saved scenario and keeps the map with it. Ctrl-C cancels a",
  "  remote map on the server. JSON is the grid (log10 of the quantity per point, row by row along y); CSV one line",
  "  per point with the inputs first; table a summary with the smallest and largest values.",
];

const DEFAULT_POINTS = 24;
const POLL_MS = 500;
/** A map still queued this long gets a hint on standard error: no worker may be running. */
const QUEUED_HINT_MS = 10_000;

const AXIS_OPTIONS = (name: "x" | "y") =>
  ({
    [name]: { type: "string" },
    [`${name}-from`]: { type: "string" },
    [`${name}-to`]: { type: "string" },
    [`${name}-points`]: { type: "string" },
    [`${name}-scale`]: { type: "string" },
  }) as const;

type AxisValues = Record<string, string | boolean | undefined>;

/** One axis from its options (--x, --x-from, --x-to, --x-points, --x-scale); problems go to `issues`. */
function readAxis(document: ScenarioDocument, values: AxisValues, name: "x" | "y", fallback: SweepParameter, issues: InputIssue[]): MapAxis {
  const text = (key: string) => values[key] as string | undefined;
  const bounds = parameterBounds(
    document,
    { vary: text(name), from: text(`${name}-from`), to: text(`${name}-to`) },
    { vary: `--${name}`, from: `--${name}-from`, to: `--${name}-to` },
    fallback,
    issues,
  );
  const pointsText = text(`${name}-points`);
  const points = pointsText === undefined ? DEFAULT_POINTS : Number(pointsText);
  if (!Number.isInteger(points) || points < 2 || points > MAX_MAP_SIDE) issues.push({ path: `--${name}-points`, message: `must be a whole number from 2 to ${MAX_MAP_SIDE}; got "${pointsText}"` });
  const scaleText = text(`${name}-scale`) ?? "log";
  if (scaleText !== "log" && scaleText !== "linear") issues.push({ path: `--${name}-scale`, message: `must be log or linear; got "${scaleText}"` });
  return { parameter: bounds.parameter, from: bounds.fromValue, to: bounds.toValue, points, scale: scaleText === "linear" ? "linear" : ("log" as AxisScale) };
}

/** The map request from the options, checked as the server checks it (physics/maps/grid.ts mapRefusal). */
function readRequest(document: ScenarioDocument, values: AxisValues): MapRequest {
  const issues: InputIssue[] = [];
  const quantity = (values.quantity as string | undefined) ?? "total-quanta";
  if (!(MAP_QUANTITIES as readonly string[]).includes(quantity)) issues.push({ path: "--quantity", message: `must be ${MAP_QUANTITIES.join(", ")}; got "${quantity}"` });
  const offered = mapParametersFor(document);
  const xFallback = offered[0] ?? SWEEP_PARAMETERS[0];
  const x = readAxis(document, values, "x", xFallback, issues);
  const y = readAxis(document, values, "y", offered.find((p) => p !== x.parameter) ?? SWEEP_PARAMETERS.find((p) => p !== x.parameter)!, issues);
  if (issues.length > 0) refuseIssues("the options cannot be used:", issues);
  const request: MapRequest = { x, y, quantity: quantity as MapQuantity };
  const refusal = mapRefusal(document, request);
  if (refusal) {
    const path = refusal.path.replace(/^([xy])\.(from|to|points|parameter)$/, (_, axis: string, field: string) => `--${axis}${field === "parameter" ? "" : `-${field}`}`);
    refuseIssues(refusal.kind === "too-costly" ? "the map would cost too much to compute:" : "the map cannot be made:", [{ path, message: refusal.message }]);
  }
  return request;
}

/** The map computed on this machine, row by row, with a progress bar over its points. */
function mapHere(document: ScenarioDocument, request: MapRequest): MapGrid {
  const progress = progressBar(`mapping ${request.quantity}`);
  const total = request.x.points * request.y.points;
  try {
    const rows = Array.from({ length: request.y.points }, (_, row) => {
      const points = Array.from({ length: request.x.points }, (_, column) => computeMapPoint(document, request, column, row));
      progress.update((row + 1) * request.x.points, total);
      return mapRowOf(row, points);
    });
    return assembleMap(request, rows);
  } finally {
    progress.stop();
  }
}

/** Follows a map on the server until it is done (its grid) or ends otherwise (a CommandFailure); Ctrl-C cancels it. */
async function followRemoteMap(remote: Remote, started: ParameterMapDto, stderr: { write(chunk: string): unknown }): Promise<ParameterMapDto> {
  stderr.write(`map ${started.id} queued at ${remote.url}${started.url}\n`);
  const progress = progressBar(`mapping ${started.request.quantity} on the server`);
  let interrupted = false;
  const onInterrupt = () => {
    interrupted = true;
  };
  process.once("SIGINT", onInterrupt);
  const since = Date.now();
  let hinted = false;
  try {
    for (let map = started; ; ) {
      if (interrupted) {
        await send(remote, "DELETE", map.url, undefined, [404]);
        throw new CommandFailure(EXIT.unavailable, [`map ${map.id}: cancelled on the server (interrupted)`]);
      }
      const { rowsDone, rowsTotal } = map.progress;
      progress.update(rowsDone * map.request.x.points, rowsTotal * map.request.x.points);
      if (map.status === "done") return map;
      if (map.status === "failed" || map.status === "cancelled") {
        throw new CommandFailure(EXIT.unavailable, [`map ${map.id} ${map.status} on the server${map.failure ? `: ${map.failure}` : ""}`]);
      }
      if (map.status === "queued" && !hinted && Date.now() - since > QUEUED_HINT_MS) {
        hinted = true;
        stderr.write(`map ${map.id} is still queued after ${QUEUED_HINT_MS / 1000} s: no map worker may be running there (npm run worker); Ctrl-C cancels it\n`);
      }
      await new Promise((resolve) => setTimeout(resolve, POLL_MS));
      map = (await send(remote, "GET", map.url)).json<{ map: ParameterMapDto }>().map;
    }
  } finally {
    process.removeListener("SIGINT", onInterrupt);
    progress.stop();
  }
}

/** PROJECT_ID/SCENARIO_ID of --scenario. */
function savedScenario(text: string): { projectId: string; scenarioId: string } {
  const match = /^([^/\s]+)\/([^/\s]+)$/.exec(text);
  if (!match) refuseIssues("the options cannot be used:", [{ path: "--scenario", message: `must be PROJECT_ID/SCENARIO_ID; got "${text}"` }]);
  return { projectId: match[1], scenarioId: match[2] };
}

export async function mapCommand(argv: string[], stderr: { write(chunk: string): unknown } = process.stderr): Promise<string> {
  const args = readArgs(
    argv,
    {
      ...AXIS_OPTIONS("x"),
      ...AXIS_OPTIONS("y"),
      quantity: { type: "string" },
      format: { type: "string" },
      remote: { type: "boolean", default: false },
      scenario: { type: "string" },
    },
    mapUsage,
  );
  const values = args.values as AxisValues;
  const issues: InputIssue[] = [];
  const format = outputFormat(args.values.format, issues);
  if (issues.length > 0) refuseIssues("the options cannot be used:", issues);
  const saved = args.values.scenario === undefined ? null : savedScenario(args.values.scenario);
  if (saved && !args.values.remote) refuseIssues("the options cannot be used:", [{ path: "--scenario", message: "maps a saved scenario on the server: add --remote" }]);
  if (saved ? args.positionals.length !== 0 : args.positionals.length !== 1) refuse(mapUsage);

  const remote = remoteFromEnv();
  let document: ScenarioDocument;
  if (saved) {
    const path = apiPaths.scenario(saved.projectId, saved.scenarioId);
    const scenario = (await send(remote, "GET", path)).json<{ scenario: { document: unknown } }>().scenario;
    const parsed = parseScenarioDocument(scenario.document);
    if (!parsed.ok) refuseIssues("the saved scenario cannot be mapped:", parsed.issues);
    document = parsed.document;
  } else {
    const parsed = parseScenarioDocument(readInputJson(args.positionals[0]));
    if (!parsed.ok) refuseIssues("the scenario cannot be mapped:", parsed.issues);
    document = parsed.document;
  }
  const request = readRequest(document, values);

  if (!args.values.remote) return mapOutput({ document, request, result: mapHere(document, request) }, format);
  const body = saved ? { scenario: saved, ...request } : { document, ...request };
  const started = (await send(remote, "POST", apiPaths.maps, body)).json<{ map: ParameterMapDto }>().map;
  const done = await followRemoteMap(remote, started, stderr);
  if (format === "csv") return (await send(remote, "GET", `${done.url}?format=csv`)).text;
  if (!done.result) throw new CommandFailure(EXIT.unavailable, [`map ${done.id} is done on the server but came without its grid`]);
  return mapOutput({ ...done, result: done.result }, format);
}
