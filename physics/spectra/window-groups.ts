/**
 * Groups moving windows for the transform. Two windows whose gap (a plateau) is short compared with their
 * durations are transformed together as one window; well-separated windows are transformed alone, and their
 * interference is added in the time domain (physics/spectra/cross-term.ts), so a long hold costs nothing.
 */
import type { MotionWindow } from "../protocols/types";

/** Windows closer than this many times the sum of their durations are transformed together. */
export const SEPARATE_WHEN_GAP_EXCEEDS = 2;

/** A window made of several moving windows and the plateaus between them. */
export interface CompositeWindow extends MotionWindow {
  parts: readonly MotionWindow[];
}

export function isComposite(window: MotionWindow): window is CompositeWindow {
  return "parts" in window;
}

export interface WindowGroup {
  window: MotionWindow;
  /** Duration of the shortest window inside the group, which sets the time step. */
  shortestMovingSeconds: number;
}

function combine(parts: MotionWindow[]): CompositeWindow {
  const start = parts[0].startSeconds;
  const last = parts[parts.length - 1];
  const duration = last.startSeconds + last.durationSeconds - start;
  const ends = parts.map((w) => w.startSeconds + w.durationSeconds);
  const plateaus = parts.map((w) => w.fraction(1));
  /** Index of the part containing time t, or −(index of the next part) − 1 on the plateau before it. */
  const partAt = (t: number) => {
    for (let i = 0; i < parts.length; i++) {
      if (t < parts[i].startSeconds) return -i - 1;
      if (t <= ends[i]) return i;
    }
    return parts.length - 1;
  };
  const everyRateKnown = parts.every((w) => w.rate !== null);
  return {
    startSeconds: start,
    durationSeconds: duration,
    fraction(u) {
      const t = start + u * duration;
      const i = partAt(t);
      if (i < 0) return plateaus[-i - 2];
      const w = parts[i];
      return w.fraction(Math.min(1, (t - w.startSeconds) / w.durationSeconds));
    },
    rate: everyRateKnown
      ? (u) => {
          const t = start + u * duration;
          const i = partAt(t);
          if (i < 0) return 0;
          const w = parts[i];
          return w.rate!(Math.min(1, (t - w.startSeconds) / w.durationSeconds)) * (duration / w.durationSeconds);
        }
      : null,
    cacheKey: compositeKey(parts, start, duration),
    smoothness: Math.min(...parts.map((w) => w.smoothness)) as MotionWindow["smoothness"],
    parts,
  };
}

/** Equal when every part has the same key and sits at the same place relative to the composite's span. */
function compositeKey(parts: MotionWindow[], start: number, duration: number): string | null {
  if (parts.some((w) => w.cacheKey === null)) return null;
  return parts.map((w) => `${w.cacheKey}@${(w.startSeconds - start) / duration}/${w.durationSeconds / duration}`).join("+");
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
