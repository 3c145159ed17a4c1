/**
 * Hold-driven decoherence rate of a charge superposed outside a Schwarzschild hole, exact at any lab radius,
 * by the horizon (global) method.
 *
 * Formula, in steps (derivation in docs/methods/schwarzschild-exact.md):
 * 1. The two branches hold the charge q at lab positions a proper distance d apart (d measured by the static lab).
 *    A radial separation shifts the areal radius by Δb = d·√(1 − 2M/b); a tangential one the angle by Δθ₀ = d/b.
 * 2. The horizon's normal field E_r̂ changes by ΔE_r̂ (copson-field.ts; Copson 1928 with Linet 1976).
 * 3. The horizon constraint D^A ΔA_A = ΔE_r̂ is solved on the sphere of radius 2M; ∫_H |ΔA_A|² dS is the memory
 *    norm (horizon-memory.ts in closed form; multipoles.ts as the Legendre sum it resums).
 * 4. Horizon photons in the Unruh state: over a hold of Killing time T the affine parameter of the horizon
 *    generators spans ln(V₂/V₁) = κT, κ = c³/(4GM), and the expected number of entangling photons is
 *      ⟨N⟩ = (κT/(πħ)) ∫_H |ΔA_A^{HL}|² dS     (ħ = c = 1, Heaviside–Lorentz)
 *    ("Black holes decohere quantum superpositions", arXiv:2205.06279; "Killing horizons decohere quantum
 *    superpositions", arXiv:2301.00026). Re-derived: the horizon data A_A(V) carries the symplectic product of a
 *    canonically normalised scalar per polarisation, whose Klein–Gordon norm for a step Δφ between V₁ and V₂ is
 *    (1/(πħ)) ∫ dS |Δφ|² ∫ dω/ω = (1/(πħ)) ∫ dS |Δφ|² ln(V₂/V₁). In SI, A^{HL} = √ε0 · A (A in volts) and a factor
 *    1/c makes the count dimensionless: Ṅ_Killing = ε0 κ ∫|ΔA|² dS / (π ħ c).
 * 5. Killing time to the lab's proper time: dτ = √(1 − 2M/b) dt, so Ṅ_lab = Ṅ_Killing / √(1 − 2M/b).
 * General orientation: the radial shift excites only m = 0 and the tangential shift only m = ±1 harmonics, which are
 * orthogonal in the norm, so at angle α from the radial direction the rate is cos²α·radial + sin²α·tangential.
 *
 * Assumptions: test charge (no back-reaction on the metric), static lab at areal radius b > 2GM/c², d small compared
 * with the lab's proper distance to the horizon (linear in d), hold long compared with GM/c³ and 1/κ (the
 * zero-frequency limit), Unruh (or Hartle–Hawking) state at the horizon. The ramps' radiation to null infinity is not
 * included here; it adds to this count.
 */
import { c, epsilon0, hbar } from "../../constants";
import {
  gaussianChargeVoltMetres,
  heightOverMassLength,
  lapseFromHeight,
  massLengthMetres,
  surfaceGravityPerSecond,
} from "./geometrized-units";
import { radialMemoryNorm, tangentialMemoryNorm } from "./horizon-memory";
import { backwardRecurrenceSteps } from "./legendre-q";
import { estimatedMultipolesNeeded, memoryNormMultipoleSum, type MemoryAxis, type MultipoleSum } from "./multipoles";
import { formatNumber, formatQuantity } from "../../units";

export type SeparationAxis = MemoryAxis | { angleFromRadialRadians: number };

export interface SchwarzschildHorizonRateInput {
  massKg: number;
  /** Areal (Schwarzschild) radius of the static lab, metres; must exceed 2GM/c². */
  labArealRadiusMetres: number;
  chargeCoulombs: number;
  /** Full separation d of the two branches, a proper length measured in the lab's static frame, metres. */
  separationMetres: number;
  axis: SeparationAxis;
  /** Tolerance for the multipole check (default 1e-12). */
  multipoleTolerance?: number;
  /**
   * The Legendre sum that checks the closed form: "auto" (default) runs it when it costs at most
   * MULTIPOLE_AUTO_BUDGET recurrence steps (labs farther than b/M ≈ 2 + 2·10⁻⁶), "always", or "never".
   */
  multipoleCheck?: "auto" | "always" | "never";
}

export type HorizonRateRegime = "near-horizon" | "intermediate" | "far-zone";

