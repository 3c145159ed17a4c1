import "server-only";
import type { Kysely } from "kysely";
import type { Database } from "../db/schema";
import type { ComputeIssue, ScenarioDocument, ScenarioResult } from "../physics";
import { computeSaved } from "./scenario-compute";

/**
 * The Budget of a shared scenario, computed on the server (in the compute pool, once per version: see
 * lib/scenario-compute.ts); the reasons instead when it cannot be computed.
 */
export async function computeShared(
  db: Kysely<Database>,
  scenario: { scenarioId: string; version: number; document: ScenarioDocument | null },
): Promise<{ result: ScenarioResult | null; resultIssues: ComputeIssue[] | null }> {
  const { result, resultIssues } = await computeSaved(db, scenario);
  return { result, resultIssues };
}
