/**
 * One scenario computation as the server runs it, inside a worker thread of lib/compute-pool.ts: unknown JSON in,
 * parsed and upgraded, its cost estimated (physics/compute-cost.ts) and refused over the ceiling before any of it
 * runs, then computed. Plain data out (it crosses threads by structured clone). No server-only import: the worker
 * loads it through tsx, outside Next's bundle.
 */
import { computeParsedScenario } from "../physics/compute";
import { COMPUTE_COST_CEILING, computeCostRefusal } from "../physics/compute-cost";
import type { ComputeIssue, ScenarioResult } from "../physics/result";
import { parseScenarioDocument } from "../physics/scenario/schema";

export type ComputeTaskOutcome =
  /** Computed. */
  | { kind: "result"; result: ScenarioResult }
  /** The document does not validate, or validates but cannot be computed (a formula with no value somewhere). */
  | { kind: "issues"; issues: ComputeIssue[] }
  /** Refused before starting: the estimated cost is over the ceiling; the issues name the fields to change. */
  | { kind: "too-costly"; issues: ComputeIssue[] };

export function runComputeTask(input: unknown, costCeiling = COMPUTE_COST_CEILING): ComputeTaskOutcome {
  const parsed = parseScenarioDocument(input);
  if (!parsed.ok) return { kind: "issues", issues: parsed.issues };
  const refusal = computeCostRefusal(parsed.document, costCeiling);
  if (refusal) return { kind: "too-costly", issues: refusal };
  const outcome = computeParsedScenario(parsed.document);
  return outcome.ok ? { kind: "result", result: outcome.result } : { kind: "issues", issues: outcome.issues };
}
