/**
 * What a sweep of each parameter starts from: the document's current value of it, and a default range around it
 * (two decades either side, kept outside a black-hole horizon and inside a cosmological one).
 */
import { makeBackground } from "@/physics/backgrounds";
import { c } from "@/physics/constants";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import type { SweepParameter } from "@/physics/sweeps";

/** The value the parameter has now, SI; null where the document has none (no horizon to be distant from). */
export function currentSweepValue(document: ScenarioDocument, parameter: SweepParameter): number | null {
  const protocol = document.protocol;
  switch (parameter) {
    case "recombination-time":
      return protocol.kind === "segments" ? protocol.recombination.durationSeconds : null;
    case "hold-time":
      return protocol.kind === "segments" ? protocol.hold.durationSeconds : null;
    case "lab-distance":
      return labDistanceMetres(document.background, document.lab);
  }
}

/** The lab's distance as a sweep takes it (c²/a in the Rindler wedge, the areal radius elsewhere), SI; null in flat space. */
export function labDistanceMetres(background: ScenarioDocument["background"], lab: ScenarioDocument["lab"]): number | null {
  if (background.kind === "minkowski") return null;
  if (background.kind === "rindler") return (c * c) / background.accelerationMetresPerSecondSquared;
  return makeBackground(background, lab).labRadiusMetres || null;
}

const DECADES = 100;

export function defaultSweepRange(document: ScenarioDocument, parameter: SweepParameter): { from: number; to: number } | null {
  const current = currentSweepValue(document, parameter);
  if (parameter !== "lab-distance") {
    const value = current && current > 0 ? current : 0.01;
    return { from: value / DECADES, to: value * DECADES };
  }
  if (current === null) return null;
  const horizon = makeBackground(document.background, document.lab).horizon?.radiusMetres ?? 0;
  switch (document.background.kind) {
    case "schwarzschild":
      return { from: horizon * 1.01, to: Math.max(current, horizon) * DECADES };
    case "de-sitter":
      return { from: horizon * 1e-4, to: horizon * 0.99 };
    default:
      return { from: current / DECADES, to: current * DECADES };
  }
}
