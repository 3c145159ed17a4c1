/** The undo history: entries of reversible patches, newest last, and the entries undone since (for redo). */
import { applyPatches, type Patch } from "./patches";

export interface HistoryEntry {
  /** What the edit did, in words ("Drag end of hold", "Set hold duration"). */
  label: string;
  patches: Patch[];
}

export interface History {
  past: HistoryEntry[];
  future: HistoryEntry[];
}

/** Oldest entries beyond this are forgotten. */
export const HISTORY_LIMIT = 200;

export const emptyHistory = (): History => ({ past: [], future: [] });

export function recordEntry(history: History, entry: HistoryEntry): History {
  if (entry.patches.length === 0) return history;
  return { past: [...history.past, entry].slice(-HISTORY_LIMIT), future: [] };
}

export function undoStep<T>(history: History, document: T): { history: History; document: T; entry: HistoryEntry } | null {
  const entry = history.past[history.past.length - 1];
  if (!entry) return null;
  return {
    entry,
    document: applyPatches(document, entry.patches, "backward"),
    history: { past: history.past.slice(0, -1), future: [entry, ...history.future] },
  };
}

export function redoStep<T>(history: History, document: T): { history: History; document: T; entry: HistoryEntry } | null {
  const entry = history.future[0];
  if (!entry) return null;
  return {
    entry,
    document: applyPatches(document, entry.patches, "forward"),
    history: { past: [...history.past, entry], future: history.future.slice(1) },
  };
}
