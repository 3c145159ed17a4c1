/**
 * Time integrals over the whole protocol of a function of the separation fraction σ(t): ∫ g(σ(t)) dt, seconds.
 * The hold-driven count uses g = f(σ)², ⟨N⟩_hold = Γ A² ∫ f² dt (physics/spectra/channels.ts); the lab's
 * environment (physics/environment) uses g = 2F(Δx(σ)), its decoherence function at each instant.
 * Plateaus exactly; moving windows by composite Gauss–Legendre (16 panels of order 16 unless asked for fewer).
 */
import type { SeparationHistory } from "../protocols/types";
import type { ChannelDefinition } from "../spectra/channels";
import { integrateGaussLegendre } from "../spectra/gauss-legendre";

const PANELS = 16;

/** ∫ g(σ(t)) dt over the protocol (σ = 0 before the first window and after the last), `panels` per moving window. */
export function integrateOverProtocolSeconds(history: SeparationHistory, g: (fraction: number) => number, panels = PANELS): number {
  let total = 0;
  let previousEnd = 0;
  let plateau = 0;
  for (const w of history.windows) {
    total += (w.startSeconds - previousEnd) * g(plateau);
    let moving = 0;
    for (let k = 0; k < panels; k++) {
      moving += integrateGaussLegendre((u) => g(w.fraction(u)), k / panels, (k + 1) / panels, 16);
    }
    total += moving * w.durationSeconds;
    previousEnd = w.startSeconds + w.durationSeconds;
    plateau = w.fraction(1);
  }
  return total;
}

export function squaredProfileIntegralSeconds(history: SeparationHistory, definition: ChannelDefinition): number {
  return integrateOverProtocolSeconds(history, (fraction) => definition.profile(fraction) ** 2);
}
