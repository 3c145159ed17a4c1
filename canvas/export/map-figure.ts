/**
 * A parameter map as figure shapes, for the editor's Map panel (drawn by a thin SVG layer) and its SVG, PNG and
 * PDF exports: the quantity's log10 as coloured cells over the two parameters (log or linear axes, ticks and units
 * from kernels/diagram/axis-scale.ts), contour lines at whole decades (d3-contour's marching squares), a colour bar,
 * the scenario's own point, and the optimum path — along the other axis, the recombination time (or else the y
 * value) at which the quantity is best (smallest; largest for a decoherence time). Also the inverse: which grid
 * point a position in the figure falls on. Pure: data in, shapes out.
 */
import { contours } from "d3-contour";
import type { MapGrid } from "@/physics/maps/axes";
import { superscript } from "@/physics/superscript";
import { axisTickLabels, axisTitle, axisUnit, linearTicks, logTicks, type AxisUnit } from "../kernels/diagram/axis-scale";
import type { FigurePalette } from "../theme";
import { CHART_TICK_FONT, chartLine, chartText } from "./chart-shapes";
import type { FigureShape } from "./diagram-figure";
import type { ExportDrawing, NamedGroup } from "./standalone-figure";

export interface MapFigureData {
  grid: MapGrid;
  /** Axis and colour-bar words: "recombination time", "total ⟨N⟩". */
  xWords: string;
  yWords: string;
  quantityWords: string;
  /** The scenario's own point (SI), where it has one. */
  now: { x: number; y: number } | null;
}

export interface MapPlot {
  left: number;
  top: number;
  right: number;
  bottom: number;
}

const MARGIN = { left: 84, right: 112, top: 24, bottom: 56 };
const BAR = { gap: 18, width: 14 };
const TICK_FONT = CHART_TICK_FONT;
const TITLE_FONT = 13;

/** The colour ramp, low to high: pale sand to deep ink blue, even in lightness so that it prints in grey. */
const RAMP = ["#f6f1de", "#d9e3b8", "#9cc6a3", "#5b9f9c", "#33738f", "#27487a", "#1e2450"];

function rampColour(t: number): string {
  const clamped = Math.min(1, Math.max(0, t));
  const at = clamped * (RAMP.length - 1);
  const i = Math.min(RAMP.length - 2, Math.floor(at));
  const f = at - i;
  const channel = (hex: string, k: number) => parseInt(hex.slice(1 + 2 * k, 3 + 2 * k), 16);
  const mix = [0, 1, 2].map((k) => Math.round(channel(RAMP[i], k) * (1 - f) + channel(RAMP[i + 1], k) * f));
  return `#${mix.map((v) => v.toString(16).padStart(2, "0")).join("")}`;
}

const transform = (scale: "log" | "linear") => (scale === "log" ? Math.log10 : (v: number) => v);
const inverse = (scale: "log" | "linear") => (scale === "log" ? (t: number) => 10 ** t : (t: number) => t);

/** One axis in figure space: each grid value at the centre of its cell, cells of equal width in the axis' scale. */
function axisSpace(values: number[], scale: "log" | "linear", start: number, end: number) {
  const t = transform(scale);
  const first = t(values[0]);
  const step = values.length > 1 ? (t(values[values.length - 1]) - first) / (values.length - 1) : 1;
  const low = first - step / 2;
  const span = step * values.length;
  return {
    /** Figure coordinate of a value (SI). */
    at: (v: number) => start + ((t(v) - low) / span) * (end - start),
    /** Figure coordinate of a fractional cell index (0 = the first cell's edge, n = the last cell's edge). */
    atCell: (u: number) => start + (u / values.length) * (end - start),
    /** The cell index under a figure coordinate (may fall outside 0…n−1). */
    cellAt: (p: number) => Math.floor(((p - start) / (end - start)) * values.length),
    /** The value range the axis shows, SI, increasing. */
    shown: [inverse(scale)(low), inverse(scale)(low + span)].sort((a, b) => a - b) as [number, number],
  };
}

export function mapPlot(size: { width: number; height: number }): MapPlot {
  return { left: MARGIN.left, top: MARGIN.top, right: size.width - MARGIN.right, bottom: size.height - MARGIN.bottom };
}

function spaces(grid: MapGrid, plot: MapPlot) {
  return { x: axisSpace(grid.x.values, grid.x.scale, plot.left, plot.right), y: axisSpace(grid.y.values, grid.y.scale, plot.bottom, plot.top) };
}

/** The grid point whose cell holds the figure position, with its values (SI); null outside the plot. */
export function mapPointAt(grid: MapGrid, size: { width: number; height: number }, position: { x: number; y: number }): { column: number; row: number; x: number; y: number } | null {
  const { x, y } = spaces(grid, mapPlot(size));
  const column = x.cellAt(position.x);
  const row = y.cellAt(position.y);
  if (column < 0 || column >= grid.x.values.length || row < 0 || row >= grid.y.values.length) return null;
  return { column, row, x: grid.x.values[column], y: grid.y.values[row] };
}

