/**
 * The embed's playback clock: lab time τ advanced along the protocol by the wall clock, one pass in PASS_SECONDS
 * whatever the protocol lasts, a pause at the end, then again from the start. The step is a pure function; the clock
 * runs it on the frames it is given (the browser's animation frames, or a test's), so no timer lives in React.
 */

export interface PlaybackTiming {
  /** Wall-clock seconds one pass of the protocol takes. */
  passSeconds: number;
  /** Wall-clock seconds it rests at the end before starting again. */
  pauseSeconds: number;
}

export const PLAYBACK_TIMING: PlaybackTiming = { passSeconds: 8, pauseSeconds: 1.2 };

export interface PlaybackState {
  tauSeconds: number;
  /** How long it has rested at the end so far, wall-clock seconds. */
  pausedForSeconds: number;
}

/** One step of `wallSeconds`: forward in proportion, held at the end for the pause, then back to the start. */
export function advancePlayback(state: PlaybackState, wallSeconds: number, totalSeconds: number, timing: PlaybackTiming = PLAYBACK_TIMING): PlaybackState {
  if (state.tauSeconds >= totalSeconds) {
    const pausedForSeconds = state.pausedForSeconds + wallSeconds;
    return pausedForSeconds < timing.pauseSeconds ? { tauSeconds: totalSeconds, pausedForSeconds } : { tauSeconds: 0, pausedForSeconds: 0 };
  }
  return { tauSeconds: Math.min(totalSeconds, state.tauSeconds + (wallSeconds / timing.passSeconds) * totalSeconds), pausedForSeconds: 0 };
}

/** Where a pass starts when play is pressed: from τ, or from the start when τ is already at the end. */
export function playbackStart(tauSeconds: number, totalSeconds: number): number {
  return tauSeconds >= totalSeconds ? 0 : tauSeconds;
}

export interface FrameScheduler {
  request(callback: (nowMs: number) => void): number;
  cancel(handle: number): void;
}

export interface PlaybackClock {
  /** Plays from τ (see playbackStart), calling onTick with each frame's τ. */
  play(tauSeconds: number): void;
  stop(): void;
  readonly playing: boolean;
}

export function createPlaybackClock(totalSeconds: number, onTick: (tauSeconds: number) => void, frames: FrameScheduler, timing: PlaybackTiming = PLAYBACK_TIMING): PlaybackClock {
  let handle: number | null = null;
  let state: PlaybackState = { tauSeconds: 0, pausedForSeconds: 0 };
  let lastMs: number | null = null;
  const frame = (nowMs: number) => {
    if (lastMs !== null) {
      state = advancePlayback(state, (nowMs - lastMs) / 1000, totalSeconds, timing);
      onTick(state.tauSeconds);
    }
    lastMs = nowMs;
    handle = frames.request(frame);
  };
  const clock: PlaybackClock = {
    play(tauSeconds) {
      clock.stop();
      state = { tauSeconds: playbackStart(tauSeconds, totalSeconds), pausedForSeconds: 0 };
      onTick(state.tauSeconds);
      lastMs = null;
      handle = frames.request(frame);
    },
    stop() {
      if (handle !== null) frames.cancel(handle);
      handle = null;
    },
    get playing() {
      return handle !== null;
    },
  };
  return clock;
}
