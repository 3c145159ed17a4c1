/**
 * Drag-handle tool, idle: hovering shows which handle is under the pointer; pressing on one starts a drag. From the
 * keyboard, Tab and Shift+Tab walk the handles in protocol order (past either end the selection is let go, and focus
 * leaves the Offsets panel), arrows nudge the selected one, Escape lets it go.
 */
import { withProtocolPlan } from "../../kernels/document-edits";
import { NUDGE_LARGE_PX, NUDGE_PX, planHandleDrag } from "../../kernels/offsets/drag-plan";
import { cycleHandle, HANDLE_WORDS, type HandleId, type HandlePlacement } from "../../kernels/offsets/handles";
import { hitTestOffsets } from "../../kernels/offsets/hit-test";
import { segmentTimes, segmentsProtocolOf } from "../../kernels/timeline";
import type { EditorState, OffsetsToolState } from "../../store/state";
import type { OffsetsPointerEvent, ToolContext, ToolStateHandlers } from "../types";

/** How far from a handle, in pixels, a press still takes it. */
export const HIT_TOLERANCE_PX = 8;

function handleUnder(state: EditorState, event: OffsetsPointerEvent): HandlePlacement | null {
  const selectors = state.offsets;
  const viewport = selectors.viewport(state);
  const protocol = segmentsProtocolOf(state.document);
  if (!viewport || !protocol) return null;
  const hit = hitTestOffsets(selectors.handles(state), viewport, segmentTimes(protocol), event, HIT_TOLERANCE_PX);
  return hit.kind === "handle" ? (selectors.handles(state).find((h) => h.id === hit.handle) ?? null) : null;
}

const ARROWS: Record<string, { dx: number; dy: number }> = {
  ArrowLeft: { dx: -1, dy: 0 },
  ArrowRight: { dx: 1, dy: 0 },
  ArrowUp: { dx: 0, dy: -1 },
  ArrowDown: { dx: 0, dy: 1 },
};

/** An arrow key moves the selected handle as a pointer moved by a pixel (ten with Shift) would: one undo step each. */
function nudge(state: EditorState, handle: HandleId, direction: { dx: number; dy: number }, large: boolean): boolean {
  const selectors = state.offsets;
  const viewport = selectors.viewport(state);
  const protocol = segmentsProtocolOf(state.document);
  const placement = selectors.handles(state).find((h) => h.id === handle);
  if (!viewport || !protocol || !placement) return false;
  const step = large ? NUDGE_LARGE_PX : NUDGE_PX;
  const pointer =
    placement.axis === "time" ? { x: placement.x + direction.dx * step, y: 0 } : { x: placement.x, y: placement.y + direction.dy * step };
  if ((placement.axis === "time" && direction.dx === 0) || (placement.axis === "distance" && direction.dy === 0)) return false;
  const plan = planHandleDrag({ handle, protocol, separation: state.document.separation, viewport }, pointer, { snap: false });
  state.edit(`Nudge ${HANDLE_WORDS[handle].toLowerCase()}`, (document) => withProtocolPlan(document, plan));
  return true;
}

type Idle = Extract<OffsetsToolState, { name: "idle" }>;

export const Idle: ToolStateHandlers<Idle> = {
  onPointerMove(ctx: ToolContext, _state, event) {
    const state = ctx.get();
    const handle = handleUnder(state, event)?.id ?? null;
    if (handle !== state.hover) state.setHover(handle);
  },

  onPointerDown(ctx: ToolContext, _state, event) {
    const state = ctx.get();
    const placement = handleUnder(state, event);
    state.select(placement?.id ?? null);
    const protocol = segmentsProtocolOf(state.document);
    const viewport = state.offsets.viewport(state);
    if (!placement || state.readOnly || !protocol || !viewport) return;
    const handle = placement.id;
    const grab = { pointer: { x: event.x, y: event.y }, handle: { x: placement.x, y: placement.axis === "distance" ? placement.y : event.y } };
    state.begin(`Drag ${HANDLE_WORDS[handle].toLowerCase()}`);
    ctx.transition({ name: "dragging", start: { handle, protocol, separation: state.document.separation, viewport, grab }, plan: null });
  },

  onKeyDown(ctx: ToolContext, _state, event) {
    const state = ctx.get();
    if (event.key === "Escape" && state.selection) {
      state.select(null);
      return true;
    }
    if (event.key === "Tab") {
      const onScreen = state.offsets.handles(state).map((h) => h.id);
      const next = cycleHandle(state.selection, onScreen, event.shiftKey);
      state.select(next);
      return next !== null;
    }
    const direction = ARROWS[event.key];
    if (!direction || !state.selection || state.readOnly) return false;
    return nudge(state, state.selection, direction, event.shiftKey);
  },
};
