/**
 * Running counts of the quanta up to an instant τ of lab time: how a computed result's totals build up along the
 * protocol, for the time scrubber of an embedded Diagram. AN APPROXIMATION, to be shown as one: a quantum of a
 * ramp is not emitted at an instant (its count is an integral over frequency of the whole history), so no exact
 * "count so far" exists. The totals are the computed ones and are reached exactly at the end; only their sharing
 * out in time is approximate:
 *
 * - Hold-driven part. ⟨N⟩_hold = Γ A² ∫ f(t)² dt exactly (physics/spectra/channels.ts, physics/estimators/
 *   hold-quanta.ts), so it is read as accruing at the rate Γ A² f(t)²: share(τ) = ∫₀^τ f² dt / ∫₀^T f² dt.
 * - Ramp-driven part. Shared between the moving windows by each window's strength as a lone ramp, which scales as
 *   τ_w^{−p−1} times the square of its source change (the factor K τ₀^{−p−1} of physics/estimators/ramp-quanta.ts,
 *   p = 1 for the dipole, 3 for the quadrupole); the square of the change is measured by I_w = ∫₀¹ (df/du)² du.
 *   The interference between windows and the shape factor of each ramp are neglected. Inside a window the share
 *   grows with ∫₀^u (df/du′)² du′ / I_w.
 *
 * Where the result has separate counts (Schwarzschild: the hold's quanta go into the horizon, the ramps' to ℐ⁺ or
 * into the horizon by regime; Minkowski: everything reaches null infinity), the running counts follow the same
 * split; in the Rindler wedge and the de Sitter static patch the one count is given split by what drives it.
 */
import type { MotionWindow, SeparationHistory } from "../protocols/types";
import type { ChannelResult, Quantity, ScenarioResult } from "../result";
import { electromagneticChannel, gravitationalChannel, type ChannelDefinition } from "../spectra/channels";
import { log10Sum } from "./quantity";

/** Grid points per moving window for the running integrals (trapezoid rule: the shares are for display). */
const STEPS = 256;

export type CountSplit = "ramps-and-horizon" | "far-field-only" | "single-spectral";

export interface RunningQuanta {
  tauSeconds: number;
  split: CountSplit;
  /** log10 of each running count, both channels together; −Infinity for none yet. */
  log10RampDriven: number;
  log10HoldDriven: number;
  /** Toward null infinity; null where the result has no separate far-field count. */
  log10FarField: number | null;
  /** Into the horizon; null where the result has no separate horizon count. */
  log10Horizon: number | null;
  /** Shares of the totals reached, each in [0, 1], for each channel. */
  shares: Record<ChannelResult["channel"], { ramp: number; hold: number }>;
}

interface WindowTable {
  window: MotionWindow;
  /** Running ∫₀^u (df/du)² du and ∫₀^u f² du on the grid u = i/STEPS. */
  rampIntegral: Float64Array;
  squareIntegral: Float64Array;
  /** f on the plateau after the window. */
  plateauAfter: number;
}

function derivative(window: MotionWindow, u: number): number {
  if (window.rate) return window.rate(u);
  const h = 1e-5;
  const [a, b] = [Math.max(0, u - h), Math.min(1, u + h)];
  return (window.fraction(b) - window.fraction(a)) / (b - a);
}

function windowTable(window: MotionWindow, definition: ChannelDefinition): WindowTable {
  const ramp = new Float64Array(STEPS + 1);
  const square = new Float64Array(STEPS + 1);
  let previous: { rate: number; f: number } | null = null;
  for (let i = 0; i <= STEPS; i++) {
    const u = i / STEPS;
    const sigma = window.fraction(u);
    const current = { rate: definition.profileRate(sigma, derivative(window, u)) ** 2, f: definition.profile(sigma) ** 2 };
    if (previous) {
      ramp[i] = ramp[i - 1] + ((previous.rate + current.rate) / 2) * (1 / STEPS);
      square[i] = square[i - 1] + ((previous.f + current.f) / 2) * (1 / STEPS);
    }
    previous = current;
  }
  return { window, rampIntegral: ramp, squareIntegral: square, plateauAfter: definition.profile(window.fraction(1)) };
}

function interpolate(table: Float64Array, u: number): number {
  const x = Math.min(1, Math.max(0, u)) * STEPS;
  const i = Math.min(STEPS - 1, Math.floor(x));
  return table[i] + (x - i) * (table[i + 1] - table[i]);
}

