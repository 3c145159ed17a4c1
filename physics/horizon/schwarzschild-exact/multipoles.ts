/**
 * Multipole (Legendre) expansion of the horizon's normal field and of the horizon memory norm.
 *
 * Coefficients. Heine's expansion 1/(B − μ) = Σ_ℓ (2ℓ+1) Q_ℓ(B) P_ℓ(μ) for B > 1 (Whittaker & Watson §15.4, from
 * memory), differentiated in B, turns the closed-form horizon field of copson-field.ts,
 *   E_r̂ M²/q = (1/(2x)) [1 − (B² − 1)/(B − μ)²],   x = b/M, B = x − 1, μ = cos θ,
 * into E_r̂ = Σ_{ℓ≥1} e_ℓ P_ℓ(μ) with e_ℓ = (2ℓ+1) g_ℓ(B) / (2x), g_ℓ = (B² − 1) Q_ℓ'(B). The ℓ = 0 term vanishes
 * (the hole is neutral). The identity (B² − 1) Q_ℓ' = ℓ(ℓ+1)/(2ℓ+1) · (Q_{ℓ+1} − Q_{ℓ−1}) gives g_ℓ without
 * cancellation from the ratios of legendre-q.ts, and Legendre's equation gives g_ℓ' = ℓ(ℓ+1) Q_ℓ, so
 *   ∂e_ℓ/∂B = ((2ℓ+1)/2) [ℓ(ℓ+1) Q_ℓ / x − g_ℓ / x²].
 *
 * Memory norm. On the unit sphere the constraint D^A a_A = δE (with a_A = D_A χ) has ∫|a|² dΩ = Σ |δE_ℓm|²/(ℓ(ℓ+1)).
 *   Radial shift ΔB of the charge (axisymmetric, m = 0):  Σ_ℓ 4π (∂_B e_ℓ)² / ((2ℓ+1) ℓ(ℓ+1))  per ΔB².
 *   Tangential shift Δθ₀ (m = ±1, δE = Σ e_ℓ P_ℓ'(μ) sin θ cos φ Δθ₀, ∫(1−μ²)P_ℓ'² dμ = 2ℓ(ℓ+1)/(2ℓ+1)):
 *     Σ_ℓ 2π e_ℓ² / (2ℓ+1)  per Δθ₀².
 * Both are in units (q/M²)² and are the same quantities horizon-memory.ts gives in closed form.
 *
 * Convergence: e_ℓ ~ e^{−ℓη} with cosh η = B = 1 + ε, so ~ ln(1/tol)/(2η) terms are needed — about 1/√ε near the
 * horizon. The sum stops when a geometric bound on the tail falls below the tolerance.
 */
import { backwardRecurrenceSteps, legendreDecayRate, legendreQ0, legendreQRatios } from "./legendre-q";

export type MemoryAxis = "radial" | "tangential";

export interface MultipoleSumOptions {
  /** Relative tolerance for the omitted tail (default 1e-12). */
  tolerance?: number;
  /** Largest ℓ to include (default 200 000). */
  lCap?: number;
}

export interface MultipoleSum {
  /** Truncated sum, units (q/M²)² per ΔB² (radial) or per Δθ₀² (tangential). */
  value: number;
  /** Last ℓ included. */
  lMax: number;
  /** Geometric bound on the omitted tail relative to the sum (Infinity if the terms had not begun to fall). */
  tailBound: number;
  converged: boolean;
  /** Backward-recurrence steps spent (the cost). */
  recurrenceSteps: number;
}

/** ℓ needed for the tail to fall below `tolerance`, from the decay e^{−2ℓη} (an estimate, used to size arrays). */
export function estimatedMultipolesNeeded(heightOverM: number, tolerance: number): number {
  return Math.ceil((Math.log(1 / tolerance) + 10) / (2 * legendreDecayRate(heightOverM))) + 20;
}

/** Legendre coefficients e_ℓ (units q/M²) of the horizon's normal field, ℓ = 0 … lMax; e_0 = 0. */
export function horizonFieldMultipoles(heightOverM: number, lMax: number): Float64Array {
  const x = 2 + heightOverM;
  const { r, s } = legendreQRatios(heightOverM, lMax + 1);
  const e = new Float64Array(lMax + 1);
  let qPrevious = legendreQ0(heightOverM);
  for (let l = 1; l <= lMax; l++) {
    e[l] = ((2 * l + 1) * gCoefficient(l, qPrevious, s[l], s[l + 1])) / (2 * x);
    qPrevious *= r[l];
  }
  return e;
}

/** g_ℓ = (B²−1) Q_ℓ'(B) = −ℓ(ℓ+1)/(2ℓ+1) · Q_{ℓ−1} (1 − r_ℓ r_{ℓ+1}), with 1 − r_ℓ r_{ℓ+1} = s_ℓ + s_{ℓ+1} − s_ℓ s_{ℓ+1}. */
function gCoefficient(l: number, qLowerNeighbour: number, sL: number, sNext: number): number {
  return (-(l * (l + 1)) / (2 * l + 1)) * qLowerNeighbour * (sL + sNext - sL * sNext);
}

/** The memory norm as a truncated multipole sum; see the module comment for the formulas. */
export function memoryNormMultipoleSum(
  heightOverM: number,
  axis: MemoryAxis,
  options: MultipoleSumOptions = {},
): MultipoleSum {
  const tolerance = options.tolerance ?? 1e-12;
  const lCap = options.lCap ?? 200_000;
  let lTop = Math.min(lCap, estimatedMultipolesNeeded(heightOverM, tolerance));
  let spent = 0;
  for (;;) {
    const result = sumUpTo(heightOverM, axis, tolerance, lTop);
    spent += result.recurrenceSteps;
    if (result.converged || lTop >= lCap) return { ...result, recurrenceSteps: spent };
    lTop = Math.min(lCap, 2 * lTop);
  }
}

function sumUpTo(heightOverM: number, axis: MemoryAxis, tolerance: number, lTop: number): MultipoleSum {
  const x = 2 + heightOverM;
  const { r, s } = legendreQRatios(heightOverM, lTop + 1);
  let qPrevious = legendreQ0(heightOverM);
  let sum = 0;
  let previousTerm = 0;
  let previousRatio = Infinity;
  let tailBound = Infinity;
  let l = 1;
  for (; l <= lTop; l++) {
    const g = gCoefficient(l, qPrevious, s[l], s[l + 1]);
    const q = qPrevious * r[l];
    let term: number;
    if (axis === "tangential") {
      const e = ((2 * l + 1) * g) / (2 * x);
      term = (2 * Math.PI * e * e) / (2 * l + 1);
    } else {
      const de = ((2 * l + 1) / 2) * ((l * (l + 1) * q) / x - g / (x * x));
      term = (4 * Math.PI * de * de) / ((2 * l + 1) * l * (l + 1));
    }
    sum += term;
    qPrevious = q;
    if (l >= 3 && previousTerm > 0) {
      const ratio = term / previousTerm;
      if (ratio < 1 && ratio <= previousRatio) {
        tailBound = (term * ratio) / (1 - ratio) / sum;
        if (tailBound <= tolerance) break;
      } else {
        tailBound = Infinity;
      }
      previousRatio = ratio;
    }
    if (term === 0 && sum > 0) {
      tailBound = 0;
      break;
    }
    previousTerm = term;
  }
  const lMax = Math.min(l, lTop);
  return {
    value: sum,
    lMax,
    tailBound,
    converged: tailBound <= tolerance,
    recurrenceSteps: backwardRecurrenceSteps(heightOverM, lTop + 1),
  };
}
