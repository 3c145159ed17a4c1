/**
 * The editor's side of the compute worker: the shapes it sends and receives, and a scheduler that keeps the UI
 * free. The worker runs one computation at a time; while it works, only the newest document waits (older ones are
 * dropped), so a drag sends a computation per frame without ever queueing stale work.
 */
import type { ScenarioDocument } from "@/physics/scenario/schema";

/** A reported number: its value (null when it only fits as a logarithm), log10, unit and formula key (/methods#key). */
export interface BudgetQuantity {
  value: number | null;
  log10: number | null;
  unit: string;
  sourceKey: string;
}

export type BudgetFlagStatus = "ok" | "note" | "caution" | "invalid" | "not-applicable";

export interface BudgetFlag {
  code: string;
  status: BudgetFlagStatus;
  message: string;
}

export interface BudgetChannel {
  channel: "electromagnetic" | "gravitational";
  /** Quanta reaching null infinity, where that count is distinct from the horizon's; else null. */
  farField: BudgetQuantity | null;
  /** Quanta into the horizon, where distinct from the far-field count; else null. */
  horizon: BudgetQuantity | null;
  rampDriven: BudgetQuantity;
  holdDriven: BudgetQuantity;
  total: BudgetQuantity;
  decoherence: BudgetQuantity;
  decoherenceTime: BudgetQuantity | null;
  /** Why the channel is exactly zero, or null. */
  exactZeroReason: string | null;
}

export interface Budget {
  channels: BudgetChannel[];
  combined: { total: BudgetQuantity; decoherence: BudgetQuantity; decoherenceTime: BudgetQuantity | null };
  flags: BudgetFlag[];
}

export interface ComputeIssue {
  path: string;
  message: string;
}

export type BudgetOutcome = { ok: true; budget: Budget } | { ok: false; issues: ComputeIssue[] };

/** What a sweep varies. */
export type SweepVariable = "recombination-duration" | "hold-duration" | "lab-distance";

export interface SweepRequest {
  document: ScenarioDocument;
  variable: SweepVariable;
  /** Inclusive range of the swept value (SI: seconds, or metres above the horizon), sampled evenly in its logarithm. */
  fromSI: number;
  toSI: number;
  points: number;
}

export interface SweepPoint {
  valueSI: number;
  /** Combined decoherence 1 − |⟨A|B⟩|; null where the computation failed at that point. */
  decoherence: number | null;
  totalQuanta: number | null;
}

export interface SweepResult {
  variable: SweepVariable;
  points: SweepPoint[];
  /** Where the decoherence is smallest over the swept range (recombination duration only), or null. */
  optimum: SweepPoint | null;
  /** Issues at the points that failed, at most a few. */
  issues: ComputeIssue[];
}

export type WorkerRequest =
  | { type: "budget"; id: number; document: ScenarioDocument }
  | { type: "sweep"; id: number; request: SweepRequest };

export type WorkerResponse =
  | { type: "budget"; id: number; outcome: BudgetOutcome }
  | { type: "sweep-progress"; id: number; done: number; total: number }
  | { type: "sweep"; id: number; result: SweepResult }
  | { type: "failed"; id: number; message: string };

/** The part of a Worker the scheduler uses, so tests can stand a fake in its place. */
export interface WorkerPort {
  postMessage(message: WorkerRequest): void;
  onmessage: ((event: { data: WorkerResponse }) => void) | null;
  terminate(): void;
}

export interface BudgetScheduler {
  /** Ask for the budget of `document`, tagged with the editor's revision of it. */
  request(document: ScenarioDocument, revision: number): void;
  dispose(): void;
}

export interface BudgetListener {
  started(revision: number): void;
  finished(revision: number, outcome: BudgetOutcome): void;
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
    else if (data.type === "failed") listener.finished(revision, { ok: false, issues: [{ path: "", message: data.message }] });
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

export interface SweepListener {
  progress(done: number, total: number): void;
  finished(result: SweepResult): void;
  failed(message: string): void;
}

/**
 * Runs one sweep at a time on its own worker (so the live budget never waits behind it). A new sweep replaces a
 * running one: the old worker is terminated, since a sweep's loop cannot be interrupted from outside.
 */
export function createSweepRunner(spawn: () => WorkerPort) {
  let port: WorkerPort | null = null;
  let nextId = 1;
  return {
    run(request: SweepRequest, listener: SweepListener) {
      port?.terminate();
      const current = spawn();
      port = current;
      const id = nextId++;
      current.onmessage = ({ data }) => {
        if (data.id !== id) return;
        if (data.type === "sweep-progress") listener.progress(data.done, data.total);
        else if (data.type === "sweep") listener.finished(data.result);
        else if (data.type === "failed") listener.failed(data.message);
      };
      current.postMessage({ type: "sweep", id, request });
    },
    cancel() {
      port?.terminate();
      port = null;
    },
    dispose() {
      port?.terminate();
      port = null;
    },
  };
}
