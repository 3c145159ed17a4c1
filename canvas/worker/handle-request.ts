/**
 * What the compute worker does with each request, apart from the worker plumbing (so it can be tested in Node):
 * the physics library's computeScenario, sweepScenario and optimiseRecombinationTime, with every input problem
 * answered as issues with document paths.
 */
import { computeScenarioFromJson } from "@/physics/compute";
import { BackgroundInputError } from "@/physics/backgrounds";
import { ScenarioInputError } from "@/physics/scenario/input-error";
import { optimiseRecombinationTime, sweepScenario } from "@/physics/sweeps";
import type { WorkerRequest, WorkerResponse } from "../compute-client";

/** Progress is reported at most this often, so a fast sweep does not flood the page with messages. */
const PROGRESS_INTERVAL_MS = 50;

function issuesOf(error: unknown) {
  if (error instanceof ScenarioInputError || error instanceof BackgroundInputError) return [{ path: error.path, message: error.message }];
  return [{ path: "", message: error instanceof Error ? `the computation failed: ${error.message}` : "the computation failed" }];
}

export function handleRequest(request: WorkerRequest, reply: (response: WorkerResponse) => void, now: () => number = Date.now): void {
  const { id } = request;
  try {
    if (request.type === "budget") {
      reply({ type: "budget", id, outcome: computeScenarioFromJson(request.document) });
      return;
    }
    const { job } = request;
    if (job.kind === "optimise") {
      reply({ type: "optimum", id, optimum: optimiseRecombinationTime(job.document, job.request) });
      return;
    }
    let lastReport = now();
    const result = sweepScenario(job.document, job.sweep, {
      onProgress(done, total) {
        if (now() - lastReport < PROGRESS_INTERVAL_MS && done < total) return;
        lastReport = now();
        reply({ type: "progress", id, done, total });
      },
    });
    reply({ type: "sweep", id, result });
  } catch (error) {
    reply({ type: "failed", id, issues: issuesOf(error) });
  }
}
