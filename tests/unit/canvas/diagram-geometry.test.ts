/**
 * The Diagram's geometry over random scenarios on every background (fast-check): the branches are drawn as curves
 * of the spacetime, so they stay inside the diagram's boundary, stay timelike, and meet the lab's worldline where the
 * separation is zero; the lab's worldline runs through the middle of its region; the labels never collide.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { diagramFigure, diagramViewport } from "@/canvas/export/diagram-figure";
import { boxesOverlap, layoutLabels, polylineCrossesBox, type PlacedLabel } from "@/canvas/kernels/diagram/label-layout";
import { buildDiagramScene, type DiagramScene } from "@/canvas/kernels/diagram/scene";
import { toPx } from "@/canvas/kernels/diagram/viewport";
import { branchPixels, diagramLabelCandidates, diagramLabelObstacles, diagramLabelRegion, sliceLabelCandidates, sliceLabelObstacles } from "@/canvas/layers/diagram-labels";
import { FIGURE_PALETTES } from "@/canvas/theme";
import { c } from "@/physics/constants";
import { schwarzschildRadiusMetres, type DiagramPoint } from "@/physics/backgrounds";
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";

const base = defaultScenarioDocument();
const logUniform = (lowExp: number, highExp: number) => fc.double({ min: lowExp, max: highExp, noNaN: true }).map((e) => 10 ** e);
const shape = fc.constantFrom("cubic", "cosine", "minimum-jerk", "linear" as const);

const protocol = fc.record({
  separation: logUniform(-7, 3),
  hold: logUniform(-7, 4),
  recombination: logUniform(-7, 3),
  shape,
  split: fc.constantFrom("symmetric", "one-branch-stays" as const),
  axis: fc.constantFrom("radial", "tangential" as const),
});

type ProtocolDraw = typeof protocol extends fc.Arbitrary<infer T> ? T : never;

function withProtocol(document: ScenarioDocument, p: ProtocolDraw): ScenarioDocument {
  return {
    ...document,
    separation: { ...document.separation, axis: p.axis, split: p.split },
    protocol: {
      kind: "segments",
      separation: { durationSeconds: p.separation, shape: p.shape },
      hold: { durationSeconds: p.hold },
      recombination: { durationSeconds: p.recombination, shape: p.shape },
    },
  };
}

/** A random scenario on each background: mass and lab radius, acceleration, Hubble rate and lab radius. */
const backgrounds: Record<string, fc.Arbitrary<ScenarioDocument>> = {
  Minkowski: fc.constant(base),
  Schwarzschild: fc.record({ massKg: logUniform(29, 38), radii: logUniform(0.01, 3) }).map(({ massKg, radii }) => ({
    ...base,
    background: { kind: "schwarzschild" as const, massKg },
    lab: { placement: "areal-radius" as const, arealRadiusMetres: radii * schwarzschildRadiusMetres(massKg) },
  })),
  Rindler: logUniform(-2, 20).map((a) => ({ ...base, background: { kind: "rindler" as const, accelerationMetresPerSecondSquared: a }, lab: { placement: "uniformly-accelerated" as const } })),
  "de Sitter": fc.record({ H: logUniform(-18, -8), share: fc.double({ min: 0, max: 0.97, noNaN: true }) }).map(({ H, share }) => ({
    ...base,
    background: { kind: "de-sitter" as const, hubbleRatePerSecond: H },
    lab: { placement: "areal-radius" as const, arealRadiusMetres: share < 0.05 ? 0 : (share * c) / H },
  })),
};

function sceneOf(document: ScenarioDocument): DiagramScene {
  const outcome = buildDiagramScene(document);
  if (!outcome.ok) throw new Error(outcome.issue.message);
  return outcome.scene;
}

