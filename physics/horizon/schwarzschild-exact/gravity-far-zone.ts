/**
 * Gravitational analogue, far zone only: the hold rate from the hole's tidal absorption of the change in the lab's
 * mass quadrupole.
 *
 * Formula, in steps:
 * 1. Branches. The lab keeps its centre of mass fixed (stress-energy conservation), so the branches differ in their
 *    trace-free quadrupole, not their dipole. With the body (mass m) at x_A in one branch and x_B in the other,
 *    relative to the centre of mass of body + lab (mass M_lab), ΔI_ij = μ (x_B x_B − x_A x_A)_ij^STF with
 *    μ = m M_lab/(m + M_lab). "One-sided" splitting (x_A = 0, x_B = d ê) gives μ d² (ê ê)^STF; a split symmetric
 *    about the centre of mass (x = ±d ê/2) gives ΔI = 0 (with the body offset x₀ from it, 2μx₀d: the engine's
 *    estimators take x₀ through physics/estimators/channel-source.ts and call this module per unit quadrupole).
 * 2. Tidal field at the hole, Newtonian (leading order in GM/(c² b)), of a quadrupole at distance b along n̂:
 *      ΔE_ab = −(G/2) ΔI_cd ∂_a∂_b∂_c∂_d (1/R)
 *            = −(G/(2b⁵)) [105 n_a n_b I_nn − 15 δ_ab I_nn − 30 (n_a (I n)_b + n_b (I n)_a) + 6 I_ab].
 * 3. Tidal heating of a Schwarzschild hole by a slowly varying tidal field: dM/dt = (16/45) M⁶ Ė_ab Ė^ab
 *    (G = c = 1; E. Poisson, PRD 70, 084044 (2004), arXiv:gr-qc/0407050 — coefficient from memory; consistent with the
 *    induced quadrupole (32/45) M⁶ Ė_ab of Fang & Lovelace, PRD 72, 124016 (2005), arXiv:gr-qc/0505156, and with the
 *    v⁸ ratio of horizon to infinity flux of Poisson & Sasaki, PRD 51, 5753 (1995)). In SI,
 *    P = (16/45) G⁵ M⁶ ⟨Ė_ab Ė^ab⟩ / c¹³ with E_ab in s⁻². For E_ab = ΔE_ab cos ωt this is P = ½ ω² 𝒟 with
 *    𝒟 = (16/45) G⁵ M⁶ ΔE:ΔE / c¹³.
 * 4. Fluctuation–dissipation at the horizon temperature (Unruh state): a dissipation 𝒟 at temperature T_H gives a
 *    zero-frequency noise 2 k_B T_H 𝒟 and a hold rate Ṅ_Killing = 2 k_B T_H 𝒟 / ħ² = c³ 𝒟 / (4π G M ħ) (the same
 *    chain reproduces the electromagnetic horizon formula; see the independent-route test). Hence
 *      Ṅ_Killing = (4/(45π)) G⁴ M⁵ ΔE:ΔE / (ħ c¹⁰),   Ṅ_lab = Ṅ_Killing / √(1 − 2GM/(c² b)).
 * 5. Comparison: the published scaling ⟨N⟩ ~ M⁵ m² d⁴ T / D¹⁰ (arXiv:2205.06279), i.e. G⁶M⁵m²d⁴/(ħ c¹⁰ b¹⁰) with
 *    coefficient 1. For one-sided splitting with μ = m this gives exact/estimate = 96/(5π) ≈ 6.11 (radial) and
 *    26/(5π) ≈ 1.66 (tangential).
 *
 * Validity: b ≫ GM/c² (relative corrections O(GM/(c² b)) are not computed), d ≪ b, slow variation. An exact
 * near-zone result (the gravitational counterpart of the Copson–Linet field) is out of reach here: the result always
 * carries the flag "far-zone-only", and "lab-not-in-far-zone" (a caution that states the size GM/(c²b) of the
 * neglected corrections) once GM/(c²b) exceeds GRAVITY_FAR_ZONE_CORRECTION_CAUTION. The rate itself is the same
 * formula at every radius: no other value is ever swapped in, so it is continuous in b.
 */
import { G, c, hbar } from "../../constants";
import { lapseFromHeight, heightOverMassLength, massLengthMetres } from "./geometrized-units";
import type { MemoryAxis } from "./multipoles";
import { formatNumber } from "../../units";

