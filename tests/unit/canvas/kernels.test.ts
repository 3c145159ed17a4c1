import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { planHandleDrag } from "@/canvas/kernels/offsets/drag-plan";
import { handlePlacements } from "@/canvas/kernels/offsets/handles";
import { broadPhase, hitTestOffsets } from "@/canvas/kernels/offsets/hit-test";
import { planHandleValue } from "@/canvas/kernels/offsets/typed-plan";
import { fitOffsetsViewport, MIN_SEGMENT_SHARE, pxToMetres, pxToTime, timeToPx } from "@/canvas/kernels/offsets/viewport";
import { ladderStepAtLeast, ladderStepAtMost, roundTicks, snapToRoundValue } from "@/canvas/kernels/round-numbers";
import { segmentTimes, type SegmentsProtocol } from "@/canvas/kernels/timeline";
import { applyPatches, diffValues } from "@/canvas/store/patches";
import { defaultScenarioDocument } from "@/physics/scenario/schema";

const document = defaultScenarioDocument();
const protocol = document.protocol as SegmentsProtocol;
const viewport = fitOffsetsViewport(segmentTimes(protocol), document.separation, { width: 800, height: 320 });
const handles = handlePlacements(viewport, protocol, document.separation);
const at = (id: string) => handles.find((h) => h.id === id)!;
const midPlot = viewport.plot.top + viewport.plot.height / 2;

describe("Offsets hit testing", () => {
  it("picks the handle nearest the pointer when two are within tolerance", () => {
    const end = at("recombination-end").x;
    const hold = at("hold-end").x;
    const between = hold + (end - hold) * 0.4;
    const hit = hitTestOffsets(handles, viewport, segmentTimes(protocol), { x: between, y: midPlot }, Math.abs(end - hold));
    expect(hit).toMatchObject({ kind: "handle", handle: "hold-end" });
  });

  it("misses a handle just beyond the tolerance and reports the segment under the pointer instead", () => {
    const hold = at("hold-end").x;
    const hit = hitTestOffsets(handles, viewport, segmentTimes(protocol), { x: hold - 9, y: midPlot }, 8);
    expect(hit).toEqual({ kind: "segment", segment: "hold" });
  });

  it("takes the separation handle only near its point, and a time handle anywhere along its rule", () => {
    const size = at("separation-size");
    expect(size.axis).toBe("distance");
    if (size.axis !== "distance") return;
    expect(hitTestOffsets(handles, viewport, segmentTimes(protocol), { x: size.x + 3, y: size.y - 3 }, 8)).toMatchObject({ handle: "separation-size" });
    const farBelow = { x: size.x, y: size.y + 40 };
    expect(broadPhase(handles, viewport, farBelow, 8).map((h) => h.id)).not.toContain("separation-size");
    const end = at("separation-end").x;
    expect(hitTestOffsets(handles, viewport, segmentTimes(protocol), { x: end + 2, y: viewport.plot.top + 4 }, 8)).toMatchObject({ handle: "separation-end" });
  });

  it("answers a miss outside the plot", () => {
    expect(hitTestOffsets(handles, viewport, segmentTimes(protocol), { x: 2, y: 2 }, 8)).toEqual({ kind: "miss" });
  });
});

describe("Offsets axes", () => {
  it("map time to pixels and back on every piece of the axis", () => {
    fc.assert(
      fc.property(fc.double({ min: -0.05, max: 0.2, noNaN: true }), (t) => {
        expect(pxToTime(viewport, timeToPx(viewport, t))).toBeCloseTo(t, 9);
      }),
    );
  });

  it("give a short ramp beside a long hold at least its minimum share of the width", () => {
    const lopsided: SegmentsProtocol = { ...protocol, hold: { durationSeconds: 1000 } };
    const vp = fitOffsetsViewport(segmentTimes(lopsided), document.separation, { width: 800, height: 320 });
    const t = segmentTimes(lopsided);
    expect(timeToPx(vp, t.separationEnd) - timeToPx(vp, t.separationStart)).toBeGreaterThanOrEqual(vp.plot.width * MIN_SEGMENT_SHARE * 0.88 - 1e-9);
  });
});

