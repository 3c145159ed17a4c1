/**
 * Sampled protocol → separation history. The samples (seconds, metres of full separation) are resampled with the
 * interpolation the document states:
 * - "linear": straight lines between samples; the velocity jumps at every sample where the slope changes, so
 *   each such sample is a kink;
 * - "cubic-spline": the clamped cubic spline with zero end velocity (the branches are at rest before and after
 *   the profile), C² inside; R. L. Burden and J. D. Faires, Numerical Analysis, §3.5 (clamped spline).
 * The profile is measured in units of its largest |separation|. A first or last sample away from zero is a jump:
 * the branches would have to start or end apart.
 */
import type { KinkReport } from "../result-basics";
import type { ProtocolSpec } from "../scenario/schema";
import { ScenarioInputError } from "../scenario/input-error";
import type { SeparationHistory } from "./types";

type SampledProtocol = Extract<ProtocolSpec, { kind: "sampled" }>;

const END_TOLERANCE = 1e-6;
const MAX_KINKS_LISTED = 50;

interface Interpolant {
  value(t: number): number;
  slope(t: number): number;
}

/** Index i with times[i] ≤ t < times[i + 1], clamped to the last interval. */
function intervalOf(times: Float64Array, t: number): number {
  let lo = 0;
  let hi = times.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (times[mid] <= t) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

function linearInterpolant(times: Float64Array, values: Float64Array): Interpolant {
  const slopeIn = (i: number) => (values[i + 1] - values[i]) / (times[i + 1] - times[i]);
  return {
    value(t) {
      const i = intervalOf(times, t);
      return values[i] + slopeIn(i) * (t - times[i]);
    },
    slope: (t) => slopeIn(intervalOf(times, t)),
  };
}

/** Clamped cubic spline (zero slope at both ends): second derivatives from the tridiagonal system, Thomas algorithm. */
function clampedSpline(times: Float64Array, values: Float64Array): Interpolant {
  const n = times.length;
  const h = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) h[i] = times[i + 1] - times[i];
  const diag = new Float64Array(n);
  const upper = new Float64Array(n);
  const rhs = new Float64Array(n);
  diag[0] = 2 * h[0];
  upper[0] = h[0];
  rhs[0] = 6 * ((values[1] - values[0]) / h[0]);
  for (let i = 1; i < n - 1; i++) {
    diag[i] = 2 * (h[i - 1] + h[i]);
    upper[i] = h[i];
    rhs[i] = 6 * ((values[i + 1] - values[i]) / h[i] - (values[i] - values[i - 1]) / h[i - 1]);
  }
  diag[n - 1] = 2 * h[n - 2];
  rhs[n - 1] = -6 * ((values[n - 1] - values[n - 2]) / h[n - 2]);
  // Forward sweep (the sub-diagonal equals the previous super-diagonal: the matrix is symmetric).
  for (let i = 1; i < n; i++) {
    const w = upper[i - 1] / diag[i - 1];
    diag[i] -= w * upper[i - 1];
    rhs[i] -= w * rhs[i - 1];
  }
  const second = new Float64Array(n);
  second[n - 1] = rhs[n - 1] / diag[n - 1];
  for (let i = n - 2; i >= 0; i--) second[i] = (rhs[i] - upper[i] * second[i + 1]) / diag[i];

  return {
    value(t) {
      const i = intervalOf(times, t);
      const a = times[i + 1] - t;
      const b = t - times[i];
      const hi = h[i];
      return (second[i] * a ** 3 + second[i + 1] * b ** 3) / (6 * hi) + (values[i] / hi - (second[i] * hi) / 6) * a + (values[i + 1] / hi - (second[i + 1] * hi) / 6) * b;
    },
    slope(t) {
      const i = intervalOf(times, t);
      const a = times[i + 1] - t;
      const b = t - times[i];
      const hi = h[i];
      return (-second[i] * a * a + second[i + 1] * b * b) / (2 * hi) + (values[i + 1] - values[i]) / hi - ((second[i + 1] - second[i]) * hi) / 6;
    },
  };
}

export function sampledHistory(protocol: SampledProtocol): SeparationHistory {
  const samples = protocol.samples;
  const times = new Float64Array(samples.length);
  const separations = new Float64Array(samples.length);
  samples.forEach((s, i) => {
    times[i] = s.timeSeconds - samples[0].timeSeconds;
    separations[i] = s.separationMetres;
    if (i > 0 && !(s.timeSeconds > samples[i - 1].timeSeconds)) {
      throw new ScenarioInputError(`protocol.samples.${i}.timeSeconds`, "sample times must increase strictly");
    }
  });
  const peakSeparationMetres = separations.reduce((m, x) => Math.max(m, Math.abs(x)), 0);
  const scale = peakSeparationMetres > 0 ? peakSeparationMetres : 1;
  const fractions = separations.map((x) => x / scale);
  const durationSeconds = times[times.length - 1];
  const interpolant = protocol.interpolation === "linear" ? linearInterpolant(times, fractions) : clampedSpline(times, fractions);

  const kinks: KinkReport[] = [];
  let kinkCount = 0;
  const note = (timeSeconds: number, kind: KinkReport["kind"]) => {
    kinkCount++;
    if (kinks.length < MAX_KINKS_LISTED) kinks.push({ timeSeconds, kind });
  };
  if (Math.abs(fractions[0]) > END_TOLERANCE) note(0, "jump");
  let peakRate = 0;
  for (let i = 0; i + 1 < times.length; i++) peakRate = Math.max(peakRate, Math.abs(fractions[i + 1] - fractions[i]) / (times[i + 1] - times[i]));
  if (protocol.interpolation === "linear") {
    for (let i = 0; i < times.length; i++) {
      const before = i === 0 ? 0 : (fractions[i] - fractions[i - 1]) / (times[i] - times[i - 1]);
      const after = i === times.length - 1 ? 0 : (fractions[i + 1] - fractions[i]) / (times[i + 1] - times[i]);
      if (Math.abs(after - before) > END_TOLERANCE * Math.max(peakRate, 1 / durationSeconds)) note(times[i], "kink");
    }
  }
  if (Math.abs(fractions[fractions.length - 1]) > END_TOLERANCE) note(durationSeconds, "jump");

  return {
    protocolKind: "sampled",
    peakSeparationMetres,
    totalDurationSeconds: durationSeconds,
    windows: [
      {
        startSeconds: 0,
        durationSeconds,
        fraction: (u) => interpolant.value(u * durationSeconds),
        rate: (u) => interpolant.slope(u * durationSeconds) * durationSeconds,
        cacheKey: null,
        smoothness: kinkCount > 0 ? 0 : 2,
      },
    ],
    peakRatePerSecond: peakRate,
    kinks,
    interpolation: protocol.interpolation === "linear" ? "linear" : "clamped cubic spline (zero end velocity)",
  };
}
