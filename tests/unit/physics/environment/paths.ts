/** Branch paths for the environment tests, from the physics tests' scenario documents. */
import type { BranchPaths } from "@/physics/environment";
import { separationHistory } from "@/physics/protocols";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { scenario, segments, withSeparation, type SegmentsOptions } from "../scenarios";

export function pathsOf(doc: ScenarioDocument): BranchPaths {
  return { history: separationHistory(doc), split: doc.separation.split };
}

/** Linear ramps of the given durations around a hold, full separation d, split as given. */
export function linearPaths(d: number, options: SegmentsOptions = {}, split: ScenarioDocument["separation"]["split"] = "symmetric"): BranchPaths {
  return pathsOf(withSeparation(scenario({ protocol: segments({ shape: "linear", ...options }) }), { distanceMetres: d, split }));
}

/** ∫σ² dt of linear ramps around a hold: each ramp contributes a third of its duration (∫₀¹u²du = 1/3). */
export function linearSquaredSeparationSeconds(options: Required<Pick<SegmentsOptions, "separationSeconds" | "holdSeconds" | "recombinationSeconds">>): number {
  return options.separationSeconds / 3 + options.holdSeconds + options.recombinationSeconds / 3;
}

/** Magnitudes reported as numbers (never outside double range in these tests). */
export function numberOf(q: { value: number | null }): number {
  if (q.value === null) throw new Error("outside double range");
  return q.value;
}
