/**
 * The two radiation channels and their spectral weights along the lab's worldline.
 *
 * Every count is ⟨N⟩ = ∫₀^∞ W(ω) |ṽ(ω)|² dω, with v(t) = dA f(t)/dt the rate of change of the source (the dipole
 * difference Δp = q d₀ σ(t) for electromagnetism; the quadrupole scale m d₀² σ(t)² for gravity) and
 * ṽ(ω) = ∫ v(t) e^{iωt} dt. For a field state that is thermal along the worldline at α = 2π k_B T_local/ħ (in s⁻¹):
 *
 *   W(ω) = K ω⁻¹ P(ω²) coth(πω/α),   P(ω²) = Π_k (ω² + k²α²),  k = 1 (EM), k = 1, 2 (gravity).
 *
 * Derivation. With the Wightman spectrum S_W(ω) = ∫ dτ e^{iωτ} ⟨E(τ)E(0)⟩, ⟨N⟩ = (1/ħ²)∫dω/2π |Δp̃|² S_W; the even
 * part of S_W is ½ S(ω) coth-form, and |Δp̃|² = |ṽ|²/ω². For EM, S_W = ħωP/(3πε0c³(1 − e^{−2πω/α})) (Boyer, PRD 21,
 * 2137 (1980); Takagi, Prog. Theor. Phys. Suppl. 88, 1 (1986)), so K_EM = 1/(6π² ε0 ħ c³), and as α → 0,
 * W → K_EM ω, Larmor's formula counted in quanta. For gravity, K_GW = (2/3)·G/(5π ħ c⁵): the quadrupole formula
 * counted in quanta, (G/5πħc⁵)∫ω⁵Σ|ΔĨ_ij|², with Σ_ij (n_i n_j − δ_ij/3)² = 2/3 for a difference along one axis;
 * its thermal form with the spin-2 factor (ω² + α²)(ω² + 4α²) is the Fourier transform of the csch⁶ correlator of a
 * spin-2 field strength along the accelerated worldline (derived for Rindler; for de Sitter the graviton state is
 * identified by assumption, flagged where used).
 *
 * Split. W has a double pole at ω = 0, W ≈ W₀/ω² with W₀ = K α P(0)/π: it is the zero-frequency noise, whose share
 * is exactly Γ ∫ f(t)² dt with Γ = π W₀ = K α P(0) (per unit A², s⁻¹): the hold-driven part. The rest,
 * W_rest = W − W₀/ω², is finite at ω = 0 and carries the ramp-driven part.
 *
 * Units: times in a reference scale τ₀ (Ω = ωτ₀, ᾱ = ατ₀), W_rest(ω) = K τ₀^{−p} w̄(Ω, ᾱ) with p = 2·(number of k) − 1.
 */
import { G, c, epsilon0, hbar } from "../constants";
import type { Channel } from "../result-basics";

export interface ChannelDefinition {
  channel: Channel;
  /** log10 K, in SI: the coefficient of W. */
  log10Coefficient: number;
  /** Power p of the inertial-vacuum weight W = K ω^p. */
  power: number;
  /** The k of the thermal factors ω² + k²α². */
  thermalOrders: readonly number[];
  /**
   * Continuous derivatives of σ the count needs to be finite: the velocity (1) for the dipole, whose weight ω
   * meets |ṽ|² ~ ω⁻² at a kink; the acceleration (2) for the quadrupole, whose weight ω³ meets |ṽ|² ~ ω⁻⁴ where
   * the acceleration jumps at nonzero separation. Below it the count grows like the logarithm of the bandwidth.
   */
  smoothnessNeeded: 1 | 2;
  /** The channel's source profile f(σ) and df/du from σ and dσ/du. */
  profile(sigma: number): number;
  profileRate(sigma: number, sigmaRate: number): number;
  /** Whether profileRate reads σ (the quadrupole's 2σσ′ does, the dipole's σ′ does not): samplers skip σ otherwise. */
  profileRateReadsProfile: boolean;
  /** Names the profile in spectrum caches when it differs from the channel's default (a body offset x₀ ≠ 0). */
  profileKey?: string;
}

export const electromagneticChannel: ChannelDefinition = {
  channel: "electromagnetic",
  log10Coefficient: -Math.log10(6 * Math.PI * Math.PI * epsilon0 * hbar * c ** 3),
  power: 1,
  thermalOrders: [1],
  smoothnessNeeded: 1,
  profile: (sigma) => sigma,
  profileRate: (_sigma, sigmaRate) => sigmaRate,
  profileRateReadsProfile: false,
};

export const gravitationalChannel: ChannelDefinition = {
  channel: "gravitational",
  log10Coefficient: Math.log10((2 / 3) * (G / (5 * Math.PI * hbar))) - 5 * Math.log10(c),
  power: 3,
  thermalOrders: [1, 2],
  smoothnessNeeded: 2,
  profile: (sigma) => sigma * sigma,
  profileRate: (sigma, sigmaRate) => 2 * sigma * sigmaRate,
  profileRateReadsProfile: true,
};

