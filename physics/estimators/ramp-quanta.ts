/**
 * The ramp-driven count per unit squared source, ⟨N⟩_ramp / A² = ∫₀^∞ W_rest(ω) |ṽ(ω)/A|² dω, by FFT, converged
 * by doubling the samples until the total changes by less than 1e-3 relative.
 *
 * Per window group (physics/spectra/window-groups.ts) of duration τ_g, with τ₀ the longest and r = τ₀/τ_g:
 *   J_g = r ∫₀^∞ w̄(rΩ, ᾱ) |ĝ_g(Ω)|² dΩ,  ⟨N⟩_ramp/A² = K τ₀^{−p−1} [Σ_g J_g + 2 Σ_{g<h} X_gh].
 * Each level compares all n samples with every other sample, both from one transform (window-spectrum.ts).
 * The Ω integral runs on the FFT grid (trapezoid, step π/2, to the Nyquist frequency πn) after subtracting a
 * reference R(Ω) = (c₀ + c₂Ω²) e^{−s²Ω²} (s = ¼) that matches |ĝ|² to O(Ω⁴) at Ω = 0; R's own integral is done in
 * closed form (inertial part: ∫Ω^p e^{−s²Ω²} = Γ((p+1)/2)/(2s^{p+1})) plus Gauss–Legendre for the thermal part.
 * Why: the weight ~ |Ω|^p is not smooth at Ω = 0 when extended evenly, and a ramp alone has |ĝ(0)|² = 1, so the plain
 * trapezoid would err by (π/2)²/12 relative to the O(1) integral; after the subtraction the error is O(Ω⁶) terms.
 * X_gh, the interference of well-separated groups, is computed in the time domain (physics/spectra/cross-term.ts).
 *
 * A profile less smooth than the channel needs (ChannelDefinition.smoothnessNeeded: a kink for the dipole, an
 * acceleration jump for the quadrupole) has no limit (the count grows like the logarithm of the bandwidth): it is
 * evaluated at the time step the document states, or the shortest moving window / 1024, and the change against
 * half that resolution is reported, unconverged.
 */
import type { MotionWindow, SeparationHistory } from "../protocols/types";
import type { Convergence } from "../result";
import { fillRampWeightsOnGrid, rampKernel, thermalCorrectionAt, thermalWeight, type ChannelDefinition, type ThermalWeight } from "../spectra/channels";
import { crossTerm } from "../spectra/cross-term";
import { gaussLegendre } from "../spectra/gauss-legendre";
import { groupWindows, type WindowGroup } from "../spectra/window-groups";
import { PADDING_FACTOR, windowSpectrum, type SpectrumLevel } from "../spectra/window-spectrum";

export const CONVERGENCE_TARGET = 1e-3;
export const BASE_SAMPLES_PER_SHORTEST_WINDOW = 512;
export const MAX_SAMPLES = 1 << 18;
export const MIN_SAMPLES = 64;
const MAX_LEVELS = 8;
export const DEFAULT_KINK_SAMPLES = 1024;
const REFERENCE_WIDTH = 0.25;
const CROSS_ORDER = { fine: 24, coarse: 16 } as const;

export interface RampIntegral {
  /** log10 of ⟨N⟩_ramp / A², A the source amplitude in SI; −Infinity when there is no motion. */
  log10PerSquaredSource: number;
  convergence: Convergence;
}

function nextPowerOfTwo(x: number): number {
  return 2 ** Math.ceil(Math.log2(Math.max(1, x)));
}

/** Samples of one window group's transform: perShortest per shortest moving window, a power of two, clamped. */
export function samplesForGroup(groupSeconds: number, shortestMovingSeconds: number, perShortest: number): number {
  const n = nextPowerOfTwo((perShortest * groupSeconds) / shortestMovingSeconds);
  return Math.min(MAX_SAMPLES, Math.max(MIN_SAMPLES, n));
}

/** Samples per shortest moving window of a kinked profile: the stated time step's, or DEFAULT_KINK_SAMPLES. */
export function kinkSamplesPerShortestWindow(shortestMovingSeconds: number, kinkTimeResolutionSeconds: number | null): number {
  return kinkTimeResolutionSeconds === null ? DEFAULT_KINK_SAMPLES : Math.max(2, shortestMovingSeconds / kinkTimeResolutionSeconds);
}

function factorial(k: number): number {
  let f = 1;
  for (let i = 2; i <= k; i++) f *= i;
  return f;
}

/** ∫₀^∞ Ω^p (c₀ + c₂Ω²) e^{−s²Ω²} dΩ for odd p. */
function inertialReferenceIntegral(p: number, c0: number, c2: number): number {
  const s = REFERENCE_WIDTH;
  const a = (p + 1) / 2;
  return (c0 * factorial(a - 1)) / (2 * s ** (p + 1)) + (c2 * factorial(a)) / (2 * s ** (p + 3));
}

