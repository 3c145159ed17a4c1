import { describe, expect, it } from "vitest";
import { createBudgetScheduler, createJobRunner, type WorkerPort, type WorkerRequest, type WorkerResponse } from "@/canvas/compute-client";
import { handleRequest } from "@/canvas/worker/handle-request";
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";

/** A worker stand-in that runs the real request handler, but only when the test says so. */
function fakeWorker() {
  const inbox: WorkerRequest[] = [];
  const port: WorkerPort & { terminated: boolean } = {
    onmessage: null,
    terminated: false,
    postMessage: (message) => inbox.push(message),
    terminate() {
      this.terminated = true;
    },
  };
  const answerNext = () => {
    const request = inbox.shift();
    if (request) handleRequest(request, (response: WorkerResponse) => port.onmessage?.({ data: response }));
  };
  return { port, inbox, answerNext };
}

const withHold = (seconds: number): ScenarioDocument => {
  const d = defaultScenarioDocument();
  return d.protocol.kind === "segments" ? { ...d, protocol: { ...d.protocol, hold: { durationSeconds: seconds } } } : d;
};

describe("the budget scheduler", () => {
  it("keeps only the newest document waiting while the worker is busy, and sends it when the worker answers", () => {
    const worker = fakeWorker();
    const finished: number[] = [];
    const scheduler = createBudgetScheduler(worker.port, { started: () => {}, finished: (revision) => finished.push(revision) });
    scheduler.request(withHold(0.1), 1);
    scheduler.request(withHold(0.2), 2);
    scheduler.request(withHold(0.3), 3);
    expect(worker.inbox).toHaveLength(1);
    worker.answerNext();
    expect(finished).toEqual([1]);
    expect(worker.inbox).toHaveLength(1);
    expect(worker.inbox[0].type === "budget" && worker.inbox[0].document).toEqual(withHold(0.3));
    worker.answerNext();
    expect(finished).toEqual([1, 3]);
  });

  it("reports a document that cannot be computed as issues with the path of the field", () => {
    const worker = fakeWorker();
    const outcomes: unknown[] = [];
    createBudgetScheduler(worker.port, { started: () => {}, finished: (_r, outcome) => outcomes.push(outcome) }).request(
      { ...defaultScenarioDocument(), background: { kind: "schwarzschild", massKg: 2e31 }, lab: { placement: "areal-radius", arealRadiusMetres: 10 } },
      7,
    );
    worker.answerNext();
    expect(outcomes[0]).toMatchObject({ ok: false, issues: [{ path: "lab.arealRadiusMetres" }] });
  });
});

describe("the sweep runner", () => {
  it("reports progress and a result with one point per requested value", () => {
    const worker = fakeWorker();
    const progress: number[] = [];
    let points = 0;
    const runner = createJobRunner(() => worker.port);
    runner.run(
      { kind: "sweep", document: defaultScenarioDocument(), sweep: { parameter: "recombination-time", fromValue: 1e-3, toValue: 1e-1, points: 5 } },
      { progress: (done) => progress.push(done), sweep: (result) => (points = result.points.length), failed: () => {} },
    );
    worker.answerNext();
    expect(points).toBe(5);
    expect(progress[progress.length - 1]).toBe(5);
  });

  it("terminates the running sweep's worker when a new sweep replaces it", () => {
    const workers = [fakeWorker(), fakeWorker()];
    let spawned = 0;
    const runner = createJobRunner(() => workers[spawned++].port);
    const job = { kind: "sweep" as const, document: defaultScenarioDocument(), sweep: { parameter: "hold-time" as const, fromValue: 1e-3, toValue: 1, points: 3 } };
    runner.run(job, { failed: () => {} });
    runner.run(job, { failed: () => {} });
    expect(workers[0].port.terminated).toBe(true);
    expect(workers[1].port.terminated).toBe(false);
  });
});
