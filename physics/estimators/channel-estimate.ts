/**
 * What every background's estimator returns for one channel, in log10 (SI), and its assembly into the reported
 * ChannelResult with decoherence, visibility and decoherence time.
 */
import { decoherenceFromQuanta, decoherenceTimeFromRate, visibilityFromQuanta } from "../decoherence";
import type { Channel, ChannelResult, Convergence, EstimateRegime, HorizonRateComparison, RateRegime, ValidityFlag } from "../result";
import { log10Product, log10Sum, quantityFromLog10 } from "./quantity";
import type { SourceKey } from "./sources";

export interface ChannelEstimate {
  channel: Channel;
  /** log10 of the source amplitude A (C m or kg m²); −Infinity when exactly zero. */
  log10Source: number;
  exactZeroReason: string | null;
  log10RampQuanta: number;
  log10HoldQuanta: number;
  /** log10 of the hold-driven quanta per second of lab proper time at full separation. */
  log10HoldRate: number;
  /**
   * Minkowski: the whole count reaches null infinity. Schwarzschild: the hold's quanta go into the horizon, the
   * ramps' to ℐ⁺ or into the horizon depending on the regime (not split: no far-field count). Thermal: one count.
   */
  counts: "far-field-only" | "ramps-and-horizon" | "single-spectral";
  regime: RateRegime;
  rampSourceKey: SourceKey;
  holdSourceKey: SourceKey;
  totalSourceKey: SourceKey;
  convergence: Convergence;
  /** The published estimate beside a computed hold rate (Schwarzschild), else null. */
  comparison: { log10HoldRate: number; regime: EstimateRegime; sourceKey: SourceKey } | null;
  /** Validity checks raised by the model that gave the hold rate, in the result's flag format. */
  modelFlags: ValidityFlag[];
}

function comparisonResult(estimate: ChannelEstimate): HorizonRateComparison | null {
  const comparison = estimate.comparison;
  // No comparison where the hold rate at full separation is exactly zero (a body offset x₀ = −d/2, one branch staying).
  if (comparison === null || comparison.log10HoldRate === -Infinity) return null;
  return {
    estimateHoldRate: quantityFromLog10(comparison.log10HoldRate, "s^-1", comparison.sourceKey),
    ratioExactToEstimate: quantityFromLog10(estimate.log10HoldRate - comparison.log10HoldRate, "1", "schwarzschild-exact-vs-estimate"),
    estimateRegime: comparison.regime,
  };
}

export function channelResult(estimate: ChannelEstimate): ChannelResult {
  const total = log10Sum(estimate.log10RampQuanta, estimate.log10HoldQuanta);
  const ramp = quantityFromLog10(estimate.log10RampQuanta, "1", estimate.rampSourceKey);
  const hold = quantityFromLog10(estimate.log10HoldQuanta, "1", estimate.holdSourceKey);
  return {
    channel: estimate.channel,
    sourceStrength: quantityFromLog10(estimate.log10Source, estimate.channel === "electromagnetic" ? "C m" : "kg m^2", estimate.channel === "electromagnetic" ? "source-strength-em" : "source-strength-gw"),
    exactZeroReason: estimate.exactZeroReason,
    totalQuanta: quantityFromLog10(total, "1", estimate.totalSourceKey),
    rampDrivenQuanta: ramp,
    holdDrivenQuanta: hold,
    farFieldQuanta: estimate.counts === "far-field-only" ? quantityFromLog10(total, "1", estimate.totalSourceKey) : null,
    horizonQuanta: estimate.counts === "ramps-and-horizon" ? hold : null,
    holdRate: quantityFromLog10(estimate.log10HoldRate, "s^-1", estimate.holdSourceKey),
    regime: estimate.regime,
    comparison: comparisonResult(estimate),
    decoherence: decoherenceFromQuanta(total),
    visibility: visibilityFromQuanta(total),
    decoherenceTime: decoherenceTimeFromRate(estimate.log10HoldRate),
    convergence: estimate.convergence,
  };
}

/** The zero estimate of a channel with no source (no charge, no separation, or a symmetric split for gravity). */
export function zeroEstimate(channel: Channel, reason: string, keys: Pick<ChannelEstimate, "rampSourceKey" | "holdSourceKey" | "totalSourceKey" | "counts" | "regime">): ChannelEstimate {
  return {
    channel,
    log10Source: -Infinity,
    exactZeroReason: reason,
    log10RampQuanta: -Infinity,
    log10HoldQuanta: -Infinity,
    log10HoldRate: -Infinity,
    ...keys,
    convergence: { relativeChange: 0, converged: true, samplesPerWindow: 0, transformLength: 0, mode: "none", timeStepSeconds: 0 },
    comparison: null,
    modelFlags: [],
  };
}

/** log10 of A² times a per-unit-A² quantity. */
export function timesSquaredSource(log10Source: number, log10PerSquaredSource: number): number {
  return log10Product(2 * log10Source, log10PerSquaredSource);
}