export type SchwarzschildRateFlagCode =
  | "separation-not-small"
  | "near-horizon-input-precision"
  | "multipole-check-skipped"
  | "multipole-check-not-converged";

export interface SchwarzschildRateFlag {
  code: SchwarzschildRateFlagCode;
  severity: "info" | "caution";
  message: string;
}

export interface SchwarzschildHorizonRate {
  /** Expected entangling photons per second of the lab's proper time during the hold. */
  ratePerLabSecond: number;
  /** The same per second of Killing time (time at infinity). */
  ratePerKillingSecond: number;
  /** ∫_H |ΔA_A|² dS in SI (V² m²), the horizon memory norm of the branch difference. */
  horizonMemoryNormVolt2Metre2: number;
  /** Last multipole ℓ in the Legendre check (null when skipped). */
  lMax: number | null;
  /** Achieved relative difference between the Legendre sum and the closed form (null when skipped). */
  relativeTolerance: number | null;
  multipoleStatus: "converged" | "not-converged" | "skipped";
  /** Multipoles the Legendre sum needs at this radius for the requested tolerance (estimate, ~1/√(b/M − 2)). */
  lMaxEstimated: number;
  regime: HorizonRateRegime;
  /** b/M − 2 with M = GM/c². */
  heightOverMassLength: number;
  /** √(1 − 2GM/(c² b)). */
  labRedshiftFactor: number;
  /** Proper acceleration of the static lab, GM/(b² √(1 − 2GM/(c² b))), m s⁻². */
  labAccelerationMetresPerSecondSquared: number;
  /** q² d² a³ / (6π² ε0 ħ c⁶): the uniformly accelerated (Rindler) rate at the lab's acceleration, for comparison. */
  rindlerRatePerLabSecond: number;
  /** The published order-of-magnitude estimate with coefficient 1, see schwarzschildFarZoneEstimate. */
  farZoneEstimatePerSecond: number;
  /** ratePerLabSecond / farZoneEstimatePerSecond. */
  ratioToFarZoneEstimate: number;
  flags: SchwarzschildRateFlag[];
}

/** Recurrence steps the "auto" multipole check may spend per axis (about 0.5 ms of work). */
export const MULTIPOLE_AUTO_BUDGET = 20_000;

/** Regime boundaries: the radial rate within this fraction of the Rindler rate, or of its far-zone law. */
const REGIME_FRACTION = 0.01;

/** The exact far-zone limits derived in docs/methods/schwarzschild-exact.md, coefficient of q²d²(GM/c²)³/(4πε0 ħ b⁶). */
export const FAR_ZONE_COEFFICIENT: Readonly<Record<MemoryAxis, number>> = Object.freeze({
  radial: 8 / (3 * Math.PI),
  tangential: 2 / (3 * Math.PI),
});

/** The same limits as multiples of the published estimate (whose q² carries 1/ε0, not 1/(4πε0)). */
const FAR_ZONE_LAW_PER_ESTIMATE: Readonly<Record<MemoryAxis, number>> = Object.freeze({
  radial: FAR_ZONE_COEFFICIENT.radial / (4 * Math.PI),
  tangential: FAR_ZONE_COEFFICIENT.tangential / (4 * Math.PI),
});

/**
 * The published order-of-magnitude estimate, coefficient set to 1: Ṅ ~ G³M³q²d²/(ε0 ħ c⁶ b⁶), i.e. ⟨N⟩ ~ M³q²d²T/D⁶
 * in Planck units with D = b ("Black holes decohere quantum superpositions", arXiv:2205.06279). Valid only far
 * from the hole, and only as an order of magnitude; per second (lab and Killing time agree there).
 */
export function schwarzschildFarZoneEstimate(input: SchwarzschildHorizonRateInput): number {
  validate(input);
  return input.chargeCoulombs ** 2 * input.separationMetres ** 2 *
    farZoneEstimatePerUnitQ2D2(massLengthMetres(input.massKg), input.labArealRadiusMetres);
}

/** G³M³/(ε0 ħ c⁶ b⁶) = (M/b²)³/(ε0 ħ) with M = GM/c²: the estimate per unit q²d², s⁻¹ C⁻² m⁻². */
function farZoneEstimatePerUnitQ2D2(massLength: number, labArealRadiusMetres: number): number {
  return (massLength / (labArealRadiusMetres * labArealRadiusMetres)) ** 3 / (epsilon0 * hbar);
}

