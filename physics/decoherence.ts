/**
 * Decoherence from the expected number of entangling quanta ⟨N⟩ (carried as log10): 𝒟 = 1 − e^{−⟨N⟩/2} by −expm1
 * so small ⟨N⟩ keeps its digits, the visibility |⟨ψ_A|ψ_B⟩| = e^{−⟨N⟩/2} with its log10 = −⟨N⟩/(2 ln 10) when it
 * underflows, and the decoherence time 1/Γ from a hold rate Γ. Sources: the coherent-state overlap, see the
 * "decoherence" entry of physics/estimators/sources.ts.
 */
import { quantityFromLog10 } from "./estimators/quantity";
import type { Quantity } from "./result-basics";

const LOG10_TWO = Math.log10(2);
const LOG10_LARGEST = Math.log10(Number.MAX_VALUE);

/** 𝒟 = 1 − exp(−N/2), as a Quantity. */
export function decoherenceFromQuanta(log10Quanta: number): Quantity {
  if (log10Quanta === -Infinity) return quantityFromLog10(-Infinity, "1", "decoherence");
  if (log10Quanta < -300) return quantityFromLog10(log10Quanta - LOG10_TWO, "1", "decoherence");
  if (log10Quanta > LOG10_LARGEST) return quantityFromLog10(0, "1", "decoherence");
  return quantityFromLog10(Math.log10(-Math.expm1(-(10 ** log10Quanta) / 2)), "1", "decoherence");
}

/** |⟨ψ_A|ψ_B⟩| = exp(−N/2), as a Quantity; log10 = −N/(2 ln 10) keeps it readable when it underflows. */
export function visibilityFromQuanta(log10Quanta: number): Quantity {
  if (log10Quanta > LOG10_LARGEST) return { value: 0, log10: null, unit: "1", sourceKey: "visibility" };
  const quanta = log10Quanta === -Infinity ? 0 : 10 ** log10Quanta;
  return quantityFromLog10(-quanta / (2 * Math.LN10), "1", "visibility");
}

/** Hold time at which the hold-driven count reaches one quantum, 1/Γ (s); null without a hold-driven part. */
export function decoherenceTimeFromRate(log10RatePerSecond: number): Quantity | null {
  if (log10RatePerSecond === -Infinity) return null;
  return quantityFromLog10(-log10RatePerSecond, "s", "decoherence-time");
}
