/**
 * Far-field estimator (flat spacetime, inertial lab): the expected number of entangling quanta radiated to null
 * infinity by the difference of the branches' sources.
 *   EM:      ⟨N⟩∞ = (1/(6π² ε0 ħ c³)) ∫₀^∞ ω³ |Δp̃(ω)|² dω  = (1/(6π² ε0 ħ c³)) ∫₀^∞ ω |(Δṗ)~(ω)|² dω,
 *            Larmor's power |Δp̈|²/(6π ε0 c³) integrated over time by Parseval and divided by ħω per quantum.
 *   Gravity: ⟨N⟩∞ = (G/(5π ħ c⁵)) ∫₀^∞ ω⁵ Σ_ij |ΔĨ_ij^STF(ω)|² dω, the quadrupole luminosity (G/5c⁵)⟨I⃛_ij I⃛_ij⟩
 *            (Landau–Lifshitz §110) counted the same way.
 * Sources: "far-field-em" and "far-field-gw" in physics/estimators/sources.ts.
 * Approximations: dipole/quadrupole order, slow motion; the velocity is transformed (physics/estimators/ramp-quanta.ts).
 * Flags raised by the caller: kink (count depends on the resolution), sampling convergence, slow motion.
 * A held superposition does not decohere here: the hold-driven part and rate are exactly zero.
 */
import type { SeparationHistory } from "../protocols/types";
import { timesSquaredSource, zeroEstimate, type ChannelEstimate } from "./channel-estimate";
import type { ChannelSource } from "./channel-source";
import { rampQuantaPerSquaredSource } from "./ramp-quanta";

export function farFieldEstimate(history: SeparationHistory, source: ChannelSource, kinkTimeResolutionSeconds: number | null): ChannelEstimate {
  const key = source.definition.channel === "electromagnetic" ? "far-field-em" : "far-field-gw";
  const keys = { rampSourceKey: key, holdSourceKey: key, totalSourceKey: key, counts: "far-field-only", regime: "none" } as const;
  if (source.zeroReason) return zeroEstimate(source.definition.channel, source.zeroReason, keys);
  const ramp = rampQuantaPerSquaredSource(history, source.definition, 0, kinkTimeResolutionSeconds);
  return {
    channel: source.definition.channel,
    log10Source: source.log10Source,
    exactZeroReason: null,
    log10RampQuanta: timesSquaredSource(source.log10Source, ramp.log10PerSquaredSource),
    log10HoldQuanta: -Infinity,
    log10HoldRate: -Infinity,
    ...keys,
    convergence: ramp.convergence,
    comparison: null,
    modelFlags: [],
  };
}
