/**
 * The power spectrum |ĝ(Ω)|² of one moving window's source rate g(u) = df/du (u = t/τ ∈ [0, 1]), by fft.js.
 *
 * g is sampled at the n cell midpoints u_m = (m + ½)/n (in closed form where the window knows its rate, else as
 * cell averages n[f(u_{m+1}) − f(u_m)], whose transform is the true one times sinc(Ω/2n), divided out) and zero-padded to M = 4n, so that ĝ(Ω) ≈ (1/n) Σ g_m e^{iΩu_m} on the
 * grid Ω_j = 2πjn/M = jπ/2 up to the Nyquist frequency πn; padding by 4 keeps the autocorrelation (support
 * [−1, 1]) clear of its periodic images. Also returned: the moments μ_k = (1/n) Σ g_m (u_m − ½)^k, k ≤ 2, which
 * give |ĝ|² = μ₀² + (μ₁² − μ₀μ₂)Ω² + O(Ω⁴) at small Ω exactly for the sampled g; and the same from every other
 * sample, the half-resolution level that the convergence check compares against, at no second transform.
 */
import FFT from "fft.js";
import type { MotionWindow } from "../protocols/types";
import type { ChannelDefinition } from "./channels";
import { isComposite } from "./window-groups";

export const PADDING_FACTOR = 4;

/** |ĝ|² on the Ω grid and the moments of the samples it came from. */
export interface SpectrumLevel {
  /** |ĝ(Ω_j)|², j = 0 … (length − 1), Ω_j = j·frequencyStep. */
  power: Float64Array;
  moments: [number, number, number];
}

export interface WindowSpectrum {
  samples: number;
  transformLength: number;
  /** Spacing of the Ω grid, π/2, the same at both levels. */
  frequencyStep: number;
  /** From all n samples. */
  fine: SpectrumLevel;
  /** From the n/2 even-indexed samples alone (a grid of half the resolution), read off the same transform. */
  coarse: SpectrumLevel;
}

const transforms = new Map<number, { fft: FFT; input: Float64Array; output: number[] }>();

function transformOfSize(size: number) {
  let entry = transforms.get(size);
  if (!entry) {
    const fft = new FFT(size);
    entry = { fft, input: new Float64Array(size), output: fft.createComplexArray() };
    transforms.set(size, entry);
  }
  return entry;
}

/** Cached spectra with the one buffer that holds both of their power levels. */
const cache = new Map<string, { spectrum: WindowSpectrum; storage: Float64Array }>();
const CACHE_LIMIT = 64;

/**
 * Buffers of spectra dropped from the cache, by length, for the next spectra of that length: a new 2^14 transform
 * would otherwise allocate 100 kB outside the JavaScript heap each time, whose collection dominates a run of
 * distinct documents (a sweep). At most CACHE_LIMIT are kept.
 */
const spareStorage = new Map<number, Float64Array[]>();
let spareCount = 0;

function recycle(storage: Float64Array): void {
  if (spareCount >= CACHE_LIMIT) return;
  const list = spareStorage.get(storage.length) ?? [];
  list.push(storage);
  spareStorage.set(storage.length, list);
  spareCount++;
}

function storageOfLength(length: number): Float64Array {
  const spare = spareStorage.get(length)?.pop();
  if (spare === undefined) return new Float64Array(length);
  spareCount--;
  return spare;
}

/** Forget cached spectra (the bench uses it to time cold computations); their buffers are kept for reuse. */
export function clearSpectrumCache(): void {
  for (const entry of cache.values()) recycle(entry.storage);
  cache.clear();
}

/** A composite of closed-form windows: each part fills its own run of samples, zero on the plateaus. */
function fillCompositeSamples(window: MotionWindow & { parts: readonly MotionWindow[] }, definition: ChannelDefinition, samples: number, input: Float64Array): void {
  for (const part of window.parts) {
    const rate = part.rate!;
    const scale = window.durationSeconds / part.durationSeconds;
    const from = (part.startSeconds - window.startSeconds) / window.durationSeconds;
    const to = from + 1 / scale;
    const first = Math.max(0, Math.ceil(from * samples - 0.5));
    const last = Math.min(samples - 1, Math.floor(to * samples - 0.5));
    for (let m = first; m <= last; m++) {
      const local = Math.min(1, Math.max(0, ((m + 0.5) / samples - from) * scale));
      const sigma = definition.profileRateReadsProfile ? part.fraction(local) : 0;
      input[m] = definition.profileRate(sigma, rate(local)) * scale;
    }
  }
}

/**
 * Fills input[0 … samples − 1]. The transform buffer of each length is only ever used with length/PADDING_FACTOR
 * samples, so its zero padding is never written and stays zero between calls.
 */
