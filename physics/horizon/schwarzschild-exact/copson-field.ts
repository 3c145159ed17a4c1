/**
 * The static electric field of a point charge held outside a Schwarzschild hole, in closed form.
 *
 * Potential (Gaussian geometrized units, M = GM/c², charge q at r = b on the axis θ = 0):
 *   Φ = q[(r−M)(b−M) − M² cos θ] / (r b D) + qM/(r b),
 *   D² = (r−M)² + (b−M)² − M² − 2(r−M)(b−M) cos θ + M² cos² θ.
 * Sources: E. T. Copson, Proc. R. Soc. Lond. A 118, 184 (1928) (first term); B. Linet, J. Phys. A 9, 1081 (1976)
 * (the monopole qM/(r b), without which the hole carries charge −qM/b). Φ = −A_t; it solves
 *   ∂_r(r² ∂_r Φ) + (1 − 2M/r)⁻¹ (1/sin θ) ∂_θ(sin θ ∂_θ Φ) = 0 away from the charge.
 * Numerics: D² is evaluated as (u − B cos θ)² + (B² − 1) sin² θ with u = r/M − 1, B = b/M − 1, a sum of two
 * non-negative terms (no cancellation away from the charge itself).
 *
 * On the horizon r = 2M the potential is the constant q/b and the orthonormal radial field E_r̂ = −∂_rΦ is
 *   E_r̂ = (q/M²) · (1 + cos²θ − 2B cos θ) / (2 (b/M) (B − cos θ)²),
 * derived by differentiating Φ at u = 1, where D = B − cos θ. With t = 1 − cos θ and ε = b/M − 2 this is
 *   (t² − 2ε(1 − t)) / (2(2 + ε)(ε + t)²),
 * the form used here: no digits are lost as the lab approaches the horizon (ε → 0).
 */

export interface CopsonPotentialOptions {
  /** Include Linet's monopole term qM/(r b) (default true). Without it the hole is not neutral. */
  includeLinetMonopole?: boolean;
}

/**
 * Φ·M/q at (r, θ) for the charge at areal radius b: the Copson–Linet potential in units of q/M.
 * Valid for r ≥ 2M (and analytic across the horizon); singular only at the charge.
 */
export function copsonLinetPotential(
  rOverM: number,
  theta: number,
  bOverM: number,
  options: CopsonPotentialOptions = {},
): number {
  const u = rOverM - 1;
  const bigB = bOverM - 1;
  const cosTheta = Math.cos(theta);
  const sinTheta = Math.sin(theta);
  const along = u - bigB * cosTheta;
  const distance = Math.sqrt(along * along + (bigB * bigB - 1) * sinTheta * sinTheta);
  const copson = (u * bigB - cosTheta) / (rOverM * bOverM * distance);
  const linet = options.includeLinetMonopole === false ? 0 : 1 / (rOverM * bOverM);
  return copson + linet;
}

/**
 * E_r̂·M²/q on the horizon at polar angle θ from the charge's direction, for the lab at height ε = b/M − 2.
 * Takes t = 1 − cos θ (pass 2 sin²(θ/2) to keep precision near θ = 0).
 */
export function horizonNormalFieldAt(oneMinusCosTheta: number, heightOverM: number): number {
  const t = oneMinusCosTheta;
  const eps = heightOverM;
  const gap = eps + t;
  return (t * t - 2 * eps * (1 - t)) / (2 * (2 + eps) * gap * gap);
}

/** E_r̂·M²/q on the horizon at angle θ (radians) from the charge's direction; see horizonNormalFieldAt. */
export function horizonNormalField(theta: number, heightOverM: number): number {
  const half = Math.sin(theta / 2);
  return horizonNormalFieldAt(2 * half * half, heightOverM);
}
