/**
 * The margin of each environmental channel: the value of its control parameter (gas pressure, the surroundings'
 * temperature, the body's internal temperature for emission, the distance to the surface) at which its ⟨N⟩ would
 * equal the body's own field channels' ⟨N⟩ (quanta to null infinity and into the horizon). Found by Brent's method
 * on log10⟨N⟩ against log10 of the parameter, between today's value and a limit no lab goes beyond.
 * "already-below": the channel is already at or below the field channels; "not-reachable": not even at the limit,
 * or the field channels are exactly zero (then only an absent environment would equal them).
 */
import { quantityFromValue } from "../estimators/quantity";
import type { Quantity } from "../result-basics";
import { gasChannelOf, surfaceChannelOf, thermalChannelOf, type EnvironmentInputs } from "./budget";
import type { ThermalChannel } from "./thermal";
import { brentRoot } from "./root-finding";
import type { BranchPaths, ChannelMargin, EnvironmentChannel, EnvironmentChannelResult, MarginOutcome, MarginParameter } from "./types";

export type { ChannelMargin, MarginOutcome, MarginParameter };


/** The furthest each parameter is searched: below any vacuum, any cryostat, beyond any chip (common practice). */
export const MARGIN_LIMITS: Readonly<Record<MarginParameter, number>> = {
  "gas-pressure": 1e-20,
  "surroundings-temperature": 1e-3,
  "internal-temperature": 1e-3,
  "surface-distance": 1,
};

const UNITS: Record<MarginParameter, string> = { "gas-pressure": "Pa", "surroundings-temperature": "K", "internal-temperature": "K", "surface-distance": "m" };

const log10Quanta = (ch: EnvironmentChannelResult | undefined) => (ch?.totalQuanta.log10 ?? -Infinity);

/** ⟨N⟩ of one channel with its parameter set to `value`. */
type Evaluate = (value: number) => number;

/** `unit` is the parameter's SI unit, for the words of a "not-reachable" reason. */
export function findMargin(evaluate: Evaluate, current: number, limit: number, fieldLog10Quanta: number, unit = ""): MarginOutcome {
  const here = evaluate(current);
  if (here <= fieldLog10Quanta) return { kind: "already-below" };
  if (fieldLog10Quanta === -Infinity) return { kind: "not-reachable", reason: "the body's own field channels are exactly zero" };
  const atLimit = evaluate(limit);
  if (atLimit > fieldLog10Quanta) return { kind: "not-reachable", reason: `still above the field channels at the search limit, ${limit}${unit ? ` ${unit}` : ""}` };
  const f = (log10Value: number) => {
    const n = evaluate(10 ** log10Value);
    return (n === -Infinity ? -1e3 : n) - fieldLog10Quanta;
  };
  const root = brentRoot(f, Math.log10(current), Math.log10(limit), 1e-7); // the parameter to 7 significant digits
  return { kind: "crossing", value: quantityFromValue(10 ** root, "", "environment-margin") };
}

function margin(channel: EnvironmentChannel, parameter: MarginParameter, current: number, evaluate: Evaluate, fieldLog10Quanta: number): ChannelMargin {
  const unit = UNITS[parameter];
  const outcome = findMargin(evaluate, current, MARGIN_LIMITS[parameter], fieldLog10Quanta, unit);
  return {
    channel,
    parameter,
    current: quantityFromValue(current, unit, "environment-margin"),
    outcome: outcome.kind === "crossing" ? { kind: "crossing", value: { ...outcome.value, unit } } : outcome,
  };
}

/** One margin per environmental channel the inputs switch on; fieldLog10Quanta is log10 of the field channels' total ⟨N⟩. */
export function environmentMargins(paths: BranchPaths, inputs: EnvironmentInputs, fieldLog10Quanta: number): ChannelMargin[] {
  const margins: ChannelMargin[] = [];
  const { gas, radiation, surface } = inputs;
  if (gas) {
    // F = γ(1 − D(κ)/κ) with γ ∝ P and κ independent of P: ⟨N⟩ is exactly proportional to the pressure.
    const now = log10Quanta(gasChannelOf(paths, inputs) ?? undefined);
    const atPressure = (p: number) => (p === 0 || now === -Infinity ? -Infinity : now + Math.log10(p / gas.pressurePascals));
    margins.push(margin("gas", "gas-pressure", gas.pressurePascals, atPressure, fieldLog10Quanta));
  }
  if (radiation) {
    const thermalAt = (channel: ThermalChannel, change: Partial<{ surroundings: number; internal: number }>) =>
      log10Quanta(
        thermalChannelOf(
          paths,
          {
            ...inputs,
            body: { ...inputs.body, internalTemperatureKelvin: change.internal ?? inputs.body.internalTemperatureKelvin },
            radiation: { surroundingsTemperatureKelvin: change.surroundings ?? radiation.surroundingsTemperatureKelvin },
          },
          channel,
        ) ?? undefined,
      );
    for (const channel of ["thermal-scattering", "thermal-absorption"] as const) {
      margins.push(margin(channel, "surroundings-temperature", radiation.surroundingsTemperatureKelvin, (t) => thermalAt(channel, { surroundings: t }), fieldLog10Quanta));
    }
    margins.push(margin("thermal-emission", "internal-temperature", inputs.body.internalTemperatureKelvin, (t) => thermalAt("thermal-emission", { internal: t }), fieldLog10Quanta));
  }
  if (surface) {
    margins.push(
      margin("surface", "surface-distance", surface.distanceMetres, (z) => log10Quanta(surfaceChannelOf(paths, { ...inputs, surface: { ...surface, distanceMetres: z } }) ?? undefined), fieldLog10Quanta),
    );
  }
  return margins;
}
