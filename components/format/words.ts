/** Our words for the values stored in a scenario document. */
import type { BackgroundKind, LabPlacement, RampShape, ScenarioDocument } from "@/physics/scenario/schema";

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
  inertial: "inertial, at rest",
  "uniformly-accelerated": "uniformly accelerated, c²/a from the horizon",
  "areal-radius": "static at an areal radius",
  "proper-distance-from-horizon": "static at a proper distance from the horizon",
};

export const rampShapeNames: Record<RampShape, string> = {
  cubic: "cubic (3u² − 2u³)",
  cosine: "cosine",
  "minimum-jerk": "minimum jerk",
  linear: "linear",
};

export const splitNames: Record<ScenarioDocument["separation"]["split"], string> = {
  symmetric: "symmetric (±d/2)",
  "one-branch-stays": "branch B stays",
};

export const protocolKindNames: Record<ScenarioDocument["protocol"]["kind"], string> = {
  segments: "ramps",
  formula: "formula σ(t)",
  sampled: "measured profile",
};

export const roleNames = { owner: "Owner", editor: "Editor", viewer: "Viewer" } as const;
