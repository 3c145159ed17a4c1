/**
 * Backgrounds: build the Background for a scenario's background and lab placement, and the diagram helpers.
 */
import { c } from "../constants";
import { backgroundSchema, labPlacementSchema, type BackgroundSpec, type LabPlacement } from "../scenario/schema";
import { deSitterPositionAtProperDistance, deSitterPositionAtRadius, makeDeSitter, type DeSitterDiagramFrame } from "./de-sitter";
import { BackgroundInputError } from "./errors";
import { makeMinkowski } from "./minkowski";
import { makeRindler } from "./rindler";
import { makeSchwarzschild, type SchwarzschildDiagramFrame } from "./schwarzschild";
import {
  schwarzschildPositionAtProperDistance,
  schwarzschildPositionAtRadius,
  schwarzschildRadiusMetres,
} from "./schwarzschild-geometry";
import type { Background, StaticLabPosition } from "./types";

export { BackgroundInputError, type BackgroundInputErrorCode } from "./errors";
export type * from "./types";
export { diagramBoundaries, type DiagramBoundary, type DiagramBoundaryKind } from "./boundaries";
export { constantRadiusCurve, constantTimeCurve } from "./grid";
export { blackHoleInteriorToDiagram, singularityCurve } from "./schwarzschild-interior";
export { horizonTemperatureKelvin } from "./horizon-temperature";
export { schwarzschildRadiusMetres } from "./schwarzschild-geometry";
export type { SchwarzschildDiagramFrame } from "./schwarzschild";
export { deSitterDiagramRatePerSecond, type DeSitterDiagramFrame } from "./de-sitter";

export interface MakeBackgroundOptions {
  /** Minkowski only: the length L of the diagram's arctan((ct ± r)/L); default one light-second. */
  minkowskiDiagramScaleMetres?: number;
  /** Schwarzschild only: "lab-centred" puts the lab's worldline through the middle of the exterior (schwarzschild.ts). */
  schwarzschildDiagramFrame?: SchwarzschildDiagramFrame;
  /** de Sitter only: "lab-centred" puts the lab's worldline through the middle of the static patch (de-sitter.ts). */
  deSitterDiagramFrame?: DeSitterDiagramFrame;
}

const placementPath = "lab.placement";

function placementMismatch(background: BackgroundSpec, lab: LabPlacement, allowed: string): BackgroundInputError {
  return new BackgroundInputError(
    "placement-does-not-fit-background",
    placementPath,
    `a ${background.kind} lab takes the placement ${allowed}, not "${lab.placement}"`,
  );
}

/**
 * The Background of a scenario: its lab's acceleration, redshift, horizon, temperatures, tortoise coordinate,
 * conformal map and cautions (see each make* for formulas and sources).
 *
 * Placements: Minkowski takes "inertial" (the lab at rest at r = 0); Rindler takes "uniformly-accelerated" (the
 * accelerated observer at distance c²/a from its horizon). Schwarzschild takes "areal-radius" (r > 2GM/c²) or
 * "proper-distance-from-horizon" (radial proper distance above the horizon, inverted to r by Newton's method).
 * de Sitter takes "areal-radius" (0 ≤ r < c/H; r = 0 is the static geodesic observer at the centre) or
 * "proper-distance-from-horizon" read as the proper distance inward from the cosmological horizon (at most πc/2H,
 * the centre).
 *
 * Throws BackgroundInputError (with the document path) for invalid numbers, a placement the background does not
 * take, a lab on or inside a black-hole horizon, or on or beyond a cosmological horizon.
 */
export function makeBackground(background: BackgroundSpec, lab: LabPlacement, options: MakeBackgroundOptions = {}): Background {
  validate(background, lab);
  switch (background.kind) {
    case "minkowski":
      if (lab.placement !== "inertial") throw placementMismatch(background, lab, '"inertial"');
      return makeMinkowski(options.minkowskiDiagramScaleMetres ?? c);
    case "rindler":
      if (lab.placement !== "uniformly-accelerated") throw placementMismatch(background, lab, '"uniformly-accelerated" (its distance to the horizon is c²/a)');
      return makeRindler(background.accelerationMetresPerSecondSquared);
    case "schwarzschild": {
      const horizonRadiusMetres = schwarzschildRadiusMetres(background.massKg);
      return makeSchwarzschild(horizonRadiusMetres, schwarzschildPosition(background, lab, horizonRadiusMetres), options.schwarzschildDiagramFrame);
    }
    case "de-sitter":
      return makeDeSitter(background.hubbleRatePerSecond, deSitterPosition(background.hubbleRatePerSecond, lab), options.deSitterDiagramFrame);
  }
}

function validate(background: BackgroundSpec, lab: LabPlacement): void {
  for (const [prefix, result] of [
    ["background", backgroundSchema.safeParse(background)],
    ["lab", labPlacementSchema.safeParse(lab)],
  ] as const) {
    if (!result.success) {
      const issue = result.error.issues[0];
      throw new BackgroundInputError("invalid-input", [prefix, ...issue.path.map(String)].join("."), issue.message);
    }
  }
}

function schwarzschildPosition(background: BackgroundSpec, lab: LabPlacement, horizonRadiusMetres: number): StaticLabPosition {
  switch (lab.placement) {
    case "areal-radius":
      if (!(lab.arealRadiusMetres > horizonRadiusMetres)) {
        throw new BackgroundInputError(
          "lab-inside-horizon",
          "lab.arealRadiusMetres",
          `the lab radius ${lab.arealRadiusMetres} m is not outside the horizon at 2GM/c² = ${horizonRadiusMetres} m: no static lab exists there`,
        );
      }
      return schwarzschildPositionAtRadius(lab.arealRadiusMetres, horizonRadiusMetres);
    case "proper-distance-from-horizon":
      return schwarzschildPositionAtProperDistance(lab.properDistanceMetres, horizonRadiusMetres);
    case "inertial":
    case "uniformly-accelerated":
      throw placementMismatch(background, lab, '"areal-radius" or "proper-distance-from-horizon" (no inertial lab stays static near a black hole)');
  }
}

function deSitterPosition(hubbleRatePerSecond: number, lab: LabPlacement): StaticLabPosition {
  const horizonRadiusMetres = c / hubbleRatePerSecond;
  switch (lab.placement) {
    case "inertial":
    case "uniformly-accelerated":
      throw placementMismatch({ kind: "de-sitter", hubbleRatePerSecond }, lab, '"areal-radius" (0 for the static geodesic observer at the centre) or "proper-distance-from-horizon"');
    case "areal-radius":
      if (!(lab.arealRadiusMetres < horizonRadiusMetres)) {
        throw new BackgroundInputError(
          "lab-beyond-cosmological-horizon",
          "lab.arealRadiusMetres",
          `the lab radius ${lab.arealRadiusMetres} m is not inside the cosmological horizon at c/H = ${horizonRadiusMetres} m`,
        );
      }
      return deSitterPositionAtRadius(lab.arealRadiusMetres, hubbleRatePerSecond);
    case "proper-distance-from-horizon": {
      const centreDistanceMetres = (Math.PI / 2) * horizonRadiusMetres;
      if (lab.properDistanceMetres > centreDistanceMetres) {
        throw new BackgroundInputError(
          "lab-beyond-cosmological-horizon",
          "lab.properDistanceMetres",
          `the proper distance ${lab.properDistanceMetres} m inward from the cosmological horizon exceeds πc/2H = ${centreDistanceMetres} m, the distance to the centre`,
        );
      }
      return deSitterPositionAtProperDistance(lab.properDistanceMetres, hubbleRatePerSecond);
    }
  }
}
