/**
 * The Sweep's chart as figure shapes, for its SVG, PNG and PDF exports: decoherence against the swept parameter on
 * log–log axes, ticks at decades (with minor ticks at 2–9 × the decade; at 1, 2 and 5 × where a range spans less
 * than a decade), one unit per axis chosen for its range, the scenario's current value ("now") and the sweep's
 * smallest decoherence marked. Drawn from the sweep's numbers, not from the chart on screen, so the file is vector
 * and independent of the charting library. Pure: data in, shapes out.
 *
 * The ticks, units and tick labels are the shared axis kernel's (canvas/kernels/diagram/axis-scale.ts), as on the
 * chart on screen.
 */
import { axisTickLabels, axisTitle, axisUnit as unitFor, logTicks, tickLabel as unitTickLabel, type AxisTicks, type AxisUnit } from "../kernels/diagram/axis-scale";
import { DASHES, type FigurePalette } from "../theme";
import { CHART_TICK_FONT, chartLine, chartText } from "./chart-shapes";
import type { FigureShape } from "./diagram-figure";
import type { ExportDrawing, NamedGroup } from "./standalone-figure";

export { logTicks };

export interface SweepChartPoint {
  /** The parameter's value, SI. */
  x: number;
  decoherence: number;
}

/** One curve of ⟨N⟩ against the parameter (a channel, or the total), drawn in its colour and dash. */
export interface SweepFigureCurve {
  words: string;
  colour: string;
  dash: number[];
  width: number;
  points: { x: number; y: number }[];
}

export interface SweepChartData {
  points: SweepChartPoint[];
  /** The axis title's words ("recombination time"). */
  parameterWords: string;
  dimension: "time" | "length" | "pressure" | "temperature";
  /** The scenario's current value of the parameter, SI; null where it has none. */
  now: number | null;
  /**
   * With an environment: ⟨N⟩ of each channel and the total, drawn instead of the decoherence curve (and no
   * smallest-decoherence mark); absent or empty: the decoherence curve.
   */
  curves?: SweepFigureCurve[];
}

export type LogTicks = AxisTicks;

/** A pure number's axis (decoherence): no unit. */
const NUMBER_UNIT: AxisUnit = { symbol: "", siPerUnit: 1 };

/** Many decades on one axis (pressure, temperature): the bare SI unit, labels in powers of ten. */
const BARE_UNITS = { pressure: "Pa", temperature: "K" } as const;

/** One unit for an axis over [from, to]: the kernel's unit for the range's geometric middle (so tick labels stay short). */
export function axisUnit(dimension: SweepChartData["dimension"], from: number, to: number): { symbol: string; perUnit: number } {
  if (dimension === "pressure" || dimension === "temperature") return { symbol: BARE_UNITS[dimension], perUnit: 1 };
  const unit = unitFor(Math.sqrt(from * to), dimension);
  return { symbol: unit.symbol, perUnit: unit.siPerUnit };
}

/** A tick value as printed: plainly between 0.001 and 10⁴, else as a power of ten (a major tick is a decade there). */
export function tickLabel(value: number): string {
  return unitTickLabel(value, NUMBER_UNIT);
}

/** At most this many labelled ticks on an axis: beyond it, every second (third, …) decade is labelled. */
const MOST_LABELS = 7;

/** The major ticks that carry a label: all of them, or the decades whose exponent is a multiple of a step. */
export function labelled(major: number[]): number[] {
  if (major.length <= MOST_LABELS) return major;
  const every = Math.ceil(major.length / MOST_LABELS);
  return major.filter((v) => Math.round(Math.log10(v)) % every === 0);
}

const PLOT = { left: 92, right: 24, top: 20, bottom: 52 };
const TICK_FONT = CHART_TICK_FONT;
const TITLE_FONT = 13;

const text = chartText;
const line = (points: number[], stroke: string, width: number, dash: number[] = []) => chartLine(points, stroke, width, dash, false);

/** Pads a log range to whole minor ticks, so the curve never touches the frame. */
function paddedRange(values: number[]): [number, number] {
  let [low, high] = [Math.min(...values), Math.max(...values)];
  if (!(high > low)) [low, high] = [low / 2, high * 2];
  const lowDecade = 10 ** Math.floor(Math.log10(low));
  const highDecade = 10 ** Math.floor(Math.log10(high));
  return [Math.floor(low / lowDecade) * lowDecade, Math.ceil(high / highDecade) * highDecade];
}

