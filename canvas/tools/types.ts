/** Events the Lab view sends to its tool, in stage pixels, and the handlers each tool state may define. */
import type { EditorState } from "../store/state";
import type { LabKeyEvent, LabPointerEvent, LabToolState } from "./lab-tool";

export type { LabKeyEvent, LabPointerEvent, LabToolState };


export interface ToolContext {
  /** The store's state now (fresh on every call). */
  get(): EditorState;
  transition(next: LabToolState): void;
}

export interface ToolStateHandlers<S extends LabToolState> {
  onPointerDown?(ctx: ToolContext, state: S, event: LabPointerEvent): void;
  onPointerMove?(ctx: ToolContext, state: S, event: LabPointerEvent): void;
  onPointerUp?(ctx: ToolContext, state: S, event: LabPointerEvent): void;
  onCancel?(ctx: ToolContext, state: S): void;
  onKeyDown?(ctx: ToolContext, state: S, event: LabKeyEvent): boolean;
}