/** ∫₀^∞ corr(rΩ) e^{−s²Ω²} dΩ and ∫₀^∞ corr(rΩ) Ω² e^{−s²Ω²} dΩ, whose combination c₀J₀ + c₂J₂ is the thermal part of R's integral. */
interface ThermalReferenceMoments {
  zeroth: number;
  second: number;
}

const THERMAL_REFERENCE_ORDER = 12;

/**
 * The two moments on panels that halve towards Ω = 0, where the thermal correction has its structure; one pass
 * evaluates the correction once per node for both, so the fine and the coarse level share them.
 */
function thermalReferenceMoments(weight: ThermalWeight, scale: number, alphaBar: number): ThermalReferenceMoments {
  const s2 = REFERENCE_WIDTH * REFERENCE_WIDTH;
  const top = 7 / REFERENCE_WIDTH;
  const { nodes, weights } = gaussLegendre(THERMAL_REFERENCE_ORDER);
  const finest = 1e-3 * Math.min(alphaBar / scale, top);
  let zeroth = 0;
  let second = 0;
  // Panels [hi/2, hi] from the top down, then [0, hi] once hi reaches the finest scale.
  let hi = top;
  for (let k = 0; k <= 80; k++) {
    const lastPanel = k === 80 || hi <= finest;
    const lo = lastPanel ? 0 : hi / 2;
    const half = (hi - lo) / 2;
    const mid = (hi + lo) / 2;
    for (let i = 0; i < THERMAL_REFERENCE_ORDER; i++) {
      const omega = mid + half * nodes[i];
      const term = weights[i] * half * thermalCorrectionAt(weight, scale * omega) * Math.exp(-s2 * omega * omega);
      zeroth += term;
      second += term * omega * omega;
    }
    if (lastPanel) break;
    hi = lo;
  }
  return { zeroth, second };
}

/** Scratch for the weights on the grid, one per length: filled and consumed within one group of one level. */
const weightBuffers = new Map<number, Float64Array>();

/** w̄(rΩ_j, ᾱ) on the FFT grid, shared by the fine and the coarse level. */
function weightsOnGrid(definition: ChannelDefinition, alphaBar: number, scale: number, step: number, length: number): Float64Array {
  let weights = weightBuffers.get(length);
  if (!weights) {
    weights = new Float64Array(length);
    weightBuffers.set(length, weights);
  }
  fillRampWeightsOnGrid(definition, alphaBar, scale * step, weights);
  return weights;
}

function groupIntegral(level: SpectrumLevel, weights: Float64Array, step: number, definition: ChannelDefinition, scale: number, thermal: ThermalReferenceMoments | null): number {
  const [mu0, mu1, mu2] = level.moments;
  const c0 = mu0 * mu0;
  const c2 = mu1 * mu1 - mu0 * mu2 + c0 * REFERENCE_WIDTH * REFERENCE_WIDTH;
  const s2 = REFERENCE_WIDTH * REFERENCE_WIDTH;
  const power = level.power;
  const last = power.length - 1;
  // Beyond Ω = 7/s the reference is below e⁻⁴⁹ of its peak: not worth an exp per bin.
  const referenceBins = Math.min(last, Math.ceil(7 / (REFERENCE_WIDTH * step)));
  const term = (j: number) => {
    const omega = j * step;
    const reference = j <= referenceBins ? (c0 + c2 * omega * omega) * Math.exp(-s2 * omega * omega) : 0;
    return weights[j] * (power[j] - reference);
  };
  // The trapezoid: every bin once, less half of each end; past referenceBins the reference is dropped.
  let trapezoid = -0.5 * (term(0) + term(last));
  for (let j = 0; j <= referenceBins; j++) trapezoid += term(j);
  for (let j = referenceBins + 1; j <= last; j++) trapezoid += weights[j] * power[j];
  trapezoid *= step;
  let reference = scale ** definition.power * inertialReferenceIntegral(definition.power, c0, c2);
  if (thermal) reference += c0 * thermal.zeroth + c2 * thermal.second;
  return scale * (trapezoid + reference);
}

interface LevelResult {
  /** Σ J + 2 Σ X from all samples, and from every other sample (half the resolution). */
  fine: number;
  coarse: number;
  samplesPerWindow: number;
  timeStepSeconds: number;
}