/** Signed distance inside the lab's region (a convex, counter-clockwise polygon in (X, T)): ≥ 0 inside or on it. */
function insideBy(region: DiagramPoint[], p: DiagramPoint): number {
  return Math.min(
    ...region.map((a, i) => {
      const b = region[(i + 1) % region.length];
      const length = Math.hypot(b.X - a.X, b.T - a.T);
      return ((b.X - a.X) * (p.T - a.T) - (b.T - a.T) * (p.X - a.X)) / length;
    }),
  );
}

/** Rounding may put a point of a curve that races into a corner on the edge itself, never beyond it. */
const ON_EDGE = 1e-12;

describe.each(Object.keys(backgrounds))("the branches on the diagram of %s", (name) => {
  const scenarios = fc.tuple(backgrounds[name], protocol).map(([document, p]) => withProtocol(document, p));

  it("keeps every drawn point of the lab's worldline and of both branches inside the boundary of the lab's region", () => {
    fc.assert(
      fc.property(scenarios, (document) => {
        const scene = sceneOf(document);
        const drawn = [...scene.labWorldline, ...scene.protocol!.branches.flatMap((s) => [s.point, s.pointA, s.pointB])];
        for (const p of drawn) expect(insideBy(scene.labRegion, p)).toBeGreaterThanOrEqual(-ON_EDGE);
      }),
      { numRuns: 100 },
    );
  }, 120_000);

  it("draws both branches timelike: between samples T rises by more than |X| moves (steeper than 45°)", () => {
    fc.assert(
      fc.property(scenarios, (document) => {
        const branches = sceneOf(document).protocol!.branches;
        for (const key of ["pointA", "pointB"] as const) {
          for (let i = 1; i < branches.length; i++) {
            const [p, q] = [branches[i - 1][key], branches[i][key]];
            const [dT, dX] = [q.T - p.T, q.X - p.X];
            // Both null coordinates P = T − X and Q = T + X may only stay put where the map has saturated at a corner.
            expect(dT - Math.abs(dX)).toBeGreaterThanOrEqual(-1e-15);
            if (dT > 1e-9) expect(Math.abs(dX)).toBeLessThan(dT);
          }
        }
      }),
      { numRuns: 100 },
    );
  }, 120_000);

  it("meets the lab's worldline wherever the separation is zero, and leaves it while apart", () => {
    fc.assert(
      fc.property(scenarios, (document) => {
        const scene = sceneOf(document);
        const branches = scene.protocol!.branches;
        for (const s of branches) {
          if (s.a === 0) expect(s.pointA).toEqual(s.point);
          if (s.b === 0) expect(s.pointB).toEqual(s.point);
        }
        const away = (p: DiagramPoint, lab: DiagramPoint) => Math.hypot(p.T - lab.T, p.X - lab.X);
        const farthest = Math.max(...branches.flatMap((s) => [away(s.pointA, s.point), away(s.pointB, s.point)]));
        expect(farthest).toBeGreaterThan(0);
        expect(farthest).toBeLessThanOrEqual(scene.protocol!.corridor * (1 + 1e-9));
      }),
      { numRuns: 60 },
    );
  }, 120_000);
});

