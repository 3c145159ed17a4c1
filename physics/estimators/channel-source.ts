/**
 * The source amplitude A of each channel, from the document and the separation history.
 * Electromagnetism: Δp = q(x_A − x_B) = q d₀ σ(t), so A = |q| d₀ and f = σ.
 * Gravity: ΔI_ij = m_eff (x_A² − x_B²)(n_i n_j − δ_ij/3). One branch staying (x_A = d, x_B = 0) gives
 * A = m_eff d₀², f = σ²; a symmetric split (±d/2) gives x_A² = x_B²: no leading-order difference, exactly zero.
 * The lab's recoil keeps the centre of mass fixed: with a lab mass M, the two-body quadrupole μ r², r = x(1 + m/M),
 * equals m(1 + m/M) x², so m_eff = m(1 + m/M); without a lab mass, m_eff = m (an immovable lab).
 */
import type { SeparationHistory } from "../protocols/types";
import type { ScenarioDocument } from "../scenario/schema";
import { electromagneticChannel, gravitationalChannel, type ChannelDefinition } from "../spectra/channels";

export interface ChannelSource {
  definition: ChannelDefinition;
  /** −Infinity when exactly zero. */
  log10Source: number;
  /** |q| in C (electromagnetism) or m_eff in kg (gravity): A = |q|·d₀ or m_eff·d₀²; 0 when exactly zero. */
  chargeOrEffectiveMass: number;
  /** Peak full separation d₀, metres. */
  separationMetres: number;
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
    zeroReason,
  };
}

export function gravitationalSource(document: ScenarioDocument, history: SeparationHistory): ChannelSource {
  const m = document.source.massKg;
  const d = history.peakSeparationMetres;
  const labMass = document.source.labMassKg;
  let zeroReason: string | null = null;
  if (m === 0) zeroReason = "the body has no mass";
  else if (d === 0) zeroReason = "the branches are never separated";
  else if (document.separation.split === "symmetric") {
    zeroReason = "symmetric split: both branches have the same quadrupole, so there is no leading-order difference";
  }
  if (zeroReason) return { definition: gravitationalChannel, log10Source: -Infinity, chargeOrEffectiveMass: 0, separationMetres: d, zeroReason };
  const effectiveMass = labMass && labMass > 0 ? m * (1 + m / labMass) : m;
  return {
    definition: gravitationalChannel,
    log10Source: Math.log10(effectiveMass) + 2 * Math.log10(d),
    chargeOrEffectiveMass: effectiveMass,
    separationMetres: d,
    zeroReason: null,
  };
}
