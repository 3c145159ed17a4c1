/**
 * The Offsets panel's tool: the events it receives, in stage pixels, and the states it can be in. Kept apart from the
 * store's state (which holds a OffsetsToolState) and the tools' handlers (which read the store), so neither imports
 * the other.
 */
import type { DragStart, ProtocolPlan } from "../kernels/offsets/drag-plan";

export interface OffsetsPointerEvent {
  x: number;
  y: number;
  shiftKey: boolean;
}

export interface OffsetsKeyEvent {
  key: string;
  shiftKey: boolean;
}

export type OffsetsToolState = { name: "idle" } | { name: "dragging"; start: DragStart; plan: ProtocolPlan | null };
