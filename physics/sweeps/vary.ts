/**
 * Copies of a scenario document with one parameter changed: the recombination time or hold time of a segments
 * protocol, or the lab's distance (Schwarzschild and de Sitter: the areal radius; Rindler: the proper distance
 * c²/a to the horizon, so a = c²/x). Refuses, with a path, what a document cannot vary.
 */
import { c } from "../constants";
import { ScenarioInputError } from "../scenario/input-error";
import type { ScenarioDocument } from "../scenario/schema";

export type SweepParameter = "recombination-time" | "hold-time" | "lab-distance";

export function parameterUnit(parameter: SweepParameter): "s" | "m" {
  return parameter === "lab-distance" ? "m" : "s";
}

export function withParameter(document: ScenarioDocument, parameter: SweepParameter, value: number): ScenarioDocument {
  if (parameter === "lab-distance") return withLabDistance(document, value);
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
