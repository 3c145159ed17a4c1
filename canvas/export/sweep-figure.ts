/**
 * The Sweep's chart as figure shapes, for its SVG, PNG and PDF exports: decoherence against the swept parameter on
 * log–log axes, ticks at decades (with minor ticks at 2–9 × the decade; at 1, 2 and 5 × where a range spans less
 * than a decade), one unit per axis chosen for its range, the scenario's current value ("now") and the sweep's
 * smallest decoherence marked. Drawn from the sweep's numbers, not from the chart on screen, so the file is vector
 * and independent of the charting library. Pure: data in, shapes out.
 *
 * The tick rule here is this file's own (a small 1–2–5/decade rule); a shared tick kernel can replace it.
 */
import { superscript } from "@/physics/superscript";
import { DASHES, type FigurePalette } from "../theme";
import type { FigureShape } from "./diagram-figure";
import type { ExportDrawing, NamedGroup } from "./standalone-figure";

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

export interface LogTicks {
  major: number[];
  minor: number[];
}

const clean = (v: number) => Number(v.toPrecision(12));

/**
 * Ticks for a log axis over [from, to] (0 < from < to): majors at the decades inside; where fewer than two decades
 * fall inside, majors at 1, 2 and 5 × each decade; minors at the other integer multiples of each decade.
 */
export function logTicks(from: number, to: number): LogTicks {
  const first = Math.floor(Math.log10(from));
  const last = Math.ceil(Math.log10(to));
  const inside = (v: number) => v >= from * (1 - 1e-9) && v <= to * (1 + 1e-9);
  const decades: number[] = [];
  for (let e = first; e <= last; e++) decades.push(clean(10 ** e));
  const multiples = (ms: number[]) => decades.flatMap((d) => ms.map((m) => clean(m * d))).filter(inside);
  const decadeMajors = decades.filter(inside);
  const major = decadeMajors.length >= 2 ? decadeMajors : multiples([1, 2, 5]);
  const majorSet = new Set(major);
  const minor = multiples([1, 2, 3, 4, 5, 6, 7, 8, 9]).filter((v) => !majorSet.has(v));
  return { major, minor };
}

const PREFIX: Record<number, string> = { [-18]: "a", [-15]: "f", [-12]: "p", [-9]: "n", [-6]: "µ", [-3]: "m", 0: "", 3: "k", 6: "M", 9: "G" };
const RANGE: Record<SweepChartData["dimension"], { symbol: string; lowest: number; highest: number }> = {
  time: { symbol: "s", lowest: -18, highest: 0 },
  length: { symbol: "m", lowest: -15, highest: 3 },
  // Many decades on one axis: the bare SI unit, labels in powers of ten.
  pressure: { symbol: "Pa", lowest: 0, highest: 0 },
  temperature: { symbol: "K", lowest: 0, highest: 0 },
};

/** One unit for an axis: the SI prefix of the range's geometric middle (so tick labels stay short). */
export function axisUnit(dimension: SweepChartData["dimension"], from: number, to: number): { symbol: string; perUnit: number } {
  const { symbol, lowest, highest } = RANGE[dimension];
  const middle = Math.sqrt(from * to);
  const exponent = Math.min(highest, Math.max(lowest, Math.floor(Math.log10(middle) / 3) * 3));
  return { symbol: `${PREFIX[exponent]}${symbol}`, perUnit: 10 ** exponent };
}

/** A tick value as printed: plainly between 0.001 and 10⁴, else as a power of ten (a major tick is a decade there). */
export function tickLabel(value: number): string {
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e4) return String(clean(value));
  const exponent = Math.round(Math.log10(magnitude));
  const mantissa = clean(value / 10 ** exponent);
  return mantissa === 1 ? `10${superscript(exponent)}` : `${mantissa} × 10${superscript(exponent)}`;
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
const TICK_FONT = 12;
const TITLE_FONT = 13;

const text = (t: string, x: number, y: number, anchor: "start" | "middle" | "end", fill: string, fontSize = TICK_FONT, rotation: 0 | -90 = 0): FigureShape => ({
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
const line = (points: number[], stroke: string, width: number, dash: number[] = []): FigureShape => ({ kind: "line", points, stroke, width, dash, round: false });

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

  const unit = axisUnit(data.dimension, x0, x1);
  const xTicks = logTicks(x0, x1);
  const yTicks = logTicks(y0, y1);

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
      ...labelled(xTicks.major).map((x) => text(tickLabel(x / unit.perUnit), px(x), plot.bottom + 17, "middle", palette.inkSoft)),
      ...labelled(yTicks.major).map((y) => text(tickLabel(y), plot.left - 9, py(y), "end", palette.inkSoft)),
      text(`${data.parameterWords} (${unit.symbol})`, (plot.left + plot.right) / 2, height - 14, "middle", palette.ink, TITLE_FONT),
      text(curves.length > 0 ? "quanta ⟨N⟩" : "decoherence", 16, (plot.top + plot.bottom) / 2, "middle", palette.ink, TITLE_FONT, -90),
    ],
  });
  return { width, height, groups };
}
