/**
 * Ramp shapes: the fraction σ(u) of the full separation reached at dimensionless time u ∈ [0, 1] of a separation
 * ramp (a recombination ramp runs the same shape backwards, 1 − σ(u)), and its rate dσ/du.
 *
 * Smoothness matters for the far-field count: where the velocity jumps (linear), the photon number grows without
 * bound as the time resolution shrinks; where only the acceleration jumps (cubic 3u² − 2u³, cosine), |ṽ(ω)|² falls as
 * ω⁻⁴; minimum-jerk (position C², acceleration continuous, the jerk jumps at the ends) falls as ω⁻⁶.
 * Minimum-jerk: T. Flash and N. Hogan, J. Neurosci. 5, 1688 (1985), the quintic 10u³ − 15u⁴ + 6u⁵.
 */
import type { RampShape } from "../scenario/schema";

export interface RampShapeDefinition {
  fraction(u: number): number;
  rate(u: number): number;
  /** Largest |dσ/du| over the ramp. */
  peakRate: number;
  /** Continuous derivatives of σ across the ramp and its ends: 0 (velocity jumps), 1 (acceleration jumps), 2. */
  smoothness: 0 | 1 | 2;
  /** σ written in the profile-formula grammar (physics/protocols/formula.ts), u being any bracketed expression. */
  formulaText(u: string): string;
}

export const rampShapes: Readonly<Record<RampShape, RampShapeDefinition>> = {
  cubic: {
    fraction: (u) => u * u * (3 - 2 * u),
    rate: (u) => 6 * u * (1 - u),
    peakRate: 1.5,
    smoothness: 1,
    formulaText: (u) => `(3*${u}^2 - 2*${u}^3)`,
  },
  cosine: {
    fraction: (u) => 0.5 * (1 - Math.cos(Math.PI * u)),
    rate: (u) => 0.5 * Math.PI * Math.sin(Math.PI * u),
    peakRate: Math.PI / 2,
    smoothness: 1,
    formulaText: (u) => `((1 - cos(pi*${u}))/2)`,
  },
  "minimum-jerk": {
    fraction: (u) => u * u * u * (10 + u * (-15 + 6 * u)),
    rate: (u) => 30 * u * u * (1 - u) * (1 - u),
    peakRate: 30 / 16,
    smoothness: 2,
    formulaText: (u) => `(10*${u}^3 - 15*${u}^4 + 6*${u}^5)`,
  },
  linear: {
    fraction: (u) => u,
    rate: () => 1,
    peakRate: 1,
    smoothness: 0,
    formulaText: (u) => u,
  },
};
