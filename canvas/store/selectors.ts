/**
 * Derived values for components, memoised on the references they come from so `useStore(store, selector)` sees a
 * stable value until something it depends on changes. The Lab view's own are in lab-view-selectors.ts.
 */
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { memoizeLast } from "../kernels/memoize";
import { sameData } from "./patches";
import type { EditorData } from "./state";

const dirtyCheck = memoizeLast((document: ScenarioDocument, saved: ScenarioDocument) => !sameData(document, saved));

/** True when the document differs from what the server has. */
export function hasUnsavedChanges(state: EditorData): boolean {
  return dirtyCheck(state.document, state.save.savedDocument);
}

/** True while the budget shown belongs to an older revision of the document than the one on screen. */
export function budgetIsStale(state: EditorData): boolean {
  return state.budget.resultRevision !== null && state.budget.resultRevision !== state.revision;
}

export const canUndo = (state: EditorData) => !state.readOnly && state.transaction === null && state.history.past.length > 0;
export const canRedo = (state: EditorData) => !state.readOnly && state.transaction === null && state.history.future.length > 0;
