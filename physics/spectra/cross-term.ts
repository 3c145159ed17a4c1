/**
 * Interference between two moving windows that do not overlap: X = ∫∫ g₁(u) g₂(u') k̄(x̄) du du' with
 * x̄ = (Δ + τ₂u' − τ₁u)/τ₀, Δ the difference of their start times, k̄ the ramp kernel of the channel
 * (physics/spectra/channels.ts). The windows are at least SEPARATE_WHEN_GAP_EXCEEDS times their durations apart,
 * so the kernel is smooth over the square and a tensor Gauss–Legendre rule converges geometrically.
 */
import type { MotionWindow } from "../protocols/types";
import type { ChannelDefinition } from "./channels";
import { gaussLegendre } from "./gauss-legendre";

const FINITE_DIFFERENCE_STEP = 1e-6;

/** The channel's df/du of a window, differenced where the window has no closed-form rate. */
export function channelRate(window: MotionWindow, definition: ChannelDefinition): (u: number) => number {
  if (window.rate) {
    const rate = window.rate;
    return (u) => definition.profileRate(window.fraction(u), rate(u));
  }
  return (u) => {
    const lo = Math.max(0, u - FINITE_DIFFERENCE_STEP);
    const hi = Math.min(1, u + FINITE_DIFFERENCE_STEP);
    return (definition.profile(window.fraction(hi)) - definition.profile(window.fraction(lo))) / (hi - lo);
  };
}

export function crossTerm(
  first: MotionWindow,
  second: MotionWindow,
  definition: ChannelDefinition,
  kernel: (x: number) => number,
  referenceSeconds: number,
  order: number,
): number {
  const { nodes, weights } = gaussLegendre(order);
  const rate1 = channelRate(first, definition);
  const rate2 = channelRate(second, definition);
  const g1 = new Float64Array(order);
  const g2 = new Float64Array(order);
  const u = new Float64Array(order);
  for (let i = 0; i < order; i++) {
    u[i] = 0.5 * (1 + nodes[i]);
    g1[i] = 0.5 * weights[i] * rate1(u[i]);
    g2[i] = 0.5 * weights[i] * rate2(u[i]);
  }
  const delta = second.startSeconds - first.startSeconds;
  let sum = 0;
  for (let i = 0; i < order; i++) {
    for (let j = 0; j < order; j++) {
      const x = (delta + second.durationSeconds * u[j] - first.durationSeconds * u[i]) / referenceSeconds;
      sum += g1[i] * g2[j] * kernel(x);
    }
  }
  return sum;
}
