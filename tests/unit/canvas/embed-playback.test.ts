/** The embed's playback clock (canvas/kernels/embed/playback.ts), driven by a test's frames instead of the browser's. */
import { describe, expect, it } from "vitest";
import { advancePlayback, createPlaybackClock, PLAYBACK_TIMING, type FrameScheduler } from "@/canvas/kernels/embed/playback";

/** Frames fired by hand, at the wall-clock times a test chooses. */
function manualFrames() {
  let pending: { id: number; callback: (nowMs: number) => void } | null = null;
  let next = 1;
  const frames: FrameScheduler = {
    request(callback) {
      pending = { id: next++, callback };
      return pending.id;
    },
    cancel(id) {
      if (pending?.id === id) pending = null;
    },
  };
  return {
    frames,
    fire(nowMs: number) {
      const due = pending;
      pending = null;
      due?.callback(nowMs);
    },
    get waiting() {
      return pending !== null;
    },
  };
}

describe("the embed's playback", () => {
  const total = 0.55;

  it("covers the whole protocol in one pass of the wall clock, whatever the protocol lasts", () => {
    const quarter = advancePlayback({ tauSeconds: 0, pausedForSeconds: 0 }, PLAYBACK_TIMING.passSeconds / 4, total);
    expect(quarter.tauSeconds).toBeCloseTo(total / 4, 12);
    const long = advancePlayback({ tauSeconds: 0, pausedForSeconds: 0 }, PLAYBACK_TIMING.passSeconds / 4, 3600);
    expect(long.tauSeconds).toBeCloseTo(900, 9);
  });

  it("stops at the end, rests for the pause, then starts again from zero", () => {
    let state = advancePlayback({ tauSeconds: 0.5, pausedForSeconds: 0 }, 10, total);
    expect(state).toEqual({ tauSeconds: total, pausedForSeconds: 0 });
    state = advancePlayback(state, PLAYBACK_TIMING.pauseSeconds / 2, total);
    expect(state.tauSeconds).toBe(total);
    state = advancePlayback(state, PLAYBACK_TIMING.pauseSeconds / 2 + 0.01, total);
    expect(state).toEqual({ tauSeconds: 0, pausedForSeconds: 0 });
  });

  it("ticks τ on each frame from where play was pressed, from the start when that was the end, and stops when told", () => {
    const ticks: number[] = [];
    const frames = manualFrames();
    const clock = createPlaybackClock(total, (tau) => ticks.push(tau), frames.frames);
    clock.play(total);
    expect(ticks).toEqual([0]);
    frames.fire(1000);
    frames.fire(1000 + (PLAYBACK_TIMING.passSeconds * 1000) / 2);
    expect(ticks[ticks.length - 1]).toBeCloseTo(total / 2, 12);
    expect(clock.playing).toBe(true);
    clock.stop();
    expect(clock.playing).toBe(false);
    expect(frames.waiting).toBe(false);
    clock.play(0.1);
    expect(ticks[ticks.length - 1]).toBe(0.1);
  });
});
