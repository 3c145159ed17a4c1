/** The drag-handle tool: its states by name, and the dispatch of the Offsets panel's events to the current one. */
import type { OffsetsToolState } from "../../store/state";
import type { OffsetsKeyEvent, OffsetsPointerEvent, ToolContext, ToolStateHandlers } from "../types";
import { Dragging } from "./Dragging";
import { Idle } from "./Idle";

const STATES: { [N in OffsetsToolState["name"]]: ToolStateHandlers<Extract<OffsetsToolState, { name: N }>> } = {
  idle: Idle,
  dragging: Dragging,
};

function handlersOf(state: OffsetsToolState): ToolStateHandlers<OffsetsToolState> {
  return STATES[state.name] as ToolStateHandlers<OffsetsToolState>;
}

export const dragHandleTool = {
  pointerDown(ctx: ToolContext, event: OffsetsPointerEvent) {
    const state = ctx.get().offsetsTool;
    handlersOf(state).onPointerDown?.(ctx, state, event);
  },
  pointerMove(ctx: ToolContext, event: OffsetsPointerEvent) {
    const state = ctx.get().offsetsTool;
    handlersOf(state).onPointerMove?.(ctx, state, event);
  },
  pointerUp(ctx: ToolContext, event: OffsetsPointerEvent) {
    const state = ctx.get().offsetsTool;
    handlersOf(state).onPointerUp?.(ctx, state, event);
  },
  cancel(ctx: ToolContext) {
    const state = ctx.get().offsetsTool;
    handlersOf(state).onCancel?.(ctx, state);
  },
  keyDown(ctx: ToolContext, event: OffsetsKeyEvent): boolean {
    const state = ctx.get().offsetsTool;
    return handlersOf(state).onKeyDown?.(ctx, state, event) ?? false;
  },
};
