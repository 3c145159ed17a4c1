"use client";

import { useCallback } from "react";
import { useEditorStore } from "@/canvas/EditorProvider";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import type { CommitResult } from "./QuantityField";

/** Dispatch an edit to the store and answer what a field shows: nothing, or the first reason it was refused. */
export function useEdit() {
  const store = useEditorStore();
  return useCallback(
    (label: string, recipe: (document: ScenarioDocument) => ScenarioDocument): CommitResult => {
      const result = store.getState().edit(label, recipe);
      return result.ok ? { ok: true } : { ok: false, message: result.issues[0]?.message ?? "this value cannot be used" };
    },
    [store],
  );
}
