/**
 * Drag-handle tool, dragging: every move asks the drag kernel for a plan from the document at pointer-down and
 * shows it with the tool's new state in one store update (subscribers never see one without the other); release commits the whole drag as one undo step; Escape (or a lost pointer) rolls back to the mark.
 * Tab is held back while dragging, so focus stays in the Offsets panel.
 */
import { withProtocolPlan } from "../../kernels/document-edits";
import { planHandleDrag } from "../../kernels/offsets/drag-plan";
import type { OffsetsToolState } from "../../store/state";
import type { OffsetsPointerEvent, ToolContext, ToolStateHandlers } from "../types";

type Dragging = Extract<OffsetsToolState, { name: "dragging" }>;

function follow(ctx: ToolContext, state: Dragging, event: OffsetsPointerEvent): void {
  const plan = planHandleDrag(state.start, event, { snap: event.shiftKey });
  ctx.get().dragTo((mark) => withProtocolPlan(mark, plan), { ...state, plan });
}

function stop(ctx: ToolContext, outcome: "commit" | "cancel"): void {
  const store = ctx.get();
  if (outcome === "commit") store.commit();
  else store.cancel();
  ctx.transition({ name: "idle" });
}

export const Dragging: ToolStateHandlers<Dragging> = {
  onPointerMove: follow,

  onPointerUp(ctx, state, event) {
    follow(ctx, state, event);
    stop(ctx, "commit");
  },

  onCancel(ctx) {
    stop(ctx, "cancel");
  },

  onKeyDown(ctx, _state, event) {
    // Tab would take focus away mid-drag: keep it until the drag ends.
    if (event.key === "Tab") return true;
    if (event.key !== "Escape") return false;
    stop(ctx, "cancel");
    return true;
  },
};
