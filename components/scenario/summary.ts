/** One-line descriptions of a scenario's background and lab, with units, for hints and lists. */
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { formatAcceleration, formatLength, formatMass, formatRate } from "@/components/format/quantities";

export function backgroundSummary(background: ScenarioDocument["background"]): string {
  switch (background.kind) {
    case "minkowski":
      return "Flat spacetime";
    case "schwarzschild":
      return `Black hole of M = ${formatMass(background.massKg)}`;
    case "rindler":
      return `Lab acceleration a = ${formatAcceleration(background.accelerationMetresPerSecondSquared)}`;
    case "de-sitter":
      return `Hubble rate H = ${formatRate(background.hubbleRatePerSecond)}`;
  }
}

export function labSummary(lab: ScenarioDocument["lab"], backgroundKind?: ScenarioDocument["background"]["kind"]): string {
  switch (lab.placement) {
    case "inertial":
      return "inertial lab";
    case "uniformly-accelerated":
      return "uniformly accelerated lab";
    case "areal-radius":
      return `lab static at areal radius r = ${formatLength(lab.arealRadiusMetres)}`;
    case "proper-distance-from-horizon":
      return `lab static ${formatLength(lab.properDistanceMetres)} (proper distance) ${backgroundKind === "de-sitter" ? "inward from" : "above"} the horizon`;
  }
}
