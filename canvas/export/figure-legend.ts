/**
 * The key to a figure, from the figure's own palette (so a dark figure's legend shows the dark figure's colours):
 * branch A orange and solid, branch B blue and dashed (DESIGN.md), and the radiation tints the Diagram draws for
 * this scenario. One list for the legend under the Diagram on screen and the one written into an exported file.
 */
import type { RadiationStrip } from "../kernels/diagram/protocol-path";
import { DASHES, type FigurePalette } from "../theme";

export type RadiationKind = RadiationStrip["kind"];

export type LegendEntry =
  | { kind: "line"; words: string; stroke: string; width: number; dash: number[] }
  | { kind: "area"; words: string; fill: string };

export const RADIATION_WORDS: Record<RadiationKind, string> = {
  "far-field": "radiated to null infinity ℐ⁺ by the ramps",
  horizon: "taken by the horizon while apart",
};

export const BRANCH_WORDS = { a: "branch A (solid)", b: "branch B (dashed)" } as const;

export function branchLegend(palette: FigurePalette): LegendEntry[] {
  return [
    { kind: "line", words: BRANCH_WORDS.a, stroke: palette.branchA, width: 2.5, dash: DASHES.branchA },
    { kind: "line", words: BRANCH_WORDS.b, stroke: palette.branchB, width: 2, dash: DASHES.branchB },
  ];
}

/** The Diagram's key: both branches, then each kind of radiation it draws (none where nothing is drawn). */
export function diagramLegend(palette: FigurePalette, radiation: readonly RadiationKind[]): LegendEntry[] {
  const tint: Record<RadiationKind, string> = { "far-field": palette.farFieldTint, horizon: palette.horizonTint };
  return [
    ...branchLegend(palette),
    ...(["far-field", "horizon"] as const).filter((k) => radiation.includes(k)).map((k): LegendEntry => ({ kind: "area", words: RADIATION_WORDS[k], fill: tint[k] })),
  ];
}

/** The kinds of radiation a drawn protocol shows, in a stable order. */
export function drawnRadiation(strips: readonly { kind: RadiationKind }[]): RadiationKind[] {
  const kinds = new Set(strips.map((s) => s.kind));
  return (["far-field", "horizon"] as const).filter((k) => kinds.has(k));
}
