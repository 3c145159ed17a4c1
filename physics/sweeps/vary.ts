/**
 * Copies of a scenario document with one parameter changed: the recombination time or hold time of a segments
 * protocol, the lab's distance (Schwarzschild and de Sitter: the areal radius; Rindler: the proper distance
 * c²/a to the horizon, so a = c²/x), or one of the environment's control parameters (the gas pressure, the
 * surroundings' temperature, the distance to the surface). Refuses, with a path, what a document cannot vary.
 */
import { c } from "../constants";
import { ScenarioInputError } from "../scenario/input-error";
import type { ScenarioDocument } from "../scenario/schema";

export type SweepParameter = "recombination-time" | "hold-time" | "lab-distance" | EnvironmentSweepParameter;

/** The environment's control parameters, each needing its part of the environment block. */
export type EnvironmentSweepParameter = "gas-pressure" | "surroundings-temperature" | "surface-distance";

export const ENVIRONMENT_SWEEP_PARAMETERS: readonly EnvironmentSweepParameter[] = ["gas-pressure", "surroundings-temperature", "surface-distance"];

const ENVIRONMENT_PART = { "gas-pressure": "gas", "surroundings-temperature": "radiation", "surface-distance": "surface" } as const;

export type SweepUnit = "s" | "m" | "Pa" | "K";

const UNITS: Record<SweepParameter, { unit: SweepUnit; dimension: "time" | "length" | "pressure" | "temperature" }> = {
  "recombination-time": { unit: "s", dimension: "time" },
  "hold-time": { unit: "s", dimension: "time" },
  "lab-distance": { unit: "m", dimension: "length" },
  "gas-pressure": { unit: "Pa", dimension: "pressure" },
  "surroundings-temperature": { unit: "K", dimension: "temperature" },
  "surface-distance": { unit: "m", dimension: "length" },
};

export function parameterUnit(parameter: SweepParameter): SweepUnit {
  return UNITS[parameter].unit;
}

/** The parameter's dimension, for parsing and printing its values at the edges (physics/units.ts). */
export function parameterDimension(parameter: SweepParameter): "time" | "length" | "pressure" | "temperature" {
  return UNITS[parameter].dimension;
}

export function isEnvironmentParameter(parameter: SweepParameter): parameter is EnvironmentSweepParameter {
  return parameter in ENVIRONMENT_PART;
}

/** Whether the document has what the parameter changes (the environment's part; a horizon for the lab distance). */
export function canVary(document: ScenarioDocument, parameter: SweepParameter): boolean {
  if (isEnvironmentParameter(parameter)) return Boolean(document.environment?.[ENVIRONMENT_PART[parameter]]);
  if (parameter === "lab-distance") return document.background.kind !== "minkowski";
  return document.protocol.kind === "segments";
}

export function withParameter(document: ScenarioDocument, parameter: SweepParameter, value: number): ScenarioDocument {
  if (parameter === "lab-distance") return withLabDistance(document, value);
  if (isEnvironmentParameter(parameter)) return withEnvironmentParameter(document, parameter, value);
  const protocol = document.protocol;
  if (protocol.kind !== "segments") {
    throw new ScenarioInputError("protocol.kind", `sweeping the ${parameter} needs a segments protocol, not "${protocol.kind}"`);
  }
  return parameter === "hold-time"
    ? { ...document, protocol: { ...protocol, hold: { durationSeconds: value } } }
    : { ...document, protocol: { ...protocol, recombination: { ...protocol.recombination, durationSeconds: value } } };
}

function withLabDistance(document: ScenarioDocument, metres: number): ScenarioDocument {
  switch (document.background.kind) {
    case "minkowski":
      throw new ScenarioInputError("background.kind", "a Minkowski lab has no distance to sweep: there is no horizon");
    case "rindler":
      return { ...document, background: { kind: "rindler", accelerationMetresPerSecondSquared: (c * c) / metres } };
    case "schwarzschild":
    case "de-sitter":
      return { ...document, lab: { placement: "areal-radius", arealRadiusMetres: metres } };
  }
}

function withEnvironmentParameter(document: ScenarioDocument, parameter: EnvironmentSweepParameter, value: number): ScenarioDocument {
  const environment = document.environment;
  const part = ENVIRONMENT_PART[parameter];
  if (!environment?.[part]) throw new ScenarioInputError(`environment.${part}`, `sweeping the ${parameter} needs the environment's ${part === "radiation" ? "thermal radiation" : part}: add it first`);
  switch (parameter) {
    case "gas-pressure":
      return { ...document, environment: { ...environment, gas: { ...environment.gas!, pressurePascals: value } } };
    case "surroundings-temperature":
      return { ...document, environment: { ...environment, radiation: { surroundingsTemperatureKelvin: value } } };
    case "surface-distance":
      return { ...document, environment: { ...environment, surface: { ...environment.surface!, distanceMetres: value } } };
  }
}
