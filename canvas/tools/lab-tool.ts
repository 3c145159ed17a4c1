/**
 * The Lab view's tool: the events it receives, in stage pixels, and the states it can be in. Kept apart from the
 * store's state (which holds a LabToolState) and the tools' handlers (which read the store), so neither imports
 * the other.
 */
import type { DragStart, ProtocolPlan } from "../kernels/lab-view/drag-plan";

export interface LabPointerEvent {
  x: number;
  y: number;
  shiftKey: boolean;
}

export interface LabKeyEvent {
  key: string;
  shiftKey: boolean;
}

export type LabToolState = { name: "idle" } | { name: "dragging"; start: DragStart; plan: ProtocolPlan | null };
