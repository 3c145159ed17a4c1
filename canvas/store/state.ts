/** The editor's state and the names of its actions. */
import type { DiagramPoint } from "@/physics/backgrounds";
import type { ScenarioDocument, SchemaIssue } from "@/physics/scenario/schema";
import type { ComputeIssue, ComputeOutcome, RecombinationOptimum, ScenarioResult, SweepParameter, SweepResult } from "../compute-client";
import type { DragStart, ProtocolPlan } from "../kernels/lab-view/drag-plan";
import type { HandleId } from "../kernels/lab-view/handles";
import type { LabKeyEvent, LabPointerEvent, LabToolState } from "../tools/lab-tool";
import type { History } from "./history";
import type { LabViewSelectors } from "./lab-view-selectors";

export type { LabToolState };
import type { SceneOutcome } from "../kernels/diagram/scene";


export interface SaveState {
  /** The server version the document was last loaded at or saved as. */
  baseVersion: number;
  /** The document as the server has it at baseVersion. */
  savedDocument: ScenarioDocument;
  status: "idle" | "saving" | "failed" | "conflict";
  /** Why the last save failed, in words. */
  message: string | null;
  /** On a conflict: the version someone else saved. */
  conflictVersion: number | null;
}

export interface BudgetState {
  status: "idle" | "computing" | "ready" | "failed";
  /** The latest result received (possibly for an older revision: see resultRevision). */
  result: ScenarioResult | null;
  /** The document revision `budget` (or `issues`) belongs to. */
  resultRevision: number | null;
  issues: ComputeIssue[];
}

export interface SweepState {
  parameter: SweepParameter;
  status: "idle" | "running" | "ready" | "failed";
  progress: { done: number; total: number } | null;
  result: SweepResult | null;
  /** The best recombination time for the current total duration, when asked for. */
  optimum: RecombinationOptimum | null;
  /** The document revision the sweep (or optimum) was started for: a later edit makes it stale. */
  requestRevision: number | null;
  issues: ComputeIssue[];
}

export interface EditorData {
  document: ScenarioDocument;
  /** Goes up by one with every change of the document (edits, drag frames, undo, redo, reload). */
  revision: number;
  readOnly: boolean;
  history: History;
  /** An edit under way (a drag): the document as it was at pointer-down. */
  transaction: { label: string; mark: ScenarioDocument } | null;
  selection: HandleId | null;
  hover: HandleId | null;
  labTool: LabToolState;
  labViewSize: { width: number; height: number };
  diagramPointer: DiagramPoint | null;
  /** The last edit the editor refused, with why; cleared by the next accepted edit. */
  refused: { label: string; issues: SchemaIssue[] } | null;
  save: SaveState;
  budget: BudgetState;
  sweep: SweepState;
}

export type EditResult = { ok: true } | { ok: false; issues: SchemaIssue[] };

export interface EditorActions {
  /** Apply an edit as one undo step, after checking it; a refused edit leaves the document as it was. */
  edit(label: string, recipe: (document: ScenarioDocument) => ScenarioDocument): EditResult;
  /** Start an edit that will take many steps (a drag): marks the document for commit or cancel. */
  begin(label: string): void;
  /** One frame of a drag: the step of the edit under way (computed from the document at the mark) and the Lab
   *  tool's new state, set together. */
  dragTo(recipe: (mark: ScenarioDocument) => ScenarioDocument, labTool: LabToolState): void;
  /** Finish the edit under way as one undo step. */
  commit(): void;
  /** Abandon the edit under way: the document returns to the mark. */
  cancel(): void;
  undo(): void;
  redo(): void;
  select(handle: HandleId | null): void;
  setHover(handle: HandleId | null): void;
  setLabViewSize(size: { width: number; height: number }): void;
  setDiagramPointer(point: DiagramPoint | null): void;
  labPointerDown(event: LabPointerEvent): void;
  labPointerMove(event: LabPointerEvent): void;
  labPointerUp(event: LabPointerEvent): void;
  /** Escape, or the pointer lost: cancel a drag. */
  labCancel(): void;
  /** Returns true when the key was used (so the caller can prevent its default). */
  labKeyDown(event: LabKeyEvent): boolean;
  /** Replace the document with the server's (reload after a conflict): a new base, a fresh history. */
  loadDocument(document: ScenarioDocument, version: number): void;
  saveStarted(): void;
  saveSucceeded(version: number, saved: ScenarioDocument): void;
  saveFailed(message: string): void;
  saveConflicted(currentVersion: number): void;
  budgetStarted(revision: number): void;
  budgetFinished(revision: number, outcome: ComputeOutcome): void;
  setSweepParameter(parameter: SweepParameter): void;
  sweepStarted(revision: number): void;
  sweepProgress(done: number, total: number): void;
  sweepFinished(result: SweepResult): void;
  optimumFound(optimum: RecombinationOptimum): void;
  sweepFailed(issues: ComputeIssue[]): void;
}

/** Memoised derived values of this store (one set per store, so editors never share a cache). */
export interface EditorDerived {
  labView: LabViewSelectors;
  /** The Diagram's scene for a document (the same document gives the same object; the backdrop survives drags). */
  diagramScene(document: ScenarioDocument): SceneOutcome;
}

export type EditorState = EditorData & EditorActions & EditorDerived;
