/**
 * Sweeps: ⟨N⟩ and 𝒟 against the recombination time, the hold time or the lab's distance, at points evenly spaced
 * in the logarithm between two values, reporting progress through an optional callback after each point.
 */
import { computeScenario, type ComputeOptions } from "../compute";
import type { Quantity } from "../result-basics";
import { ScenarioInputError } from "../scenario/input-error";
import type { ScenarioDocument } from "../scenario/schema";
import { parameterUnit, withParameter, type SweepParameter } from "./vary";

export interface SweepRequest {
  parameter: SweepParameter;
  fromValue: number;
  toValue: number;
  points: number;
}

export interface SweepPoint {
  /** The parameter's value, SI (s or m). */
  x: number;
  totalQuanta: Quantity;
  decoherence: Quantity;
  electromagneticQuanta: Quantity;
  gravitationalQuanta: Quantity;
}

export interface SweepResult {
  parameter: SweepParameter;
  unit: "s" | "m";
  spacing: "log";
  points: SweepPoint[];
}

export interface SweepOptions {
  onProgress?: (done: number, total: number) => void;
  compute?: ComputeOptions;
}

export const MAX_SWEEP_POINTS = 10_000;

export function logSpaced(from: number, to: number, points: number): number[] {
  if (points === 1) return [from];
  const a = Math.log(from);
  const b = Math.log(to);
  return Array.from({ length: points }, (_, i) => Math.exp(a + ((b - a) * i) / (points - 1)));
}

function validate(request: SweepRequest): void {
  if (!(request.fromValue > 0 && Number.isFinite(request.fromValue))) throw new ScenarioInputError("sweep.fromValue", "the sweep must start at a positive number");
  if (!(request.toValue > 0 && Number.isFinite(request.toValue))) throw new ScenarioInputError("sweep.toValue", "the sweep must end at a positive number");
  if (!Number.isInteger(request.points) || request.points < 1 || request.points > MAX_SWEEP_POINTS) {
    throw new ScenarioInputError("sweep.points", `a sweep takes 1 to ${MAX_SWEEP_POINTS} points`);
  }
}

export function sweepScenario(document: ScenarioDocument, request: SweepRequest, options: SweepOptions = {}): SweepResult {
  validate(request);
  const xs = logSpaced(request.fromValue, request.toValue, request.points);
  const points = xs.map((x, i) => {
    const result = computeScenario(withParameter(document, request.parameter, x), options.compute);
    options.onProgress?.(i + 1, xs.length);
    return {
      x,
      totalQuanta: result.combined.totalQuanta,
      decoherence: result.combined.decoherence,
      electromagneticQuanta: result.electromagnetic.totalQuanta,
      gravitationalQuanta: result.gravitational.totalQuanta,
    };
  });
  return { parameter: request.parameter, unit: parameterUnit(request.parameter), spacing: "log", points };
}