/** The finite log10 values of the grid, lowest and highest; null when there is none. */
export function mapRange(grid: MapGrid): { low: number; high: number } | null {
  const finite = grid.log10.flat().filter((v): v is number => v !== null && Number.isFinite(v));
  if (finite.length === 0) return null;
  return { low: Math.min(...finite), high: Math.max(...finite) };
}

/** Whole decades inside the range, every decade or every second, third… so that at most 8 lines are drawn. */
export function contourDecades(range: { low: number; high: number }): number[] {
  const first = Math.ceil(range.low);
  const last = Math.floor(range.high);
  if (last < first) return [];
  const every = Math.max(1, Math.ceil((last - first + 1) / 8));
  const levels: number[] = [];
  for (let level = first; level <= last; level += every) levels.push(level);
  return levels;
}

/**
 * The optimum path: for each value of one axis, the grid value of the other at which the quantity is best —
 * smallest, or largest for a decoherence time. The optimised axis is the recombination time's where the map has
 * one (the best recombination time per distance, per hold…), else the y axis. Points without a value are skipped.
 */
export function optimumPath(grid: MapGrid): { x: number; y: number }[] {
  const better = grid.quantity === "decoherence-time" ? (a: number, b: number) => a > b : (a: number, b: number) => a < b;
  const alongX = grid.x.parameter === "recombination-time" && grid.y.parameter !== "recombination-time";
  const path: { x: number; y: number }[] = [];
  const outer = alongX ? grid.y.values.length : grid.x.values.length;
  const inner = alongX ? grid.x.values.length : grid.y.values.length;
  for (let o = 0; o < outer; o++) {
    let best: { index: number; value: number } | null = null;
    for (let i = 0; i < inner; i++) {
      const value = alongX ? grid.log10[o][i] : grid.log10[i][o];
      if (value !== null && (best === null || better(value, best.value))) best = { index: i, value };
    }
    if (best) path.push(alongX ? { x: grid.x.values[best.index], y: grid.y.values[o] } : { x: grid.x.values[o], y: grid.y.values[best.index] });
  }
  return path;
}

const text = chartText;
const line = (points: number[], stroke: string, width: number, dash: number[] = []) => chartLine(points, stroke, width, dash, true);
const rect = (x0: number, y0: number, x1: number, y1: number, fill: string): FigureShape => ({ kind: "area", points: [x0, y0, x1, y0, x1, y1, x0, y1], fill });

function axisTicks(values: number[], scale: "log" | "linear", shown: [number, number]) {
  const ticks = scale === "log" ? logTicks(shown[0], shown[1]) : linearTicks(shown[0], shown[1]);
  return { major: ticks.major.filter((v) => v >= shown[0] && v <= shown[1]), minor: ticks.minor.filter((v) => v >= shown[0] && v <= shown[1]) };
}

/** One unit per axis: SI prefixes for times and lengths (axis-scale.ts), the plain SI unit (Pa, K) otherwise. */
function unitOfAxis(axis: MapGrid["x"]): AxisUnit {
  const largest = Math.max(...axis.values.map(Math.abs));
  if (axis.unit === "s" || axis.unit === "m") return axisUnit(largest, axis.unit === "m" ? "length" : "time");
  return { symbol: axis.unit, siPerUnit: 1 };
}

