"use client";

/**
 * The two ways on when someone else saved a newer version of the scenario: load theirs here (my unsaved edits
 * are dropped), or save my edits as a new scenario and open it (theirs stays as it is). Never a silent overwrite.
 * The conflict dialog and the newer-version banner share them.
 */
import { useRouter } from "next/navigation";
import { useState } from "react";
import { messageOf } from "@/components/api/client";
import { useEditorStore } from "@/canvas/EditorProvider";
import { getScenario, keepMineAsNewScenario } from "./save-scenario";

export interface ConflictActions {
  pending: "theirs" | "mine" | null;
  error: string | null;
  loadNewer(): Promise<void>;
  saveMineAsCopy(): Promise<void>;
}

export function useConflictActions({ projectId, scenarioId, title, editPath }: { projectId: string; scenarioId: string; title: string; editPath(scenarioId: string): string }): ConflictActions {
  const store = useEditorStore();
  const router = useRouter();
  const [pending, setPending] = useState<ConflictActions["pending"]>(null);
  const [error, setError] = useState<string | null>(null);

  const loadNewer = async () => {
    setPending("theirs");
    setError(null);
    try {
      const theirs = await getScenario(projectId, scenarioId);
      if (!theirs.document) throw new Error("the newer version of the scenario cannot be read");
      store.getState().loadDocument(theirs.document, theirs.version);
    } catch (e) {
      setError(e instanceof Error && !("status" in e) ? e.message : messageOf(e));
    } finally {
      setPending(null);
    }
  };

  const saveMineAsCopy = async () => {
    setPending("mine");
    setError(null);
    try {
      const copy = await keepMineAsNewScenario(projectId, scenarioId, `${title} (my edits)`.slice(0, 200), store.getState().document);
      router.push(editPath(copy.id));
    } catch (e) {
      setError(messageOf(e));
      setPending(null);
    }
  };

  return { pending, error, loadNewer, saveMineAsCopy };
}