/** Coefficients of P(Ω²) − P(0) as a polynomial in Ω² (index i ↔ Ω^{2i}, i ≥ 1), and P(0). */
function thermalPolynomial(orders: readonly number[], alpha: number): { coefficients: number[]; atZero: number } {
  let coefficients = [1];
  for (const k of orders) {
    const shift = k * k * alpha * alpha;
    const next = new Array(coefficients.length + 1).fill(0);
    coefficients.forEach((a, i) => {
      next[i] += a * shift;
      next[i + 1] += a;
    });
    coefficients = next;
  }
  return { coefficients, atZero: coefficients[0] };
}

/**
 * Below this ᾱ the thermal corrections (relative size ~ᾱ²) are far below double precision, and ᾱ² would
 * underflow: the weight and kernel are taken as the inertial ones.
 */
const INERTIAL_BELOW = 1e-100;

/** x coth x − 1, accurate for small x. */
function xCothXMinusOne(x: number): number {
  if (x < 0.1) {
    const x2 = x * x;
    return x2 * (1 / 3 + x2 * (-1 / 45 + x2 * (2 / 945 - x2 / 4725)));
  }
  return x / Math.tanh(x) - 1;
}

/**
 * The constants of w̄(·, ᾱ) at one ᾱ: P(Ω²) = P₀ + c₁Ω² + c₂Ω⁴ + c₃Ω⁶ (leading coefficient 1, at Ω^{2·top}), and
 * the factors of its two forms. Evaluated by plain functions rather than closures: the integrals call them 10³–10⁴
 * times per ramp, and a closure made per call is not inlined there (about four times slower, measured).
 */
export interface ThermalWeight {
  /** Power p of the inertial weight Ω^p. */
  power: number;
  /** Degree of P in Ω². */
  top: number;
  atZero: number;
  c1: number;
  c2: number;
  c3: number;
  /** w̄(0, ᾱ), the limit of the low-frequency form. */
  atOrigin: number;
  /** π/ᾱ, so that x = πΩ/ᾱ is one product. */
  xPerOmega: number;
  /** ᾱ/π. */
  tailFactor: number;
}

/** null below INERTIAL_BELOW, where w̄ = Ω^p exactly. */
export function thermalWeight(definition: ChannelDefinition, alphaBar: number): ThermalWeight | null {
  if (alphaBar < INERTIAL_BELOW) return null;
  const { coefficients, atZero } = thermalPolynomial(definition.thermalOrders, alphaBar);
  if (coefficients.length > 4) throw new RangeError("thermal polynomials of degree above 3 are not implemented");
  const c1 = coefficients[1];
  return {
    power: definition.power,
    top: coefficients.length - 1,
    atZero,
    c1,
    c2: coefficients[2] ?? 0,
    c3: coefficients[3] ?? 0,
    atOrigin: (alphaBar / Math.PI) * ((atZero * Math.PI * Math.PI) / (3 * alphaBar * alphaBar) + c1),
    xPerOmega: Math.PI / alphaBar,
    tailFactor: alphaBar / Math.PI,
  };
}

/**
 * The dimensionless ramp weight w̄(Ω, ᾱ) = W_rest τ₀^p / K, from Ω and 1/Ω (so that a grid can supply 1/Ω from a
 * table). Two forms, each free of cancellation where it is used: x = πΩ/ᾱ < 1, (ᾱ/πΩ²)[P(xcothx − 1) + (P − P₀)];
 * else P/Ω + (ᾱ/πΩ²)[P·2x/(e^{2x} − 1) − P₀], whose Bose factor is dropped beyond x = 350 (below e⁻⁷⁰⁰).
 */
function thermalWeightAt(w: ThermalWeight, omega: number, inverseOmega: number): number {
  if (omega === 0) return w.atOrigin;
  const omega2 = omega * omega;
  const tail = w.tailFactor * inverseOmega * inverseOmega;
  // P − P₀ without its constant term (degree 1 for EM, 2 for gravity), by Horner's rule.
  const minusZero = omega2 * (w.c1 + omega2 * (w.c2 + omega2 * w.c3));
  const polynomial = w.atZero + minusZero;
  const x = w.xPerOmega * omega;
  if (x < 1) return tail * (polynomial * xCothXMinusOne(x) + minusZero);
  if (x > 350) return polynomial * inverseOmega - tail * w.atZero;
  return polynomial * inverseOmega + tail * (polynomial * ((2 * x) / Math.expm1(2 * x)) - w.atZero);
}

/** w̄(Ω, ᾱ) for many Ω at one ᾱ; ᾱ below INERTIAL_BELOW gives Ω^p exactly. */
export function rampWeight(definition: ChannelDefinition, alphaBar: number): (omega: number) => number {
  const p = definition.power;
  const thermal = thermalWeight(definition, alphaBar);
  if (thermal === null) return p === 1 ? (omega) => omega : (omega) => omega ** p;
  return (omega) => thermalWeightAt(thermal, omega, 1 / omega);
}

/** 1/j for j ≥ 1 (index 0 unused), grown on demand: a constant table, so a grid needs no division per point. */
let reciprocals = new Float64Array(0);

