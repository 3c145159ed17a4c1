/** Ticks of the Offsets panel: the segment boundaries on the time axis (and their labels), round offsets on the vertical axis. */
import { roundTicks } from "../round-numbers";
import type { SegmentTimes } from "../timeline";
import { layoutLabels, type LabelCandidate, type PlacedLabel } from "../diagram/label-layout";
import { metresToPx, timeToPx, type OffsetsViewport } from "./viewport";

export interface Tick {
  px: number;
  valueSI: number;
}

/** The four instants of the protocol, on the time axis. */
export function boundaryTicks(viewport: OffsetsViewport, times: SegmentTimes): Tick[] {
  return [times.separationStart, times.separationEnd, times.holdEnd, times.recombinationEnd].map((t) => ({ px: timeToPx(viewport, t), valueSI: t }));
}

export function offsetTicks(viewport: OffsetsViewport, count = 5): Tick[] {
  return roundTicks(viewport.metresAtBottom, viewport.metresAtTop, count).map((m) => ({ px: metresToPx(viewport, m), valueSI: m }));
}

/** Rows under the time axis: the first for the instants, the second for a crowded one and the axis title. */
export const TIME_LABEL_ROWS_PX = [8, 26] as const;
/** Room kept between two labels of the Offsets figure, pixels. */
export const OFFSETS_LABEL_GAP_PX = 4;

export interface TimeAxisLabelsInput {
  /** The instants' ticks and their texts, in order along the axis. */
  ticks: { px: number; text: string }[];
  title: string;
  plot: { left: number; width: number; bottom: number };
  stage: { width: number; height: number };
  fontSize: number;
  /** Average advance of a character of the instants' (mono) and the title's (sans) faces, in ems. */
  monoEm: number;
  sansEm: number;
}

/**
 * The labels under the Offsets panel's time axis, as candidates for the one label layout the Diagram uses: each
 * instant centred under its tick on the first row, or the second when a neighbour takes the first; the axis title at
 * the right end of the second row, else at its left end, else dropped. The instants rank first, the earlier first.
 */
export function timeAxisLabelCandidates(input: TimeAxisLabelsInput): LabelCandidate[] {
  const { plot, fontSize } = input;
  const rowY = (row: 0 | 1) => plot.bottom + TIME_LABEL_ROWS_PX[row] + (fontSize * 1.2) / 2;
  const instants = input.ticks.map(
    (tick, i): LabelCandidate => ({
      id: `time-${i}`,
      text: tick.text,
      fontSize,
      characterEm: input.monoEm,
      priority: 20,
      tone: "soft",
      x: tick.px,
      y: rowY(0),
      align: "center",
      verticalAlign: "middle",
      rotation: 0,
      alternatives: [{ x: tick.px, y: rowY(1), align: "center", verticalAlign: "middle", rotation: 0 }],
    }),
  );
  const title: LabelCandidate = {
    id: "time-title",
    text: input.title,
    fontSize,
    characterEm: input.sansEm,
    priority: 10,
    tone: "faint",
    x: plot.left + plot.width,
    y: rowY(1),
    align: "right",
    verticalAlign: "middle",
    rotation: 0,
    alternatives: [{ x: plot.left, y: rowY(1), align: "left", verticalAlign: "middle", rotation: 0 }],
  };
  return [...instants, title];
}

/** The time axis' labels laid out on their own (the Offsets scene lays them out with its other labels). */
export function timeAxisLabels(input: TimeAxisLabelsInput): PlacedLabel[] {
  return layoutLabels(timeAxisLabelCandidates(input), input.stage, { gapPx: OFFSETS_LABEL_GAP_PX });
}
