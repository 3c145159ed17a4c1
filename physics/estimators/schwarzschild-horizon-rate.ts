/**
 * The hold rate of a static lab outside a Schwarzschild black hole (Unruh state): quanta into the horizon per
 * second of lab proper time, at full separation. This file is the seam for a rate model: computeScenario takes
 * any SchwarzschildHorizonRateModel, and publishedEstimateRateModel is the default until an exact module exists.
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
import { G, c, epsilon0, hbar } from "../constants";
import type { Channel, RateRegime } from "../result";
import { electromagneticChannel, gravitationalChannel, log10HoldRateCoefficient } from "../spectra/channels";
import type { SourceKey } from "./sources";

export interface SchwarzschildHorizonRateInput {
  channel: Channel;
  massKg: number;
  labArealRadiusMetres: number;
  labRedshiftFactor: number;
  labProperAccelerationMetresPerSecondSquared: number;
  axis: "radial" | "tangential";
  /** log10 of the source amplitude A (q·d in C m, or m_eff·d² in kg m²). */
  log10Source: number;
}

export interface SchwarzschildHorizonRate {
  /** log10 of quanta per second of lab proper time at full separation. */
  log10RatePerSecond: number;
  regime: RateRegime;
  sourceKey: SourceKey;
}

export interface SchwarzschildHorizonRateModel {
  name: string;
  rate(input: SchwarzschildHorizonRateInput): SchwarzschildHorizonRate;
}

export const NEAR_HORIZON_RADIUS_RATIO = 1.01;
export const FAR_RADIUS_RATIO = 10;

const log10 = Math.log10;

function farRate(input: SchwarzschildHorizonRateInput): number {
  const killing =
    input.channel === "electromagnetic"
      ? 3 * log10(G) + 3 * log10(input.massKg) + 2 * input.log10Source - log10(epsilon0) - log10(hbar) - 6 * log10(c) - 6 * log10(input.labArealRadiusMetres)
      : 6 * log10(G) + 5 * log10(input.massKg) + 2 * input.log10Source - log10(hbar) - 10 * log10(c) - 10 * log10(input.labArealRadiusMetres);
  return killing - log10(input.labRedshiftFactor);
}

function nearRate(input: SchwarzschildHorizonRateInput): number {
  const definition = input.channel === "electromagnetic" ? electromagneticChannel : gravitationalChannel;
  return 2 * input.log10Source + log10HoldRateCoefficient(definition, input.labProperAccelerationMetresPerSecondSquared / c);
}

export const publishedEstimateRateModel: SchwarzschildHorizonRateModel = {
  name: "published estimates (far: arXiv:2205.06279; near: Rindler limit), interpolated between",
  rate(input) {
    const suffix = input.channel === "electromagnetic" ? "em" : "gw";
    const ratio = (input.labArealRadiusMetres * c * c) / (2 * G * input.massKg);
    if (ratio >= FAR_RADIUS_RATIO) return { log10RatePerSecond: farRate(input), regime: "far", sourceKey: `schwarzschild-far-${suffix}` };
    if (ratio <= NEAR_HORIZON_RADIUS_RATIO) return { log10RatePerSecond: nearRate(input), regime: "near-horizon", sourceKey: `schwarzschild-near-${suffix}` };
    const w = Math.log(ratio / NEAR_HORIZON_RADIUS_RATIO) / Math.log(FAR_RADIUS_RATIO / NEAR_HORIZON_RADIUS_RATIO);
    return {
      log10RatePerSecond: (1 - w) * nearRate(input) + w * farRate(input),
      regime: "interpolated",
      sourceKey: `schwarzschild-interpolated-${suffix}`,
    };
  },
};