describe("framing", () => {
  it("puts a Schwarzschild lab's worldline through the middle of the exterior at t = 0, wherever the lab is", () => {
    fc.assert(
      fc.property(backgrounds.Schwarzschild, (document) => {
        const scene = sceneOf(document);
        const middle = scene.chart.background.conformal.toDiagram(0, scene.chart.background.labRadiusMetres);
        // The exterior diamond spans X from 0 (bifurcation) to 1 (i⁰) along T = 0.
        expect(middle.T).toBeCloseTo(0, 12);
        expect(middle.X).toBeCloseTo(0.5, 9);
      }),
      { numRuns: 60 },
    );
  }, 120_000);

  it("puts a de Sitter lab's worldline through the middle of the static patch at t = 0, the pole on X = 0 and the horizons on the diagonals", () => {
    fc.assert(
      fc.property(backgrounds["de Sitter"], (document) => {
        const scene = sceneOf(document);
        const background = scene.chart.background;
        const H = (document.background as { hubbleRatePerSecond: number }).hubbleRatePerSecond;
        const pole = background.conformal.toDiagram(1e3 / H, 0);
        // The static patch is the triangle X ≤ 1 − |T| of the Penrose square; its centre line r = 0 is X = 0.
        expect(pole.X).toBeCloseTo(0, 12);
        // Light along u = ct − r* = const, out to the horizon r → c/H, ends on H⁺: T + X = 1.
        const nearHorizon = background.conformal.toDiagram(40 / H, (c / H) * (1 - 1e-12));
        expect(nearHorizon.T + nearHorizon.X).toBeGreaterThan(1 - 1e-3);
        // The static geodesic observer at the centre is the pole itself; every other lab is framed through the middle.
        if (document.lab.placement === "areal-radius" && document.lab.arealRadiusMetres === 0) return;
        const middle = background.conformal.toDiagram(0, background.labRadiusMetres);
        expect(middle.T).toBeCloseTo(0, 12);
        expect(middle.X).toBeCloseTo(0.5, 9);
      }),
      { numRuns: 60 },
    );
  }, 120_000);

  it("draws the time slices through the protocol's own events, labelled in lab time from the start of the separation", () => {
    const document = withProtocol(base, { separation: 1e-3, hold: 5e-3, recombination: 2e-3, shape: "cosine", split: "symmetric", axis: "radial" });
    const slices = sceneOf(document).protocol!.slices;
    expect(slices.map((s) => s.tauSeconds)).toEqual([0, 1e-3, 6e-3, 8e-3]);
    expect(slices.map((s) => s.label)).toEqual(["τ = 0", "τ = 1 ms", "τ = 6 ms", "τ = 8 ms"]);
  });
});

const SIZES = [320, 480, 640, 900, 1200, 1600];
const EXAMPLES: Record<string, ScenarioDocument> = {
  Minkowski: withProtocol(base, { separation: 1e-3, hold: 1e-2, recombination: 1e-3, shape: "minimum-jerk", split: "symmetric", axis: "tangential" }),
  Schwarzschild: {
    ...base,
    background: { kind: "schwarzschild", massKg: 1.989e31 },
    lab: { placement: "areal-radius", arealRadiusMetres: 1.5e5 },
  },
  Rindler: { ...base, background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e18 }, lab: { placement: "uniformly-accelerated" } },
  "de Sitter": { ...base, background: { kind: "de-sitter", hubbleRatePerSecond: 2.2e-18 }, lab: { placement: "areal-radius", arealRadiusMetres: 3e25 } },
};

