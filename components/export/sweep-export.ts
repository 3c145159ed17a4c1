/**
 * The Sweep as an exported figure: what the Sweep panel shows (decoherence against the swept parameter, the
 * scenario's current value, the smallest decoherence found), drawn from the sweep's result by
 * canvas/export/sweep-figure.ts, with the legend and the caption line under it. The Export menu and the figure
 * command both go through here. Pure: no React, no DOM.
 */
import { exportPalette, type StandaloneOptions } from "@/canvas/export/export-figure";
import { figureCaption, CAPTION_SEPARATOR } from "@/canvas/export/figure-caption";
import type { LegendEntry } from "@/canvas/export/figure-legend";
import { withBand, type ExportDrawing, type MeasureText } from "@/canvas/export/standalone-figure";
import { sweepChartDrawing, type SweepChartData } from "@/canvas/export/sweep-figure";
import { sweepCurves } from "@/canvas/kernels/sweep-channels";
import { currentSweepValue } from "@/canvas/kernels/sweep-range";
import { DASHES } from "@/canvas/theme";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { parameterDimension, type SweepParameter, type SweepResult } from "@/physics/sweeps";
import { formatQuantity } from "@/physics/units";

export const SWEEP_PARAMETER_WORDS: Record<SweepParameter, string> = {
  "recombination-time": "recombination time",
  "hold-time": "hold time",
  "lab-distance": "lab distance",
  "gas-pressure": "gas pressure",
  "surroundings-temperature": "surroundings temperature",
  "surface-distance": "surface distance",
};

export const DEFAULT_SWEEP_FIGURE_SIZE = { width: 640, height: 400 };

export function sweepChartData(document: ScenarioDocument, sweep: SweepResult): SweepChartData {
  return {
    points: sweep.points.flatMap((p) => (p.decoherence.value !== null && p.decoherence.value > 0 ? [{ x: p.x, decoherence: p.decoherence.value }] : [])),
    parameterWords: SWEEP_PARAMETER_WORDS[sweep.parameter],
    dimension: parameterDimension(sweep.parameter),
    now: currentSweepValue(document, sweep.parameter),
    curves: sweepCurves(sweep.points).map((c) => ({
      words: c.words,
      colour: c.colour,
      dash: c.dash,
      width: c.width,
      points: sweep.points.flatMap((p, i) => (c.values[i] === null ? [] : [{ x: p.x, y: c.values[i]! }])),
    })),
  };
}

/** The caption of a sweep: the scenario's, then what was swept over which range. */
export function sweepCaption(document: ScenarioDocument, sweep: SweepResult): string {
  const dimension = parameterDimension(sweep.parameter);
  const xs = sweep.points.map((p) => p.x);
  const range = xs.length > 0 ? ` from ${formatQuantity(Math.min(...xs), dimension)} to ${formatQuantity(Math.max(...xs), dimension)}` : "";
  return `${figureCaption(document)}${CAPTION_SEPARATOR}sweep of the ${SWEEP_PARAMETER_WORDS[sweep.parameter]}${range}, ${sweep.points.length} points, log-spaced`;
}

export function sweepDrawing(
  document: ScenarioDocument,
  sweep: SweepResult,
  size: { width: number; height: number },
  options: StandaloneOptions,
  measure?: MeasureText,
): ExportDrawing {
  const palette = exportPalette(options.theme);
  const data = sweepChartData(document, sweep);
  const curves: LegendEntry[] = (data.curves ?? []).map((c) => ({ kind: "line", words: `⟨N⟩, ${c.words}`, stroke: c.colour === "#1c2024" ? palette.ink : c.colour, width: c.width, dash: c.dash }));
  const legend: LegendEntry[] = [
    ...(curves.length > 0 ? curves : [{ kind: "line" as const, words: "decoherence, both channels", stroke: palette.branchB, width: 2, dash: DASHES.branchA }]),
    { kind: "line", words: "now (the scenario's value)", stroke: palette.branchA, width: 2, dash: [] },
  ];
  return withBand(
    sweepChartDrawing(data, size, palette, options.ground === "solid"),
    { legend: options.legend ? legend : null, caption: options.caption ? sweepCaption(document, sweep) : null, palette, paper: options.ground === "solid" },
    measure,
  );
}