describe("snapping to round values", () => {
  it("lands on a multiple of a 1–2–5 step within half a step of the value", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-9, max: 1e6, noNaN: true }), (value) => {
        const snapped = snapToRoundValue(value, value / 1000);
        const step = ladderStepAtMost(value / 10);
        expect(Math.abs(snapped - value)).toBeLessThanOrEqual(step / 2 + value * 1e-12);
        const mantissa = Number((step / 10 ** Math.floor(Math.log10(step))).toPrecision(6));
        expect([1, 2, 5]).toContain(mantissa);
      }),
    );
  });

  it("never snaps finer than the step a few pixels are worth", () => {
    expect(snapToRoundValue(0.01372, 0.004)).toBeCloseTo(0.015, 12);
    expect(snapToRoundValue(0.01372, 1e-6)).toBeCloseTo(0.014, 12);
  });

  it("brackets a value between the ladder steps at most and at least it", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-12, max: 1e12, noNaN: true }), (value) => {
        expect(ladderStepAtMost(value)).toBeLessThanOrEqual(value);
        expect(ladderStepAtLeast(value)).toBeGreaterThanOrEqual(value);
        expect(ladderStepAtLeast(value) / ladderStepAtMost(value)).toBeLessThanOrEqual(2.5 + 1e-9);
      }),
    );
  });

  it("makes axis ticks that cover the range in round steps", () => {
    const ticks = roundTicks(-0.3, 1.1, 5);
    expect(ticks[0]).toBeGreaterThanOrEqual(-0.3);
    expect(ticks[ticks.length - 1]).toBeLessThanOrEqual(1.1);
    const steps = ticks.slice(1).map((t, i) => t - ticks[i]);
    for (const s of steps) expect(s).toBeCloseTo(steps[0], 12);
  });
});

describe("handle drag plans", () => {
  const start = (handle: "hold-end" | "separation-size") => ({ handle, protocol, separation: document.separation, viewport });

  it("snaps a shift-dragged hold to a round duration", () => {
    const plan = planHandleDrag(start("hold-end"), { x: at("hold-end").x - 37, y: midPlot }, { snap: true });
    const free = planHandleDrag(start("hold-end"), { x: at("hold-end").x - 37, y: midPlot }, { snap: false });
    expect(plan.holdSeconds).not.toBe(free.holdSeconds);
    const mantissa = plan.holdSeconds / 10 ** Math.floor(Math.log10(plan.holdSeconds));
    expect(Math.abs(mantissa - Math.round(mantissa))).toBeLessThan(1e-9);
  });

  it("turns a drag of the separation handle above the plot into a larger separation, and below zero into none", () => {
    const up = planHandleDrag(start("separation-size"), { x: 0, y: viewport.plot.top - 50 }, { snap: false });
    expect(up.distanceMetres).toBeGreaterThan(document.separation.distanceMetres);
    const down = planHandleDrag(start("separation-size"), { x: 0, y: viewport.plot.top + viewport.plot.height + 50 }, { snap: false });
    expect(down).toMatchObject({ distanceMetres: 0, clamped: true });
    expect(pxToMetres(viewport, viewport.plot.top + viewport.plot.height + 50)).toBeLessThan(0);
  });

  it("refuses a typed end of hold before the end of the separation, with the reason", () => {
    const typed = planHandleValue("hold-end", protocol.separation.durationSeconds / 2, protocol, document.separation);
    expect(typed.ok).toBe(false);
    expect(!typed.ok && typed.message).toMatch(/recombination cannot start before the separation ends/);
  });
});

describe("reversible patches", () => {
  const json = fc.letrec((tie) => ({
    value: fc.oneof({ depthSize: "small" }, fc.double({ noNaN: true }), fc.string(), fc.boolean(), fc.constant(null), tie("object"), tie("array")),
    object: fc.dictionary(fc.constantFrom("a", "b", "c", "d"), tie("value"), { maxKeys: 4 }),
    array: fc.array(tie("value"), { maxLength: 3 }),
  }));

  it("replay a change forwards to the new value and backwards to the old one, exactly", () => {
    fc.assert(
      fc.property(json.object, json.object, (before, after) => {
        const patches = diffValues(before, after);
        expect(applyPatches(before, patches, "forward")).toEqual(after);
        expect(applyPatches(after, patches, "backward")).toEqual(before);
      }),
    );
  });

  it("record only the leaves that changed", () => {
    const after = { ...document, separation: { ...document.separation, distanceMetres: 2e-6 } };
    expect(diffValues(document, after)).toEqual([{ path: ["separation", "distanceMetres"], before: 1e-6, after: 2e-6 }]);
  });
});