function fillSamples(window: MotionWindow, definition: ChannelDefinition, samples: number, input: Float64Array): void {
  input.fill(0, 0, samples);
  if (isComposite(window) && window.rate) {
    fillCompositeSamples(window, definition, samples, input);
    return;
  }
  if (window.rate) {
    for (let m = 0; m < samples; m++) {
      const u = (m + 0.5) / samples;
      input[m] = definition.profileRate(definition.profileRateReadsProfile ? window.fraction(u) : 0, window.rate(u));
    }
    return;
  }
  let previous = definition.profile(window.fraction(0));
  for (let m = 0; m < samples; m++) {
    const next = definition.profile(window.fraction((m + 1) / samples));
    input[m] = samples * (next - previous);
    previous = next;
  }
}

/** μ_k = (1/n) Σ g_m (u_m − ½)^k, k ≤ 2, from all samples (fine) and from the even-indexed ones (coarse), in one pass. */
function levelMoments(input: Float64Array, samples: number): { fine: [number, number, number]; coarse: [number, number, number] } {
  let even0 = 0;
  let even1 = 0;
  let even2 = 0;
  let odd0 = 0;
  let odd1 = 0;
  let odd2 = 0;
  for (let m = 0; m < samples; m += 2) {
    const x = (m + 0.5) / samples - 0.5;
    even0 += input[m];
    even1 += input[m] * x;
    even2 += input[m] * x * x;
    const y = (m + 1.5) / samples - 0.5;
    odd0 += input[m + 1];
    odd1 += input[m + 1] * y;
    odd2 += input[m + 1] * y * y;
  }
  const fineWeight = 1 / samples;
  const coarseWeight = 2 / samples;
  return {
    fine: [(even0 + odd0) * fineWeight, (even1 + odd1) * fineWeight, (even2 + odd2) * fineWeight],
    coarse: [even0 * coarseWeight, even1 * coarseWeight, even2 * coarseWeight],
  };
}

/**
 * The fine level is |X_j|²/n². The coarse level uses that the transform of the even-indexed samples, padded to
 * M/2, is Y_j = (X_j + X_{j+M/2})/2 with X_{j+M/2} = conj(X_{M/2−j}) for real input: its power is
 * |X_j + conj(X_{M/2−j})|²/n², j = 0 … M/4, on the same Ω grid.
 * A cached spectrum is valid until the next call of windowSpectrum or clearSpectrumCache, which may drop it from
 * the cache and reuse its buffer: read it before asking for another (ramp-quanta.ts does, one group at a time).
 */
export function windowSpectrum(window: MotionWindow, definition: ChannelDefinition, samples: number): WindowSpectrum {
  const key = window.cacheKey === null ? null : `${window.cacheKey}|${definition.profileKey ?? definition.channel}|${samples}`;
  const cached = key === null ? undefined : cache.get(key);
  if (cached) return cached.spectrum;

  const length = PADDING_FACTOR * samples;
  const { fft, input, output } = transformOfSize(length);
  fillSamples(window, definition, samples, input);
  const levels = levelMoments(input, samples);
  fft.realTransform(output, input);
  const half = length / 2;
  const norm = 1 / (samples * samples);
  const quarter = length / 4;
  // One buffer for both levels; every element is written below.
  const powers = key === null ? new Float64Array(half + 1 + quarter + 1) : storageOfLength(half + 1 + quarter + 1);
  const fine = powers.subarray(0, half + 1);
  const coarse = powers.subarray(half + 1);
  for (let j = 0; j <= half; j++) {
    const re = output[2 * j];
    const im = output[2 * j + 1];
    fine[j] = (re * re + im * im) * norm;
  }
  for (let j = 0; j <= quarter; j++) {
    const re = output[2 * j] + output[2 * (half - j)];
    const im = output[2 * j + 1] - output[2 * (half - j) + 1];
    coarse[j] = (re * re + im * im) * norm;
  }
  if (!window.rate) {
    // Cell averages over cells of width 1/n: divide by sinc²(Ω/2n) = sinc²(πj/M) at both levels.
    for (let j = 1; j <= half; j++) {
      const x = (Math.PI * j) / length;
      const box = (Math.sin(x) / x) ** 2;
      fine[j] /= box;
      if (j <= quarter) coarse[j] /= box;
    }
  }

  const spectrum: WindowSpectrum = {
    samples,
    transformLength: length,
    frequencyStep: (2 * Math.PI * samples) / length,
    fine: { power: fine, moments: levels.fine },
    coarse: { power: coarse, moments: levels.coarse },
  };
  if (key !== null) {
    if (cache.size >= CACHE_LIMIT) {
      const oldest = cache.keys().next().value!;
      recycle(cache.get(oldest)!.storage);
      cache.delete(oldest);
    }
    cache.set(key, { spectrum, storage: powers });
  }
  return spectrum;
}
