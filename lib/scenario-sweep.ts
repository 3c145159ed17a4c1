import "server-only";
import { AppError, type FieldIssue } from "../db/errors";
import { COMPUTE_COST_CEILING, computeCostRefusal, estimateComputeCost } from "../physics/compute-cost";
import { parseScenarioDocument, type ScenarioDocument } from "../physics/scenario/schema";
import { ScenarioInputError } from "../physics/scenario/input-error";
import { sweepDocuments, sweepPointOf, sweepResultOf, type SweepPoint, type SweepRequest, type SweepResult } from "../physics/sweeps";
import { computePool } from "./compute-pool";
import { computeFailure } from "./scenario-compute";

/**
 * A sweep computed for a request (POST /api/sweeps): every point is one computation in the compute pool, so each
 * has the pool's time budget and runs off the request thread, and at most as many points are in flight as the pool
 * has threads (the rest of the server's requests take their turns between them, and no point waits long enough in
 * the queue to be answered "busy"). Before any point runs, each varied document must pass the one-document cost
 * ceiling and all of them together SWEEP_COST_CEILING, so a sweep is refused at once (422 compute_too_costly,
 * naming what to change) rather than found too slow.
 */

/** Work units (≈ µs of one core, physics/compute-cost.ts) one sweep may cost in all: about ten seconds of a core. */
export const SWEEP_COST_CEILING = 10 * COMPUTE_COST_CEILING;

const prefixed = (issues: { path: string; message: string }[], prefix: string): FieldIssue[] =>
  issues.map((i) => ({ path: i.path ? `${prefix}.${i.path}` : prefix, message: i.message }));

/** The varied documents, or the 400/422 that says why they cannot be swept. */
function plannedRuns(document: ScenarioDocument, request: SweepRequest) {
  let runs: { x: number; document: ScenarioDocument }[];
  try {
    runs = sweepDocuments(document, request);
  } catch (error) {
    if (!(error instanceof ScenarioInputError)) throw error;
    const path = error.path.startsWith("sweep.") ? error.path.slice("sweep.".length) : `document.${error.path}`;
    throw new AppError("validation_failed", `this scenario cannot be swept: ${error.message}`, [{ path, message: error.message }]);
  }
  let total = 0;
  for (const run of runs) {
    const refusal = computeCostRefusal(run.document);
    if (refusal) {
      throw new AppError("compute_too_costly", `at ${request.parameter} = ${run.x} the document would cost more than the server spends on one computation: relax the numerics named in the fields`, prefixed(refusal, "document"));
    }
    total += estimateComputeCost(run.document).units;
  }
  if (total > SWEEP_COST_CEILING) {
    const fits = Math.max(1, Math.floor((SWEEP_COST_CEILING / total) * runs.length));
    throw new AppError("compute_too_costly", `these ${runs.length} points would cost more than the server spends on one sweep`, [
      { path: "points", message: `at most about ${fits} points of this scenario fit in one sweep; ask for fewer, or compute it with the command line (npx branchline sweep)` },
    ]);
  }
  return runs;
}

/** A point's failure, saying which point, with its fields as paths into the request's document. */
const atPoint = (error: AppError, where: string) =>
  new AppError(error.code, `${where}: ${error.message}`, error.fields && prefixed(error.fields, "document"), error.details);

/** Sweeps a document (unknown JSON, a client's, or a saved scenario's); answers the sweep and the document as read. */
export async function sweepRequested(input: unknown, request: SweepRequest, documentPath = "document"): Promise<{ sweep: SweepResult; document: ScenarioDocument }> {
  const parsed = parseScenarioDocument(input);
  if (!parsed.ok) throw new AppError("validation_failed", "the scenario document is not valid", prefixed(parsed.issues, documentPath));
  const runs = plannedRuns(parsed.document, request);
  const pool = computePool();
  const points: SweepPoint[] = new Array(runs.length);
  let next = 0;
  let failed: AppError | null = null;
  const lane = async () => {
    while (failed === null && next < runs.length) {
      const i = next++;
      const outcome = await pool.run(runs[i].document);
      if (outcome.kind === "result") points[i] = sweepPointOf(runs[i].x, outcome.result);
      else failed ??= atPoint(computeFailure(outcome, runs[i].document), `at ${request.parameter} = ${runs[i].x}`);
    }
  };
  await Promise.all(Array.from({ length: Math.min(pool.size, runs.length) }, lane));
  if (failed) throw failed;
  return { sweep: sweepResultOf(request.parameter, points), document: parsed.document };
}
