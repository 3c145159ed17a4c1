/**
 * The Diagram's drawn size: its height follows its shape (tall for Minkowski, wide for Schwarzschild) within
 * bounds. One rule for the editor's Diagram and the figure command, so a figure made from a script is laid out as
 * the one on screen at the same width. Pure.
 */
import type { DiagramBackdrop } from "@/canvas/kernels/diagram/scene";

export const DIAGRAM_MIN_HEIGHT = 320;
export const DIAGRAM_MAX_HEIGHT = 540;

export function diagramHeightFor(bounds: DiagramBackdrop["bounds"] | null, width: number): number {
  if (!bounds) return DIAGRAM_MIN_HEIGHT;
  const aspect = (bounds.maxT - bounds.minT) / (bounds.maxX - bounds.minX);
  return Math.round(Math.min(DIAGRAM_MAX_HEIGHT, Math.max(DIAGRAM_MIN_HEIGHT, (width - 80) * aspect + 80)));
}