/** Exact hold rate by the horizon method; see the module comment for formula, sources and assumptions. */
export function schwarzschildHorizonRate(input: SchwarzschildHorizonRateInput): SchwarzschildHorizonRate {
  validate(input);
  const m = massLengthMetres(input.massKg);
  const eps = heightOverMassLength(input.labArealRadiusMetres, input.massKg);
  const lapse = lapseFromHeight(eps);
  const b = input.labArealRadiusMetres;
  const d = input.separationMetres;
  const weights = axisWeights(input.axis);

  // Everything scales as q²d²: work per unit q²d² (C² m²) and multiply at the end.
  // Step 3 in SI: the field scale on the horizon is (q/4πε0)/M², the sphere has radius 2M, so
  // ∫|ΔA|² dS = 16 (q/4πε0)² × (unit-sphere norm) × (shift)², with shifts ΔB = d·lapse/M and Δθ₀ = d/b.
  const fieldScale = gaussianChargeVoltMetres(1);
  const unitNorm: Record<MemoryAxis, number> = {
    radial: 16 * fieldScale * fieldScale * radialMemoryNorm(eps) * (lapse / m) ** 2,
    tangential: 16 * fieldScale * fieldScale * tangentialMemoryNorm(eps) * (1 / b) ** 2,
  };
  const unitNormCombined = weights.radial * unitNorm.radial + weights.tangential * unitNorm.tangential;

  // Steps 4 and 5: Ṅ_lab = ε0 κ ∫|ΔA|² dS / (π ħ c √(1 − 2M/b)).
  const perLabSecondPerNorm = (epsilon0 * surfaceGravityPerSecond(input.massKg)) / (Math.PI * hbar * c * lapse);
  const q2d2 = input.chargeCoulombs ** 2 * d * d;
  const ratePerLabSecond = q2d2 * perLabSecondPerNorm * unitNormCombined;

  // References: the Rindler rate at the lab's acceleration, and the published far-zone estimate.
  const acceleration = (c * c * m) / (b * b * lapse);
  const unitRindler = (acceleration / (c * c)) ** 3 / (6 * Math.PI * Math.PI * epsilon0 * hbar);
  const unitEstimate = farZoneEstimatePerUnitQ2D2(m, b);
  const unitRadialRate = perLabSecondPerNorm * unitNorm.radial;

  const flags: SchwarzschildRateFlag[] = [];
  const tolerance = input.multipoleTolerance ?? 1e-12;
  const check = multipoleCheck(eps, weights, tolerance, input.multipoleCheck ?? "auto", flags);
  const properDistanceToHorizon = m * (Math.sqrt((2 + eps) * eps) + 2 * Math.asinh(Math.sqrt(eps / 2)));
  if (d > 0.1 * properDistanceToHorizon) {
    flags.push({
      code: "separation-not-small",
      severity: "caution",
      message:
        `The separation is more than a tenth of the lab's proper distance to the horizon ` +
        `(${formatQuantity(properDistanceToHorizon, "length")}); the rate is the leading term in d and may be off by O(d²/distance²).`,
    });
  }
  if (eps < 1e-10) {
    flags.push({
      code: "near-horizon-input-precision",
      severity: "caution",
      message:
        `The lab sits ${formatNumber(eps)} M above the horizon; representing b in double precision leaves ` +
        `b/M − 2 uncertain by about ${formatNumber(((2.2e-16 * (2 + eps)) / eps), 2)} (relative), and the rate by 3/2 of that.`,
    });
  }

  return {
    ratePerLabSecond,
    ratePerKillingSecond: ratePerLabSecond * lapse,
    horizonMemoryNormVolt2Metre2: q2d2 * unitNormCombined,
    ...check,
    lMaxEstimated: estimatedMultipolesNeeded(eps, tolerance),
    regime: regimeOf(unitRadialRate / unitRindler, unitRadialRate / (FAR_ZONE_LAW_PER_ESTIMATE.radial * unitEstimate)),
    heightOverMassLength: eps,
    labRedshiftFactor: lapse,
    labAccelerationMetresPerSecondSquared: acceleration,
    rindlerRatePerLabSecond: q2d2 * unitRindler,
    farZoneEstimatePerSecond: q2d2 * unitEstimate,
    ratioToFarZoneEstimate: (perLabSecondPerNorm * unitNormCombined) / unitEstimate,
    flags,
  };
}

