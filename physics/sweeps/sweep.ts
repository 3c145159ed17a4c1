/**
 * Sweeps: ⟨N⟩ and 𝒟 against the recombination time, the hold time, the lab's distance or an environmental control
 * parameter (gas pressure, surroundings temperature, surface distance), at points evenly spaced in the logarithm
 * between two values, reporting progress through an optional callback after each point. Each point carries every
 * channel's ⟨N⟩ (the field channels and the environment's) and the whole budget's, so a chart draws one curve each.
 */
import { computeScenario, type ComputeOptions } from "../compute";
import type { Quantity } from "../result-basics";
import { ScenarioInputError } from "../scenario/input-error";
import type { ScenarioDocument } from "../scenario/schema";
import type { EnvironmentChannel } from "../environment/types";
import { parameterUnit, withParameter, type SweepParameter, type SweepUnit } from "./vary";

export interface SweepRequest {
  parameter: SweepParameter;
  fromValue: number;
  toValue: number;
  points: number;
}

export interface SweepPoint {
  /** The parameter's value, SI (s, m, Pa or K). */
  x: number;
  /** The body's own field channels together (electromagnetic and gravitational). */
  totalQuanta: Quantity;
  decoherence: Quantity;
  electromagneticQuanta: Quantity;
  gravitationalQuanta: Quantity;
  /** ⟨N⟩ of each environmental channel the scenario switches on (empty for an isolated body). */
  environmentQuanta: { channel: EnvironmentChannel; quanta: Quantity }[];
  /** Every channel together, the environment's included; the field channels' total for an isolated body. */
  budgetTotalQuanta: Quantity;
  /** The whole budget's decoherence. */
  budgetDecoherence: Quantity;
}

export interface SweepResult {
  parameter: SweepParameter;
  unit: SweepUnit;
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
      environmentQuanta: (result.environment?.channels ?? []).map((ch) => ({ channel: ch.channel, quanta: ch.totalQuanta })),
      budgetTotalQuanta: (result.environment?.total ?? result.combined).totalQuanta,
      budgetDecoherence: (result.environment?.total ?? result.combined).decoherence,
    };
  });
  return { parameter: request.parameter, unit: parameterUnit(request.parameter), spacing: "log", points };
}
