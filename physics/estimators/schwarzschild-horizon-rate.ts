/**
 * The hold rate of a static lab outside a Schwarzschild black hole (Unruh state): quanta into the horizon per
 * second of lab proper time, at full separation. This file is the seam for a rate model: computeScenario takes
 * any SchwarzschildHorizonRateModel. The default is exactHorizonRateModel (schwarzschild-exact-rate.ts);
 * publishedEstimateRateModel, below, is the alternative, and the exact model reports it beside its own value.
 *
 * publishedEstimateRateModel, with r_s = 2GM/c², b the lab's areal radius, lapse √(1 − r_s/b):
 * - far (b ≥ 10 r_s): the order-of-magnitude estimate of Danielson, Satishchandran & Wald, IJMPD 31, 2241003
 *   (2022), arXiv:2205.06279, ⟨N⟩ ~ M³q²d²T/D⁶ (EM) and M⁵m²d⁴T/D¹⁰ (gravity) in Planck units, with T Killing
 *   time. Restoring SI (M → GM/c², q² → q²/(ε0ħc), T → cT): Γ_t = G³M³(qd)²/(ε0 ħ c⁶ b⁶) and
 *   G⁶M⁵(m d²)²/(ħ c¹⁰ b¹⁰); per lab proper time Γ_τ = Γ_t / lapse.
 * - near (b ≤ 1.01 r_s): the Rindler rate with the lab's local acceleration a = GM/(b²·lapse):
 *   Γ = (qd)² a³/(6π² ε0 ħ c⁶) (S(0) of Boyer 1980 / Takagi 1986), gravity in its thermal spin-2 form.
 * - in between: log Γ interpolated linearly in ln b, and marked "interpolated".
 * Each is an estimate, labelled with its regime; the radial/tangential axis does not enter these estimates.
 */
import { schwarzschildRadiusMetres } from "../backgrounds/schwarzschild-geometry";
import { G, c, epsilon0, hbar } from "../constants";
import type { Channel, EstimateRegime, RateRegime, ValidityFlag } from "../result";
import { electromagneticChannel, gravitationalChannel, log10HoldRateCoefficient } from "../spectra/channels";
import type { SourceKey } from "./sources";

export interface SchwarzschildHorizonRateInput {
  channel: Channel;
  massKg: number;
  labArealRadiusMetres: number;
  labRedshiftFactor: number;
  labProperAccelerationMetresPerSecondSquared: number;
  axis: "radial" | "tangential";
  /** The body's coupling: |q| in C for electromagnetism, m_eff in kg for gravity (channel-source.ts). */
  chargeOrEffectiveMass: number;
  /** Full separation d of the branches at the hold, a proper length measured by the static lab, metres; > 0. */
  separationMetres: number;
}

/** A hold rate and where it comes from. */
export interface RateWithSource {
  /** log10 of quanta per second of lab proper time at full separation. */
  log10RatePerSecond: number;
  regime: RateRegime;
  sourceKey: SourceKey;
}

/** The published estimate, in one of its regimes. */
export interface EstimatedRate extends RateWithSource {
  regime: EstimateRegime;
}

export interface SchwarzschildHorizonRate extends RateWithSource {
  /** The published order-of-magnitude estimate for the same lab and source, when the rate is not itself that estimate. */
  estimate: EstimatedRate | null;
  /** The model's own validity checks, in the result's flag format. */
  flags: ValidityFlag[];
}

/** Where a lab and channel sit, without a source: what `rate` would report as regime and source. */
export type SchwarzschildRateLab = Omit<SchwarzschildHorizonRateInput, "chargeOrEffectiveMass" | "separationMetres">;

export interface SchwarzschildHorizonRateModel {
  name: string;
  rate(input: SchwarzschildHorizonRateInput): SchwarzschildHorizonRate;
  /** The regime and source `rate` reports for this lab and channel (for a channel that is exactly zero). */
  describe(lab: SchwarzschildRateLab): Pick<RateWithSource, "regime" | "sourceKey">;
}

