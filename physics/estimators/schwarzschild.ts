/**
 * Schwarzschild estimator (static lab at areal radius b outside a black hole of mass M, Unruh state). Two counts
 * that add: the ramps' quanta (schwarzschild-ramps.ts: to null infinity ℐ⁺ for slow ramps far from the hole, mostly
 * into the horizon near it; source "schwarzschild-ramps"), and the hold's quanta into the horizon,
 *   ⟨N⟩_hold = Γ ∫ f(τ)² dτ,   f = Δp(τ)/Δp_max (EM) or ΔI(τ)/ΔI_max (gravity), τ the lab's proper time,
 * with Γ the rate at full separation from a SchwarzschildHorizonRateModel (default: exactHorizonRateModel, the exact
 * horizon-method rate; schwarzschild-horizon-rate.ts). This is the same definition of the hold-driven part as the
 * Rindler and de Sitter spectral split (physics/spectra/channels.ts: the zero-frequency noise times ∫f²dt, the time
 * spent apart during the ramps included), so the parts compare across backgrounds; here it is the count into the
 * horizon, which adds to the ramps' count at null infinity. Γ scales as d², so Γ(d_max) f² is the rate at d(τ).
 * Approximations: those of the ramp model (its flag schwarzschild-ramp-model); hold long compared with GM/c³ and
 * b/c (the rate is the zero-frequency limit; flag hold-timescale); those of the rate model.
 * Flags raised by the caller: Schwarzschild regime, separation vs the distance to the horizon, and the model's own
 * checks (carried in ChannelEstimate.modelFlags).
 */
import type { SeparationHistory } from "../protocols/types";
import { timesSquaredSource, zeroEstimate, type ChannelEstimate } from "./channel-estimate";
import type { ChannelSource } from "./channel-source";
import { squaredProfileIntegralSeconds } from "./hold-quanta";
import { log10Product } from "./quantity";
import { schwarzschildRampQuanta } from "./schwarzschild-ramps";
import type { SchwarzschildHorizonRateInput, SchwarzschildHorizonRateModel } from "./schwarzschild-horizon-rate";

export type SchwarzschildLab = Omit<SchwarzschildHorizonRateInput, "channel" | "chargeOrEffectiveMass" | "separationMetres">;

export function schwarzschildEstimate(
  history: SeparationHistory,
  source: ChannelSource,
  lab: SchwarzschildLab,
  model: SchwarzschildHorizonRateModel,
  kinkTimeResolutionSeconds: number | null,
): ChannelEstimate {
  const channel = source.definition.channel;
  if (source.zeroReason) {
    const described = model.describe({ ...lab, channel });
    return zeroEstimate(channel, source.zeroReason, {
      rampSourceKey: "schwarzschild-ramps",
      holdSourceKey: described.sourceKey,
      totalSourceKey: described.sourceKey,
      counts: "ramps-and-horizon",
      regime: described.regime,
    });
  }
  const rate = model.rate({ ...lab, channel, chargeOrEffectiveMass: source.chargeOrEffectiveMass, separationMetres: source.separationMetres });
  const ramp = schwarzschildRampQuanta(history, source.definition, lab, kinkTimeResolutionSeconds);
  const timeApart = squaredProfileIntegralSeconds(history, source.definition);
  return {
    channel,
    log10Source: source.log10Source,
    exactZeroReason: null,
    log10RampQuanta: timesSquaredSource(source.log10Source, ramp.log10PerSquaredSource),
    log10HoldQuanta: log10Product(rate.log10RatePerSecond, Math.log10(timeApart)),
    log10HoldRate: log10Product(rate.log10RatePerSecond, source.log10FullSeparationFactor),
    counts: "ramps-and-horizon",
    regime: rate.regime,
    rampSourceKey: "schwarzschild-ramps",
    holdSourceKey: rate.sourceKey,
    totalSourceKey: rate.sourceKey,
    convergence: ramp.convergence,
    comparison: rate.estimate && {
      log10HoldRate: log10Product(rate.estimate.log10RatePerSecond, source.log10FullSeparationFactor),
      regime: rate.estimate.regime,
      sourceKey: rate.estimate.sourceKey,
    },
    modelFlags: [...rate.flags, ramp.flag],
  };
}
