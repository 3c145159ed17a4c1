"use client";

/**
 * Autosave: a moment after the last change (never mid-drag), PUT the document with the version it was edited
 * from. A 409 stops saving and asks the person what to do (see ConflictDialog); nothing is ever overwritten
 * silently. Leaving the page with unsaved changes asks first.
 */
import { useCallback, useEffect, useRef } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { ApiError, messageOf } from "@/components/api/client";
import { scenarioKeys } from "@/components/api/scenarios";
import type { EditorStore } from "@/canvas/store/createEditorStore";
import { hasUnsavedChanges } from "@/canvas/store/selectors";
import { putScenarioDocument } from "./save-scenario";

export const AUTOSAVE_DELAY_MS = 800;

export function useAutosave(store: EditorStore, projectId: string, scenarioId: string): { saveNow(): void } {
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const queryClient = useQueryClient();

  const attempt = useCallback(async () => {
    const state = store.getState();
    if (state.readOnly || state.transaction || state.save.status === "saving" || state.save.status === "conflict" || !hasUnsavedChanges(state)) return;
    const document = state.document;
    state.saveStarted();
    try {
      const saved = await putScenarioDocument(projectId, scenarioId, state.save.baseVersion, document);
      store.getState().saveSucceeded(saved.version, document);
      queryClient.setQueryData(scenarioKeys.one(projectId, scenarioId), saved);
      void queryClient.invalidateQueries({ queryKey: scenarioKeys.revisions(projectId, scenarioId) });
    } catch (error) {
      if (error instanceof ApiError && error.status === 409) {
        store.getState().saveConflicted(Number(error.details.currentVersion ?? state.save.baseVersion + 1));
        return;
      }
      store.getState().saveFailed(messageOf(error));
      return;
    }
    // Edits made while the request was out are saved next, from the new version.
    if (hasUnsavedChanges(store.getState())) timer.current = setTimeout(attempt, AUTOSAVE_DELAY_MS);
  }, [store, projectId, scenarioId, queryClient]);

  useEffect(() => {
    const schedule = () => {
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(attempt, AUTOSAVE_DELAY_MS);
    };
    const unsubscribe = store.subscribe((s, prev) => {
      if (s.document !== prev.document || s.transaction !== prev.transaction) schedule();
    });
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      if (hasUnsavedChanges(store.getState())) event.preventDefault();
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    return () => {
      unsubscribe();
      window.removeEventListener("beforeunload", onBeforeUnload);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [store, attempt]);

  return { saveNow: () => void attempt() };
}
