/** Scenario documents for the physics tests, built from the default document. */
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import type { RampShape } from "@/physics/scenario/schema";

export interface SegmentsOptions {
  separationSeconds?: number;
  holdSeconds?: number;
  recombinationSeconds?: number;
  shape?: RampShape;
  recombinationShape?: RampShape;
}

export function segments(options: SegmentsOptions = {}): ScenarioDocument["protocol"] {
  return {
    kind: "segments",
    separation: { durationSeconds: options.separationSeconds ?? 0.01, shape: options.shape ?? "minimum-jerk" },
    hold: { durationSeconds: options.holdSeconds ?? 0.1 },
    recombination: { durationSeconds: options.recombinationSeconds ?? 0.01, shape: options.recombinationShape ?? options.shape ?? "minimum-jerk" },
  };
}

export function scenario(overrides: Partial<ScenarioDocument> = {}): ScenarioDocument {
  return { ...defaultScenarioDocument(), ...overrides };
}

export function withSource(doc: ScenarioDocument, source: Partial<ScenarioDocument["source"]>): ScenarioDocument {
  return { ...doc, source: { ...doc.source, ...source } };
}

export function withSeparation(doc: ScenarioDocument, separation: Partial<ScenarioDocument["separation"]>): ScenarioDocument {
  return { ...doc, separation: { ...doc.separation, ...separation } };
}

/** The value of a reported quantity, failing loudly if it is outside double range. */
export function valueOf(q: { value: number | null } | null): number {
  if (q === null || q.value === null) throw new Error("quantity is missing or outside double range");
  return q.value;
}