export const NEAR_HORIZON_RADIUS_RATIO = 1.01;
export const FAR_RADIUS_RATIO = 10;

const log10 = Math.log10;
const LOG10_G = log10(G);
const LOG10_C = log10(c);
const LOG10_HBAR = log10(hbar);
const LOG10_EPSILON0 = log10(epsilon0);

/** log10 of the source amplitude A: q·d (C m) or m_eff·d² (kg m²). */
export function log10SourceAmplitude(input: SchwarzschildHorizonRateInput): number {
  const power = input.channel === "electromagnetic" ? 1 : 2;
  return log10(input.chargeOrEffectiveMass) + power * log10(input.separationMetres);
}

function farRate(input: SchwarzschildHorizonRateInput, log10Source: number): number {
  const killing =
    input.channel === "electromagnetic"
      ? 3 * LOG10_G + 3 * log10(input.massKg) + 2 * log10Source - LOG10_EPSILON0 - LOG10_HBAR - 6 * LOG10_C - 6 * log10(input.labArealRadiusMetres)
      : 6 * LOG10_G + 5 * log10(input.massKg) + 2 * log10Source - LOG10_HBAR - 10 * LOG10_C - 10 * log10(input.labArealRadiusMetres);
  return killing - log10(input.labRedshiftFactor);
}

function nearRate(input: SchwarzschildHorizonRateInput, log10Source: number): number {
  const definition = input.channel === "electromagnetic" ? electromagneticChannel : gravitationalChannel;
  return 2 * log10Source + log10HoldRateCoefficient(definition, input.labProperAccelerationMetresPerSecondSquared / c);
}

function estimateRegime(lab: SchwarzschildRateLab): EstimateRegime {
  const ratio = lab.labArealRadiusMetres / schwarzschildRadiusMetres(lab.massKg);
  return ratio >= FAR_RADIUS_RATIO ? "far" : ratio <= NEAR_HORIZON_RADIUS_RATIO ? "near-horizon" : "interpolated";
}

const ESTIMATE_KEYS = {
  electromagnetic: { far: "schwarzschild-far-em", "near-horizon": "schwarzschild-near-em", interpolated: "schwarzschild-interpolated-em" },
  gravitational: { far: "schwarzschild-far-gw", "near-horizon": "schwarzschild-near-gw", interpolated: "schwarzschild-interpolated-gw" },
} as const satisfies Record<Channel, Record<EstimateRegime, SourceKey>>;

export function describeEstimate(lab: SchwarzschildRateLab): { regime: EstimateRegime; sourceKey: SourceKey } {
  const regime = estimateRegime(lab);
  return { regime, sourceKey: ESTIMATE_KEYS[lab.channel][regime] };
}

/** The published estimates alone, in their regimes. */
export function publishedEstimateRate(input: SchwarzschildHorizonRateInput): EstimatedRate {
  const { regime, sourceKey } = describeEstimate(input);
  const source = log10SourceAmplitude(input);
  if (regime === "far") return { log10RatePerSecond: farRate(input, source), regime, sourceKey };
  if (regime === "near-horizon") return { log10RatePerSecond: nearRate(input, source), regime, sourceKey };
  const ratio = input.labArealRadiusMetres / schwarzschildRadiusMetres(input.massKg);
  const w = Math.log(ratio / NEAR_HORIZON_RADIUS_RATIO) / Math.log(FAR_RADIUS_RATIO / NEAR_HORIZON_RADIUS_RATIO);
  return { log10RatePerSecond: (1 - w) * nearRate(input, source) + w * farRate(input, source), regime, sourceKey };
}

export const publishedEstimateRateModel: SchwarzschildHorizonRateModel = {
  name: "published estimates (far: arXiv:2205.06279; near: Rindler limit), interpolated between",
  rate: (input) => ({ ...publishedEstimateRate(input), estimate: null, flags: [] }),
  describe: describeEstimate,
};
