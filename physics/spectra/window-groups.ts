/**
 * Groups moving windows for the transform. Two windows whose gap (a plateau) is short compared with their
 * durations are transformed together as one window; well-separated windows are transformed alone, and their
 * interference is added in the time domain (physics/spectra/cross-term.ts), so a long hold costs nothing.
 */
import type { MotionWindow } from "../protocols/types";

/** Windows closer than this many times the sum of their durations are transformed together. */
export const SEPARATE_WHEN_GAP_EXCEEDS = 2;

export interface WindowGroup {
  window: MotionWindow;
  /** Duration of the shortest window inside the group, which sets the time step. */
  shortestMovingSeconds: number;
}

function combine(parts: MotionWindow[]): MotionWindow {
  const start = parts[0].startSeconds;
  const last = parts[parts.length - 1];
  const duration = last.startSeconds + last.durationSeconds - start;
  const locate = (u: number) => {
    const t = start + u * duration;
    let plateau = 0;
    for (const w of parts) {
      if (t < w.startSeconds) return { window: null, local: 0, plateau };
      if (t <= w.startSeconds + w.durationSeconds) return { window: w, local: (t - w.startSeconds) / w.durationSeconds, plateau };
      plateau = w.fraction(1);
    }
    return { window: null, local: 0, plateau };
  };
  const everyRateKnown = parts.every((w) => w.rate !== null);
  return {
    startSeconds: start,
    durationSeconds: duration,
    fraction(u) {
      const at = locate(u);
      return at.window ? at.window.fraction(at.local) : at.plateau;
    },
    rate: everyRateKnown
      ? (u) => {
          const at = locate(u);
          return at.window ? at.window.rate!(at.local) * (duration / at.window.durationSeconds) : 0;
        }
      : null,
    cacheKey: null,
    kinked: parts.some((w) => w.kinked),
  };
}

export function groupWindows(windows: MotionWindow[]): WindowGroup[] {
  const groups: MotionWindow[][] = [];
  for (const w of windows) {
    const current = groups.at(-1);
    const previous = current?.at(-1);
    const gap = previous ? w.startSeconds - (previous.startSeconds + previous.durationSeconds) : Infinity;
    if (current && previous && gap < SEPARATE_WHEN_GAP_EXCEEDS * (previous.durationSeconds + w.durationSeconds)) current.push(w);
    else groups.push([w]);
  }
  return groups.map((parts) => ({
    window: parts.length === 1 ? parts[0] : combine(parts),
    shortestMovingSeconds: Math.min(...parts.map((w) => w.durationSeconds)),
  }));
}
