/**
 * What a sweep of each parameter starts from: the document's current value of it, and a default range around it
 * (two decades either side, kept outside a black-hole horizon and inside a cosmological one).
 */
import { makeBackground } from "@/physics/backgrounds";
import { c } from "@/physics/constants";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { ENVIRONMENT_SWEEP_PARAMETERS, type SweepParameter } from "@/physics/sweeps";

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
    case "gas-pressure":
      return document.environment?.gas?.pressurePascals ?? null;
    case "surroundings-temperature":
      return document.environment?.radiation?.surroundingsTemperatureKelvin ?? null;
    case "surface-distance":
      return document.environment?.surface?.distanceMetres ?? null;
  }
}

/** The lab's distance as a sweep takes it (c²/a in the Rindler wedge, the areal radius elsewhere), SI; null in flat space. */
export function labDistanceMetres(background: ScenarioDocument["background"], lab: ScenarioDocument["lab"]): number | null {
  if (background.kind === "minkowski") return null;
  if (background.kind === "rindler") return (c * c) / background.accelerationMetresPerSecondSquared;
  return makeBackground(background, lab).labRadiusMetres || null;
}

const DECADES = 100;

/** A temperature sweep runs up to room temperature (or today's value, if hotter). */
const HOTTEST_SURROUNDINGS_KELVIN = 300;

export function defaultSweepRange(document: ScenarioDocument, parameter: SweepParameter): { from: number; to: number } | null {
  const current = currentSweepValue(document, parameter);
  if (parameter === "gas-pressure" || parameter === "surroundings-temperature" || parameter === "surface-distance") {
    if (current === null) return null;
    // A surroundings at 0 K (allowed) has no decade around it: start the sweep at 10 mK.
    const value = current > 0 ? current : 0.01;
    if (parameter === "surroundings-temperature") return { from: Math.min(value, HOTTEST_SURROUNDINGS_KELVIN) / DECADES, to: Math.max(value, HOTTEST_SURROUNDINGS_KELVIN) };
    // Pressures: four decades down (a better pump), two up (a leak).
    if (parameter === "gas-pressure") return { from: value / 1e4, to: value * DECADES };
    // Distances: from a tenth of today's (closer to the chip) to a hundred times.
    return { from: value / 10, to: value * DECADES };
  }
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

/**
 * The parameters a map of this document can vary, in the order a map offers them: the segment times, a horizon
 * distance, and the environment's parameters it has a part for. The Map panel and `branchline map` share it.
 */
export function mapParametersFor(document: ScenarioDocument): SweepParameter[] {
  return [
    ...(document.protocol.kind === "segments" ? (["recombination-time", "hold-time"] as const) : []),
    ...(document.background.kind === "minkowski" ? [] : (["lab-distance"] as const)),
    ...ENVIRONMENT_SWEEP_PARAMETERS.filter((p) => defaultSweepRange(document, p) !== null),
  ];
}
