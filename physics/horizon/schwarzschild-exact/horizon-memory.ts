/**
 * The horizon memory norm ∫_H |ΔA_A|² dS in closed form: the Legendre sums of multipoles.ts, resummed.
 *
 * Setting (Gaussian geometrized units, M = 1, q = 1; x = b, B = x − 1, ε = x − 2, μ = cos θ). The horizon field of
 * copson-field.ts is E(μ) = (1/(2x)) [1 − (B²−1)/(B−μ)²]. The horizon constraint D^A ΔA_A = ΔE_r
 * ("Black holes decohere quantum superpositions", arXiv:2205.06279; "Killing horizons decohere quantum
 * superpositions", arXiv:2301.00026) is solved on the unit sphere with ΔA_A = D_A χ, ∇²χ = ΔE.
 *
 * Radial shift ΔB (axisymmetric). Then (1 − μ²) χ'(μ) = F(μ) ≡ ∫_{−1}^{μ} ΔE dμ', and ∫|Dχ|² dΩ =
 * 2π ∫ F²/(1 − μ²) dμ. For the field itself ∫_{−1}^{μ} E dμ' = (1 − μ²) / (2x(B − μ)) (zero at both poles: no net
 * charge), so with ∂_B[(1/(2x(B−μ)))] = −(2B + 1 − μ)/(2x²(B−μ)²),
 *   ∫|Dχ|² dΩ = (π / (2x⁴)) · I(ε) · ΔB²,   I = ∫_{−1}^{1} (1−μ²)(2B+1−μ)²/(B−μ)⁴ dμ = 4/(3ε²) + 4/ε − 2 ln(1 + 2/ε)
 * (elementary: substitute s = B − μ; the numerator is −s⁴ − 2s³ + 2B(B+1)s² + 2(B+1)²s − ε(B+1)³).
 *
 * Tangential shift Δθ₀ (m = ±1). Parseval with ∫(1 − μ²)P_ℓ'² dμ = 2ℓ(ℓ+1)/(2ℓ+1) gives
 * ∫|Dχ|² dΩ = (Δθ₀²/2) ∫ E² dΩ, and ∫_{−1}^{1} (1 + μ² − 2Bμ)²/(B − μ)⁴ dμ = 8/(3(B² − 1)), so
 *   ∫|Dχ|² dΩ = 2π / (3 x³ ε) · Δθ₀².
 * Units: (q/M²)² per ΔB² or per Δθ₀²; the physical horizon (radius 2M) multiplies by (2M)⁴.
 *
 * Numerics: near the horizon (ε → 0) both forms are sums of positive terms. Far away I = u²/3 + 2(u − ln(1+u)),
 * u = 2/ε, and u − ln(1+u) is summed as its series Σ_{k≥2} (−u)^k/k for u < 1/4, avoiding the cancellation that
 * would lose ~log₁₀(ε) digits (8 at b/M = 10⁸).
 */

/** u − ln(1 + u) for u ≥ 0, accurate to a few ulp for all u. */
export function uMinusLog1p(u: number): number {
  if (u >= 0.25) return u - Math.log1p(u);
  let power = u * u;
  let sum = 0;
  for (let k = 2; k < 60; k++) {
    const term = power / k;
    sum += k % 2 === 0 ? term : -term;
    if (term < 1e-17 * sum) break;
    power *= u;
  }
  return sum;
}

/** I(ε) = 4/(3ε²) + 4/ε − 2 ln(1 + 2/ε), the radial memory integral. */
export function radialMemoryIntegral(heightOverM: number): number {
  const u = 2 / heightOverM;
  return (u * u) / 3 + 2 * uMinusLog1p(u);
}

/** ∫|Dχ|² dΩ per ΔB² (units (q/M²)²) for a radial shift of the charge: π I(ε) / (2 x⁴). */
export function radialMemoryNorm(heightOverM: number): number {
  const x = 2 + heightOverM;
  return (Math.PI * radialMemoryIntegral(heightOverM)) / (2 * x * x * x * x);
}

/** ∫|Dχ|² dΩ per Δθ₀² (units (q/M²)²) for a tangential shift of the charge: 2π / (3 x³ ε). */
export function tangentialMemoryNorm(heightOverM: number): number {
  const x = 2 + heightOverM;
  return (2 * Math.PI) / (3 * x * x * x * heightOverM);
}
