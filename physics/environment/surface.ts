/**
 * A warm surface: the body's charge q held at height z above a plane Ohmic half-space of resistivity ρ at
 * temperature T, its branches at x_A and x_B along the separation axis (parallel to the plane, or perpendicular to
 * it with positive offsets pointing away from it).
 *
 * The engine's local formula ⟨N⟩ = S(0) t/ħ² for the which-path observable X = q[φ(x_A) − φ(x_B)], with the
 * fluctuation–dissipation theorem S(0) = 2k_BT lim_{ω→0} Im χ(ω)/ω (the classical limit of ħ coth(ħω/2k_BT) Im χ).
 * χ is X's response to a perturbation −fX, i.e. to charges −fq at x_A and +fq at x_B: in the quasi-static limit
 * the surface answers each charge Q at height h with an image −r(ω)Q at depth h, r = (ε − 1)/(ε + 1), so
 *   χ(ω) = r(ω) q²/(4πε₀) · K,   K = 1/(2z_A) + 1/(2z_B) − 2/√(Δ_∥² + (z_A + z_B)²),
 * the self-image terms of each branch minus the cross terms. A Drude conductor below its relaxation rate has
 * ε = ε_b + i/(ε₀ρω), so r → 1 + 2iε₀ρω and Im r/ω → 2ε₀ρ (independent of the background ε_b), and
 *   d⟨N⟩/dt = 2F = k_BT q² ρ K/(π ħ²),
 * exact in Δx/z. Parallel (z_A = z_B = z, Δ_∥ = Δx): K = Δx²/(z s (s + 2z)), s = √(Δx² + 4z²) → Δx²/(8z³);
 * perpendicular (z_A,B = z + x_A,B): K = (z_A − z_B)²/(2 z_A z_B (z_A + z_B)) → Δx²/(4z³), twice as large — the
 * field noise above a conductor is twice as strong normal to it. Both forms are free of cancellation.
 * Derived here; the image-response route is that of J. R. Anglin, J. P. Paz & W. H. Zurek, PRA 55, 4041 (1997),
 * quant-ph/9611049; the tests check it against a numerical integral of the low-frequency Fresnel coefficient r_p(k, ω)
 * over the evanescent wavenumbers (retardation included), which must reduce to it for z ≪ skin depth.
 *
 * Validity flags, at the protocol's highest frequency ω = max(2π/shortest moving window, v_peak/z): z against the
 * skin depth √(2ρ/(μ₀ω)) (quasi-static); ω against the material's relaxation rate (Drude τ, and the charge
 * relaxation ε₀ε_bρ); the body's radius against its least height (a point charge); moving charges (retardation and
 * the eddy currents' magnetic part are left out: the quasi-static model failed for keV electrons flying past doped
 * silicon, P. Kerker et al., New J. Phys. 22, 063039 (2020); S. Scheel & S. Y. Buhmann, PRA 85, 030101 (2012)).
 */
import { c, epsilon0, hbar, kB, mu0 } from "../constants";
import { peakBranchSpeed } from "../protocols";
import type { FlagStatus, ValidityFlag } from "../result-basics";
import { ScenarioInputError } from "../scenario/input-error";
import { accumulate, environmentResult, zeroEnvironmentResult } from "./channel-result";
import type { BranchPaths, EnvironmentChannelResult } from "./types";
import { formatNumber, formatQuantity } from "../units";

export type SurfaceOrientation = "parallel" | "perpendicular";

export interface SurfaceParameters {
  chargeCoulombs: number;
  bodyRadiusMetres: number;
  /** Height z of the body's rest position above the plane. */
  distanceMetres: number;
  resistivityOhmMetres: number;
  temperatureKelvin: number;
  orientation: SurfaceOrientation;
  /** The host's relative permittivity ε_b (1 for a metal; 11.7 for doped silicon); only the charge relaxation flag uses it. */
  backgroundPermittivity: number;
  /** Drude relaxation time τ; null: 10⁻¹² s assumed (metals and doped semiconductors at room temperature: 10⁻¹⁴–10⁻¹² s). */
  relaxationTimeSeconds: number | null;
}

