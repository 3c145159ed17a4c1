/**
 * The regime of a channel whose decoherence function runs from F = ΛΔx² (long wavelength: one event resolves
 * the path only partly) to F = γ (saturated: every event resolves it), judged at full separation d.
 */

/** From Λd²/γ: below 0.1 long-wavelength, above 10 saturated, else crossover (common practice). */
export function regimeOf(longWavelengthOverSaturated: number): "long-wavelength" | "crossover" | "saturated" {
  return longWavelengthOverSaturated < 0.1 ? "long-wavelength" : longWavelengthOverSaturated > 10 ? "saturated" : "crossover";
}
