/**
 * A parameter map as an exported figure (SVG, PNG, PDF through canvas/export/render-figure.ts) and as words: the
 * figure model of canvas/export/map-figure.ts with the legend and, in the caption, the scenario and what was mapped
 * (both axes with their ranges, points and spacing, the quantity) — so the file says where its numbers come from.
 * Pure: no React, no DOM.
 */
import { exportPalette, type StandaloneOptions } from "@/canvas/export/export-figure";
import { CAPTION_SEPARATOR, figureCaption } from "@/canvas/export/figure-caption";
import type { LegendEntry } from "@/canvas/export/figure-legend";
import { mapFigureDrawing, type MapFigureData } from "@/canvas/export/map-figure";
import { withBand, type ExportDrawing, type MeasureText } from "@/canvas/export/standalone-figure";
import { currentSweepValue } from "@/canvas/kernels/sweep-range";
import type { MapAxis, MapGrid, MapQuantity, MapRequest } from "@/physics/maps/axes";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { parameterDimension } from "@/physics/sweeps/vary";
import { formatQuantity } from "@/physics/units";
import { SWEEP_PARAMETER_WORDS } from "./sweep-export";

export const MAP_QUANTITY_WORDS: Record<MapQuantity, string> = {
  "total-quanta": "total ⟨N⟩, both channels",
  "electromagnetic-quanta": "⟨N⟩, electromagnetic",
  "gravitational-quanta": "⟨N⟩, gravitational",
  decoherence: "decoherence 𝒟",
  "decoherence-time": "decoherence time",
};

export const DEFAULT_MAP_FIGURE_SIZE = { width: 640, height: 460 };

export interface MapToDraw {
  request: MapRequest;
  result: MapGrid;
}

/** A finished map and the document it was computed for (its inputs, for the caption). */
export interface MapToExport extends MapToDraw {
  document: ScenarioDocument;
}

export function mapFigureData(document: ScenarioDocument, map: MapToDraw): MapFigureData {
  const x = currentSweepValue(document, map.request.x.parameter);
  const y = currentSweepValue(document, map.request.y.parameter);
  return {
    grid: map.result,
    xWords: SWEEP_PARAMETER_WORDS[map.request.x.parameter],
    yWords: SWEEP_PARAMETER_WORDS[map.request.y.parameter],
    quantityWords: MAP_QUANTITY_WORDS[map.request.quantity],
    now: x !== null && y !== null ? { x, y } : null,
  };
}

function axisWords(axis: MapAxis): string {
  const dimension = parameterDimension(axis.parameter);
  return `${SWEEP_PARAMETER_WORDS[axis.parameter]} ${formatQuantity(axis.from, dimension)} to ${formatQuantity(axis.to, dimension)}, ${axis.points} points, ${axis.scale}`;
}

/** The caption: the scenario's, then the map's inputs. */
export function mapCaption(document: ScenarioDocument, request: MapRequest): string {
  return [figureCaption(document), `map of ${MAP_QUANTITY_WORDS[request.quantity]}`, `x: ${axisWords(request.x)}`, `y: ${axisWords(request.y)}`].join(CAPTION_SEPARATOR);
}

/** The figure with its band: the scenario's point now (`current`), the map's own inputs in the caption. */
export function mapDrawing(current: ScenarioDocument, map: MapToExport, size: { width: number; height: number }, options: StandaloneOptions, measure?: MeasureText): ExportDrawing {
  const palette = exportPalette(options.theme);
  const legend: LegendEntry[] = [
    { kind: "line", words: "optimum (best value along the recombination time)", stroke: palette.branchA, width: 2, dash: [6, 4] },
    { kind: "line", words: "contours at whole decades", stroke: palette.ink, width: 0.75, dash: [] },
  ];
  return withBand(
    mapFigureDrawing(mapFigureData(current, map), size, palette, options.ground === "solid"),
    { legend: options.legend ? legend : null, caption: options.caption ? mapCaption(map.document, map.request) : null, palette, paper: options.ground === "solid" },
    measure,
  );
}
