/**
 * The document a new scenario starts from: the default flat-spacetime experiment, moved into the chosen
 * background with invented but sensible values, so every background opens with something to look at.
 */
import { defaultScenarioDocument, type BackgroundKind, type ScenarioDocument } from "@/physics/scenario/schema";

/** Ten solar masses, in kilograms. */
const TEN_SOLAR_MASSES_KG = 1.98841e31;

const starting: Record<BackgroundKind, Pick<ScenarioDocument, "background" | "lab">> = {
  minkowski: { background: { kind: "minkowski" }, lab: { placement: "inertial" } },
  schwarzschild: {
    background: { kind: "schwarzschild", massKg: TEN_SOLAR_MASSES_KG },
    lab: { placement: "areal-radius", arealRadiusMetres: 1.0e5 },
  },
  // The Rindler lab needs no placement: its acceleration puts it at c²/a from the horizon.
  rindler: { background: { kind: "rindler", accelerationMetresPerSecondSquared: 9.81 }, lab: { placement: "uniformly-accelerated" } },
  "de-sitter": {
    background: { kind: "de-sitter", hubbleRatePerSecond: 2.2e-18 },
    lab: { placement: "areal-radius", arealRadiusMetres: 1.0e25 },
  },
};

export function newScenarioDocument(kind: BackgroundKind): ScenarioDocument {
  return { ...defaultScenarioDocument(), ...structuredClone(starting[kind]) };
}
