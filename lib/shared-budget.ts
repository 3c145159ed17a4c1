import "server-only";
import { computeScenarioFromJson, type ComputeIssue, type ScenarioDocument, type ScenarioResult } from "../physics";

/** The Budget of a shared scenario, computed on the server; the reasons instead when it cannot be computed. */
export function computeShared(document: ScenarioDocument | null): { result: ScenarioResult | null; resultIssues: ComputeIssue[] | null } {
  if (!document) return { result: null, resultIssues: null };
  const outcome = computeScenarioFromJson(document);
  return outcome.ok ? { result: outcome.result, resultIssues: null } : { result: null, resultIssues: outcome.issues };
}
