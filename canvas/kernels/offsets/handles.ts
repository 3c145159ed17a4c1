/** The Offsets panel's handles: which there are, what each one moves, and where each sits on screen. */
import type { SeparationSpec } from "@/physics/scenario/schema";
import { branchAOffsetPerSeparation, segmentTimes, type SegmentsProtocol, type SegmentTimes } from "../timeline";
import { metresToPx, timeToPx, type OffsetsViewport } from "./viewport";

export type TimeHandleId = "separation-start" | "separation-end" | "hold-end" | "recombination-end";
export type HandleId = TimeHandleId | "separation-size";

export const HANDLE_IDS: readonly HandleId[] = ["separation-start", "separation-end", "hold-end", "recombination-end", "separation-size"];

export const HANDLE_WORDS: Record<HandleId, string> = {
  "separation-start": "Start of separation",
  "separation-end": "End of separation",
  "hold-end": "End of hold",
  "recombination-end": "End of recombination",
  "separation-size": "Separation",
};

/** The handles in the order the protocol meets them (the order Tab walks): the plateau's height sits inside the hold. */
export const PROTOCOL_ORDER: readonly HandleId[] = ["separation-start", "separation-end", "separation-size", "hold-end", "recombination-end"];

/**
 * The handle Tab (or Shift+Tab, `backwards`) selects next among those on screen, in protocol order; from no
 * selection, the first (the last going backwards). Null past either end: the selection is let go and focus leaves.
 */
export function cycleHandle(current: HandleId | null, onScreen: readonly HandleId[], backwards: boolean): HandleId | null {
  const order = PROTOCOL_ORDER.filter((id) => onScreen.includes(id));
  if (order.length === 0) return null;
  const index = current === null ? -1 : order.indexOf(current);
  if (index === -1) return backwards ? order[order.length - 1] : order[0];
  return order[index + (backwards ? -1 : 1)] ?? null;
}

export function isTimeHandle(handle: HandleId): handle is TimeHandleId {
  return handle !== "separation-size";
}

export function handleTimeSeconds(handle: TimeHandleId, times: SegmentTimes): number {
  switch (handle) {
    case "separation-start":
      return times.separationStart;
    case "separation-end":
      return times.separationEnd;
    case "hold-end":
      return times.holdEnd;
    case "recombination-end":
      return times.recombinationEnd;
  }
}

/** What a handle sets, in SI: its instant on the lab's clock from the start of the separation, or the separation. */
export function handleValueSI(handle: HandleId, protocol: SegmentsProtocol, separation: SeparationSpec): number {
  return isTimeHandle(handle) ? handleTimeSeconds(handle, segmentTimes(protocol)) : separation.distanceMetres;
}

export type HandlePlacement =
  | { id: TimeHandleId; axis: "time"; x: number; tSeconds: number }
  | { id: "separation-size"; axis: "distance"; x: number; y: number; offsetMetres: number };

/** Where each handle sits: time handles as vertical rules across the plot, the separation handle on branch A's plateau. */
export function handlePlacements(
  viewport: OffsetsViewport,
  protocol: SegmentsProtocol,
  separation: SeparationSpec,
  originSeconds = 0,
): HandlePlacement[] {
  const times = segmentTimes(protocol, originSeconds);
  const timeHandles = (["separation-start", "separation-end", "hold-end", "recombination-end"] as const).map((id) => {
    const tSeconds = handleTimeSeconds(id, times);
    return { id, axis: "time" as const, x: timeToPx(viewport, tSeconds), tSeconds };
  });
  const offsetMetres = branchAOffsetPerSeparation(separation) * separation.distanceMetres;
  const holdMiddlePx = (timeToPx(viewport, times.separationEnd) + timeToPx(viewport, times.holdEnd)) / 2;
  return [...timeHandles, { id: "separation-size", axis: "distance", x: holdMiddlePx, y: metresToPx(viewport, offsetMetres), offsetMetres }];
}