function reciprocalTable(length: number): Float64Array {
  if (reciprocals.length < length) {
    reciprocals = new Float64Array(length);
    for (let j = 1; j < length; j++) reciprocals[j] = 1 / j;
  }
  return reciprocals;
}

/** w̄(j·step, ᾱ) for j = 0 … out.length − 1, written into `out`: the ramp integral's grid. */
export function fillRampWeightsOnGrid(definition: ChannelDefinition, alphaBar: number, step: number, out: Float64Array): void {
  const thermal = thermalWeight(definition, alphaBar);
  const p = definition.power;
  if (thermal === null) {
    for (let j = 0; j < out.length; j++) out[j] = (j * step) ** p;
    return;
  }
  const inverse = reciprocalTable(out.length);
  const inverseStep = 1 / step;
  for (let j = 0; j < out.length; j++) out[j] = thermalWeightAt(thermal, j * step, inverse[j] * inverseStep);
}

/** w̄(Ω, ᾱ) − Ω^p: the thermal correction to the inertial weight, computed without cancellation at large Ω. */
export function thermalCorrectionAt(w: ThermalWeight, omega: number): number {
  const x = w.xPerOmega * omega;
  if (x < 1) return thermalWeightAt(w, omega, 1 / omega) - omega ** w.power;
  const omega2 = omega * omega;
  // P − P₀ below its leading term Ω^{2·top}.
  const belowTop = w.top === 1 ? 0 : w.top === 2 ? w.c1 * omega2 : omega2 * (w.c1 + w.c2 * omega2);
  const polynomial = w.atZero + belowTop + omega2 ** w.top;
  const boseTail = x > 350 ? 0 : (2 * x) / Math.expm1(2 * x);
  return (w.atZero + belowTop) / omega + (w.tailFactor / omega2) * (polynomial * boseTail - w.atZero);
}

/** thermalCorrectionAt as a function of Ω alone; identically 0 below INERTIAL_BELOW. */
export function thermalCorrectionWeight(definition: ChannelDefinition, alphaBar: number): (omega: number) => number {
  const thermal = thermalWeight(definition, alphaBar);
  if (thermal === null) return () => 0;
  return (omega) => thermalCorrectionAt(thermal, omega);
}

/**
 * The time-domain ramp kernel k̄(x̄, ᾱ) = ∫₀^∞ w̄(Ω, ᾱ) cos(Ωx̄) dΩ for x̄ > 0, which couples two ramps that do not
 * overlap: their cross term is 2∫∫ g₁ g₂ k̄. Derived by integrating k̄'' = −∫Ω² w̄ cos(Ωx̄) dΩ twice with decay at
 * infinity, where ∫₀^∞ Ω(Ω² + ᾱ²)coth(πΩ/ᾱ)cos(Ωx̄)dΩ = (3/8)ᾱ⁴ csch⁴(ᾱx̄/2) and the spin-2 analogue is
 * −(15/8)ᾱ⁶ csch⁶(ᾱx̄/2):
 *   EM:      k̄ = −ᾱ²[ln(1 − e^{−ᾱx̄}) + ¼ csch²(ᾱx̄/2)]                       → −1/x̄² as ᾱ → 0;
 *   gravity: k̄ = (15/2)ᾱ⁴[csch⁴y/20 − (2/15)csch²y − (8/15)ln(1 − e^{−2y})], y = ᾱx̄/2  → 6/x̄⁴.
 */
export function rampKernel(definition: ChannelDefinition, alphaBar: number): (x: number) => number {
  const gravitational = definition.channel === "gravitational";
  if (alphaBar < INERTIAL_BELOW) return gravitational ? (x) => 6 / x ** 4 : (x) => -1 / (x * x);
  // ᾱ csch(ᾱx/2) → 2/x as ᾱ → 0: kept together so that small ᾱ neither overflows nor underflows.
  const scaledCsch2 = (x: number) => (alphaBar / Math.sinh((alphaBar * x) / 2)) ** 2;
  const logTail = (x: number) => Math.log(-Math.expm1(-alphaBar * x));
  if (gravitational) {
    return (x) => {
      const q2 = scaledCsch2(x);
      const a2 = alphaBar * alphaBar;
      return 7.5 * ((q2 * q2) / 20 - (2 / 15) * a2 * q2 - (8 / 15) * a2 * a2 * logTail(x));
    };
  }
  return (x) => -(alphaBar * alphaBar * logTail(x) + 0.25 * scaledCsch2(x));
}

/** log10 of the hold-rate coefficient Γ/A² = K α^{2n+1} Π k² (s⁻¹ per unit A²); −Infinity when α = 0. */
export function log10HoldRateCoefficient(definition: ChannelDefinition, alphaPerSecond: number): number {
  if (alphaPerSecond === 0) return -Infinity;
  const orders = definition.thermalOrders;
  const productOfSquares = orders.reduce((product, k) => product * k * k, 1);
  return definition.log10Coefficient + Math.log10(productOfSquares) + (2 * orders.length + 1) * Math.log10(alphaPerSecond);
}
