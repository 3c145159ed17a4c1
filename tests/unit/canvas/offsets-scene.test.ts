/**
 * The Offsets figure model (canvas/kernels/offsets/scene.ts): the branches' paths against lab time, the segments'
 * bands, the ticks and the labels, laid out by the Diagram's label layout. The offsets are checked against the
 * split's own rule (symmetric: ±d/2; one branch stays: d and 0, DESIGN of physics/protocols), the geometry by
 * properties over random scenarios on all four backgrounds and widths from 320 px to 1600 px.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { boxesOverlap, polylineCrossesBox } from "@/canvas/kernels/diagram/label-layout";
import { buildOffsetsScene, clipPolylineToRect, type OffsetsScene } from "@/canvas/kernels/offsets/scene";
import { fitOffsetsViewport, metresToPx, pxToTime, timeToPx, type OffsetsViewport } from "@/canvas/kernels/offsets/viewport";
import { segmentTimes, type SegmentsProtocol } from "@/canvas/kernels/timeline";
import { schwarzschildRadiusMetres } from "@/physics/backgrounds";
import { c } from "@/physics/constants";
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";

const HEIGHT = 300;
const base = defaultScenarioDocument();

function protocolOf(document: ScenarioDocument): SegmentsProtocol {
  if (document.protocol.kind !== "segments") throw new Error("expected a segments protocol");
  return document.protocol;
}

function viewportFor(document: ScenarioDocument, width: number, fitSeparationMetres = document.separation.distanceMetres): OffsetsViewport {
  return fitOffsetsViewport(segmentTimes(protocolOf(document)), { split: document.separation.split, distanceMetres: fitSeparationMetres }, { width, height: HEIGHT });
}

function sceneFor(document: ScenarioDocument, width: number): OffsetsScene {
  return buildOffsetsScene({ document, viewport: viewportFor(document, width), originSeconds: 0 });
}

const pairs = (flat: number[]) => Array.from({ length: flat.length / 2 }, (_, i) => ({ x: flat[2 * i], y: flat[2 * i + 1] }));

describe("cutting a polyline to the plot", () => {
  const rect = { left: 0, top: 0, width: 10, height: 10 };

  it("keeps a polyline inside the plot as it is", () => {
    expect(clipPolylineToRect([{ x: 1, y: 1 }, { x: 5, y: 5 }, { x: 9, y: 2 }], rect)).toEqual([[1, 1, 5, 5, 9, 2]]);
  });

  it("cuts a curve that leaves and comes back into two parts, ending each on the edge", () => {
    const parts = clipPolylineToRect([{ x: 2, y: 5 }, { x: 2, y: 15 }, { x: 8, y: 15 }, { x: 8, y: 5 }], rect);
    expect(parts).toEqual([
      [2, 5, 2, 10],
      [8, 10, 8, 5],
    ]);
  });

  it("drops a curve entirely outside the plot", () => {
    expect(clipPolylineToRect([{ x: -5, y: -5 }, { x: -1, y: 20 }], rect)).toEqual([]);
  });
});

describe("the Offsets figure of a segments protocol", () => {
  const document: ScenarioDocument = {
    ...base,
    separation: { ...base.separation, axis: "radial", split: "symmetric", distanceMetres: 2e-6 },
    protocol: { kind: "segments", separation: { durationSeconds: 0.01, shape: "linear" }, hold: { durationSeconds: 1 }, recombination: { durationSeconds: 0.01, shape: "linear" } },
  };
  const viewport = viewportFor(document, 800);
  const scene = buildOffsetsScene({ document, viewport, originSeconds: 0 });

  it("draws the three segments as bands between the protocol's instants, the ramps shaded and the hold on paper", () => {
    expect(scene.bands.map((b) => [b.name, b.shaded])).toEqual([
      ["separation", true],
      ["hold", false],
      ["recombination", true],
    ]);
    const times = segmentTimes(protocolOf(document));
    expect(scene.bands[1].left).toBeCloseTo(timeToPx(viewport, times.separationEnd), 9);
    expect(scene.bands[1].left + scene.bands[1].width).toBeCloseTo(timeToPx(viewport, times.holdEnd), 9);
  });

  it("puts a symmetric split's branches at +d/2 and −d/2 during the hold, and both at the lab's place before and after", () => {
    const middle = (timeToPx(viewport, 0.01) + timeToPx(viewport, 1.01)) / 2;
    const at = (parts: number[][], x: number) => {
      const points = parts.flatMap(pairs);
      const i = points.findIndex((p, k) => k > 0 && points[k - 1].x <= x && p.x >= x);
      const [p, q] = [points[i - 1], points[i]];
      return p.y + ((x - p.x) / (q.x - p.x)) * (q.y - p.y);
    };
    expect(at(scene.branchA, middle)).toBeCloseTo(metresToPx(viewport, 1e-6), 6);
    expect(at(scene.branchB, middle)).toBeCloseTo(metresToPx(viewport, -1e-6), 6);
    const before = scene.plot.left + 2;
    expect(pxToTime(viewport, before)).toBeLessThan(0);
    expect(at(scene.branchA, before)).toBeCloseTo(scene.zeroY, 6);
    expect(at(scene.branchB, before)).toBeCloseTo(scene.zeroY, 6);
  });

  it("labels the instants from the start of the separation with their units, and names the segments and both axes", () => {
    const texts = new Map(scene.labels.map((l) => [l.id, l.text]));
    expect(texts.get("time-0")).toBe("0 s");
    expect(texts.get("time-3")).toMatch(/^1\.02\d* s$/);
    expect(texts.get("time-title")).toBe("lab proper time");
    expect(texts.get("offset-title")).toBe("offset along the radial axis");
    expect(scene.labels.filter((l) => l.id.startsWith("segment-")).map((l) => l.text)).toContain("hold");
    expect(scene.labels.filter((l) => l.id.startsWith("offset-") && l.id !== "offset-title").every((l) => /\d/.test(l.text))).toBe(true);
  });

  it("counts the instants from the dragged origin while the first instant is dragged", () => {
    const dragged = buildOffsetsScene({ document, viewport, originSeconds: 0.2 });
    expect(dragged.timeTicks[0].px).toBeCloseTo(timeToPx(viewport, 0.2), 9);
    expect(dragged.labels.find((l) => l.id === "time-0")?.text).toBe("0 s");
  });
});

describe("the Offsets figure of a formula profile", () => {
  it("draws the profile with no bands and its start and end as the instants", () => {
    const document: ScenarioDocument = { ...base, protocol: { kind: "formula", expression: "sin(pi * t / 0.5)^2", durationSeconds: 0.5 } };
    const thirds = { separationStart: 0, separationEnd: 0.5 / 3, holdEnd: 1 / 3, recombinationEnd: 0.5 };
    const viewport = fitOffsetsViewport(thirds, document.separation, { width: 640, height: HEIGHT });
    const scene = buildOffsetsScene({ document, viewport, originSeconds: 0 });
    expect(scene.bands).toEqual([]);
    expect(scene.timeTicks.map((t) => t.valueSI)).toEqual([0, 0.5]);
    expect(scene.branchA.flat().length).toBeGreaterThan(100);
  });
});

// Random scenarios: every background (the Offsets figure shows lab time, the same on each), random segments,
// splits and axes, widths from a phone's to a wide screen's, and a drag's frozen axes (fitted for another separation).
const logUniform = (lowExp: number, highExp: number) => fc.double({ min: lowExp, max: highExp, noNaN: true }).map((e) => 10 ** e);
const backgrounds: fc.Arbitrary<ScenarioDocument>[] = [
  fc.constant(base),
  logUniform(29, 38).map((massKg) => ({
    ...base,
    background: { kind: "schwarzschild" as const, massKg },
    lab: { placement: "areal-radius" as const, arealRadiusMetres: 3 * schwarzschildRadiusMetres(massKg) },
  })),
  logUniform(-2, 20).map((a) => ({ ...base, background: { kind: "rindler" as const, accelerationMetresPerSecondSquared: a } })),
  logUniform(-18, -8).map((H) => ({ ...base, background: { kind: "de-sitter" as const, hubbleRatePerSecond: H }, lab: { placement: "areal-radius" as const, arealRadiusMetres: (0.5 * c) / H } })),
];
const scenario = fc
  .tuple(
    fc.oneof(...backgrounds),
    fc.record({
      separation: logUniform(-7, 3),
      hold: logUniform(-7, 4),
      recombination: logUniform(-7, 3),
      shape: fc.constantFrom("cubic", "cosine", "minimum-jerk", "linear" as const),
      split: fc.constantFrom("symmetric", "one-branch-stays" as const),
      axis: fc.constantFrom("radial", "tangential" as const),
      distance: logUniform(-9, -1),
    }),
  )
  .map(
    ([document, p]): ScenarioDocument => ({
      ...document,
      separation: { ...document.separation, axis: p.axis, split: p.split, distanceMetres: p.distance },
      protocol: {
        kind: "segments",
        separation: { durationSeconds: p.separation, shape: p.shape },
        hold: { durationSeconds: p.hold },
        recombination: { durationSeconds: p.recombination, shape: p.shape },
      },
    }),
  );
const width = fc.integer({ min: 320, max: 1600 });

function expectCleanFigure(scene: OffsetsScene) {
  const { plot } = scene;
  for (const path of [...scene.branchA, ...scene.branchB]) {
    for (const p of pairs(path)) {
      expect(p.x).toBeGreaterThanOrEqual(plot.left);
      expect(p.x).toBeLessThanOrEqual(plot.left + plot.width);
      expect(p.y).toBeGreaterThanOrEqual(plot.top);
      expect(p.y).toBeLessThanOrEqual(plot.top + plot.height);
    }
  }
  const { labels } = scene;
  for (const label of labels) {
    expect(label.box.left).toBeGreaterThanOrEqual(0);
    expect(label.box.top).toBeGreaterThanOrEqual(0);
    expect(label.box.left + label.box.width).toBeLessThanOrEqual(scene.width);
    expect(label.box.top + label.box.height).toBeLessThanOrEqual(scene.height);
    for (const path of [...scene.branchA, ...scene.branchB]) expect(polylineCrossesBox(pairs(path), label.box)).toBe(false);
  }
  for (let i = 0; i < labels.length; i++) for (let j = i + 1; j < labels.length; j++) expect(boxesOverlap(labels[i].box, labels[j].box)).toBe(false);
}

describe("the Offsets figure on random scenarios", () => {
  it("keeps every label clear of the others and of both branches, on the stage, and both paths inside the plot", () => {
    fc.assert(
      fc.property(scenario, width, (document, w) => {
        const scene = sceneFor(document, w);
        expectCleanFigure(scene);
        expect(scene.branchA.length).toBeGreaterThan(0);
        expect(scene.labels.length).toBeGreaterThan(0);
      }),
      { numRuns: 100 },
    );
  }, 60_000);

  it("keeps the paths inside the plot while a drag holds the axes it started with", () => {
    fc.assert(
      fc.property(scenario, width, fc.double({ min: 0.2, max: 1, noNaN: true }), fc.double({ min: -0.5, max: 0.5, noNaN: true }), (document, w, fitShare, shift) => {
        const viewport = viewportFor(document, w, document.separation.distanceMetres * fitShare);
        const total = segmentTimes(protocolOf(document)).recombinationEnd;
        expectCleanFigure(buildOffsetsScene({ document, viewport, originSeconds: shift * total }));
      }),
      { numRuns: 60 },
    );
  }, 60_000);
});
