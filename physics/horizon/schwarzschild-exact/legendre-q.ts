/**
 * Legendre functions of the second kind Q_ℓ(x) on x = 1 + ε > 1, for the multipole expansion of the horizon field.
 *
 * Recurrence: (ℓ+1) Q_{ℓ+1} = (2ℓ+1) x Q_ℓ − ℓ Q_{ℓ−1} (DLMF 14.10.3 with μ = 0; it holds for Q as for P).
 * For x > 1, Q_ℓ is the recurrence's minimal solution (Q_ℓ ~ e^{−(ℓ+½)η}, P_ℓ ~ e^{(ℓ+½)η}, cosh η = x), so the
 * forward recurrence is unstable and the ratios r_ℓ = Q_ℓ/Q_{ℓ−1} are computed backwards (Gautschi, SIAM Rev. 9,
 * 24 (1967)). To keep digits when x → 1 the recurrence is written for s_ℓ = 1 − r_ℓ, in which every term is
 * positive:
 *   s_ℓ = ((2ℓ+1)ε + (ℓ+1)s_{ℓ+1}) / (ℓ + (2ℓ+1)ε + (ℓ+1)s_{ℓ+1}).
 * It is started at N = L + ⌈18/η⌉ + 20 from the large-ℓ limit s_N = 1 − e^{−η}; the start error reaching ℓ ≤ L is
 * damped by at least e^{−2(N−ℓ)η} < 10⁻¹⁵. Normalisation: Q_0(x) = ½ ln((x+1)/(x−1)) = ½ log1p(2/ε).
 */

/** η = arccosh(1 + ε), computed as log1p(ε + √(ε(2+ε))) so that it is accurate for small ε. */
export function legendreDecayRate(heightEps: number): number {
  return Math.log1p(heightEps + Math.sqrt(heightEps * (2 + heightEps)));
}

/** Q_0(1 + ε) = ½ ln((2 + ε)/ε). */
export function legendreQ0(heightEps: number): number {
  return 0.5 * Math.log1p(2 / heightEps);
}

/** Number of backward-recurrence steps needed for ratios accurate up to ℓ = lTop. */
export function backwardRecurrenceSteps(heightEps: number, lTop: number): number {
  return lTop + Math.ceil(18 / legendreDecayRate(heightEps)) + 20;
}

/** The ratios r_ℓ = Q_ℓ/Q_{ℓ−1} and their complements s_ℓ = 1 − r_ℓ, each to full relative precision. */
export interface LegendreQRatios {
  /** r[ℓ] for ℓ = 1 … lTop (index 0 unused). Accurate far from the hole, where r_ℓ ≪ 1. */
  r: Float64Array;
  /** s[ℓ] for ℓ = 1 … lTop (index 0 unused). Accurate near the horizon, where r_ℓ → 1. */
  s: Float64Array;
}

/**
 * r_ℓ and s_ℓ of Q_ℓ(1 + ε) for ℓ = 1 … lTop. Both come from one positive denominator
 * ℓ + (2ℓ+1)ε + (ℓ+1)s_{ℓ+1}: r_ℓ = ℓ/denominator, s_ℓ = ((2ℓ+1)ε + (ℓ+1)s_{ℓ+1})/denominator, so neither is formed
 * as 1 minus the other.
 */
export function legendreQRatios(heightEps: number, lTop: number): LegendreQRatios {
  const eta = legendreDecayRate(heightEps);
  const start = backwardRecurrenceSteps(heightEps, lTop);
  const r = new Float64Array(lTop + 1);
  const s = new Float64Array(lTop + 1);
  let next = -Math.expm1(-eta);
  for (let l = start; l >= 1; l--) {
    const numerator = (2 * l + 1) * heightEps + (l + 1) * next;
    const denominator = l + numerator;
    next = numerator / denominator;
    if (l <= lTop) {
      s[l] = next;
      r[l] = l / denominator;
    }
  }
  return { r, s };
}

/** Q_ℓ(1 + ε) for ℓ = 0 … lMax. (Underflows to 0 once Q_ℓ < 10⁻³⁰⁸, i.e. only for large ℓ far from the hole.) */
export function legendreQ(heightEps: number, lMax: number): Float64Array {
  const { r } = legendreQRatios(heightEps, Math.max(lMax, 1));
  const q = new Float64Array(lMax + 1);
  q[0] = legendreQ0(heightEps);
  for (let l = 1; l <= lMax; l++) q[l] = q[l - 1] * r[l];
  return q;
}