export function mapFigureDrawing(data: MapFigureData, size: { width: number; height: number }, palette: FigurePalette, paper: boolean): ExportDrawing {
  const { width, height } = size;
  const { grid } = data;
  const plot = mapPlot(size);
  const space = spaces(grid, plot);
  const columns = grid.x.values.length;
  const rows = grid.y.values.length;
  const range = mapRange(grid);
  const groups: NamedGroup[] = [{ id: "background", shapes: paper ? [rect(0, 0, width, height, palette.paper)] : [] }];
  const colourOf = (v: number | null) => (v === null || !range ? palette.contextPaper : rampColour(range.high > range.low ? (v - range.low) / (range.high - range.low) : 0.5));

  const cells: FigureShape[] = [];
  for (let row = 0; row < rows; row++) {
    for (let column = 0; column < columns; column++) {
      // Each cell a hair wider than its place, so that no seam of the ground shows between neighbours.
      cells.push(rect(space.x.atCell(column) - 0.25, space.y.atCell(row) + 0.25, space.x.atCell(column + 1) + 0.25, space.y.atCell(row + 1) - 0.25, colourOf(grid.log10[row][column])));
    }
  }
  groups.push({ id: "cells", shapes: cells });

  const levels = range ? contourDecades(range) : [];
  if (levels.length > 0 && range) {
    // Marching squares over the point values (a missing point counts as below every level, so no line runs into a gap).
    const values = grid.log10.flatMap((row) => row.map((v) => (v === null ? range.low - 1 : v)));
    const generator = contours().size([columns, rows]).thresholds(levels);
    const shapes: FigureShape[] = [];
    for (const contour of generator(values)) {
      for (const polygon of contour.coordinates) {
        for (const ring of polygon) {
          // d3-contour puts point (i, j) at (i + 0.5, j + 0.5): exactly the centre of cell (i, j) here.
          shapes.push(line(ring.flatMap(([u, w]) => [space.x.atCell(u), space.y.atCell(w)]), palette.ink, 0.75));
        }
      }
    }
    groups.push({ id: "contours", shapes });
  }

  const xUnit = unitOfAxis(grid.x);
  const yUnit = unitOfAxis(grid.y);
  const xTicks = axisTicks(grid.x.values, grid.x.scale, space.x.shown);
  const yTicks = axisTicks(grid.y.values, grid.y.scale, space.y.shown);
  groups.push({
    id: "axes",
    shapes: [
      line([plot.left, plot.top, plot.left, plot.bottom, plot.right, plot.bottom, plot.right, plot.top, plot.left, plot.top], palette.ink, 1),
      ...xTicks.major.map((v) => line([space.x.at(v), plot.bottom, space.x.at(v), plot.bottom + 6], palette.ink, 1)),
      ...xTicks.minor.map((v) => line([space.x.at(v), plot.bottom, space.x.at(v), plot.bottom + 3], palette.ink, 0.75)),
      ...yTicks.major.map((v) => line([plot.left - 6, space.y.at(v), plot.left, space.y.at(v)], palette.ink, 1)),
      ...yTicks.minor.map((v) => line([plot.left - 3, space.y.at(v), plot.left, space.y.at(v)], palette.ink, 0.75)),
    ],
  });

  const path = optimumPath(grid);
  if (path.length > 1) {
    groups.push({ id: "optimum", shapes: [line(path.flatMap((p) => [space.x.at(p.x), space.y.at(p.y)]), palette.branchA, 2, [6, 4])] });
  }
  const inside = (v: number, shown: [number, number]) => v >= shown[0] && v <= shown[1];
  if (data.now && inside(data.now.x, space.x.shown) && inside(data.now.y, space.y.shown)) {
    const x = space.x.at(data.now.x);
    const y = space.y.at(data.now.y);
    groups.push({ id: "now", shapes: [{ kind: "dot", x, y, radius: 6, stroke: palette.ink, width: 2, fill: palette.branchA }, text("now", x + 10, y - 10, "start", palette.ink)] });
  }

  // The colour bar: the ramp from the lowest to the highest log10, labelled at the contour decades.
  const bar = { left: plot.right + BAR.gap, right: plot.right + BAR.gap + BAR.width };
  const barShapes: FigureShape[] = [];
  if (range) {
    const steps = 48;
    for (let k = 0; k < steps; k++) {
      const y0 = plot.bottom - ((plot.bottom - plot.top) * k) / steps;
      const y1 = plot.bottom - ((plot.bottom - plot.top) * (k + 1)) / steps;
      barShapes.push(rect(bar.left, y0 + 0.25, bar.right, y1 - 0.25, rampColour((k + 0.5) / steps)));
    }
    const barY = (level: number) => plot.bottom - ((level - range.low) / (range.high - range.low || 1)) * (plot.bottom - plot.top);
    for (const level of levels) {
      barShapes.push(line([bar.right, barY(level), bar.right + 4, barY(level)], palette.ink, 1));
      barShapes.push(text(`10${superscript(level)}`, bar.right + 7, barY(level), "start", palette.inkSoft));
    }
    barShapes.push(line([bar.left, plot.top, bar.right, plot.top, bar.right, plot.bottom, bar.left, plot.bottom, bar.left, plot.top], palette.ink, 0.75));
  }
  groups.push({ id: "colour-bar", shapes: barShapes });

  const xLabels = axisTickLabels(xTicks.major, xUnit);
  const yLabels = axisTickLabels(yTicks.major, yUnit);
  groups.push({
    id: "labels",
    shapes: [
      ...xTicks.major.map((v, i) => text(xLabels[i], space.x.at(v), plot.bottom + 17, "middle", palette.inkSoft)),
      ...yTicks.major.map((v, i) => text(yLabels[i], plot.left - 9, space.y.at(v), "end", palette.inkSoft)),
      text(axisTitle(data.xWords, xUnit), (plot.left + plot.right) / 2, height - 14, "middle", palette.ink, TITLE_FONT),
      text(axisTitle(data.yWords, yUnit), 16, (plot.top + plot.bottom) / 2, "middle", palette.ink, TITLE_FONT, -90),
      text(`${data.quantityWords}${grid.unit === "1" ? "" : ` (${grid.unit})`}`, width - 10, (plot.top + plot.bottom) / 2, "middle", palette.ink, TITLE_FONT, -90),
    ],
  });
  return { width, height, groups };
}
