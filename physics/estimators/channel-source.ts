/**
 * The source amplitude A of each channel, from the document and the separation history.
 * Electromagnetism: Δp = q(x_A − x_B) = q d₀ σ(t), so A = |q| d₀ and f = σ.
 * Gravity, one recoil convention everywhere (docs/methods, gravity-far-zone.ts, sources.ts): the lab (mass M, the
 * rest of the apparatus) and the body (mass m) keep their common centre of mass fixed, and every length is measured
 * by the lab: the body's position x relative to the lab's own centre of mass is the relative coordinate, and the
 * two-body quadrupole about the common centre of mass is μ x² with μ = m M/(m + M) (m when no lab mass is given:
 * an immovable lab). With the body at x₀ before the split (separation.bodyOffsetMetres, default 0) and the
 * branches at x₀ + x_A, x₀ + x_B,
 *   ΔI_ij = μ [(x₀ + x_A)² − (x₀ + x_B)²] (n_i n_j − δ_ij/3),
 * so with σ(t) the separation profile (peak 1) and ξ = x₀/d₀:
 *   one branch stays (x_A = d₀σ, x_B = 0):  ΔI = μ d₀² g(σ),  g = 2ξσ + σ²   (μ(2x₀d + d²) at full separation);
 *   symmetric (x_{A,B} = ±d₀σ/2):            ΔI = μ d₀² g(σ),  g = 2ξσ        (2μx₀d: zero only for x₀ = 0).
 * A = μ d₀² s and f = g/s with s = max |g| over σ ∈ [0, 1] (continuous in ξ, so A and f never jump); the hold rate
 * at full separation is Γ(A)·f(1)², carried as log10FullSeparationFactor.
 */
import type { SeparationHistory } from "../protocols/types";
import type { ScenarioDocument } from "../scenario/schema";
import { electromagneticChannel, gravitationalChannel, type ChannelDefinition } from "../spectra/channels";

export interface ChannelSource {
  definition: ChannelDefinition;
  /** −Infinity when exactly zero. */
  log10Source: number;
  /** |q| in C (electromagnetism), or A/d₀² in kg (gravity: μ·s, see above); 0 when exactly zero. */
  chargeOrEffectiveMass: number;
  /** Peak full separation d₀, metres. */
  separationMetres: number;
  /** log10 f(1)²: the hold rate at full separation is the rate for A times f(1)²; 0 for electromagnetism. */
  log10FullSeparationFactor: number;
  zeroReason: string | null;
}

export function electromagneticSource(document: ScenarioDocument, history: SeparationHistory): ChannelSource {
  const q = Math.abs(document.source.chargeCoulombs);
  const d = history.peakSeparationMetres;
  const zeroReason = q === 0 ? "the body carries no charge" : d === 0 ? "the branches are never separated" : null;
  return {
    definition: electromagneticChannel,
    log10Source: zeroReason ? -Infinity : Math.log10(q) + Math.log10(d),
    chargeOrEffectiveMass: zeroReason ? 0 : q,
    separationMetres: d,
    log10FullSeparationFactor: 0,
    zeroReason,
  };
}

/** μ = m M/(m + M), the lab's recoil; m for an immovable lab (no lab mass given, or 0). */
export function recoilReducedMass(bodyMassKg: number, labMassKg: number | null | undefined): number {
  return labMassKg && labMassKg > 0 ? (bodyMassKg * labMassKg) / (bodyMassKg + labMassKg) : bodyMassKg;
}

/** max |g(σ)| over σ ∈ [0, 1] for g = 2ξσ + σ² (one branch stays) or 2ξσ (symmetric). */
function profileScale(split: ScenarioDocument["separation"]["split"], xi: number): number {
  if (split === "symmetric") return 2 * Math.abs(xi);
  const vertex = -1 <= xi && xi <= 0 ? xi * xi : 0;
  return Math.max(Math.abs(2 * xi + 1), vertex);
}

export function gravitationalSource(document: ScenarioDocument, history: SeparationHistory): ChannelSource {
  const m = document.source.massKg;
  const d = history.peakSeparationMetres;
  const offset = document.separation.bodyOffsetMetres ?? 0;
  const split = document.separation.split;
  let zeroReason: string | null = null;
  if (m === 0) zeroReason = "the body has no mass";
  else if (d === 0) zeroReason = "the branches are never separated";
  else if (split === "symmetric" && offset === 0) {
    zeroReason = "symmetric split about the body's place at the lab's centre of mass (x₀ = 0): both branches have the same quadrupole, so there is no leading-order difference";
  }
  const zero = { definition: gravitationalChannel, log10Source: -Infinity, chargeOrEffectiveMass: 0, separationMetres: d, log10FullSeparationFactor: 0, zeroReason };
  if (zeroReason) return zero;
  const xi = offset / d;
  const scale = profileScale(split, xi);
  if (!(scale > 0) || !Number.isFinite(scale)) return { ...zero, zeroReason: "the quadrupole difference is outside the range of a double" };
  const atFull = (split === "symmetric" ? 2 * xi : 2 * xi + 1) / scale;
  const effectiveMass = recoilReducedMass(m, document.source.labMassKg) * scale;
  return {
    definition: quadrupoleChannel(split, xi, scale),
    log10Source: Math.log10(effectiveMass) + 2 * Math.log10(d),
    chargeOrEffectiveMass: effectiveMass,
    separationMetres: d,
    log10FullSeparationFactor: 2 * Math.log10(Math.abs(atFull)),
    zeroReason: null,
  };
}

/** The gravitational channel with the profile f = g/s of the branch configuration (gravitationalChannel for ξ = 0, one branch stays). */
function quadrupoleChannel(split: ScenarioDocument["separation"]["split"], xi: number, scale: number): ChannelDefinition {
  if (split === "one-branch-stays" && xi === 0) return gravitationalChannel;
  if (split === "symmetric") {
    const k = (2 * xi) / scale;
    return { ...gravitationalChannel, profileKey: `gravitational:symmetric:${xi}`, profile: (sigma) => k * sigma, profileRate: (_sigma, rate) => k * rate, profileRateReadsProfile: false };
  }
  return {
    ...gravitationalChannel,
    profileKey: `gravitational:one-branch:${xi}`,
    profile: (sigma) => (2 * xi * sigma + sigma * sigma) / scale,
    profileRate: (sigma, rate) => ((2 * xi + 2 * sigma) * rate) / scale,
  };
}
