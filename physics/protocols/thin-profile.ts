/**
 * Thinning a long measured profile before it is stored: the Ramer–Douglas–Peucker algorithm (U. Ramer, Computer
 * Graphics and Image Processing 1, 244 (1972); D. H. Douglas and T. K. Peucker, The Canadian Cartographer 10, 112
 * (1973)) keeps the fewest samples such that the straight line between kept neighbours stays within a tolerance
 * of every dropped sample. Here the distance is vertical (in separation, at the sample's own time), so the bound
 * is exactly the largest error of the thinned profile's linear interpolation at the original sample times:
 * |s_thin(t_i) − s_i| ≤ THIN_TOLERANCE_FRACTION × max|s| for every original sample i. The first and last samples
 * are always kept.
 *
 * A sequencer's 200,000-row export of a smooth ramp-hold-ramp thins to a few hundred samples; noise larger than the
 * tolerance is kept (it is what was measured), which is why the stored count has its own ceiling.
 */

/** Largest vertical error allowed, as a fraction of the profile's largest |separation| (d). */
export const THIN_TOLERANCE_FRACTION = 1e-5;
/** Profiles with at most this many samples are stored as they are. */
export const THIN_ABOVE_SAMPLES = 10_000;
/** Most samples a stored profile keeps after thinning (a scenario file of this size imports: under 2 MB). */
export const MAX_STORED_SAMPLES = 20_000;

export interface ProfileSample {
  timeSeconds: number;
  separationMetres: number;
}

/** Indices of the samples Ramer–Douglas–Peucker keeps, in order; iterative (no recursion depth to exhaust). */
export function douglasPeuckerIndices(samples: readonly ProfileSample[], tolerance: number): number[] {
  const n = samples.length;
  if (n <= 2) return samples.map((_, i) => i);
  const keep = new Uint8Array(n);
  keep[0] = 1;
  keep[n - 1] = 1;
  const stack: [number, number][] = [[0, n - 1]];
  while (stack.length > 0) {
    const [first, last] = stack.pop()!;
    const t0 = samples[first].timeSeconds;
    const s0 = samples[first].separationMetres;
    const slope = (samples[last].separationMetres - s0) / (samples[last].timeSeconds - t0);
    let worst = -1;
    let worstAt = -1;
    for (let i = first + 1; i < last; i++) {
      const error = Math.abs(samples[i].separationMetres - (s0 + slope * (samples[i].timeSeconds - t0)));
      if (error > worst) [worst, worstAt] = [error, i];
    }
    if (worst > tolerance) {
      keep[worstAt] = 1;
      stack.push([first, worstAt], [worstAt, last]);
    }
  }
  const kept: number[] = [];
  for (let i = 0; i < n; i++) if (keep[i]) kept.push(i);
  return kept;
}

export interface ThinnedProfile {
  samples: ProfileSample[];
  /** The count before thinning. */
  originalCount: number;
  /** The tolerance used, in metres (0 when nothing was thinned). */
  toleranceMetres: number;
  /** Largest |s_thin(t_i) − s_i| over the original samples, in metres: measured, not assumed. */
  largestErrorMetres: number;
}

/** Linear interpolation of the kept samples at every original sample time: the largest error. */
function largestError(original: readonly ProfileSample[], kept: readonly ProfileSample[]): number {
  let j = 0;
  let largest = 0;
  for (const s of original) {
    while (j + 2 < kept.length && kept[j + 1].timeSeconds <= s.timeSeconds) j++;
    const a = kept[j];
    const b = kept[Math.min(j + 1, kept.length - 1)];
    const value = b.timeSeconds === a.timeSeconds ? a.separationMetres : a.separationMetres + ((b.separationMetres - a.separationMetres) * (s.timeSeconds - a.timeSeconds)) / (b.timeSeconds - a.timeSeconds);
    largest = Math.max(largest, Math.abs(value - s.separationMetres));
  }
  return largest;
}

/** The profile as it is stored: thinned within THIN_TOLERANCE_FRACTION × d when longer than THIN_ABOVE_SAMPLES. */
export function thinProfile(samples: readonly ProfileSample[]): ThinnedProfile {
  if (samples.length <= THIN_ABOVE_SAMPLES) return { samples: [...samples], originalCount: samples.length, toleranceMetres: 0, largestErrorMetres: 0 };
  const peak = samples.reduce((m, s) => Math.max(m, Math.abs(s.separationMetres)), 0);
  const tolerance = THIN_TOLERANCE_FRACTION * peak;
  const kept = douglasPeuckerIndices(samples, tolerance).map((i) => samples[i]);
  return { samples: kept, originalCount: samples.length, toleranceMetres: tolerance, largestErrorMetres: largestError(samples, kept) };
}