function evaluateLevel(groups: WindowGroup[], definition: ChannelDefinition, referenceSeconds: number, alphaBar: number, perShortest: number): LevelResult {
  let fine = 0;
  let coarse = 0;
  let samplesPerWindow = 0;
  let timeStepSeconds = Infinity;
  const correction = alphaBar > 0 ? thermalWeight(definition, alphaBar) : null;
  for (const group of groups) {
    const n = samplesForGroup(group.window.durationSeconds, group.shortestMovingSeconds, perShortest);
    samplesPerWindow = Math.max(samplesPerWindow, n);
    timeStepSeconds = Math.min(timeStepSeconds, group.window.durationSeconds / n);
    const spectrum = windowSpectrum(group.window, definition, n);
    const scale = referenceSeconds / group.window.durationSeconds;
    const weights = weightsOnGrid(definition, alphaBar, scale, spectrum.frequencyStep, spectrum.fine.power.length);
    const thermal = correction === null ? null : thermalReferenceMoments(correction, scale, alphaBar);
    fine += groupIntegral(spectrum.fine, weights, spectrum.frequencyStep, definition, scale, thermal);
    coarse += groupIntegral(spectrum.coarse, weights, spectrum.frequencyStep, definition, scale, thermal);
  }
  const kernel = rampKernel(definition, alphaBar);
  for (let g = 0; g < groups.length; g++) {
    for (let h = g + 1; h < groups.length; h++) {
      fine += 2 * crossTerm(groups[g].window, groups[h].window, definition, kernel, referenceSeconds, CROSS_ORDER.fine);
      coarse += 2 * crossTerm(groups[g].window, groups[h].window, definition, kernel, referenceSeconds, CROSS_ORDER.coarse);
    }
  }
  return { fine, coarse, samplesPerWindow, timeStepSeconds };
}

function relativeChange(coarse: number, fine: number): number {
  if (fine === coarse) return 0;
  return Math.abs(fine - coarse) / Math.max(Math.abs(fine), Number.MIN_VALUE);
}

/**
 * ⟨N⟩_ramp / A² for a separation history in a channel whose field is thermal at α (s⁻¹) along the lab's worldline
 * (α = 0: the inertial vacuum). `kinkTimeResolutionSeconds` is the stated resolution for kinked profiles;
 * `startSamplesPerShortestWindow` the first level of the doubling (tests raise it to check convergence).
 */
export function rampQuantaPerSquaredSource(
  history: SeparationHistory,
  definition: ChannelDefinition,
  alphaPerSecond: number,
  kinkTimeResolutionSeconds: number | null,
  startSamplesPerShortestWindow = BASE_SAMPLES_PER_SHORTEST_WINDOW,
): RampIntegral {
  const groups = groupWindows(history.windows);
  const mode = groups.length === 0 ? "none" : groups.length === 1 && history.windows.length > 1 ? "whole-protocol" : "separate-ramps";
  if (groups.length === 0) {
    return { log10PerSquaredSource: -Infinity, convergence: { relativeChange: 0, converged: true, samplesPerWindow: 0, transformLength: 0, mode, timeStepSeconds: 0 } };
  }
  const referenceSeconds = Math.max(...groups.map((g) => g.window.durationSeconds));
  const alphaBar = alphaPerSecond * referenceSeconds;
  const shortest = Math.min(...groups.map((g) => g.shortestMovingSeconds));
  const kinked = groups.some((g) => g.window.smoothness < definition.smoothnessNeeded);

  let level: LevelResult;
  if (kinked) {
    const perShortest = kinkSamplesPerShortestWindow(shortest, kinkTimeResolutionSeconds);
    level = evaluateLevel(groups, definition, referenceSeconds, alphaBar, perShortest);
  } else {
    let perShortest = startSamplesPerShortestWindow;
    level = evaluateLevel(groups, definition, referenceSeconds, alphaBar, perShortest);
    for (let step = 1; step < MAX_LEVELS && relativeChange(level.coarse, level.fine) > CONVERGENCE_TARGET && level.samplesPerWindow < MAX_SAMPLES; step++) {
      perShortest *= 2;
      level = evaluateLevel(groups, definition, referenceSeconds, alphaBar, perShortest);
    }
  }
  const change = relativeChange(level.coarse, level.fine);
  const convergence: Convergence = {
    relativeChange: change,
    converged: change <= CONVERGENCE_TARGET,
    samplesPerWindow: level.samplesPerWindow,
    transformLength: PADDING_FACTOR * level.samplesPerWindow,
    mode,
    timeStepSeconds: level.timeStepSeconds,
  };
  const log10 = level.fine > 0 ? definition.log10Coefficient - (definition.power + 1) * Math.log10(referenceSeconds) + Math.log10(level.fine) : -Infinity;
  return { log10PerSquaredSource: log10, convergence };
}
