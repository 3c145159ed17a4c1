/**
 * Horizon estimator for a field that is thermal along the lab's worldline: the Rindler wedge (Minkowski vacuum
 * seen by a lab of proper acceleration a) and the static patch of de Sitter (Bunch–Davies state).
 *
 *   ⟨N⟩ = (1/ħ²) ∫ dω/2π |Δp̃(ω)|² S(ω),  S(ω) = ħω(ω² + α²)/(3π ε0 c³ (1 − e^{−2πω/α})),  α = 2π k_B T_local/ħ,
 *
 * which is a/c for Rindler (Boyer, PRD 21, 2137 (1980); Takagi, Prog. Theor. Phys. Suppl. 88, 1 (1986)) and
 * √(a_lab² + c²H²)/c for de Sitter, exact at every static radius (the static lab is a uniformly accelerated line of the
 * conformally flat slicing, Maxwell theory is conformally invariant and Bunch–Davies is the conformal vacuum;
 * Narnhofer–Peter–Thirring 1996, Deser–Levin 1997): the hold rate is q²d²H³/(6π²ε0ħc³(1 − H²r²/c²)^{3/2}).
 * The spectral formula holds every quantum once (those through the horizon are those reaching null infinity,
 * arXiv:2301.00026), so one total is reported, split exactly into the hold-driven part S(0)/ħ² ∫Δp² dt
 * (S(0) = ħa³/(6π² ε0 c⁶)) and the ramp-driven rest (physics/spectra/channels.ts).
 * Gravity uses the spin-2 thermal form: derived for Rindler (boost invariance of the Minkowski vacuum, a csch⁶
 * correlator); for de Sitter the graviton state's identification is assumed and flagged ("thermal-form-assumed").
 * Flags raised by the caller: separation vs distance to the horizon, kink, convergence, slow motion.
 */
import type { SeparationHistory } from "../protocols/types";
import { log10HoldRateCoefficient } from "../spectra/channels";
import { timesSquaredSource, zeroEstimate, type ChannelEstimate } from "./channel-estimate";
import type { ChannelSource } from "./channel-source";
import { squaredProfileIntegralSeconds } from "./hold-quanta";
import { log10Product } from "./quantity";
import { rampQuantaPerSquaredSource } from "./ramp-quanta";

export type ThermalBackground = "rindler" | "de-sitter";

export function thermalHorizonEstimate(
  history: SeparationHistory,
  source: ChannelSource,
  background: ThermalBackground,
  alphaPerSecond: number,
  kinkTimeResolutionSeconds: number | null,
): ChannelEstimate {
  const gravitational = source.definition.channel === "gravitational";
  const key = background === "rindler" ? (gravitational ? "rindler-gw" : "rindler-em") : gravitational ? "de-sitter-gw" : "de-sitter-em";
  const keys = { rampSourceKey: "spectral-split", holdSourceKey: key, totalSourceKey: key, counts: "single-spectral", regime: "thermal-spectrum" } as const;
  if (source.zeroReason) return zeroEstimate(source.definition.channel, source.zeroReason, keys);
  const ramp = rampQuantaPerSquaredSource(history, source.definition, alphaPerSecond, kinkTimeResolutionSeconds);
  const log10Rate = timesSquaredSource(source.log10Source, log10HoldRateCoefficient(source.definition, alphaPerSecond));
  const timeApart = squaredProfileIntegralSeconds(history, source.definition);
  return {
    channel: source.definition.channel,
    log10Source: source.log10Source,
    exactZeroReason: null,
    log10RampQuanta: timesSquaredSource(source.log10Source, ramp.log10PerSquaredSource),
    log10HoldQuanta: log10Product(log10Rate, Math.log10(timeApart)),
    log10HoldRate: log10Product(log10Rate, source.log10FullSeparationFactor),
    ...keys,
    convergence: ramp.convergence,
    comparison: null,
    modelFlags: [],
  };
}
