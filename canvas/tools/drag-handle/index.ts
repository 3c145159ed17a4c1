/** The drag-handle tool: its states by name, and the dispatch of the Offsets panel's events to the current one. */
import type { LabToolState } from "../../store/state";
import type { LabKeyEvent, LabPointerEvent, ToolContext, ToolStateHandlers } from "../types";
import { Dragging } from "./Dragging";
import { Idle } from "./Idle";

const STATES: { [N in LabToolState["name"]]: ToolStateHandlers<Extract<LabToolState, { name: N }>> } = {
  idle: Idle,
  dragging: Dragging,
};

function handlersOf(state: LabToolState): ToolStateHandlers<LabToolState> {
  return STATES[state.name] as ToolStateHandlers<LabToolState>;
}

export const dragHandleTool = {
  pointerDown(ctx: ToolContext, event: LabPointerEvent) {
    const state = ctx.get().offsetsTool;
    handlersOf(state).onPointerDown?.(ctx, state, event);
  },
  pointerMove(ctx: ToolContext, event: LabPointerEvent) {
    const state = ctx.get().offsetsTool;
    handlersOf(state).onPointerMove?.(ctx, state, event);
  },
  pointerUp(ctx: ToolContext, event: LabPointerEvent) {
    const state = ctx.get().offsetsTool;
    handlersOf(state).onPointerUp?.(ctx, state, event);
  },
  cancel(ctx: ToolContext) {
    const state = ctx.get().offsetsTool;
    handlersOf(state).onCancel?.(ctx, state);
  },
  keyDown(ctx: ToolContext, event: LabKeyEvent): boolean {
    const state = ctx.get().offsetsTool;
    return handlersOf(state).onKeyDown?.(ctx, state, event) ?? false;
  },
};
