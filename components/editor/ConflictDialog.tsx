"use client";

/**
 * A save met a newer version saved by someone else. Two ways on, both explicit (see useConflictActions): load
 * the newer version, or save my edits as a copy. Never a silent overwrite.
 */
import { useEffect, useId, useRef } from "react";
import { buttonStyles } from "@/components/ui/styles";
import { useEditor } from "@/canvas/EditorProvider";
import { useConflictActions } from "./useConflictActions";

export function ConflictDialog(props: { projectId: string; scenarioId: string; title: string; editPath(scenarioId: string): string }) {
  const conflict = useEditor((s) => (s.save.status === "conflict" ? s.save.conflictVersion : null));
  const { pending, error, loadNewer, saveMineAsCopy } = useConflictActions(props);
  const dialog = useRef<HTMLDialogElement>(null);
  const titleId = useId();

  useEffect(() => {
    const el = dialog.current;
    if (!el) return;
    if (conflict !== null && !el.open) el.showModal();
    if (conflict === null && el.open) el.close();
  }, [conflict]);

  return (
    <dialog
      ref={dialog}
      aria-labelledby={titleId}
      className="m-auto w-[calc(100%-2rem)] max-w-lg rounded border border-rule-strong bg-paper p-6 text-ink shadow-sheet backdrop:bg-ink/30"
      onCancel={(e) => e.preventDefault()}
    >
      <h2 id={titleId} className="font-serif text-xl font-semibold">
        Someone else saved this scenario
      </h2>
      <p className="mt-3 text-sm leading-relaxed text-ink-soft">
        While you were editing, version {conflict ?? "?"} was saved by someone else. Your edits have not been saved. Choose how to go on:
      </p>
      <ul className="mt-3 list-disc space-y-1 pl-5 text-sm text-ink-soft">
        <li>
          <strong className="text-ink">Load the newer version</strong>: open it here; your unsaved edits are dropped.
        </li>
        <li>
          <strong className="text-ink">Save my edits as a copy</strong>: a new scenario with your edits is made in this project and opened; the newer version stays as it is.
        </li>
      </ul>
      {error && (
        <p role="alert" className="mt-3 text-sm text-invalid">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
      <div className="mt-5 flex flex-wrap justify-end gap-3">
        <button type="button" className={buttonStyles.secondary} disabled={pending !== null} onClick={loadNewer}>
          {pending === "theirs" ? "Loading…" : "Load the newer version"}
        </button>
        <button type="button" className={buttonStyles.primary} disabled={pending !== null} onClick={saveMineAsCopy}>
          {pending === "mine" ? "Saving a copy…" : "Save my edits as a copy"}
        </button>
      </div>
    </dialog>
  );
}
