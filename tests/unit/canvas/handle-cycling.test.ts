import { describe, expect, it } from "vitest";
import { cycleHandle, PROTOCOL_ORDER } from "@/canvas/kernels/offsets/handles";
import type { SegmentsProtocol } from "@/canvas/kernels/timeline";
import { createHarness, framesOf, schwarzschildDocument } from "./harness";

const walk = (h: ReturnType<typeof createHarness>, shiftKey: boolean) => {
  const seen: (string | null)[] = [];
  for (let i = 0; i < PROTOCOL_ORDER.length; i++) {
    h.key("Tab", shiftKey);
    seen.push(h.store.getState().selection);
  }
  return seen;
};

describe("walking the Offsets panel's handles with Tab", () => {
  it("selects the handles in the order the protocol meets them, the plateau's height between the end of separation and the end of the hold", () => {
    const h = createHarness();
    expect(walk(h, false)).toEqual(["separation-start", "separation-end", "separation-size", "hold-end", "recombination-end"]);
  });

  it("puts that order in step with the handles' places on the time axis", () => {
    const h = createHarness({ document: schwarzschildDocument() });
    const xs = PROTOCOL_ORDER.map((id) => h.placement(id).x);
    expect([...xs].sort((a, b) => a - b)).toEqual(xs);
  });

  it("walks backwards with Shift+Tab, starting from the last handle", () => {
    const h = createHarness();
    expect(walk(h, true)).toEqual(["recombination-end", "hold-end", "separation-size", "separation-end", "separation-start"]);
  });

  it("lets the selection go past either end and leaves the key unused, so focus can leave the Offsets panel", () => {
    const h = createHarness();
    walk(h, false);
    expect(h.key("Tab")).toBe(false);
    expect(h.store.getState().selection).toBeNull();
    expect(h.key("Tab")).toBe(true);
    expect(h.key("Tab", true)).toBe(false);
    expect(h.store.getState().selection).toBeNull();
  });

  it("goes on from a handle chosen with the pointer", () => {
    const h = createHarness();
    h.drag("hold-end", []);
    expect(h.store.getState().selection).toBe("hold-end");
    h.key("Tab");
    expect(h.store.getState().selection).toBe("recombination-end");
    h.key("Tab", true);
    h.key("Tab", true);
    expect(h.store.getState().selection).toBe("separation-size");
  });

  it("still nudges the handle it reached with the arrow keys, and Escape lets it go", () => {
    const h = createHarness();
    for (let i = 0; i < 5; i++) h.key("Tab");
    expect(h.store.getState().selection).toBe("recombination-end");
    const before = (h.document().protocol as SegmentsProtocol).recombination.durationSeconds;
    expect(h.key("ArrowRight")).toBe(true);
    expect((h.document().protocol as SegmentsProtocol).recombination.durationSeconds).toBeGreaterThan(before);
    expect(h.key("Escape")).toBe(true);
    expect(h.store.getState().selection).toBeNull();
  });

  it("does not move the selection (or focus) in the middle of a drag", () => {
    const h = createHarness();
    h.drag("separation-end", framesOf(20, 0, 4), { release: false });
    expect(h.key("Tab")).toBe(true);
    expect(h.store.getState().selection).toBe("separation-end");
    expect(h.store.getState().offsetsTool.name).toBe("dragging");
  });

  it("finds nothing to walk for a viewer, and leaves the key to the browser", () => {
    const h = createHarness({ readOnly: true });
    expect(h.key("Tab")).toBe(false);
    expect(h.store.getState().selection).toBeNull();
  });
});

describe("the order kernel on its own", () => {
  it("skips handles that are not on screen", () => {
    expect(cycleHandle("separation-end", ["separation-start", "separation-end", "recombination-end"], false)).toBe("recombination-end");
  });

  it("starts over from the first handle when the selection is not among those on screen", () => {
    expect(cycleHandle("separation-size", ["separation-start", "hold-end"], false)).toBe("separation-start");
    expect(cycleHandle("separation-size", ["separation-start", "hold-end"], true)).toBe("hold-end");
  });

  it("answers no handle when there are none", () => {
    expect(cycleHandle(null, [], false)).toBeNull();
  });
});