export type Vector3 = readonly [number, number, number];
export type Matrix3 = readonly [Vector3, Vector3, Vector3];

/**
 * Above this size of the neglected relative corrections, GM/(c²b), the far-zone formula carries a caution
 * (1 %: b < 100 GM/c²). Common practice for "≪", as in physics/flags.ts.
 */
export const GRAVITY_FAR_ZONE_CORRECTION_CAUTION = 0.01;

/** GM/(c²b): the relative size of the corrections the leading-order (far-zone) rate leaves out. */
export function farZoneCorrectionSize(massKg: number, labArealRadiusMetres: number): number {
  return massLengthMetres(massKg) / labArealRadiusMetres;
}

export interface GravityFarZoneInput {
  massKg: number;
  labArealRadiusMetres: number;
  bodyMassKg: number;
  /** Mass of the rest of the lab, which recoils; default Infinity (μ = m). */
  labMassKg?: number;
  /** Full branch separation d: the body's displacement relative to the rest of the lab, proper length, metres. */
  separationMetres: number;
  axis: MemoryAxis;
  /** "one-sided" (default): one branch at the centre of mass; "symmetric": ±d/2 about it (ΔI = 0). */
  splitting?: "one-sided" | "symmetric";
}

export type GravityFlagCode = "far-zone-only" | "lab-not-in-far-zone" | "zero-quadrupole-difference";

export interface GravityFlag {
  code: GravityFlagCode;
  severity: "info" | "caution";
  message: string;
}

export interface GravityFarZoneRate {
  ratePerLabSecond: number;
  ratePerKillingSecond: number;
  /** ΔE_ab at the hole, s⁻², in the orthonormal basis (r̂, θ̂, φ̂) of the lab. */
  tidalFieldDifference: Matrix3;
  /** G⁶M⁵m²d⁴/(ħ c¹⁰ b¹⁰), the published scaling with coefficient 1. */
  publishedEstimatePerSecond: number;
  ratioToPublishedEstimate: number;
  /** Always false: only the far-zone limit is computed. */
  nearZoneExact: false;
  flags: GravityFlag[];
}

/** ΔI_ij^STF (kg m²) in the lab basis (r̂, θ̂, φ̂) for the branch configuration of GravityFarZoneInput. */
export function displacedBodyQuadrupoleDifference(input: GravityFarZoneInput): Matrix3 {
  const labMass = input.labMassKg ?? Infinity;
  const mu = Number.isFinite(labMass) ? (input.bodyMassKg * labMass) / (input.bodyMassKg + labMass) : input.bodyMassKg;
  if (input.splitting === "symmetric") return zeroMatrix();
  const unit: Vector3 = input.axis === "radial" ? [1, 0, 0] : [0, 1, 0];
  const d2 = input.separationMetres ** 2;
  return matrix((i, j) => mu * d2 * (unit[i] * unit[j] - (i === j ? 1 / 3 : 0)));
}

/** Newtonian tidal field ΔE_ab (s⁻²) at distance b along n̂ = r̂ = (1, 0, 0) from a trace-free quadrupole ΔI (kg m²). */
export function tidalFieldOfQuadrupole(quadrupole: Matrix3, distanceMetres: number): Matrix3 {
  const n: Vector3 = [1, 0, 0];
  const iN = [0, 1, 2].map((a) => quadrupole[a][0] * n[0] + quadrupole[a][1] * n[1] + quadrupole[a][2] * n[2]);
  const iNN = iN[0] * n[0] + iN[1] * n[1] + iN[2] * n[2];
  const scale = -G / (2 * distanceMetres ** 5);
  return matrix(
    (a, b) =>
      scale *
      (105 * n[a] * n[b] * iNN - 15 * (a === b ? 1 : 0) * iNN - 30 * (n[a] * iN[b] + n[b] * iN[a]) + 6 * quadrupole[a][b]),
  );
}

/**
 * Dissipation coefficient 𝒟 (J s) of the hole for a tidal field oscillating with amplitude ΔE_ab:
 * P = ½ ω² 𝒟, 𝒟 = (16/45) G⁵ M⁶ ΔE:ΔE / c¹³ (Poisson 2004, see the module comment).
 */
export function tidalDissipationCoefficient(massKg: number, tidalAmplitude: Matrix3): number {
  // G⁵M⁶/c¹³ = (GM/c²)⁶/(G c): arranged so that no intermediate power overflows.
  const m = massLengthMetres(massKg);
  return ((16 / 45) * m ** 6 * contract(tidalAmplitude, tidalAmplitude)) / (G * c);
}

