/**
 * Finds kinks (jumps of the velocity) and jumps (of the separation itself) in a profile σ(u), u ∈ [0, 1], that is
 * known only pointwise, as a formula is. σ is taken as zero outside [0, 1], so a nonzero σ at an end is a jump and
 * a nonzero velocity at an end is a kink.
 *
 * Test: on a grid of spacing h, a smooth profile's slope changes by σ''·h between neighbouring chords and its
 * values by σ'·h, both shrinking with h; at a kink the slope change stays [σ'], at a jump the value change stays
 * [σ]. Each candidate found on the coarse grid is re-sampled sixteen times finer: what does not shrink is real.
 */
import type { KinkReport } from "../result-basics";

const COARSE_CELLS = 4096;
const REFINEMENT = 16;
const CANDIDATE_FRACTION_OF_PEAK_RATE = 0.02;
const SURVIVES_REFINEMENT = 0.3;
const JUMP_TOLERANCE = 1e-6;
const MAX_REFINED_CANDIDATES = 64;

/** The most evaluations of σ that detectProfileFeatures makes: the coarse grid and every refined candidate. */
export const MAX_FEATURE_PROBES = COARSE_CELLS + 5 + MAX_REFINED_CANDIDATES * (7 + 6 * REFINEMENT + 1);

export interface ProfileFeatures {
  /** Kinks and jumps, u in [0, 1]. */
  features: { u: number; kind: KinkReport["kind"] }[];
  /** Largest |dσ/du| seen on the coarse grid (chord slopes). */
  peakRate: number;
}

function sample(fraction: (u: number) => number, from: number, to: number, cells: number): Float64Array {
  const values = new Float64Array(cells + 1);
  for (let m = 0; m <= cells; m++) {
    const u = from + ((to - from) * m) / cells;
    values[m] = u < 0 || u > 1 ? 0 : fraction(u);
  }
  return values;
}

function largestStep(values: Float64Array): { size: number; index: number } {
  let size = 0;
  let index = 0;
  for (let m = 0; m + 1 < values.length; m++) {
    const step = Math.abs(values[m + 1] - values[m]);
    if (step > size) [size, index] = [step, m];
  }
  return { size, index };
}

/** Largest |change of chord slope| summed over two neighbouring nodes (a kink between nodes splits over two). */
function largestSlopeChange(values: Float64Array, spacing: number): { size: number; index: number } {
  let size = 0;
  let index = 0;
  for (let m = 1; m + 2 < values.length; m++) {
    const change = Math.abs(values[m + 2] - values[m + 1] - (values[m] - values[m - 1])) / spacing;
    if (change > size) [size, index] = [change, m];
  }
  return { size, index };
}

export function detectProfileFeatures(fraction: (u: number) => number): ProfileFeatures {
  const h = 1 / COARSE_CELLS;
  // Two ghost cells either side, where σ = 0, so that the ends are tested like any other node.
  const coarse = sample(fraction, -2 * h, 1 + 2 * h, COARSE_CELLS + 4);
  let peakRate = 0;
  for (let m = 0; m + 1 < coarse.length; m++) peakRate = Math.max(peakRate, Math.abs(coarse[m + 1] - coarse[m]) / h);
  if (peakRate === 0) return { features: [], peakRate };

  const candidates: number[] = [];
  for (let m = 1; m + 1 < coarse.length; m++) {
    const slopeChange = Math.abs(coarse[m + 1] - 2 * coarse[m] + coarse[m - 1]) / h;
    if (slopeChange > CANDIDATE_FRACTION_OF_PEAK_RATE * peakRate && !(candidates.length && candidates.at(-1)! >= m - 2)) candidates.push(m);
  }

  const features: ProfileFeatures["features"] = [];
  for (const m of candidates.slice(0, MAX_REFINED_CANDIDATES)) {
    const u = -2 * h + m * h;
    const from = u - 3 * h;
    const to = u + 3 * h;
    const coarseLocal = sample(fraction, from, to, 6);
    const fineLocal = sample(fraction, from, to, 6 * REFINEMENT);
    const fineSpacing = h / REFINEMENT;
    const coarseStep = largestStep(coarseLocal);
    const fineStep = largestStep(fineLocal);
    if (fineStep.size > JUMP_TOLERANCE && fineStep.size > SURVIVES_REFINEMENT * coarseStep.size) {
      features.push({ u: clampUnit(from + (fineStep.index + 0.5) * fineSpacing), kind: "jump" });
      continue;
    }
    const coarseChange = largestSlopeChange(coarseLocal, h);
    const fineChange = largestSlopeChange(fineLocal, fineSpacing);
    if (fineChange.size > SURVIVES_REFINEMENT * coarseChange.size) {
      features.push({ u: clampUnit(from + (fineChange.index + 0.5) * fineSpacing), kind: "kink" });
    }
  }
  return { features, peakRate };
}

function clampUnit(u: number): number {
  return Math.min(1, Math.max(0, u));
}
