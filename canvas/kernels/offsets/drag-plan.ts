/**
 * What dragging (or nudging) an Offsets handle does to the protocol: a plan of new durations and separation, with
 * the constraints applied. Each time handle moves one instant and keeps the others where they are on the lab's
 * clock, so the neighbouring segments trade time: dragging the end of the hold lengthens the hold and shortens the
 * recombination, and the end of the recombination stays put.
 */
import type { SeparationSpec } from "@/physics/scenario/schema";
import { snapToRoundValue } from "../round-numbers";
import { branchAOffsetPerSeparation, segmentTimes, type SegmentsProtocol } from "../timeline";
import type { HandleId } from "./handles";
import { metresPerPx, pxToMetres, pxToTime, secondsPerPxAt, type OffsetsViewport } from "./viewport";
import type { Pointer } from "./hit-test";

export interface ProtocolPlan {
  separationSeconds: number;
  holdSeconds: number;
  recombinationSeconds: number;
  distanceMetres: number;
  /** Where the start of the separation sits on the drag's axis (only a drag of that handle moves it from 0). */
  originSeconds: number;
  /** True when a constraint stopped the handle short of the pointer. */
  clamped: boolean;
}

export interface DragStart {
  handle: HandleId;
  protocol: SegmentsProtocol;
  separation: SeparationSpec;
  /** The axes as they were at pointer-down; they stay fixed for the whole drag so the handle follows the pointer. */
  viewport: OffsetsViewport;
  /**
   * Where the pointer went down and where the handle then was: the handle moves by the pointer's travel, so
   * taking it a few pixels off-centre does not make it jump. Absent for a move computed from the handle itself.
   */
  grab?: { pointer: Pointer; handle: Pointer };
}

/** Pointer travel that one snapping step is at least worth, in pixels. */
const SNAP_FINEST_PX = 6;
/** A ramp is never dragged shorter than this many pixels' worth of time: the schema wants it positive. */
const MIN_RAMP_PX = 1;

function clamp(value: number, low: number, high: number): { value: number; clamped: boolean } {
  if (value < low) return { value: low, clamped: true };
  if (value > high) return { value: high, clamped: true };
  return { value, clamped: false };
}

/** The plan that changes nothing: the protocol's own durations and separation. */
export function unchangedPlan(protocol: SegmentsProtocol, separation: SeparationSpec): ProtocolPlan {
  return {
    separationSeconds: protocol.separation.durationSeconds,
    holdSeconds: protocol.hold.durationSeconds,
    recombinationSeconds: protocol.recombination.durationSeconds,
    distanceMetres: separation.distanceMetres,
    originSeconds: 0,
    clamped: false,
  };
}

export function planHandleDrag(start: DragStart, pointer: Pointer, options: { snap: boolean }): ProtocolPlan {
  const { protocol, separation, viewport } = start;
  const times = segmentTimes(protocol);
  const unchanged = unchangedPlan(protocol, separation);
  if (start.grab && pointer.x === start.grab.pointer.x && pointer.y === start.grab.pointer.y) return unchanged;
  const target = start.grab
    ? { x: start.grab.handle.x + pointer.x - start.grab.pointer.x, y: start.grab.handle.y + pointer.y - start.grab.pointer.y }
    : pointer;
  const t = pxToTime(viewport, target.x);
  const minRamp = (at: number) => MIN_RAMP_PX * secondsPerPxAt(viewport, at);
  const snapDuration = (seconds: number, at: number) =>
    options.snap ? snapToRoundValue(seconds, SNAP_FINEST_PX * secondsPerPxAt(viewport, at)) : seconds;

  switch (start.handle) {
    case "separation-start": {
      const floor = minRamp(times.separationEnd);
      const raw = clamp(times.separationEnd - t, floor, Number.POSITIVE_INFINITY);
      const sep = Math.max(floor, snapDuration(raw.value, t));
      return { ...unchanged, separationSeconds: sep, originSeconds: times.separationEnd - sep, clamped: raw.clamped };
    }
    case "separation-end": {
      const floor = minRamp(times.separationStart);
      const raw = clamp(t - times.separationStart, floor, times.holdEnd - times.separationStart);
      const sep = clamp(snapDuration(raw.value, t), floor, times.holdEnd - times.separationStart).value;
      return { ...unchanged, separationSeconds: sep, holdSeconds: times.holdEnd - times.separationStart - sep, clamped: raw.clamped };
    }
    case "hold-end": {
      const room = times.recombinationEnd - times.separationEnd - minRamp(times.recombinationEnd);
      const raw = clamp(t - times.separationEnd, 0, room);
      const hold = clamp(snapDuration(raw.value, t), 0, room).value;
      return { ...unchanged, holdSeconds: hold, recombinationSeconds: times.recombinationEnd - times.separationEnd - hold, clamped: raw.clamped };
    }
    case "recombination-end": {
      const floor = minRamp(times.holdEnd);
      const raw = clamp(t - times.holdEnd, floor, Number.POSITIVE_INFINITY);
      return { ...unchanged, recombinationSeconds: Math.max(floor, snapDuration(raw.value, t)), clamped: raw.clamped };
    }
    case "separation-size": {
      const perSeparation = branchAOffsetPerSeparation(separation);
      const raw = clamp(pxToMetres(viewport, target.y) / perSeparation, 0, Number.POSITIVE_INFINITY);
      const finest = (SNAP_FINEST_PX * metresPerPx(viewport)) / perSeparation;
      const d = options.snap ? Math.max(0, snapToRoundValue(raw.value, finest)) : raw.value;
      return { ...unchanged, distanceMetres: d, clamped: raw.clamped };
    }
  }
}

/** Pixels an arrow key moves a handle; with Shift, ten times as far. */
export const NUDGE_PX = 1;
export const NUDGE_LARGE_PX = 10;
