/**
 * The time integral ∫ f(σ(t))² dt of a channel's source profile over the whole protocol, seconds: the factor that
 * multiplies the zero-frequency noise in the hold-driven count, ⟨N⟩_hold = Γ A² ∫ f² dt (physics/spectra/channels.ts).
 * Plateaus exactly; moving windows by composite Gauss–Legendre (16 panels of order 16).
 */
import type { SeparationHistory } from "../protocols/types";
import type { ChannelDefinition } from "../spectra/channels";
import { integrateGaussLegendre } from "../spectra/gauss-legendre";

const PANELS = 16;

export function squaredProfileIntegralSeconds(history: SeparationHistory, definition: ChannelDefinition): number {
  let total = 0;
  let previousEnd = 0;
  let plateau = 0;
  for (const w of history.windows) {
    total += (w.startSeconds - previousEnd) * definition.profile(plateau) ** 2;
    let moving = 0;
    for (let k = 0; k < PANELS; k++) {
      moving += integrateGaussLegendre((u) => definition.profile(w.fraction(u)) ** 2, k / PANELS, (k + 1) / PANELS, 16);
    }
    total += moving * w.durationSeconds;
    previousEnd = w.startSeconds + w.durationSeconds;
    plateau = w.fraction(1);
  }
  return total;
}