function regimeOf(radialOverRindler: number, radialOverFarZoneLaw: number): HorizonRateRegime {
  if (Math.abs(radialOverRindler - 1) < REGIME_FRACTION) return "near-horizon";
  if (Math.abs(radialOverFarZoneLaw - 1) < REGIME_FRACTION) return "far-zone";
  return "intermediate";
}

/** cos²α and sin²α for the separation's angle α from the radial direction (exact 1 and 0 for the named axes). */
function axisWeights(axis: SeparationAxis): Record<MemoryAxis, number> {
  if (axis === "radial") return { radial: 1, tangential: 0 };
  if (axis === "tangential") return { radial: 0, tangential: 1 };
  return { radial: Math.cos(axis.angleFromRadialRadians) ** 2, tangential: Math.sin(axis.angleFromRadialRadians) ** 2 };
}

function validate(input: SchwarzschildHorizonRateInput): void {
  const { massKg, labArealRadiusMetres, chargeCoulombs, separationMetres } = input;
  if (!(Number.isFinite(massKg) && massKg > 0)) throw new RangeError("massKg must be a positive finite number");
  if (!Number.isFinite(chargeCoulombs)) throw new RangeError("chargeCoulombs must be finite");
  if (!(Number.isFinite(separationMetres) && separationMetres > 0)) {
    throw new RangeError("separationMetres must be a positive finite number");
  }
  if (!(Number.isFinite(labArealRadiusMetres) && labArealRadiusMetres > 2 * massLengthMetres(massKg))) {
    throw new RangeError("labArealRadiusMetres must exceed the Schwarzschild radius 2GM/c²");
  }
  const axis = input.axis;
  if (typeof axis === "object" && !Number.isFinite(axis.angleFromRadialRadians)) {
    throw new RangeError("angleFromRadialRadians must be finite");
  }
}

// ---- multipole check (cached per height and axis; the rate itself never waits for it) ----

const multipoleCache = new Map<string, MultipoleSum>();
const MULTIPOLE_CACHE_LIMIT = 1024;

function cachedMultipoleSum(eps: number, axis: MemoryAxis, tolerance: number): MultipoleSum {
  const key = `${eps}|${axis}|${tolerance}`;
  const hit = multipoleCache.get(key);
  if (hit) return hit;
  const result = memoryNormMultipoleSum(eps, axis, { tolerance });
  if (multipoleCache.size >= MULTIPOLE_CACHE_LIMIT) multipoleCache.clear();
  multipoleCache.set(key, result);
  return result;
}

function multipoleCheck(
  eps: number,
  weights: Record<MemoryAxis, number>,
  tolerance: number,
  mode: "auto" | "always" | "never",
  flags: SchwarzschildRateFlag[],
): Pick<SchwarzschildHorizonRate, "lMax" | "relativeTolerance" | "multipoleStatus"> {
  const cost = backwardRecurrenceSteps(eps, estimatedMultipolesNeeded(eps, tolerance));
  if (mode === "never" || (mode === "auto" && cost > MULTIPOLE_AUTO_BUDGET)) {
    if (mode === "auto") {
      flags.push({
        code: "multipole-check-skipped",
        severity: "info",
        message:
          `The Legendre check would need about ${estimatedMultipolesNeeded(eps, tolerance)} multipoles this close to ` +
          `the horizon; the closed form was used unchecked (request multipoleCheck: "always" to run it).`,
      });
    }
    return { lMax: null, relativeTolerance: null, multipoleStatus: "skipped" };
  }
  let lMax = 0;
  let worst = 0;
  let converged = true;
  for (const axis of ["radial", "tangential"] as const) {
    if (weights[axis] === 0) continue;
    const sum = cachedMultipoleSum(eps, axis, tolerance);
    const closed = axis === "radial" ? radialMemoryNorm(eps) : tangentialMemoryNorm(eps);
    lMax = Math.max(lMax, sum.lMax);
    worst = Math.max(worst, Math.abs(sum.value / closed - 1));
    converged &&= sum.converged;
  }
  if (!converged) {
    flags.push({
      code: "multipole-check-not-converged",
      severity: "info",
      message: `The Legendre check stopped at ℓ = ${lMax} before its tail fell below ${tolerance}.`,
    });
  }
  return { lMax, relativeTolerance: worst, multipoleStatus: converged ? "converged" : "not-converged" };
}
