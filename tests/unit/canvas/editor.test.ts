import { afterEach, describe, expect, it } from "vitest";
import type { WorkerPort, WorkerRequest, WorkerResponse } from "@/canvas/compute-client";
import { BUDGET_DRAG_PACE_MS, createEditor, type Editor } from "@/canvas/editor";
import { handleRequest } from "@/canvas/worker/handle-request";
import { computeScenario } from "@/physics/compute";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { createHarness } from "./harness";

/** A compute worker in this process: the worker's own request handler, answering on a later microtask. */
function inProcessWorkers() {
  const ports: (WorkerPort & { terminated: boolean; requests: WorkerRequest[] })[] = [];
  const spawn = (): WorkerPort => {
    const port = {
      onmessage: null as WorkerPort["onmessage"],
      terminated: false,
      requests: [] as WorkerRequest[],
      postMessage(message: WorkerRequest) {
        port.requests.push(message);
        queueMicrotask(() => {
          if (!port.terminated) handleRequest(message, (data: WorkerResponse) => port.onmessage?.({ data }));
        });
      },
      terminate() {
        port.terminated = true;
      },
    };
    ports.push(port);
    return port;
  };
  return { spawn, ports };
}

async function settled(editor: Editor) {
  for (let i = 0; i < 200; i++) {
    const { budget, revision } = editor.store.getState();
    if (budget.status === "ready" && budget.resultRevision === revision) return budget.result!;
    await new Promise((resolve) => setTimeout(resolve, 1));
  }
  throw new Error("the Budget did not settle");
}

let editor: Editor | null = null;
afterEach(() => editor?.dispose());

describe("the editor object", () => {
  it("computes the Budget of the document it opens with, on its worker", async () => {
    const workers = inProcessWorkers();
    editor = createEditor({ document: defaultScenarioDocument(), version: 3, readOnly: false, spawnWorker: workers.spawn });
    const result = await settled(editor);
    const direct = computeScenario(defaultScenarioDocument());
    expect(result.electromagnetic.totalQuanta.value).toBe(direct.electromagnetic.totalQuanta.value);
    expect(editor.store.getState().save.baseVersion).toBe(3);
  });

  it("follows a drag of the recombination handle to the Budget of the dragged document, one store update a frame", async () => {
    const workers = inProcessWorkers();
    editor = createEditor({ document: defaultScenarioDocument(), version: 1, readOnly: false, spawnWorker: workers.spawn });
    const before = await settled(editor);
    const h = createHarness({ store: editor.store });
    h.store.getState().setOffsetsSize({ width: 800, height: 320 });

    // Every store notification in which the drag's document or the tool's state moved; the Budget's own updates
    // (computing, ready) are not the drag's.
    let dragUpdates = 0;
    let sawDocumentWithoutPlan = false;
    const stop = h.store.subscribe((s, prev) => {
      if (s.document !== prev.document || s.offsetsTool !== prev.offsetsTool) dragUpdates++;
      if (s.document !== prev.document && s.offsetsTool === prev.offsetsTool) sawDocumentWithoutPlan = true;
    });
    let { x, y } = h.grip("recombination-end");
    h.store.getState().offsetsPointerDown({ x, y, shiftKey: false });
    for (let frame = 0; frame < 6; frame++) {
      x += 15;
      const before = dragUpdates;
      h.store.getState().offsetsPointerMove({ x, y, shiftKey: false });
      expect(dragUpdates - before).toBe(1);
    }
    h.store.getState().offsetsPointerUp({ x, y, shiftKey: false });
    stop();
    expect(sawDocumentWithoutPlan).toBe(false);

    const after = await settled(editor);
    const dragged = h.document();
    expect(dragged.protocol).not.toEqual(defaultScenarioDocument().protocol);
    expect(after.electromagnetic.totalQuanta.value).toBe(computeScenario(dragged).electromagnetic.totalQuanta.value);
    // A slower recombination radiates less in flat spacetime (the count falls as 1/T² for smooth ramps).
    expect(after.electromagnetic.totalQuanta.value!).toBeLessThan(before.electromagnetic.totalQuanta.value!);
  });

  it("asks its worker for the Budget at a pace during a drag, and for the dragged document as soon as the handle is let go", async () => {
    const workers = inProcessWorkers();
    editor = createEditor({ document: defaultScenarioDocument(), version: 1, readOnly: false, spawnWorker: workers.spawn });
    await settled(editor);
    const budgetRequests = () => workers.ports[0].requests.filter((r) => r.type === "budget").length;
    const opened = budgetRequests();
    const h = createHarness({ store: editor.store });
    h.store.getState().setOffsetsSize({ width: 800, height: 320 });
    let { x, y } = h.grip("recombination-end");
    h.store.getState().offsetsPointerDown({ x, y, shiftKey: false });
    // Thirty frames' moves within one task: the worker is not asked once per move.
    for (let frame = 0; frame < 30; frame++) h.store.getState().offsetsPointerMove({ x: (x += 2), y, shiftKey: false });
    expect(budgetRequests()).toBe(opened);
    // The pace takes the newest document once the moves stop arriving (BUDGET_DRAG_PACE_MS after the last tick).
    await new Promise((resolve) => setTimeout(resolve, 2 * BUDGET_DRAG_PACE_MS));
    expect(budgetRequests()).toBe(opened + 1);
    const requestedDuringDrag = workers.ports[0].requests.at(-1) as Extract<WorkerRequest, { type: "budget" }>;
    expect(requestedDuringDrag.document).toEqual(h.document());
    // One more move, then the release: the last document goes out at once, without waiting for the pace.
    h.store.getState().offsetsPointerMove({ x: (x += 2), y, shiftKey: false });
    h.store.getState().offsetsPointerUp({ x, y, shiftKey: false });
    expect(budgetRequests()).toBe(opened + 2);
    const after = await settled(editor);
    expect(after.electromagnetic.totalQuanta.value).toBe(computeScenario(h.document()).electromagnetic.totalQuanta.value);
  });

  it("runs sweeps on a worker of its own, and dispose stops every worker and the pace clock", async () => {
    const workers = inProcessWorkers();
    editor = createEditor({ document: defaultScenarioDocument(), version: 1, readOnly: true, spawnWorker: workers.spawn });
    await settled(editor);
    const swept = await new Promise<number>((resolve, reject) =>
      editor!.jobs.run(
        { kind: "sweep", document: defaultScenarioDocument(), sweep: { parameter: "recombination-time", fromValue: 1e-3, toValue: 1e-1, points: 5 } },
        { sweep: (result) => resolve(result.points.length), failed: (issues) => reject(new Error(issues[0]?.message)) },
      ),
    );
    expect(swept).toBe(5);
    expect(workers.ports).toHaveLength(2);
    editor.dispose();
    editor = null;
    expect(workers.ports.every((p) => p.terminated)).toBe(true);
  });
});
