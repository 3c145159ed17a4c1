/**
 * One editor per open scenario: the store (document, history, tools, what the panels show), the live Budget's
 * scheduler on a compute worker, the sweep runner on a worker of its own, and the pace clock the panels follow a
 * drag by. It owns their lifetimes: `dispose()` stops the workers and the clock. React components only subscribe
 * to the store and dispatch to it (canvas/EditorProvider.tsx creates and disposes the editor); tests drive it
 * headlessly with in-process workers.
 */
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { createBudgetScheduler, createJobRunner, type JobRunner, type WorkerPort } from "./compute-client";
import { createEditorStore, type EditorStore } from "./store/createEditorStore";
import { createPaceClock, type PaceClock } from "./store/pace-clock";

/** How often the panels beside the canvases follow a drag (see pace-clock.ts): ten times a second. */
export const DRAG_PACE_MS = 100;

/**
 * How often the live Budget's worker is asked during a drag: twenty times a second, twice the panels' pace, so each
 * pace tick shows a Budget at most one request behind the handle. Asking on every frame cost the page a structured
 * clone of the document and a store update with its answer per frame, for numbers shown ten times a second.
 */
export const BUDGET_DRAG_PACE_MS = 50;

/** Each live Budget request's round trip is left as a performance measure of this name (read by the browser bench). */
export const BUDGET_ROUNDTRIP_MEASURE = "branchline:budget-roundtrip";

export interface EditorOptions {
  document: ScenarioDocument;
  /** The scenario's version on the server. */
  version: number;
  readOnly: boolean;
  /** Starts a compute worker: a real Worker in the browser, an in-process port in tests. */
  spawnWorker(): WorkerPort;
}

export interface Editor {
  readonly store: EditorStore;
  readonly paceClock: PaceClock;
  /** Runs sweeps and searches for the best recombination time, one at a time, off the live Budget's worker. */
  readonly jobs: JobRunner;
  dispose(): void;
}

const requestMark = (revision: number) => `branchline:budget-request:${revision}`;

export function createEditor({ document, version, readOnly, spawnWorker }: EditorOptions): Editor {
  const store = createEditorStore({ document, version, readOnly });
  const paceClock = createPaceClock(store, DRAG_PACE_MS);
  const jobs = createJobRunner(spawnWorker);

  // The live Budget: every new revision of the document goes to the worker, newest wins; during a drag, the newest
  // at most every BUDGET_DRAG_PACE_MS, and the drag's last one as soon as the handle is let go.
  const budget = createBudgetScheduler(spawnWorker(), {
    started(revision) {
      performance.mark(requestMark(revision));
      store.getState().budgetStarted(revision);
    },
    finished(revision, outcome) {
      performance.measure(BUDGET_ROUNDTRIP_MEASURE, requestMark(revision));
      performance.clearMarks(requestMark(revision));
      store.getState().budgetFinished(revision, outcome);
    },
  });
  let requested: number | null = null;
  const follow = () => {
    const { document, revision } = store.getState();
    if (revision === requested) return;
    requested = revision;
    budget.request(document, revision);
  };
  follow();
  const budgetPace = createPaceClock(store, BUDGET_DRAG_PACE_MS);
  const stopTicks = budgetPace.subscribe(follow);
  const stopFollowing = store.subscribe((s) => {
    if (s.offsetsTool.name !== "dragging") follow();
  });

  return {
    store,
    paceClock,
    jobs,
    dispose() {
      stopFollowing();
      stopTicks();
      budgetPace.dispose();
      budget.dispose();
      jobs.dispose();
      paceClock.dispose();
    },
  };
}