/** Point in polygon by ray casting (even–odd crossings), independent of the layout's own convex test. */
function insidePolygon(polygon: { x: number; y: number }[], x: number, y: number): boolean {
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const [a, b] = [polygon[i], polygon[j]];
    if (a.y > y !== b.y > y && x < ((b.x - a.x) * (y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

describe.each(Object.keys(EXAMPLES))("the labels of the %s diagram", (name) => {
  for (const width of SIZES) {
    for (const labelScale of [1, 2]) {
      it(`never overlap each other nor cross a branch, the lab's worldline or a horizon, ${width} px wide at label scale ${labelScale}`, () => {
        const scene = sceneOf(EXAMPLES[name]);
        const size = { width, height: Math.round(width * 0.8) };
        const figure = diagramFigure(scene, size, FIGURE_PALETTES.light, { labelScale });
        const viewport = figure.viewport;
        expect(viewport).toEqual(diagramViewport(scene, size, labelScale));
        // The layout the figure used, redone to read the boxes (the figure keeps only the text).
        const backdrop = layoutLabels(
          diagramLabelCandidates(scene, viewport).map((c) => ({ ...c, fontSize: c.fontSize * (c.priority >= 90 ? labelScale : 1 + (labelScale - 1) / 2) })),
          size,
          { obstacles: diagramLabelObstacles(scene, viewport), within: diagramLabelRegion(scene, viewport) },
        );
        const slices = layoutLabels(
          sliceLabelCandidates(scene.protocol!, viewport).map((c) => ({ ...c, fontSize: c.fontSize * (1 + (labelScale - 1) / 2) })),
          size,
          { obstacles: sliceLabelObstacles(scene, scene.protocol!, viewport), placed: backdrop },
        );
        const placed: PlacedLabel[] = [...backdrop, ...slices];
        const texts = figure.groups.filter((g) => g.id === "labels" || g.id === "slice-labels").flatMap((g) => g.shapes.flatMap((s) => (s.kind === "text" ? [s.text] : [])));
        expect(texts.sort()).toEqual(placed.map((l) => l.text).sort());
        // The boundaries that border the lab's region are always named.
        expect(placed.some((l) => l.text === "ℐ⁺" || l.text === "H⁺")).toBe(true);
        for (let i = 0; i < placed.length; i++) {
          for (let j = i + 1; j < placed.length; j++) expect(boxesOverlap(placed[i].box, placed[j].box), `${placed[i].text} / ${placed[j].text}`).toBe(false);
        }
        const { a, b } = branchPixels(scene.protocol!, viewport);
        const worldline = scene.labWorldline.map((p) => toPx(viewport, p));
        // The grid's labels lie across no null infinity, and inside the diagram, not on the blank paper beyond it. (The
        // time slices' may sit by their lines' ends out past i⁰: dropping them would leave the protocol's instants unnamed.)
        const nullInfinity = scene.boundaries.filter((edge) => edge.kind === "null-infinity" && edge.bordersLabRegion).map((edge) => edge.points.map((p) => toPx(viewport, p)));
        const outline = scene.outline.map((p) => toPx(viewport, p));
        for (const label of placed.filter((l) => l.priority < 30)) {
          for (const edge of nullInfinity) expect(polylineCrossesBox(edge, label.box), `${label.text} across null infinity`).toBe(false);
          const { left, top, width: w, height: h } = label.box;
          for (const [x, y] of [[left, top], [left + w, top], [left, top + h], [left + w, top + h]]) expect(insidePolygon(outline, x, y), `${label.text} inside the diagram`).toBe(true);
        }
        for (const label of placed) {
          expect(polylineCrossesBox(a, label.box), `${label.text} on branch A`).toBe(false);
          expect(polylineCrossesBox(b, label.box), `${label.text} on branch B`).toBe(false);
          expect(polylineCrossesBox(worldline, label.box), `${label.text} on the lab's worldline`).toBe(false);
          expect(label.box.left >= 0 && label.box.top >= 0 && label.box.left + label.box.width <= size.width && label.box.top + label.box.height <= size.height).toBe(true);
        }
      });
    }
  }

  it("names the lab's worldline by its radius in the background's own unit", () => {
    const scene = sceneOf(EXAMPLES[name]);
    const size = { width: 900, height: 720 };
    const texts = diagramFigure(scene, size, FIGURE_PALETTES.light).groups.find((g) => g.id === "labels")!.shapes.flatMap((s) => (s.kind === "text" ? [s.text] : []));
    const expected: Record<string, string> = {
      Minkowski: "lab, x = 0",
      // 10 M☉ has rₛ = 29.5 km (2GM/c², IAU 2015 nominal solar mass parameter): 150 km is 5.08 rₛ.
      Schwarzschild: "lab, r = 150 km = 5.08 rₛ",
      // c²/a = (2.998e8 m/s)² / 1e18 m/s² = 89.9 mm.
      Rindler: "lab, ξ = c²/a = 89.9 mm",
      // c/H = 2.998e8 / 2.2e-18 = 1.363e26 m; 3e25 m is 0.22 of it.
      "de Sitter": "lab, r = 0.22 c/H",
    };
    expect(texts).toContain(expected[name]);
  });
});
