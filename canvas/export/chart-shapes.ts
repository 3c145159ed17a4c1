/**
 * The text and line shapes the exported charts (the sweep chart, the parameter map) are drawn from: serif text at
 * the charts' tick size unless told otherwise, lines with their dash and end caps.
 */
import type { FigureShape } from "./diagram-figure";

export const CHART_TICK_FONT = 12;

export const chartText = (t: string, x: number, y: number, anchor: "start" | "middle" | "end", fill: string, fontSize = CHART_TICK_FONT, rotation: 0 | -90 = 0): FigureShape => ({
  kind: "text",
  text: t,
  x,
  y,
  anchor,
  rotation,
  fontSize,
  font: "serif",
  fill,
});

/** A polyline; `round` caps and joins for curves, square ones for axes and ticks. */
export const chartLine = (points: number[], stroke: string, width: number, dash: number[] = [], round = false): FigureShape => ({ kind: "line", points, stroke, width, dash, round });
