/** Events the Offsets panel sends to its tool, in stage pixels, and the handlers each tool state may define. */
import type { EditorState } from "../store/state";
import type { OffsetsKeyEvent, OffsetsPointerEvent, OffsetsToolState } from "./offsets-tool";

export type { OffsetsKeyEvent, OffsetsPointerEvent, OffsetsToolState };


export interface ToolContext {
  /** The store's state now (fresh on every call). */
  get(): EditorState;
  transition(next: OffsetsToolState): void;
}

export interface ToolStateHandlers<S extends OffsetsToolState> {
  onPointerDown?(ctx: ToolContext, state: S, event: OffsetsPointerEvent): void;
  onPointerMove?(ctx: ToolContext, state: S, event: OffsetsPointerEvent): void;
  onPointerUp?(ctx: ToolContext, state: S, event: OffsetsPointerEvent): void;
  onCancel?(ctx: ToolContext, state: S): void;
  onKeyDown?(ctx: ToolContext, state: S, event: OffsetsKeyEvent): boolean;
}
