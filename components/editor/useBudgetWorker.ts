"use client";

/**
 * Keeps the Budget current: every new revision of the document goes to the compute worker (newest wins). Each
 * request's round trip (sent to the worker → answer back on the main thread) is left as a performance measure named
 * BUDGET_ROUNDTRIP_MEASURE, so a browser bench or the devtools timeline can read it.
 */
import { useEffect } from "react";
import { createBudgetScheduler } from "@/canvas/compute-client";
import type { EditorStore } from "@/canvas/store/createEditorStore";
import { spawnComputeWorker } from "@/canvas/worker/spawn";

export const BUDGET_ROUNDTRIP_MEASURE = "branchline:budget-roundtrip";

const requestMark = (revision: number) => `branchline:budget-request:${revision}`;

export function useBudgetWorker(store: EditorStore): void {
  useEffect(() => {
    const scheduler = createBudgetScheduler(spawnComputeWorker(), {
      started: (revision) => {
        performance.mark(requestMark(revision));
        store.getState().budgetStarted(revision);
      },
      finished: (revision, outcome) => {
        performance.measure(BUDGET_ROUNDTRIP_MEASURE, requestMark(revision));
        performance.clearMarks(requestMark(revision));
        store.getState().budgetFinished(revision, outcome);
      },
    });
    const { document, revision } = store.getState();
    scheduler.request(document, revision);
    const unsubscribe = store.subscribe((s, prev) => {
      if (s.revision !== prev.revision) scheduler.request(s.document, s.revision);
    });
    return () => {
      unsubscribe();
      scheduler.dispose();
    };
  }, [store]);
}
