/** Our words for the values stored in a scenario document. */
import type { BackgroundKind, LabPlacement, RampShape } from "@/physics/scenario/schema";

export const backgroundNames: Record<BackgroundKind, string> = {
  minkowski: "Minkowski",
  schwarzschild: "Schwarzschild",
  rindler: "Rindler wedge",
  "de-sitter": "de Sitter static patch",
};

export const backgroundKinds = Object.keys(backgroundNames) as BackgroundKind[];

export function backgroundName(kind: string): string {
  return kind in backgroundNames ? backgroundNames[kind as BackgroundKind] : kind;
}

export const placementNames: Record<LabPlacement["placement"], string> = {
  inertial: "inertial (no placement needed)",
  "areal-radius": "static at an areal radius",
  "proper-distance-above-horizon": "static at a proper distance above the horizon",
};

export const rampShapeNames: Record<RampShape, string> = {
  smoothstep: "smoothstep",
  cosine: "cosine",
  "minimum-jerk": "minimum jerk",
  linear: "linear",
};

export const roleNames = { owner: "Owner", editor: "Editor", viewer: "Viewer" } as const;
