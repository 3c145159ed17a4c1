/** Ticks of the Lab view: the segment boundaries on the time axis, and round offsets on the vertical axis. */
import { roundTicks } from "../round-numbers";
import type { SegmentTimes } from "../timeline";
import { metresToPx, timeToPx, type LabViewport } from "./viewport";

export interface Tick {
  px: number;
  valueSI: number;
}

/** The four instants of the protocol, on the time axis. */
export function boundaryTicks(viewport: LabViewport, times: SegmentTimes): Tick[] {
  return [times.separationStart, times.separationEnd, times.holdEnd, times.recombinationEnd].map((t) => ({ px: timeToPx(viewport, t), valueSI: t }));
}

export function offsetTicks(viewport: LabViewport, count = 5): Tick[] {
  return roundTicks(viewport.metresAtBottom, viewport.metresAtTop, count).map((m) => ({ px: metresToPx(viewport, m), valueSI: m }));
}
