/**
 * The power spectrum |ĝ(Ω)|² of one moving window's source rate g(u) = df/du (u = t/τ ∈ [0, 1]), by fft.js.
 *
 * g is sampled at the n cell midpoints u_m = (m + ½)/n (in closed form where the window knows its rate, else as
 * cell averages n[f(u_{m+1}) − f(u_m)]) and zero-padded to M = 4n, so that ĝ(Ω) ≈ (1/n) Σ g_m e^{iΩu_m} on the
 * grid Ω_j = 2πjn/M = jπ/2 up to the Nyquist frequency πn; padding by 4 keeps the autocorrelation (support
 * [−1, 1]) clear of its periodic images. Also returned: the moments μ_k = (1/n) Σ g_m (u_m − ½)^k, k ≤ 2, which
 * give |ĝ|² = μ₀² + (μ₁² − μ₀μ₂)Ω² + O(Ω⁴) at small Ω exactly for the sampled g.
 */
import FFT from "fft.js";
import type { MotionWindow } from "../protocols/types";
import type { ChannelDefinition } from "./channels";

export const PADDING_FACTOR = 4;

export interface WindowSpectrum {
  samples: number;
  transformLength: number;
  /** |ĝ(Ω_j)|², j = 0 … M/2. */
  power: Float64Array;
  /** Spacing of the Ω grid, π/2. */
  frequencyStep: number;
  moments: [number, number, number];
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

const cache = new Map<string, WindowSpectrum>();
const CACHE_LIMIT = 64;

/** Forget cached spectra (the bench uses it to time cold computations). */
export function clearSpectrumCache(): void {
  cache.clear();
}

export function windowSpectrum(window: MotionWindow, definition: ChannelDefinition, samples: number): WindowSpectrum {
  const key = window.cacheKey === null ? null : `${window.cacheKey}|${definition.channel}|${samples}`;
  const cached = key === null ? undefined : cache.get(key);
  if (cached) return cached;

  const length = PADDING_FACTOR * samples;
  const { fft, input, output } = transformOfSize(length);
  input.fill(0);
  if (window.rate) {
    for (let m = 0; m < samples; m++) {
      const u = (m + 0.5) / samples;
      input[m] = definition.profileRate(window.fraction(u), window.rate(u));
    }
  } else {
    let previous = definition.profile(window.fraction(0));
    for (let m = 0; m < samples; m++) {
      const next = definition.profile(window.fraction((m + 1) / samples));
      input[m] = samples * (next - previous);
      previous = next;
    }
  }
  let mu0 = 0;
  let mu1 = 0;
  let mu2 = 0;
  for (let m = 0; m < samples; m++) {
    const x = (m + 0.5) / samples - 0.5;
    mu0 += input[m];
    mu1 += input[m] * x;
    mu2 += input[m] * x * x;
  }
  fft.realTransform(output, input);
  const half = length / 2;
  const power = new Float64Array(half + 1);
  const norm = 1 / (samples * samples);
  for (let j = 0; j <= half; j++) power[j] = (output[2 * j] ** 2 + output[2 * j + 1] ** 2) * norm;

  const spectrum: WindowSpectrum = {
    samples,
    transformLength: length,
    power,
    frequencyStep: (2 * Math.PI * samples) / length,
    moments: [mu0 / samples, mu1 / samples, mu2 / samples],
  };
  if (key !== null) {
    if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value!);
    cache.set(key, spectrum);
  }
  return spectrum;
}
