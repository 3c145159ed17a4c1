/**
 * The figure an export writes: the scene on screen, in the scenario's theme, on a solid or a transparent ground, and
 * (by default) standing alone with its legend, caption line and notes under it (standalone-figure.ts).
 */
import type { ScenarioDocument } from "@/physics/scenario/schema";
import type { DiagramScene } from "../kernels/diagram/scene";
import { FIGURE_PALETTES, type FigurePalette } from "../theme";
import { diagramFigure, type DiagramFigure } from "./diagram-figure";
import { figureCaption } from "./figure-caption";
import { diagramLegend, drawnRadiation } from "./figure-legend";
import { withBand, type ExportDrawing, type MeasureText } from "./standalone-figure";

export type FigureGround = "solid" | "transparent";
export type FigureTheme = ScenarioDocument["display"]["theme"];

/** A light figure for a paper is printed on white, not on the screen's paper tone; a dark one keeps its ground. */
export function exportPalette(theme: FigureTheme): FigurePalette {
  const palette = FIGURE_PALETTES[theme];
  return theme === "light" ? { ...palette, paper: "#ffffff" } : palette;
}

export function exportFigure(scene: DiagramScene, size: { width: number; height: number }, theme: FigureTheme, ground: FigureGround): DiagramFigure {
  return diagramFigure(scene, size, exportPalette(theme), { paperBackground: ground === "solid" });
}

/** What the Export menu and the figure command let a user choose; legend and caption are on by default. */
export interface StandaloneOptions {
  theme: FigureTheme;
  ground: FigureGround;
  legend: boolean;
  caption: boolean;
}

export const DEFAULT_STANDALONE: Omit<StandaloneOptions, "theme"> = { ground: "solid", legend: true, caption: true };

/** The Diagram as its exported file draws it: the figure on screen at `size`, with the band under it. */
export function exportDiagramDrawing(document: ScenarioDocument, scene: DiagramScene, size: { width: number; height: number }, options: StandaloneOptions, measure?: MeasureText): ExportDrawing {
  const palette = exportPalette(options.theme);
  const figure = exportFigure(scene, size, options.theme, options.ground);
  return withBand(
    figure,
    {
      legend: options.legend ? diagramLegend(palette, drawnRadiation(scene.protocol?.strips ?? [])) : null,
      caption: options.caption ? figureCaption(document) : null,
      notes: scene.notes,
      palette,
      paper: options.ground === "solid",
    },
    measure,
  );
}