export function sweepChartDrawing(data: SweepChartData, size: { width: number; height: number }, palette: FigurePalette, paper: boolean): ExportDrawing {
  const { width, height } = size;
  const curves = (data.curves ?? []).map((c) => ({ ...c, points: c.points.filter((p) => p.x > 0 && p.y > 0) })).filter((c) => c.points.length > 0);
  const points = data.points.filter((p) => p.x > 0 && p.decoherence > 0);
  const groups: NamedGroup[] = [{ id: "background", shapes: paper ? [{ kind: "area", points: [0, 0, width, 0, width, height, 0, height], fill: palette.paper }] : [] }];
  const xs = curves.length > 0 ? curves.flatMap((c) => c.points.map((p) => p.x)) : points.map((p) => p.x);
  const ys = curves.length > 0 ? curves.flatMap((c) => c.points.map((p) => p.y)) : points.map((p) => p.decoherence);
  if (xs.length === 0) return { width, height, groups };

  const [x0, x1] = [Math.min(...xs), Math.max(...xs)];
  const [y0, y1] = paddedRange(ys);
  const plot = { left: PLOT.left, top: PLOT.top, right: width - PLOT.right, bottom: height - PLOT.bottom };
  const px = (x: number) => plot.left + ((Math.log10(x) - Math.log10(x0)) / (Math.log10(x1) - Math.log10(x0) || 1)) * (plot.right - plot.left);
  const py = (y: number) => plot.bottom - ((Math.log10(y) - Math.log10(y0)) / (Math.log10(y1) - Math.log10(y0) || 1)) * (plot.bottom - plot.top);

  const { symbol, perUnit } = axisUnit(data.dimension, x0, x1);
  const unit: AxisUnit = { symbol, siPerUnit: perUnit };
  const xTicks = logTicks(x0, x1);
  const yTicks = logTicks(y0, y1);
  const labelsOf = (major: number[], axis: AxisUnit) => {
    const words = new Map(major.map((v, i) => [v, axisTickLabels(major, axis)[i]]));
    return labelled(major).map((v) => ({ v, words: words.get(v)! }));
  };

  groups.push({
    id: "grid",
    shapes: [...xTicks.major.map((x) => line([px(x), plot.top, px(x), plot.bottom], palette.rule, 0.75)), ...yTicks.major.map((y) => line([plot.left, py(y), plot.right, py(y)], palette.rule, 0.75))],
  });
  groups.push({
    id: "axes",
    shapes: [
      line([plot.left, plot.top, plot.left, plot.bottom, plot.right, plot.bottom], palette.ink, 1),
      ...xTicks.major.map((x) => line([px(x), plot.bottom, px(x), plot.bottom + 6], palette.ink, 1)),
      ...xTicks.minor.map((x) => line([px(x), plot.bottom, px(x), plot.bottom + 3], palette.ink, 0.75)),
      ...yTicks.major.map((y) => line([plot.left - 6, py(y), plot.left, py(y)], palette.ink, 1)),
      ...yTicks.minor.map((y) => line([plot.left - 3, py(y), plot.left, py(y)], palette.ink, 0.75)),
    ],
  });
  if (curves.length > 0) {
    // The total in the palette's ink (it is the figure's ink on a dark ground too); channels in their own colours.
    const stroke = (c: SweepFigureCurve) => (c.colour === "#1c2024" ? palette.ink : c.colour);
    groups.push({ id: "curves", shapes: curves.map((c): FigureShape => ({ kind: "line", points: c.points.flatMap((p) => [px(p.x), py(p.y)]), stroke: stroke(c), width: c.width, dash: c.dash, round: true })) });
  } else {
    groups.push({
      id: "curve",
      shapes: [
        { kind: "line", points: points.flatMap((p) => [px(p.x), py(p.decoherence)]), stroke: palette.branchB, width: 2, dash: DASHES.branchA, round: true },
        ...points.map((p): FigureShape => ({ kind: "dot", x: px(p.x), y: py(p.decoherence), radius: 2, stroke: null, width: 0, fill: palette.branchB })),
      ],
    });
    const best = points.reduce((b, p) => (p.decoherence < b.decoherence ? p : b));
    groups.push({ id: "smallest", shapes: [{ kind: "dot", x: px(best.x), y: py(best.decoherence), radius: 5, stroke: palette.ink, width: 2, fill: palette.paper }] });
  }
  if (data.now !== null && data.now >= x0 && data.now <= x1) {
    const x = px(data.now);
    groups.push({ id: "now", shapes: [line([x, plot.top, x, plot.bottom], palette.branchA, 2), text("now", x, plot.top - 9, "middle", palette.inkSoft)] });
  }
  groups.push({
    id: "labels",
    shapes: [
      ...labelsOf(xTicks.major, unit).map(({ v, words }) => text(words, px(v), plot.bottom + 17, "middle", palette.inkSoft)),
      ...labelsOf(yTicks.major, NUMBER_UNIT).map(({ v, words }) => text(words, plot.left - 9, py(v), "end", palette.inkSoft)),
      text(axisTitle(data.parameterWords, unit), (plot.left + plot.right) / 2, height - 14, "middle", palette.ink, TITLE_FONT),
      text(curves.length > 0 ? "quanta ⟨N⟩" : "decoherence", 16, (plot.top + plot.bottom) / 2, "middle", palette.ink, TITLE_FONT, -90),
    ],
  });
  return { width, height, groups };
}
