"use client";

/** Keeps the Budget current: every new revision of the document goes to the compute worker (newest wins). */
import { useEffect } from "react";
import { createBudgetScheduler } from "@/canvas/compute-client";
import type { EditorStore } from "@/canvas/store/createEditorStore";
import { spawnComputeWorker } from "@/canvas/worker/spawn";

export function useBudgetWorker(store: EditorStore): void {
  useEffect(() => {
    const scheduler = createBudgetScheduler(spawnComputeWorker(), {
      started: (revision) => store.getState().budgetStarted(revision),
      finished: (revision, outcome) => store.getState().budgetFinished(revision, outcome),
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
