"use client";

/**
 * Someone else saved the scenario while it was being edited here. Two ways on, both explicit: take their version
 * (my changes are dropped), or keep mine as a new scenario (theirs stays as it is). Never a silent overwrite.
 */
import { useRouter } from "next/navigation";
import { useEffect, useId, useRef, useState } from "react";
import { messageOf } from "@/components/api/client";
import { buttonStyles } from "@/components/ui/styles";
import { useEditor, useEditorStore } from "@/canvas/EditorProvider";
import { getScenario, keepMineAsNewScenario } from "./save-scenario";

export function ConflictDialog({ projectId, scenarioId, title, editPath }: { projectId: string; scenarioId: string; title: string; editPath(scenarioId: string): string }) {
  const store = useEditorStore();
  const router = useRouter();
  const conflict = useEditor((s) => (s.save.status === "conflict" ? s.save.conflictVersion : null));
  const dialog = useRef<HTMLDialogElement>(null);
  const [pending, setPending] = useState<"theirs" | "mine" | null>(null);
  const [error, setError] = useState<string | null>(null);
  const titleId = useId();

  useEffect(() => {
    const el = dialog.current;
    if (!el) return;
    if (conflict !== null && !el.open) el.showModal();
    if (conflict === null && el.open) el.close();
  }, [conflict]);

  const reloadTheirs = async () => {
    setPending("theirs");
    setError(null);
    try {
      const theirs = await getScenario(projectId, scenarioId);
      if (!theirs.document) throw new Error("their version of the scenario cannot be read");
      store.getState().loadDocument(theirs.document, theirs.version);
    } catch (e) {
      setError(e instanceof Error && !("status" in e) ? e.message : messageOf(e));
    } finally {
      setPending(null);
    }
  };

  const keepMine = async () => {
    setPending("mine");
    setError(null);
    try {
      const copy = await keepMineAsNewScenario(projectId, scenarioId, `${title} (my version)`.slice(0, 200), store.getState().document);
      router.push(editPath(copy.id));
    } catch (e) {
      setError(messageOf(e));
      setPending(null);
    }
  };

  return (
    <dialog
      ref={dialog}
      aria-labelledby={titleId}
      className="w-full max-w-lg rounded border border-rule-strong bg-paper p-6 text-ink shadow-sheet backdrop:bg-ink/30"
      onCancel={(e) => e.preventDefault()}
    >
      <h2 id={titleId} className="font-serif text-xl font-semibold">
        Someone else saved this scenario
      </h2>
      <p className="mt-3 text-sm leading-relaxed text-ink-soft">
        While you were editing, version {conflict ?? "?"} was saved by someone else. Your changes have not been saved. Choose how to go on:
      </p>
      <ul className="mt-3 list-disc space-y-1 pl-5 text-sm text-ink-soft">
        <li>
          <strong className="text-ink">Reload theirs</strong>: open their version here; your unsaved changes are dropped.
        </li>
        <li>
          <strong className="text-ink">Keep mine as a new scenario</strong>: a copy with your changes is created in this project; theirs stays as it is.
        </li>
      </ul>
      {error && (
        <p role="alert" className="mt-3 text-sm text-invalid">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
      <div className="mt-5 flex flex-wrap justify-end gap-3">
        <button type="button" className={buttonStyles.secondary} disabled={pending !== null} onClick={reloadTheirs}>
          {pending === "theirs" ? "Reloading…" : "Reload theirs"}
        </button>
        <button type="button" className={buttonStyles.primary} disabled={pending !== null} onClick={keepMine}>
          {pending === "mine" ? "Saving a copy…" : "Keep mine as a new scenario"}
        </button>
      </div>
    </dialog>
  );
}
