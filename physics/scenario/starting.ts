/**
 * Where each background starts, built from the constants: the one source for a new scenario (the New scenario
 * form) and for switching the background in the editor, so both open on the same, physically plain lab.
 * - Minkowski: an inertial lab at rest.
 * - Schwarzschild: 10 M☉ with the lab at five horizon radii, outside the photon sphere (1.5 r_s).
 * - Rindler: a lab accelerated at the standard acceleration of gravity g_n (so c²/a, its distance from the
 *   horizon, is about a light-year).
 * - de Sitter: today's Hubble rate, H ≈ 67.7 km s⁻¹ Mpc⁻¹ ≈ 2.2 × 10⁻¹⁸ s⁻¹ (Planck Collaboration, A&A 641, A6
 *   (2020), rounded), with the lab at the centre, r = 0: the static geodesic observer.
 */
import { schwarzschildRadiusMetres } from "../backgrounds/schwarzschild-geometry";
import { solarMass, standardGravity } from "../constants";
import { defaultScenarioDocument, type BackgroundKind, type ScenarioDocument } from "./schema";

export const STARTING_BLACK_HOLE_SOLAR_MASSES = 10;
export const STARTING_LAB_RADIUS_IN_HORIZON_RADII = 5;
export const STARTING_HUBBLE_RATE_PER_SECOND = 2.2e-18;

/** A background of this kind with its starting parameter, and a lab placement it takes. */
export function startingBackground(kind: BackgroundKind): Pick<ScenarioDocument, "background" | "lab"> {
  switch (kind) {
    case "minkowski":
      return { background: { kind }, lab: { placement: "inertial" } };
    case "rindler":
      return { background: { kind, accelerationMetresPerSecondSquared: standardGravity.value }, lab: { placement: "uniformly-accelerated" } };
    case "de-sitter":
      return { background: { kind, hubbleRatePerSecond: STARTING_HUBBLE_RATE_PER_SECOND }, lab: { placement: "areal-radius", arealRadiusMetres: 0 } };
    case "schwarzschild": {
      const massKg = STARTING_BLACK_HOLE_SOLAR_MASSES * solarMass.value;
      return { background: { kind, massKg }, lab: { placement: "areal-radius", arealRadiusMetres: STARTING_LAB_RADIUS_IN_HORIZON_RADII * schwarzschildRadiusMetres(massKg) } };
    }
  }
}

/** A new scenario on this background: the default experiment (physics/scenario/schema.ts) moved into it. */
export function newScenarioDocument(kind: BackgroundKind): ScenarioDocument {
  return { ...defaultScenarioDocument(), ...startingBackground(kind) };
}