interface ChannelShares {
  ramp(tauSeconds: number): number;
  hold(tauSeconds: number): number;
}

function channelShares(history: SeparationHistory, definition: ChannelDefinition): ChannelShares {
  const tables = history.windows.map((w) => windowTable(w, definition));
  const weights = tables.map((t) => (t.window.durationSeconds > 0 ? t.rampIntegral[STEPS] / t.window.durationSeconds ** (definition.power + 1) : 0));
  const weightSum = weights.reduce((a, b) => a + b, 0);

  /** ∫₀^τ f² dt, seconds: plateaus exactly, windows from their tables. */
  const squaredUpTo = (tau: number): number => {
    let total = 0;
    let previousEnd = 0;
    let plateau = 0;
    for (const t of tables) {
      const { startSeconds, durationSeconds } = t.window;
      if (tau <= startSeconds) return total + Math.max(0, tau - previousEnd) * plateau ** 2;
      total += (startSeconds - previousEnd) * plateau ** 2;
      if (tau <= startSeconds + durationSeconds) return total + interpolate(t.squareIntegral, (tau - startSeconds) / durationSeconds) * durationSeconds;
      total += t.squareIntegral[STEPS] * durationSeconds;
      previousEnd = startSeconds + durationSeconds;
      plateau = t.plateauAfter;
    }
    return total + Math.max(0, Math.min(tau, history.totalDurationSeconds) - previousEnd) * plateau ** 2;
  };
  const squaredTotal = squaredUpTo(history.totalDurationSeconds);

  return {
    ramp(tau) {
      if (weightSum <= 0) return tau >= history.totalDurationSeconds ? 1 : 0;
      let share = 0;
      tables.forEach((t, i) => {
        const total = t.rampIntegral[STEPS];
        if (total <= 0) return;
        const u = (tau - t.window.startSeconds) / t.window.durationSeconds;
        share += (weights[i] / weightSum) * (interpolate(t.rampIntegral, u) / total);
      });
      return Math.min(1, share);
    },
    hold(tau) {
      if (squaredTotal <= 0) return tau >= history.totalDurationSeconds ? 1 : 0;
      return Math.min(1, Math.max(0, squaredUpTo(tau) / squaredTotal));
    },
  };
}

const log10Of = (q: Quantity | null) => (q === null || q.log10 === null ? -Infinity : q.log10);
const times = (log10: number, share: number) => (share <= 0 || log10 === -Infinity ? -Infinity : log10 + Math.log10(share));

export function countSplit(result: ScenarioResult): CountSplit {
  const channel = result.electromagnetic;
  if (channel.horizonQuanta !== null) return "ramps-and-horizon";
  if (channel.farFieldQuanta !== null) return "far-field-only";
  return "single-spectral";
}

/** Running counts of `result` (computed for the protocol `history` describes) at any instant of lab time. */
export function createQuantaAccumulation(history: SeparationHistory, result: ScenarioResult): (tauSeconds: number) => RunningQuanta {
  const split = countSplit(result);
  const channels = [
    { result: result.electromagnetic, shares: channelShares(history, electromagneticChannel) },
    { result: result.gravitational, shares: channelShares(history, gravitationalChannel) },
  ];
  return (tauSeconds) => {
    const parts = channels.map(({ result: c, shares }) => {
      const ramp = shares.ramp(tauSeconds);
      const hold = shares.hold(tauSeconds);
      return { channel: c.channel, ramp, hold, log10Ramp: times(log10Of(c.rampDrivenQuanta), ramp), log10Hold: times(log10Of(c.holdDrivenQuanta), hold) };
    });
    const log10RampDriven = parts.reduce((sum, p) => log10Sum(sum, p.log10Ramp), -Infinity);
    const log10HoldDriven = parts.reduce((sum, p) => log10Sum(sum, p.log10Hold), -Infinity);
    return {
      tauSeconds,
      split,
      log10RampDriven,
      log10HoldDriven,
      log10FarField: split === "far-field-only" ? log10Sum(log10RampDriven, log10HoldDriven) : null,
      log10Horizon: split === "ramps-and-horizon" ? log10HoldDriven : null,
      shares: {
        electromagnetic: { ramp: parts[0].ramp, hold: parts[0].hold },
        gravitational: { ramp: parts[1].ramp, hold: parts[1].hold },
      },
    };
  };
}
