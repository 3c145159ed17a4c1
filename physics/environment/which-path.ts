/**
 * How much of a path difference Δx one scattered, absorbed or emitted quantum of wavenumber k resolves, averaged
 * over isotropic directions: 1 − ⟨e^{ik n̂·Δx}⟩ = 1 − sinc(kΔx) for one quantum (absorbed or emitted), and
 * 1 − sinc²(kΔx) for a scattering (independent isotropic in and out directions); and the regime a channel is in.
 */

/** 1 − sin(x)/x, without cancellation at small x (series x²/6 − x⁴/120 below 0.01). */
export function oneMinusSinc(x: number): number {
  if (Math.abs(x) < 0.01) return (x * x) / 6 - x ** 4 / 120;
  return 1 - Math.sin(x) / x;
}

/** 1 − (sin(x)/x)², without cancellation at small x (series x²/3 − 2x⁴/45 below 0.01). */
export function oneMinusSincSquared(x: number): number {
  if (Math.abs(x) < 0.01) return (x * x) / 3 - (2 * x ** 4) / 45;
  const s = Math.sin(x) / x;
  return 1 - s * s;
}

/** From ΛΔx₀²/γ at full separation: below 0.1 long-wavelength, above 10 saturated, else crossover (common practice). */
export function regimeOf(longWavelengthOverSaturated: number): "long-wavelength" | "crossover" | "saturated" {
  return longWavelengthOverSaturated < 0.1 ? "long-wavelength" : longWavelengthOverSaturated > 10 ? "saturated" : "crossover";
}
