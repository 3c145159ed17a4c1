/**
 * Schwarzschild estimator (static lab at areal radius b outside a black hole of mass M, Unruh state). Two distinct
 * counts that add: the ramps' quanta to null infinity, from the far-field estimator in the lab's local flat
 * approximation (source "schwarzschild-ramps"), and the hold's quanta into the horizon, Γ ∫f² dτ with Γ from a
 * SchwarzschildHorizonRateModel (physics/estimators/schwarzschild-horizon-rate.ts).
 * Approximations: ramp wavelengths short compared with the distance to the hole; the rate model's regime.
 * Flags raised by the caller: Schwarzschild regime, flat-approximation note, separation vs distance to the horizon.
 */
import type { SeparationHistory } from "../protocols/types";
import { timesSquaredSource, zeroEstimate, type ChannelEstimate } from "./channel-estimate";
import type { ChannelSource } from "./channel-source";
import { squaredProfileIntegralSeconds } from "./hold-quanta";
import { log10Product } from "./quantity";
import { rampQuantaPerSquaredSource } from "./ramp-quanta";
import type { SchwarzschildHorizonRateInput, SchwarzschildHorizonRateModel } from "./schwarzschild-horizon-rate";

export type SchwarzschildLab = Omit<SchwarzschildHorizonRateInput, "channel" | "log10Source">;

export function schwarzschildEstimate(
  history: SeparationHistory,
  source: ChannelSource,
  lab: SchwarzschildLab,
  model: SchwarzschildHorizonRateModel,
  kinkTimeResolutionSeconds: number | null,
): ChannelEstimate {
  const channel = source.definition.channel;
  if (source.zeroReason) {
    const probe = model.rate({ ...lab, channel, log10Source: 0 });
    return zeroEstimate(channel, source.zeroReason, {
      rampSourceKey: "schwarzschild-ramps",
      holdSourceKey: probe.sourceKey,
      totalSourceKey: probe.sourceKey,
      counts: "far-field-and-horizon",
      regime: probe.regime,
    });
  }
  const rate = model.rate({ ...lab, channel, log10Source: source.log10Source });
  const ramp = rampQuantaPerSquaredSource(history, source.definition, 0, kinkTimeResolutionSeconds);
  const timeApart = squaredProfileIntegralSeconds(history, source.definition);
  return {
    channel,
    log10Source: source.log10Source,
    exactZeroReason: null,
    log10RampQuanta: timesSquaredSource(source.log10Source, ramp.log10PerSquaredSource),
    log10HoldQuanta: log10Product(rate.log10RatePerSecond, Math.log10(timeApart)),
    log10HoldRate: rate.log10RatePerSecond,
    counts: "far-field-and-horizon",
    regime: rate.regime,
    rampSourceKey: "schwarzschild-ramps",
    holdSourceKey: rate.sourceKey,
    totalSourceKey: rate.sourceKey,
    convergence: ramp.convergence,
  };
}
