import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { createPaceClock } from "@/canvas/store/pace-clock";
import { createHarness, framesOf } from "./harness";

/** Ticks of a clock on a fresh editor, with the pointer pressed on the recombination-end handle. */
function pressedEditor(everyMs = 100) {
  const h = createHarness();
  const clock = createPaceClock(h.store, everyMs);
  const ticks: number[] = [];
  clock.subscribe(() => ticks.push(performance.now()));
  const at = h.grip("recombination-end");
  h.store.getState().offsetsPointerDown({ ...at, shiftKey: false });
  let x = at.x;
  const move = (dx: number) => h.store.getState().offsetsPointerMove({ x: (x += dx), y: at.y, shiftKey: false });
  const release = () => h.store.getState().offsetsPointerUp({ x, y: at.y, shiftKey: false });
  return { h, clock, ticks, move, release };
}

describe("the pace clock the editor's panels follow a drag by", () => {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "performance"] });
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it("ticks at most every 100 ms while a handle is dragged a frame at a time", () => {
    const { ticks, move } = pressedEditor();
    for (let frame = 0; frame < 60; frame++) {
      move(1);
      vi.advanceTimersByTime(1000 / 60);
    }
    // One second of frames: the first change is taken at once, then one every 100 ms (1e-3 ms of slack for the
    // rounding of the frames of 1000/60 ms summed on the fake clock).
    expect(ticks.length).toBeGreaterThanOrEqual(9);
    expect(ticks.length).toBeLessThanOrEqual(11);
    ticks.slice(1).forEach((t, i) => expect(t - ticks[i]).toBeGreaterThanOrEqual(100 - 1e-3));
  });

  it("takes the last change of a drag that then holds still, and is silent when nothing changes", () => {
    const { ticks, move } = pressedEditor();
    move(5);
    vi.advanceTimersByTime(10);
    move(5);
    vi.advanceTimersByTime(500);
    expect(ticks).toHaveLength(2);
    vi.advanceTimersByTime(2000);
    expect(ticks).toHaveLength(2);
  });

  it("does not tick for edits outside a drag, nor after the drag ends", () => {
    const { h, ticks, move, release } = pressedEditor();
    move(5);
    release();
    vi.advanceTimersByTime(500);
    const afterRelease = ticks.length;
    h.drag("hold-end", framesOf(0, 0, 1), { release: true });
    h.store.getState().offsetsKeyDown({ key: "ArrowRight", shiftKey: false });
    vi.advanceTimersByTime(500);
    expect(ticks.length).toBe(afterRelease);
    expect(h.store.getState().offsetsTool.name).not.toBe("dragging");
  });
});
