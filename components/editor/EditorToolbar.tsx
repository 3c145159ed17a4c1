"use client";

/** Title, save state, undo and redo, the figure switches (theme, grid), and Export (for every role). */
import { useEditor, useEditorStore } from "@/canvas/EditorProvider";
import { ExportMenu } from "@/components/export/ExportMenu";
import { canRedo, canUndo, hasUnsavedChanges } from "@/canvas/store/selectors";
import { buttonStyles } from "@/components/ui/styles";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { useEdit } from "./useEdit";

function SaveState({ onRetry }: { onRetry(): void }) {
  const save = useEditor((s) => s.save);
  const unsaved = useEditor(hasUnsavedChanges);
  const readOnly = useEditor((s) => s.readOnly);
  if (readOnly) return null;
  let text: string;
  if (save.status === "saving") text = "Saving…";
  else if (save.status === "conflict") text = "⚠ Not saved: someone else saved a newer version";
  else if (save.status === "failed") text = `⚠ Not saved: ${save.message}`;
  else text = unsaved ? "Not saved yet" : `Saved · v${save.baseVersion}`;
  return (
    <span role="status" aria-live="polite" data-testid="save-state" data-saved={!unsaved && save.status === "idle"} className="flex items-center gap-2 text-sm text-ink-soft">
      {text}
      {save.status === "failed" && (
        <button type="button" className={buttonStyles.row} onClick={onRetry}>
          Retry
        </button>
      )}
    </span>
  );
}

export function EditorToolbar({ title, onRetrySave }: { title: string; onRetrySave(): void }) {
  const store = useEditorStore();
  const edit = useEdit();
  const readOnly = useEditor((s) => s.readOnly);
  const undoable = useEditor(canUndo);
  const redoable = useEditor(canRedo);
  const undoLabel = useEditor((s) => s.history.past[s.history.past.length - 1]?.label ?? null);
  const redoLabel = useEditor((s) => s.history.future[0]?.label ?? null);
  const display = useEditor((s) => s.document.display);
  const setDisplay = (label: string, change: Partial<ScenarioDocument["display"]>) => edit(label, (d) => ({ ...d, display: { ...d.display, ...change } }));
  const small = "rounded border border-rule-strong bg-paper px-3 py-1.5 text-sm hover:border-ink disabled:cursor-not-allowed disabled:opacity-40";

  return (
    <div className="flex flex-wrap items-center justify-between gap-3 border-b border-rule pb-3">
      <div className="flex min-w-0 items-baseline gap-3">
        <h1 className="truncate font-serif text-2xl font-semibold">{title}</h1>
        {readOnly && (
          <span className="rounded border border-rule-strong px-2 py-0.5 text-xs text-ink-soft" data-testid="read-only">
            Read-only: your role in this project can view, not edit
          </span>
        )}
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <SaveState onRetry={onRetrySave} />
        {!readOnly && (
          <>
            <button type="button" className={small} disabled={!undoable} onClick={() => store.getState().undo()} title={undoLabel ? `Undo: ${undoLabel} (Ctrl/⌘+Z)` : "Nothing to undo"} aria-label={undoLabel ? `Undo ${undoLabel}` : "Undo"}>
              ↶ Undo
            </button>
            <button type="button" className={small} disabled={!redoable} onClick={() => store.getState().redo()} title={redoLabel ? `Redo: ${redoLabel} (Shift+Ctrl/⌘+Z)` : "Nothing to redo"} aria-label={redoLabel ? `Redo ${redoLabel}` : "Redo"}>
              ↷ Redo
            </button>
            <label className="ml-2 flex items-center gap-1.5 text-sm">
              <input type="checkbox" checked={display.showGrid} onChange={(e) => setDisplay(e.target.checked ? "Show grid" : "Hide grid", { showGrid: e.target.checked })} />
              Grid
            </label>
            <label className="flex items-center gap-1.5 text-sm">
              <input type="checkbox" checked={display.theme === "dark"} onChange={(e) => setDisplay("Change figure theme", { theme: e.target.checked ? "dark" : "light" })} />
              Dark figures
            </label>
          </>
        )}
        <ExportMenu title={title} />
      </div>
    </div>
  );
}