/** Far-zone gravitational hold rate; see the module comment. */
export function schwarzschildGravityFarZoneRate(input: GravityFarZoneInput): GravityFarZoneRate {
  validate(input);
  const b = input.labArealRadiusMetres;
  const tidal = tidalFieldOfQuadrupole(displacedBodyQuadrupoleDifference(input), b);
  const twiceHawkingKT = (hbar * c * c * c) / (4 * Math.PI * G * input.massKg);
  const ratePerKillingSecond = (twiceHawkingKT * tidalDissipationCoefficient(input.massKg, tidal)) / (hbar * hbar);
  const lapse = lapseFromHeight(heightOverMassLength(b, input.massKg));
  const published = schwarzschildGravityPublishedEstimate(input);
  const bOverM = b / massLengthMetres(input.massKg);
  const flags: GravityFlag[] = [
    {
      code: "far-zone-only",
      severity: "info",
      message: "Leading order in GM/(c² b): no exact near-zone result for the gravitational case is computed.",
    },
  ];
  const correction = 1 / bOverM;
  if (correction > GRAVITY_FAR_ZONE_CORRECTION_CAUTION) {
    flags.push({
      code: "lab-not-in-far-zone",
      severity: "caution",
      message: `b = ${formatNumber(bOverM)} GM/c²: the far-zone formula leaves out relative corrections of order GM/(c² b) = ${formatNumber(correction, 2)}.`,
    });
  }
  if (input.splitting === "symmetric") {
    flags.push({
      code: "zero-quadrupole-difference",
      severity: "caution",
      message: "A split symmetric about the centre of mass has no quadrupole difference; the octupole term is not computed.",
    });
  }
  return {
    ratePerLabSecond: ratePerKillingSecond / lapse,
    ratePerKillingSecond,
    tidalFieldDifference: tidal,
    publishedEstimatePerSecond: published,
    ratioToPublishedEstimate: ratePerKillingSecond / lapse / published,
    nearZoneExact: false,
    flags,
  };
}

/** G⁶M⁵m²d⁴/(ħ c¹⁰ b¹⁰): the published scaling with coefficient 1, s⁻¹ (m the body's mass). */
export function schwarzschildGravityPublishedEstimate(input: GravityFarZoneInput): number {
  validate(input);
  const hole = massLengthMetres(input.massKg);
  const body = massLengthMetres(input.bodyMassKg);
  const b = input.labArealRadiusMetres;
  const d = input.separationMetres;
  // G⁶M⁵m²d⁴/(ħc¹⁰b¹⁰) = (GM/c²)⁵ (Gm/c²)² d⁴ c⁴ / (ħ G b¹⁰), grouped as dimensionless ratios.
  return ((hole / b) ** 5 * (body / b) ** 2 * (d / b) ** 4 * c ** 4 * b) / (hbar * G);
}

function validate(input: GravityFarZoneInput): void {
  const { massKg, labArealRadiusMetres, bodyMassKg, separationMetres } = input;
  if (!(Number.isFinite(massKg) && massKg > 0)) throw new RangeError("massKg must be a positive finite number");
  if (!(Number.isFinite(bodyMassKg) && bodyMassKg > 0)) throw new RangeError("bodyMassKg must be positive and finite");
  if (!(Number.isFinite(separationMetres) && separationMetres > 0)) {
    throw new RangeError("separationMetres must be a positive finite number");
  }
  if (!(labArealRadiusMetres > 2 * massLengthMetres(massKg)) || !Number.isFinite(labArealRadiusMetres)) {
    throw new RangeError("labArealRadiusMetres must exceed the Schwarzschild radius 2GM/c²");
  }
  if (input.labMassKg !== undefined && !(input.labMassKg > 0)) throw new RangeError("labMassKg must be positive");
}

function matrix(entry: (i: number, j: number) => number): Matrix3 {
  const row = (i: number): Vector3 => [entry(i, 0), entry(i, 1), entry(i, 2)];
  return [row(0), row(1), row(2)];
}

function zeroMatrix(): Matrix3 {
  return matrix(() => 0);
}

function contract(a: Matrix3, b: Matrix3): number {
  let sum = 0;
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) sum += a[i][j] * b[i][j];
  return sum;
}
