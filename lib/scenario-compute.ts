import "server-only";
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import type { Kysely } from "kysely";
import { AppError, type FieldIssue } from "../db/errors";
import { readCachedOutcome, storeCachedOutcome } from "../db/scenario-results";
import type { Database } from "../db/schema";
import { RESULT_FORMAT_VERSION, type ComputeIssue, type ScenarioDocument, type ScenarioResult } from "../physics";
import { computePool, type PoolOutcome } from "./compute-pool";

/**
 * Every server path that computes a scenario goes through here, and so through the compute pool (worker threads,
 * a time budget, a cost ceiling): POST /api/compute with computeRequested; the share view, share page, embed and
 * the Budget exports with computeSaved, which also keeps each saved scenario's outcome per (scenario, version) in
 * scenario_results, so that a version is computed once, whoever looks at it.
 */

/** What is cached: every outcome but "busy", which says nothing about the document. */
type CachedOutcome = Exclude<PoolOutcome, { kind: "busy" }>;

/** An over-budget outcome may have met a loaded server: it is tried again after this long. */
const OVER_BUDGET_RETRY_MS = 10 * 60 * 1000;
const BUSY_RETRY_SECONDS = 5;

/** What to relax when a computation overran its budget, by protocol kind. */
function overBudgetFields(document: unknown): FieldIssue[] {
  const protocol = (document as { protocol?: { kind?: unknown } } | null)?.protocol?.kind;
  const fields: FieldIssue[] = [{ path: "numerics.kinkTimeResolutionSeconds", message: "a coarser time step for kinked profiles (or null for the default) samples the profile fewer times" }];
  if (protocol === "formula") fields.push({ path: "protocol.expression", message: "a shorter formula is cheaper to evaluate at every sample; a smooth one converges sooner" });
  if (protocol === "sampled") fields.push({ path: "protocol.samples", message: "fewer samples, or cubic-spline interpolation, which has no kinks to resolve" });
  return fields;
}

function overBudgetMessage(budgetMs: number): string {
  return (
    `the computation did not finish within its ${budgetMs / 1000} s budget and was stopped: this document is too expensive ` +
    `to compute on the server. Relax the numerics named in the fields, or compute it without a budget with the command line (npm run compute)`
  );
}

const tooCostlyMessage = "this document would cost more to compute than the server spends on one request: relax the numerics named in the fields";

/** The error a failed outcome answers with: 400 for a document that cannot be computed, 422 for one too costly, 503 when busy. */
export function computeFailure(outcome: Exclude<PoolOutcome, { kind: "result" }>, document: unknown): AppError {
  switch (outcome.kind) {
    case "issues":
      return new AppError("validation_failed", "the scenario document cannot be computed", outcome.issues);
    case "too-costly":
      return new AppError("compute_too_costly", tooCostlyMessage, outcome.issues);
    case "over-budget":
      return new AppError("compute_over_budget", overBudgetMessage(outcome.budgetMs), overBudgetFields(document), { budgetSeconds: outcome.budgetMs / 1000 });
    case "busy":
      return new AppError("service_unavailable", `the server is busy computing other scenarios (${outcome.reason}); try again in a few seconds`, undefined, {
        retryAfterSeconds: BUSY_RETRY_SECONDS,
      });
  }
}

/** Computes a document sent by a client: the result, or the AppError to answer with. */
export async function computeRequested(input: unknown): Promise<ScenarioResult> {
  const outcome = await computePool().run(input);
  if (outcome.kind === "result") return outcome.result;
  throw computeFailure(outcome, input);
}

/**
 * The build that computes: a production build's id (.next/BUILD_ID), so that a deployment computes every cached
 * scenario again; elsewhere (tests, next dev, where the physics may change without a build) this process alone.
 */
const engineKey = (() => {
  const buildIdFile = path.join(process.cwd(), ".next", "BUILD_ID");
  const build = process.env.NODE_ENV === "production" && existsSync(buildIdFile) ? readFileSync(buildIdFile, "utf8").trim() : `unbuilt-${process.pid}-${Date.now()}`;
  return `${RESULT_FORMAT_VERSION}:${build}`;
})();

export interface SavedComputation {
  result: ScenarioResult | null;
  /** Why there is no result, as {path, message} issues, for the share page and the Budget. */
  resultIssues: ComputeIssue[] | null;
  /** The error an export answers with when there is no result. */
  error: AppError | null;
}

function savedComputation(outcome: PoolOutcome, document: unknown): SavedComputation {
  if (outcome.kind === "result") return { result: outcome.result, resultIssues: null, error: null };
  if (outcome.kind === "issues") {
    // Stored, so not the client's request to correct: the export cannot be made (422), with the reasons.
    const reasons = outcome.issues.map((i) => i.message).join("; ");
    return { result: null, resultIssues: outcome.issues, error: new AppError("unprocessable", `this scenario cannot be computed: ${reasons}`, outcome.issues) };
  }
  const error = computeFailure(outcome, document);
  return { result: null, resultIssues: error.fields ?? [{ path: "", message: error.message }], error };
}

function isFresh(cached: { outcome: unknown; computedAt: Date }): cached is { outcome: CachedOutcome; computedAt: Date } {
  const outcome = cached.outcome as CachedOutcome;
  return outcome.kind !== "over-budget" || Date.now() - cached.computedAt.getTime() < OVER_BUDGET_RETRY_MS;
}

/**
 * A saved scenario's computation at one version: from scenario_results when this build has computed it, else
 * computed in the pool and stored (failures too, as their reasons; "busy" is answered but not stored).
 * A null document (one this version cannot read) has nothing to compute.
 */
export async function computeSaved(db: Kysely<Database>, scenario: { scenarioId: string; version: number; document: ScenarioDocument | null }): Promise<SavedComputation> {
  if (!scenario.document) return { result: null, resultIssues: null, error: null };
  const key = { scenarioId: scenario.scenarioId, version: scenario.version, engineKey };
  const cached = await readCachedOutcome(db, key);
  if (cached && isFresh(cached)) return savedComputation(cached.outcome, scenario.document);
  const outcome = await computePool().run(scenario.document);
  if (outcome.kind !== "busy") await storeCachedOutcome(db, key, outcome);
  return savedComputation(outcome, scenario.document);
}

/** The result of a saved computation, or the error an export answers with. */
export function requireResult(computation: SavedComputation): ScenarioResult {
  if (computation.result) return computation.result;
  throw computation.error ?? new AppError("unprocessable", "this scenario's stored document cannot be read by this version of Branchline");
}
