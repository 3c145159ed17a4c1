/**
 * Colours of the figures (Diagram and Offsets), light and dark: the dark theme swaps ink and paper for
 * projection and keeps the branch colours (Okabe–Ito orange and blue), which read on both.
 */
import type { ScenarioDocument } from "@/physics/scenario/schema";

export interface FigurePalette {
  paper: string;
  /** Regions drawn for context only (beyond the lab's static region). */
  contextPaper: string;
  ink: string;
  inkSoft: string;
  inkFaint: string;
  rule: string;
  branchA: string;
  branchB: string;
  /** Radiation toward null infinity (branch A's tint) and into the horizon (branch B's tint). */
  farFieldTint: string;
  horizonTint: string;
  focus: string;
}

export const FIGURE_PALETTES: Record<ScenarioDocument["display"]["theme"], FigurePalette> = {
  light: {
    paper: "#fbfaf7",
    contextPaper: "#f3f1ec",
    ink: "#1c2024",
    inkSoft: "#4a5058",
    inkFaint: "#666b73",
    rule: "#d9d6cf",
    branchA: "#E69F00",
    branchB: "#0072B2",
    farFieldTint: "rgba(230, 159, 0, 0.16)",
    horizonTint: "rgba(0, 114, 178, 0.13)",
    focus: "#0072B2",
  },
  dark: {
    paper: "#1c2024",
    contextPaper: "#23282d",
    ink: "#fbfaf7",
    inkSoft: "#c9c6bf",
    inkFaint: "#8e939a",
    rule: "#3b4148",
    branchA: "#E69F00",
    branchB: "#3d9fd6",
    farFieldTint: "rgba(230, 159, 0, 0.20)",
    horizonTint: "rgba(61, 159, 214, 0.20)",
    focus: "#56B4E9",
  },
};

/** Dash patterns, so the branches differ in greyscale too: A solid, B dashed; null infinity a thin long dash. */
export const DASHES = {
  branchA: [] as number[],
  branchB: [7, 4],
  nullInfinity: [12, 5],
  context: [3, 3],
};
