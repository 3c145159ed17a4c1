/**
 * The editor's side of the compute workers: the messages they exchange, a scheduler for the live budget that keeps
 * the UI free, and a runner for sweeps. The budget worker runs one computation at a time; while it works, only the
 * newest document waits (older ones are dropped), so a drag asks for a budget every frame without queueing stale
 * work. Sweeps run on a worker of their own so the live budget never waits behind them.
 */
import type { ComputeIssue, ComputeOutcome, ScenarioResult } from "@/physics/result";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import type { RecombinationOptimum, RecombinationOptimumRequest, SweepParameter, SweepRequest, SweepResult } from "@/physics/sweeps";

export type { ComputeIssue, ComputeOutcome, RecombinationOptimum, ScenarioResult, SweepParameter, SweepRequest, SweepResult };

/** A job for the sweep worker: a sweep of one parameter, or the recombination time that minimises ⟨N⟩. */
export type SweepJob =
  | { kind: "sweep"; document: ScenarioDocument; sweep: SweepRequest }
  | { kind: "optimise"; document: ScenarioDocument; request: RecombinationOptimumRequest };

export type WorkerRequest = { type: "budget"; id: number; document: ScenarioDocument } | { type: "job"; id: number; job: SweepJob };

export type WorkerResponse =
  | { type: "budget"; id: number; outcome: ComputeOutcome }
  | { type: "progress"; id: number; done: number; total: number }
  | { type: "sweep"; id: number; result: SweepResult }
  | { type: "optimum"; id: number; optimum: RecombinationOptimum }
  | { type: "failed"; id: number; issues: ComputeIssue[] };

/** The part of a Worker the scheduler uses, so tests can stand a fake in its place. */
export interface WorkerPort {
  postMessage(message: WorkerRequest): void;
  onmessage: ((event: { data: WorkerResponse }) => void) | null;
  terminate(): void;
}

export interface BudgetListener {
  started(revision: number): void;
  finished(revision: number, outcome: ComputeOutcome): void;
}

export interface BudgetScheduler {
  /** Ask for the budget of `document`, tagged with the editor's revision of it. */
  request(document: ScenarioDocument, revision: number): void;
  dispose(): void;
}

export function createBudgetScheduler(port: WorkerPort, listener: BudgetListener): BudgetScheduler {
  let nextId = 1;
  let inFlight: { id: number; revision: number } | null = null;
  let waiting: { document: ScenarioDocument; revision: number } | null = null;

  const send = (document: ScenarioDocument, revision: number) => {
    inFlight = { id: nextId++, revision };
    listener.started(revision);
    port.postMessage({ type: "budget", id: inFlight.id, document });
  };

  port.onmessage = ({ data }) => {
    if (!inFlight || data.id !== inFlight.id) return;
    const { revision } = inFlight;
    inFlight = null;
    if (data.type === "budget") listener.finished(revision, data.outcome);
    else if (data.type === "failed") listener.finished(revision, { ok: false, issues: data.issues });
    if (waiting) {
      const next = waiting;
      waiting = null;
      send(next.document, next.revision);
    }
  };

  return {
    request(document, revision) {
      if (inFlight) waiting = { document, revision };
      else send(document, revision);
    },
    dispose() {
      port.onmessage = null;
      port.terminate();
    },
  };
}

export interface JobListener {
  progress?(done: number, total: number): void;
  sweep?(result: SweepResult): void;
  optimum?(optimum: RecombinationOptimum): void;
  failed(issues: ComputeIssue[]): void;
}

/**
 * Runs one sweep job at a time. A new job replaces a running one: the old worker is terminated (a sweep's loop
 * cannot be interrupted from outside) and a fresh one spawned.
 */
export interface JobRunner {
  run(job: SweepJob, listener: JobListener): void;
  cancel(): void;
  dispose(): void;
}

export function createJobRunner(spawn: () => WorkerPort): JobRunner {
  let port: WorkerPort | null = null;
  let nextId = 1;
  const stop = () => {
    port?.terminate();
    port = null;
  };
  return {
    run(job: SweepJob, listener: JobListener) {
      stop();
      const current = spawn();
      port = current;
      const id = nextId++;
      current.onmessage = ({ data }) => {
        if (data.id !== id) return;
        if (data.type === "progress") listener.progress?.(data.done, data.total);
        else if (data.type === "sweep") listener.sweep?.(data.result);
        else if (data.type === "optimum") listener.optimum?.(data.optimum);
        else if (data.type === "failed") listener.failed(data.issues);
      };
      current.postMessage({ type: "job", id, job });
    },
    cancel: stop,
    dispose: stop,
  };
}
