/**
 * One decoherence function F(x_A, x_B) (s⁻¹) integrated over the protocol's branch paths into the reported
 * result: ⟨N⟩ = 2∫F dt (physics/estimators/hold-quanta.ts's quadrature), the rate 2F at full separation, and
 * the decoherence, visibility and decoherence time of physics/decoherence.ts.
 */
import { decoherenceFromQuanta, decoherenceTimeFromRate, visibilityFromQuanta } from "../decoherence";
import { integrateOverProtocolSeconds } from "../estimators/hold-quanta";
import { quantityFromLog10 } from "../estimators/quantity";
import type { SourceKey } from "../estimators/sources";
import { branchPositions } from "../protocols";
import type { ValidityFlag } from "../result-basics";
import type { BranchPaths, EnvironmentChannel, EnvironmentChannelResult, EnvironmentRegime } from "./types";

/** F at branch positions x_A, x_B along the separation axis (metres from the rest position), s⁻¹. */
export type DecoherenceFunction = (branchAMetres: number, branchBMetres: number) => number;

/**
 * Panels of order 16 per moving window: F is smooth in σ (analytic in Δx), so 4 panels integrate it to ~1e-12 where
 * the field channels' spectra take 16; only a crossover far narrower than the ramp (d ≫ Δx_c) is resolved less
 * finely, and there the time spent within it is itself a negligible part of ⟨N⟩.
 */
const RAMP_PANELS = 4;

/** 2∫F dt over the protocol, and 2F at full separation. */
export function accumulate(paths: BranchPaths, decoherenceFunction: DecoherenceFunction): { quanta: number; fullSeparationRate: number } {
  const { aPerSeparation, bPerSeparation } = branchPositions(paths.split);
  const d = paths.history.peakSeparationMetres;
  const at = (fraction: number) => 2 * decoherenceFunction(aPerSeparation * d * fraction, bPerSeparation * d * fraction);
  return { quanta: integrateOverProtocolSeconds(paths.history, at, RAMP_PANELS), fullSeparationRate: at(1) };
}

const log10OrZero = (x: number) => (x > 0 ? Math.log10(x) : -Infinity);

export function environmentResult(
  channel: EnvironmentChannel,
  sourceKey: SourceKey,
  counts: { quanta: number; fullSeparationRate: number },
  regime: EnvironmentRegime,
  flags: ValidityFlag[],
): EnvironmentChannelResult {
  const log10Quanta = log10OrZero(counts.quanta);
  const log10Rate = log10OrZero(counts.fullSeparationRate);
  return {
    channel,
    exactZeroReason: null,
    totalQuanta: quantityFromLog10(log10Quanta, "1", sourceKey),
    holdRate: quantityFromLog10(log10Rate, "s^-1", sourceKey),
    regime,
    sourceKey,
    decoherence: decoherenceFromQuanta(log10Quanta),
    visibility: visibilityFromQuanta(log10Quanta),
    decoherenceTime: decoherenceTimeFromRate(log10Rate),
    flags,
  };
}

export function zeroEnvironmentResult(channel: EnvironmentChannel, sourceKey: SourceKey, reason: string, flags: ValidityFlag[] = []): EnvironmentChannelResult {
  return { ...environmentResult(channel, sourceKey, { quanta: 0, fullSeparationRate: 0 }, "none", flags), exactZeroReason: reason };
}
