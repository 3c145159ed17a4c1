/**
 * The edges and corners of each background's conformal diagram, as labelled polylines for drawing, in the
 * coordinates of compactify.ts. Straight edges are exact: ℐ±, H± are lines of constant P or Q, and in the unit
 * Kruskal scale the Schwarzschild singularity is straight too (schwarzschild-interior.ts).
 */
import type { Background, DiagramPoint } from "./types";
import { singularityCurve } from "./schwarzschild-interior";

export type DiagramBoundaryKind = "null-infinity" | "horizon" | "spatial-infinity" | "timelike-infinity" | "singularity" | "centre";

export interface DiagramBoundary {
  /** The label of the trade: ℐ⁺, ℐ⁻, H⁺, H⁻, i⁰, i⁺, i⁻, singularity, r = 0. */
  label: string;
  kind: DiagramBoundaryKind;
  /** False for edges drawn for context that do not touch the lab's static region (e.g. the far side of region II). */
  bordersLabRegion: boolean;
  /** A polyline; a single point for i⁰, i⁺, i⁻. */
  points: DiagramPoint[];
}

const pt = (T: number, X: number): DiagramPoint => ({ T, X });

function edge(label: string, kind: DiagramBoundaryKind, points: DiagramPoint[], bordersLabRegion = true): DiagramBoundary {
  return { label, kind, bordersLabRegion, points };
}

/** The exterior diamond shared by the Schwarzschild region I and the Rindler wedge: bifurcation (0, 0), far corner (0, 1). */
function wedgeHorizons(): DiagramBoundary[] {
  return [edge("H⁺", "horizon", [pt(0, 0), pt(0.5, 0.5)]), edge("H⁻", "horizon", [pt(-0.5, 0.5), pt(0, 0)])];
}

/**
 * Labelled boundary paths of the diagram of `background` (only its kind matters: the diagrams are normalised).
 * Minkowski: the plane through the lab along the separation axis (x from −∞ to ∞), the diamond |T| + |X| ≤ 1 with
 * i⁻ (−1, 0), i⁺ (1, 0), i⁰ at (0, ±1) and the lab's x = 0 on X = 0.
 * Rindler: the full (1+1) Minkowski diamond |T| + |X| = 1, the lab's wedge bounded by H± through the origin.
 * Schwarzschild: exterior diamond with i⁻ (−½, ½), i⁰ (0, 1), i⁺ (½, ½), H± through the bifurcation (0, 0), and the
 * black-hole interior up to the singularity T = ½. de Sitter: the square |T| ≤ 1, 0 ≤ X ≤ 2, ℐ± on T = ±1, the
 * lab's pole r = 0 on X = 0, the static patch bounded by H± on the diagonals through (0, 1); static worldlines end at
 * i⁺ = (1, 0).
 */
export function diagramBoundaries(background: Pick<Background, "kind">, singularitySamples = 2): DiagramBoundary[] {
  switch (background.kind) {
    case "minkowski":
      return [
        edge("ℐ⁺", "null-infinity", [pt(0, 1), pt(1, 0)]),
        edge("ℐ⁻", "null-infinity", [pt(-1, 0), pt(0, 1)]),
        edge("ℐ⁺", "null-infinity", [pt(1, 0), pt(0, -1)]),
        edge("ℐ⁻", "null-infinity", [pt(0, -1), pt(-1, 0)]),
        edge("i⁺", "timelike-infinity", [pt(1, 0)]),
        edge("i⁻", "timelike-infinity", [pt(-1, 0)]),
        edge("i⁰", "spatial-infinity", [pt(0, 1)]),
        edge("i⁰", "spatial-infinity", [pt(0, -1)]),
      ];
    case "rindler":
      return [
        ...wedgeHorizons(),
        edge("ℐ⁺", "null-infinity", [pt(0.5, 0.5), pt(0, 1)]),
        edge("ℐ⁻", "null-infinity", [pt(-0.5, 0.5), pt(0, 1)]),
        edge("ℐ⁺", "null-infinity", [pt(0, -1), pt(1, 0), pt(0.5, 0.5)], false),
        edge("ℐ⁻", "null-infinity", [pt(-0.5, 0.5), pt(-1, 0), pt(0, -1)], false),
        edge("i⁺", "timelike-infinity", [pt(1, 0)], false),
        edge("i⁻", "timelike-infinity", [pt(-1, 0)], false),
        edge("i⁰", "spatial-infinity", [pt(0, 1)]),
        edge("i⁰", "spatial-infinity", [pt(0, -1)], false),
      ];
    case "schwarzschild":
      return [
        ...wedgeHorizons(),
        edge("ℐ⁺", "null-infinity", [pt(0.5, 0.5), pt(0, 1)]),
        edge("ℐ⁻", "null-infinity", [pt(-0.5, 0.5), pt(0, 1)]),
        edge("i⁺", "timelike-infinity", [pt(0.5, 0.5)]),
        edge("i⁻", "timelike-infinity", [pt(-0.5, 0.5)]),
        edge("i⁰", "spatial-infinity", [pt(0, 1)]),
        edge("singularity", "singularity", singularityCurve(singularitySamples), false),
        edge("H⁺", "horizon", [pt(0, 0), pt(0.5, -0.5)], false),
      ];
    case "de-sitter":
      return [
        edge("H⁺", "horizon", [pt(0, 1), pt(1, 0)]),
        edge("H⁻", "horizon", [pt(-1, 0), pt(0, 1)]),
        edge("r = 0", "centre", [pt(-1, 0), pt(1, 0)]),
        edge("i⁺", "timelike-infinity", [pt(1, 0)]),
        edge("i⁻", "timelike-infinity", [pt(-1, 0)]),
        edge("ℐ⁺", "null-infinity", [pt(1, 0), pt(1, 2)], false),
        edge("ℐ⁻", "null-infinity", [pt(-1, 0), pt(-1, 2)], false),
        edge("r = 0", "centre", [pt(-1, 2), pt(1, 2)], false),
      ];
  }
}