export const ASSUMED_RELAXATION_TIME_SECONDS = 1e-12;

/** The geometric factor K (m⁻¹) of the image response, at branch offsets x_A, x_B from height z. */
export function imageKernel(z: number, orientation: SurfaceOrientation, xA: number, xB: number): number {
  if (orientation === "parallel") {
    const dx = xA - xB;
    const s = Math.sqrt(dx * dx + 4 * z * z);
    return (dx * dx) / (z * s * (s + 2 * z));
  }
  const zA = z + xA;
  const zB = z + xB;
  return (xA - xB) ** 2 / (2 * zA * zB * (zA + zB)); // z_A − z_B from the offsets: no cancellation against z
}

/** S(0) = 2k_BT · q²/(4πε₀) · 2ε₀ρ · K, in J² s (the noise of X = q Δφ at zero frequency). */
export function surfaceZeroFrequencyNoise(p: SurfaceParameters, xA: number, xB: number): number {
  return (2 * kB * p.temperatureKelvin * p.chargeCoulombs ** 2 * 2 * epsilon0 * p.resistivityOhmMetres * imageKernel(p.distanceMetres, p.orientation, xA, xB)) / (4 * Math.PI * epsilon0);
}

/** F = S(0)/(2ħ²), s⁻¹. */
export function surfaceDecoherenceFunction(p: SurfaceParameters): (xA: number, xB: number) => number {
  return (xA, xB) => surfaceZeroFrequencyNoise(p, xA, xB) / (2 * hbar * hbar);
}

/**
 * A thin resistive sheet of surface resistance R_s instead of a half-space — a metal film much thinner than z, or a
 * horizon in the membrane picture (R_H = 1/(ε₀c) ≈ 377 Ω; R. L. Znajek, MNRAS 179, 457 (1977); T. Damour, PRD 18,
 * 3598 (1978); K. S. Thorne, R. H. Price & D. A. Macdonald, Black Holes: The Membrane Paradigm (1986)). Its
 * quasi-static reflection coefficient r = iσ_sk/(2ε₀ω + iσ_sk) gives Im r/ω → 2ε₀R_s/k, so the same formula reads
 *   d⟨N⟩/dt = k_BT q² R_s K_sheet/(πħ²),
 *   K_sheet = 2 ln((2z + √(Δx² + 4z²))/(4z)) (parallel) → Δx²/(8z²),   ln((z_A + z_B)²/(4z_Az_B)) (perpendicular) → Δx²/(4z²),
 * from ∫₀^∞ (e^{−ak} − e^{−ak}J₀(bk)) dk/k = ln((a + √(a² + b²))/2a) and Frullani's integral. Derived here.
 */
export function sheetKernel(z: number, orientation: SurfaceOrientation, xA: number, xB: number): number {
  if (orientation === "parallel") {
    const dx = xA - xB;
    const s = Math.sqrt(dx * dx + 4 * z * z);
    return 2 * Math.log1p((dx * dx) / (4 * z * (s + 2 * z)));
  }
  const zA = z + xA;
  const zB = z + xB;
  return Math.log1p((xA - xB) ** 2 / (4 * zA * zB));
}

/** d⟨N⟩/dt = k_BT q² R_s K_sheet/(πħ²), s⁻¹, for a resistive sheet at distance z and temperature T. */
export function sheetHoldRate(p: { chargeCoulombs: number; temperatureKelvin: number; sheetResistanceOhms: number; distanceMetres: number; orientation: SurfaceOrientation }, xA: number, xB: number): number {
  return (kB * p.temperatureKelvin * p.chargeCoulombs ** 2 * p.sheetResistanceOhms * sheetKernel(p.distanceMetres, p.orientation, xA, xB)) / (Math.PI * hbar * hbar);
}

