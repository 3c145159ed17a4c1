/**
 * Residual-gas collisions: a sphere of radius R in a gas of molecules of mass m at pressure P and temperature T.
 *
 * Each collision scatters a molecule of momentum p = mv; with the sphere's path Δx apart in the two branches, the
 * scattered molecule carries away the phase difference (p_in − p_out)·Δx/ħ. Hard-sphere (classical) scattering
 * off a heavy sphere is isotropic, with total cross-section σ = πR², and the incoming directions are isotropic,
 * so averaging e^{i(p_in − p_out)·Δx/ħ} over both independent directions gives sinc²(pΔx/ħ), and
 *
 *   F(Δx) = n σ ⟨v (1 − sinc²(m v Δx/ħ))⟩_Maxwell = γ (1 − D(κ)/κ),   n = P/(k_B T),   κ = Δx√(2mk_BT)/ħ,
 *
 * with D Dawson's integral (gasDecoherenceFunction), which joins the two published limits exactly; this form is
 * the one evaluated, at every Δx:
 *   long wavelength (Δx ≪ λ_th):  F = Λ Δx²,  Λ = (8/3ħ²) P √(2π m k_B T) R²
 *     (E. Joos & H. D. Zeh, Z. Phys. B 59, 223 (1985); M. Schlosshauer, Decoherence and the Quantum-to-Classical
 *     Transition (Springer 2007), ch. 3, eq. for Λ_air; O. Romero-Isart, PRA 84, 052121 (2011));
 *   saturated (Δx ≫ λ_th):  F = γ = n πR² ⟨v⟩ = P R² √(8π/(m k_B T)), the kinetic-theory collision rate.
 * The crossover, where ΛΔx² = γ, is Δx_c = √(γ/Λ) = (√3/2) ħ/√(m k_B T) ≈ 0.345 λ_th, with the thermal de Broglie
 * wavelength λ_th = 2πħ/√(2π m k_B T). The regime reported compares ΛΔx₀²/γ at full separation with 0.1 and 10.
 *
 * Approximations: an ideal gas in thermal equilibrium, the body at rest and much heavier than a molecule, the
 * classical geometric cross-section (a quantum hard sphere's 2πR² includes a forward diffraction peak that
 * transfers no momentum; K. Hornberger & J. E. Sipe, PRA 68, 012105 (2003) give the exact quantum treatment, which
 * corrects older rates by a factor 2π), isotropic scattering (exact for hard spheres; real surfaces accommodate and re-emit, which changes the crossover's shape, not its limits).
 * Flags: the regime; small bodies, where the van der Waals (C₆) cross-section replaces the geometric one
 * (L. Hackermüller et al., Appl. Phys. B 77, 781 (2003), quant-ph/0307238).
 */
import { hbar, kB } from "../constants";
import type { ValidityFlag } from "../result-basics";
import { accumulate, environmentResult, zeroEnvironmentResult } from "./channel-result";
import { gasSpecies, molecularMassKg, type GasSpecies } from "./species";
import type { BranchPaths, EnvironmentChannelResult } from "./types";
import { oneMinusDawsonOverX } from "./special-functions";
import { regimeOf } from "./which-path";
import { formatNumber, formatQuantity } from "../units";

export interface GasParameters {
  pressurePascals: number;
  temperatureKelvin: number;
  species: GasSpecies;
  bodyRadiusMetres: number;
}

export interface GasRates {
  /** Λ, m⁻² s⁻¹. */
  localisationRate: number;
  /** γ, s⁻¹. */
  collisionRate: number;
  thermalWavelengthMetres: number;
  crossoverSeparationMetres: number;
}

export function gasRates(p: GasParameters): GasRates {
  const m = molecularMassKg(p.species);
  const kT = kB * p.temperatureKelvin;
  const R2 = p.bodyRadiusMetres ** 2;
  return {
    localisationRate: (8 / (3 * hbar * hbar)) * p.pressurePascals * Math.sqrt(2 * Math.PI * m * kT) * R2,
    collisionRate: p.pressurePascals * R2 * Math.sqrt((8 * Math.PI) / (m * kT)),
    thermalWavelengthMetres: (2 * Math.PI * hbar) / Math.sqrt(2 * Math.PI * m * kT),
    crossoverSeparationMetres: ((Math.sqrt(3) / 2) * hbar) / Math.sqrt(m * kT),
  };
}

/**
 * F(Δx) = γ · 2∫₀^∞ u³ e^{−u²} (1 − sinc²(κu)) du = γ (1 − D(κ)/κ), κ = Δx √(2mk_BT)/ħ, u = v/√(2k_BT/m), with D
 * Dawson's integral: sin² = (1 − cos)/2 and ∫₀^∞ u e^{−u²} cos(2κu) du = ½ − κD(κ) (derived here; the tests check it
 * against the Maxwell average by quadrature). s⁻¹.
 */
export function gasDecoherenceFunction(p: GasParameters): (separationMetres: number) => number {
  const { collisionRate } = gasRates(p);
  const momentumScale = Math.sqrt(2 * molecularMassKg(p.species) * kB * p.temperatureKelvin) / hbar;
  return (separationMetres) => {
    const kappa = Math.abs(separationMetres) * momentumScale;
    return kappa === 0 ? 0 : collisionRate * oneMinusDawsonOverX(kappa);
  };
}

/** Below this radius the van der Waals attraction, not the geometric size, sets the cross-section (common practice). */
const VAN_DER_WAALS_RADIUS_METRES = 1e-8;

export function gasChannel(paths: BranchPaths, p: GasParameters): EnvironmentChannelResult {
  if (p.pressurePascals === 0) return zeroEnvironmentResult("gas", "environment-gas", "no residual gas (pressure 0)");
  const rates = gasRates(p);
  const d = paths.history.peakSeparationMetres;
  const ratio = (rates.localisationRate * d * d) / rates.collisionRate;
  const regime = regimeOf(ratio);
  const flags: ValidityFlag[] = [
    {
      code: "gas-regime",
      status: regime === "crossover" ? "caution" : "note",
      message:
        `${gasSpecies[p.species].name} at full separation: ${regime} (d/Δx_c = ${formatNumber(d / rates.crossoverSeparationMetres)}, ` +
        `crossover Δx_c = ${formatQuantity(rates.crossoverSeparationMetres, "length")} ≈ 0.345 λ_th); the joined hard-sphere form is evaluated at every instant` +
        (regime === "crossover" ? ", and its shape between the limits assumes isotropic scattering" : ""),
      measure: d / rates.crossoverSeparationMetres,
    },
    p.bodyRadiusMetres < VAN_DER_WAALS_RADIUS_METRES
      ? {
          code: "gas-cross-section",
          status: "caution",
          message: "a body this small scatters molecules by its van der Waals attraction more than by its size: the geometric cross-section πR² underestimates the rate (Hackermüller et al. 2003)",
          measure: p.bodyRadiusMetres,
        }
      : { code: "gas-cross-section", status: "ok", message: "geometric hard-sphere cross-section πR² (body larger than the van der Waals range)", measure: p.bodyRadiusMetres },
  ];
  if (d === 0) return zeroEnvironmentResult("gas", "environment-gas", "the branches are never separated", flags);
  const F = gasDecoherenceFunction(p);
  return environmentResult("gas", "environment-gas", accumulate(paths, (a, b) => F(a - b)), regime, flags);
}
