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

/** A label under the time axis: centred on its tick, on the first row or (to clear a neighbour) the second. */
export interface TimeLabelPlacement {
  px: number;
  widthPx: number;
  row: 0 | 1;
}

/** Room kept between two labels on the same row, pixels. */
const LABEL_GAP_PX = 6;

/**
 * Rows for the labels under the time axis, given each one's centre and (estimated) width in order along the axis:
 * a label drops to the second row only when it would touch its neighbour on the first.
 */
export function staggerTimeLabels(labels: { px: number; widthPx: number }[]): TimeLabelPlacement[] {
  const placed: TimeLabelPlacement[] = [];
  for (const label of labels) {
    const previous = placed[placed.length - 1];
    const touches = previous !== undefined && previous.row === 0 && label.px - label.widthPx / 2 < previous.px + previous.widthPx / 2 + LABEL_GAP_PX;
    placed.push({ ...label, row: touches ? 1 : 0 });
  }
  return placed;
}

/**
 * Which end of the second row the axis title goes to: the right end, unless a second-row label reaches into it
 * there and the left end is clear. `title` spans from `rightEndPx − widthPx` at the right, from `leftEndPx` at the left.
 */
export function timeAxisTitleSide(labels: TimeLabelPlacement[], title: { widthPx: number; leftEndPx: number; rightEndPx: number }): "left" | "right" {
  const blocks = (from: number, to: number) =>
    labels.some((l) => l.row === 1 && l.px - l.widthPx / 2 < to + LABEL_GAP_PX && l.px + l.widthPx / 2 > from - LABEL_GAP_PX);
  if (!blocks(title.rightEndPx - title.widthPx, title.rightEndPx)) return "right";
  return blocks(title.leftEndPx, title.leftEndPx + title.widthPx) ? "right" : "left";
}