function ratioFlag(code: string, measure: number, message: string): ValidityFlag {
  const status: FlagStatus = measure <= 0.01 ? "ok" : measure <= 0.1 ? "caution" : "invalid";
  return { code, status, message, measure };
}

/** Highest frequency the protocol drives, rad/s: the shortest moving window, and the passage time z/v. */
function protocolAngularFrequency(paths: BranchPaths, z: number): number {
  const windows = paths.history.windows.map((w) => w.durationSeconds).filter((t) => t > 0);
  const ramp = windows.length ? (2 * Math.PI) / Math.min(...windows) : 0;
  return Math.max(ramp, peakBranchSpeed(paths.history, paths.split) / z);
}

function surfaceFlags(paths: BranchPaths, p: SurfaceParameters, leastHeight: number): ValidityFlag[] {
  const omega = protocolAngularFrequency(paths, p.distanceMetres);
  const speed = peakBranchSpeed(paths.history, paths.split);
  const tau = Math.max(p.relaxationTimeSeconds ?? ASSUMED_RELAXATION_TIME_SECONDS, epsilon0 * p.backgroundPermittivity * p.resistivityOhmMetres);
  const skinDepth = omega > 0 ? Math.sqrt((2 * p.resistivityOhmMetres) / (mu0 * omega)) : Infinity;
  return [
    ratioFlag(
      "surface-skin-depth",
      p.distanceMetres / skinDepth,
      `the surface is ${formatNumber(p.distanceMetres / skinDepth)} skin depths away at the protocol's highest frequency ${formatNumber(omega)} rad/s: the quasi-static image needs z ≪ δ`,
    ),
    ratioFlag(
      "surface-relaxation",
      omega * tau,
      `ωτ = ${formatNumber(omega * tau)} (τ = ${formatQuantity(tau, "time")}${p.relaxationTimeSeconds === null ? ", Drude time assumed 1 ps" : ""}): the Ohmic response needs frequencies below the relaxation rate`,
    ),
    ratioFlag(
      "surface-body-size",
      p.bodyRadiusMetres / leastHeight,
      `the body's radius is ${formatNumber(p.bodyRadiusMetres / leastHeight)} of its least height above the surface: the image of a point charge needs ≪ 1 (the separation itself is treated exactly)`,
    ),
    speed === 0
      ? { code: "surface-moving-charge", status: "ok", message: "the branches do not move" }
      : {
          code: "surface-moving-charge",
          status: speed / c > 1e-3 ? "caution" : "note",
          message:
            `branches move at up to ${formatNumber(speed)} m/s: the static image leaves out retardation and the eddy currents' magnetic field, ` +
            "which the quasi-static model missed for keV electrons past doped silicon (Kerker et al. 2020)",
          measure: speed / c,
        },
  ];
}

export function surfaceChannel(paths: BranchPaths, p: SurfaceParameters, documentPath = "environment.surface"): EnvironmentChannelResult {
  const d = paths.history.peakSeparationMetres;
  const reach = paths.split === "symmetric" ? 0.5 * d : d;
  const leastHeight = p.orientation === "perpendicular" && paths.split === "symmetric" ? p.distanceMetres - reach : p.distanceMetres;
  if (leastHeight <= p.bodyRadiusMetres) {
    throw new ScenarioInputError(`${documentPath}.distanceMetres`, `a branch comes within ${formatQuantity(leastHeight, "length")} of the surface, not more than the body's radius: the body would touch it`);
  }
  if (p.chargeCoulombs === 0) return zeroEnvironmentResult("surface", "environment-surface", "the body carries no charge (its induced dipoles are not counted)");
  if (p.temperatureKelvin === 0) return zeroEnvironmentResult("surface", "environment-surface", "the surface is at 0 K");
  if (d === 0) return zeroEnvironmentResult("surface", "environment-surface", "the branches are never separated");
  const F = surfaceDecoherenceFunction(p);
  return environmentResult("surface", "environment-surface", accumulate(paths, F), "quasi-static-image", surfaceFlags(paths, p, leastHeight));
}
