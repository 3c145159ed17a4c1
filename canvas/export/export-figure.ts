/** The figure an export writes: the scene on screen, in the scenario's theme, on a solid or a transparent ground. */
import type { ScenarioDocument } from "@/physics/scenario/schema";
import type { DiagramScene } from "../kernels/diagram/scene";
import { FIGURE_PALETTES, type FigurePalette } from "../theme";
import { diagramFigure, type DiagramFigure } from "./diagram-figure";

export type FigureGround = "solid" | "transparent";

/** A light figure for a paper is printed on white, not on the screen's paper tone; a dark one keeps its ground. */
export function exportPalette(theme: ScenarioDocument["display"]["theme"]): FigurePalette {
  const palette = FIGURE_PALETTES[theme];
  return theme === "light" ? { ...palette, paper: "#ffffff" } : palette;
}

export function exportFigure(scene: DiagramScene, size: { width: number; height: number }, theme: ScenarioDocument["display"]["theme"], ground: FigureGround): DiagramFigure {
  return diagramFigure(scene, size, exportPalette(theme), { paperBackground: ground === "solid" });
}
