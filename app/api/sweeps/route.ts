import { consumeComputePoint, computeRatePerMinute } from "@/db/compute-rate-limit";
import { getDb } from "@/db";
import { AppError } from "@/db/errors";
import { getScenario } from "@/db/scenarios";
import { sweepCsv } from "@/canvas/export/sweep-csv";
import { clientAddress } from "@/lib/client-address";
import { sweepRequestSchema } from "@/contracts/requests";
import { json, readJson, route } from "@/lib/http";
import { sweepRequested } from "@/lib/scenario-sweep";
import { actorFromRequest } from "@/lib/session";

/** A sweep's request is a document (a sampled protocol may be large) and a few numbers: the document's limit. */
const SWEEP_BODY_MAX_BYTES = 8 * 1024 * 1024;

/**
 * Sweeps one parameter of a scenario over points spaced evenly in its logarithm (at most API_SWEEP_MAX_POINTS),
 * answered directly: JSON `{ sweep }` (each point's ⟨N⟩ and 𝒟 with units), or CSV with `format: "csv"`. The
 * scenario is a document in the body (anyone; anonymous callers spend one of their computations a minute per point)
 * or a saved one named by projectId and scenarioId (its readers, as for GET on the scenario). Every point is
 * computed in the compute pool (lib/scenario-sweep.ts): 422 compute_too_costly before any of it runs when a point
 * or the whole sweep is over its ceiling, 422 compute_over_budget when a point overruns, 503 when the pool is full.
 */
export const POST = route(async (req) => {
  const actor = await actorFromRequest(req);
  const input = await readJson(req, sweepRequestSchema, SWEEP_BODY_MAX_BYTES);
  let document: unknown = input.document;
  let documentPath = "document";
  if (input.projectId && input.scenarioId) {
    if (!actor) throw new AppError("unauthenticated", "sign in (or send an API token) to sweep a saved scenario");
    const scenario = await getScenario(getDb(), actor, input.projectId, input.scenarioId);
    if (!scenario.document) throw new AppError("unprocessable", "this scenario's stored document cannot be read by this version of Branchline");
    document = scenario.document;
    documentPath = "(saved scenario)";
  } else if (!actor) {
    const retryAfterSeconds = await consumeComputePoint(`address:${clientAddress(req)}`, input.points);
    if (retryAfterSeconds !== null) {
      throw new AppError("rate_limited", `anonymous computation is limited to ${computeRatePerMinute()} a minute per address (a sweep counts its points); sign in, or try again in ${retryAfterSeconds} s`, undefined, {
        retryAfterSeconds,
      });
    }
  }
  const { sweep, document: swept } = await sweepRequested(document, input, documentPath);
  if (input.format === "json") return json({ sweep });
  return new Response(sweepCsv(sweep, swept), {
    status: 200,
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="sweep-${sweep.parameter}.csv"`, "cache-control": "no-store" },
  });
});
