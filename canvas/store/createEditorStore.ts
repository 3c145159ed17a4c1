/**
 * The editor model: a vanilla zustand store per editor instance (created by the provider, never at module level).
 * Every document change goes through here: one-shot edits are checked and recorded as one undo entry; a drag
 * marks the document at pointer-down, previews each frame without touching the history, and on release records
 * the difference from the mark as one entry of reversible patches.
 */
import { createStore, type StoreApi } from "zustand/vanilla";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { documentIssues } from "../kernels/document-edits";
import { dragHandleTool } from "../tools/drag-handle";
import type { ToolContext } from "../tools/types";
import { emptyHistory, recordEntry, redoStep, undoStep } from "./history";
import { diffValues } from "./patches";
import { createLabViewSelectors } from "./lab-view-selectors";
import { createSceneBuilder } from "../kernels/diagram/scene";
import { memoizeLast } from "../kernels/memoize";
import type { EditorData, EditorState } from "./state";

export interface EditorStoreOptions {
  document: ScenarioDocument;
  /** The scenario's version on the server. */
  version: number;
  readOnly: boolean;
}

export type EditorStore = StoreApi<EditorState>;

function initialData({ document, version, readOnly }: EditorStoreOptions): EditorData {
  return {
    document,
    revision: 0,
    readOnly,
    history: emptyHistory(),
    transaction: null,
    selection: null,
    hover: null,
    labTool: { name: "idle" },
    labViewSize: { width: 640, height: 300 },
    diagramPointer: null,
    refused: null,
    save: { baseVersion: version, savedDocument: document, status: "idle", message: null, conflictVersion: null },
    budget: { status: "idle", result: null, resultRevision: null, issues: [] },
    sweep: { parameter: "recombination-time", status: "idle", progress: null, result: null, optimum: null, requestRevision: null, issues: [] },
  };
}

export function createEditorStore(options: EditorStoreOptions): EditorStore {
  return createStore<EditorState>()((set, get) => {
    const tool: ToolContext = { get, transition: (labTool) => set({ labTool }) };
    const changeDocument = (document: ScenarioDocument, extra: Partial<EditorData> = {}) =>
      set((s) => (document === s.document ? extra : { ...extra, document, revision: s.revision + 1 }));

    return {
      ...initialData(options),
      labView: createLabViewSelectors(),
      diagramScene: memoizeLast(createSceneBuilder()),

      edit(label, recipe) {
        const state = get();
        if (state.readOnly || state.transaction) return { ok: false, issues: [{ path: "", message: "the scenario cannot be edited now" }] };
        const next = recipe(state.document);
        const issues = documentIssues(next);
        if (issues.length > 0) {
          set({ refused: { label, issues } });
          return { ok: false, issues };
        }
        changeDocument(next, { history: recordEntry(state.history, { label, patches: diffValues(state.document, next) }), refused: null });
        return { ok: true };
      },

      begin(label) {
        const state = get();
        if (state.readOnly || state.transaction) return;
        set({ transaction: { label, mark: state.document } });
      },

      dragTo(recipe, labTool) {
        const { transaction } = get();
        if (!transaction) return set({ labTool });
        changeDocument(recipe(transaction.mark), { labTool });
      },

      commit() {
        const { transaction, document, history } = get();
        if (!transaction) return;
        const patches = diffValues(transaction.mark, document);
        set({ transaction: null, history: recordEntry(history, { label: transaction.label, patches }), refused: null });
      },

      cancel() {
        const { transaction } = get();
        if (!transaction) return;
        changeDocument(transaction.mark, { transaction: null });
      },

      undo() {
        const state = get();
        if (state.readOnly || state.transaction) return;
        const step = undoStep(state.history, state.document);
        if (step) changeDocument(step.document, { history: step.history, refused: null });
      },

      redo() {
        const state = get();
        if (state.readOnly || state.transaction) return;
        const step = redoStep(state.history, state.document);
        if (step) changeDocument(step.document, { history: step.history, refused: null });
      },

      select: (selection) => set({ selection }),
      setHover: (hover) => set({ hover }),
      setLabViewSize: (labViewSize) => {
        const current = get().labViewSize;
        if (current.width !== labViewSize.width || current.height !== labViewSize.height) set({ labViewSize });
      },
      setDiagramPointer: (diagramPointer) => set({ diagramPointer }),

      labPointerDown: (event) => dragHandleTool.pointerDown(tool, event),
      labPointerMove: (event) => dragHandleTool.pointerMove(tool, event),
      labPointerUp: (event) => dragHandleTool.pointerUp(tool, event),
      labCancel: () => dragHandleTool.cancel(tool),
      labKeyDown: (event) => dragHandleTool.keyDown(tool, event),

      loadDocument(document, version) {
        const { readOnly, labViewSize, sweep, revision } = get();
        const fresh = initialData({ document, version, readOnly });
        set({ ...fresh, labViewSize, sweep: { ...fresh.sweep, parameter: sweep.parameter }, revision: revision + 1 });
      },

      saveStarted: () => set((s) => ({ save: { ...s.save, status: "saving", message: null } })),
      saveSucceeded: (version, saved) =>
        set((s) => ({ save: { ...s.save, baseVersion: version, savedDocument: saved, status: "idle", message: null, conflictVersion: null } })),
      saveFailed: (message) => set((s) => ({ save: { ...s.save, status: "failed", message } })),
      saveConflicted: (currentVersion) => set((s) => ({ save: { ...s.save, status: "conflict", conflictVersion: currentVersion, message: null } })),

      // Already computing (a drag sends a request a frame): no change, so nothing subscribed to the budget re-renders.
      budgetStarted: () => set((s) => (s.budget.status === "computing" ? s : { budget: { ...s.budget, status: "computing" } })),
      budgetFinished(revision, outcome) {
        set((s) => {
          const status = revision !== s.revision ? "computing" : outcome.ok ? "ready" : "failed";
          if (outcome.ok) return { budget: { status, result: outcome.result, resultRevision: revision, issues: [] } };
          return { budget: { status, result: s.budget.result, resultRevision: revision, issues: outcome.issues } };
        });
      },

      setSweepParameter: (parameter) =>
        set((s) => ({ sweep: { ...s.sweep, parameter, status: "idle", progress: null, result: null, optimum: null, requestRevision: null, issues: [] } })),
      sweepStarted: (revision) => set((s) => ({ sweep: { ...s.sweep, status: "running", progress: null, requestRevision: revision, issues: [] } })),
      sweepProgress: (done, total) => set((s) => ({ sweep: { ...s.sweep, progress: { done, total } } })),
      sweepFinished: (result) => set((s) => ({ sweep: { ...s.sweep, status: "ready", result, progress: null } })),
      optimumFound: (optimum) => set((s) => ({ sweep: { ...s.sweep, status: "ready", optimum, progress: null } })),
      sweepFailed: (issues) => set((s) => ({ sweep: { ...s.sweep, status: "failed", progress: null, issues } })),
    };
  });
}
