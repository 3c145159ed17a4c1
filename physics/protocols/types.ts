/**
 * A protocol turned into the history of the branches' full separation d(t) = d₀ σ(t): moving windows, between
 * which σ stays constant. Only the windows radiate; the plateaus contribute to the hold-driven count alone.
 */
import type { KinkReport } from "../result-basics";

export interface MotionWindow {
  startSeconds: number;
  durationSeconds: number;
  /** σ at dimensionless local time u ∈ [0, 1] (t = start + u·duration). */
  fraction(u: number): number;
  /** dσ/du where the window knows it in closed form; null where it must be differenced from `fraction`. */
  rate: ((u: number) => number) | null;
  /** Equal keys promise equal σ(u): spectra computed for one may be reused for the other. Null: never reuse. */
  cacheKey: string | null;
  /**
   * Derivatives of σ(t) known to be continuous, ends included (σ is constant outside): 0 where the velocity
   * jumps (a kink), 1 where only the acceleration jumps, 2 for acceleration continuous or not known to jump.
   */
  smoothness: 0 | 1 | 2;
}

export interface SeparationHistory {
  protocolKind: "segments" | "formula" | "sampled";
  /** d₀, metres: σ is measured in units of it. */
  peakSeparationMetres: number;
  totalDurationSeconds: number;
  /** Sorted, non-overlapping; σ is 0 before the first and after the last, and constant in every gap. */
  windows: MotionWindow[];
  /** Largest |dσ/dt|, s⁻¹. */
  peakRatePerSecond: number;
  kinks: KinkReport[];
  /** Interpolation of a sampled profile, else null. */
  interpolation: string | null;
}
