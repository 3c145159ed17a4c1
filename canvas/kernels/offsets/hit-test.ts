/**
 * Hit testing in the Offsets panel: a broad phase on each handle's bounds, a narrow phase measuring the distance to the
 * handle itself, then a ranking. Time handles are vertical rules (grabbed anywhere along their height); the
 * separation handle is a point.
 */
import type { SegmentName, SegmentTimes } from "../timeline";
import type { HandleId, HandlePlacement } from "./handles";
import { pxToTime, type OffsetsViewport } from "./viewport";

export type OffsetsHit =
  | { kind: "handle"; handle: HandleId; distancePx: number }
  | { kind: "segment"; segment: SegmentName }
  | { kind: "miss" };

export interface Pointer {
  x: number;
  y: number;
}

interface Bounds {
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

/** When two handles are equally near (e.g. a zero hold puts two rules on one line), the earlier one wins. */
const PRIORITY: readonly HandleId[] = ["separation-size", "hold-end", "recombination-end", "separation-end", "separation-start"];

function boundsOf(handle: HandlePlacement, viewport: OffsetsViewport, tolerancePx: number): Bounds {
  if (handle.axis === "distance") {
    return { minX: handle.x - tolerancePx, maxX: handle.x + tolerancePx, minY: handle.y - tolerancePx, maxY: handle.y + tolerancePx };
  }
  const { plot } = viewport;
  return { minX: handle.x - tolerancePx, maxX: handle.x + tolerancePx, minY: plot.top - tolerancePx, maxY: plot.top + plot.height + tolerancePx };
}

const contains = (b: Bounds, p: Pointer) => p.x >= b.minX && p.x <= b.maxX && p.y >= b.minY && p.y <= b.maxY;

function distanceTo(handle: HandlePlacement, pointer: Pointer): number {
  return handle.axis === "time" ? Math.abs(pointer.x - handle.x) : Math.hypot(pointer.x - handle.x, pointer.y - handle.y);
}

export function broadPhase(handles: HandlePlacement[], viewport: OffsetsViewport, pointer: Pointer, tolerancePx: number): HandlePlacement[] {
  return handles.filter((h) => contains(boundsOf(h, viewport, tolerancePx), pointer));
}

export function narrowPhase(candidates: HandlePlacement[], pointer: Pointer, tolerancePx: number): { handle: HandleId; distancePx: number }[] {
  return candidates.map((h) => ({ handle: h.id, distancePx: distanceTo(h, pointer) })).filter((c) => c.distancePx <= tolerancePx);
}

export function rank(hits: { handle: HandleId; distancePx: number }[]): { handle: HandleId; distancePx: number } | null {
  const sorted = [...hits].sort((a, b) => a.distancePx - b.distancePx || PRIORITY.indexOf(a.handle) - PRIORITY.indexOf(b.handle));
  return sorted[0] ?? null;
}

function segmentAt(times: SegmentTimes, tSeconds: number): SegmentName | null {
  if (tSeconds < times.separationStart || tSeconds > times.recombinationEnd) return null;
  if (tSeconds < times.separationEnd) return "separation";
  if (tSeconds <= times.holdEnd) return "hold";
  return "recombination";
}

export function hitTestOffsets(
  handles: HandlePlacement[],
  viewport: OffsetsViewport,
  times: SegmentTimes,
  pointer: Pointer,
  tolerancePx: number,
): OffsetsHit {
  const best = rank(narrowPhase(broadPhase(handles, viewport, pointer, tolerancePx), pointer, tolerancePx));
  if (best) return { kind: "handle", ...best };
  const { plot } = viewport;
  const insidePlot = pointer.x >= plot.left && pointer.x <= plot.left + plot.width && pointer.y >= plot.top && pointer.y <= plot.top + plot.height;
  const segment = insidePlot ? segmentAt(times, pxToTime(viewport, pointer.x)) : null;
  return segment ? { kind: "segment", segment } : { kind: "miss" };
}
