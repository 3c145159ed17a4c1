import { describe, expect, it } from "vitest";
import { lightConeAt } from "@/canvas/kernels/diagram/light-cone";
import { buildDiagramScene, type DiagramScene } from "@/canvas/kernels/diagram/scene";
import { clipToConvex } from "@/canvas/kernels/diagram/geometry";
import { layoutLabels, type LabelCandidate } from "@/canvas/kernels/diagram/decorations";
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import { schwarzschildDocument } from "./harness";

const base = defaultScenarioDocument();
const documents: Record<string, ScenarioDocument> = {
  Minkowski: base,
  Schwarzschild: schwarzschildDocument(),
  "the Rindler wedge": { ...base, background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e18 } },
  "the de Sitter static patch": { ...base, background: { kind: "de-sitter", hubbleRatePerSecond: 2.2e-18 }, lab: { placement: "areal-radius", arealRadiusMetres: 3e25 } },
};

function sceneOf(document: ScenarioDocument): DiagramScene {
  const outcome = buildDiagramScene(document);
  if (!outcome.ok) throw new Error(outcome.issue.message);
  return outcome.scene;
}

const insideConvex = (outline: DiagramScene["outline"], p: { T: number; X: number }) => clipToConvex([p, p, p], outline).length > 0;

/** Distance from a point to the nearest edge of a polygon. */
function distanceToEdges(outline: DiagramScene["outline"], p: { T: number; X: number }): number {
  return Math.min(
    ...outline.map((a, i) => {
      const b = outline[(i + 1) % outline.length];
      const ab = { T: b.T - a.T, X: b.X - a.X };
      const s = Math.max(0, Math.min(1, ((p.T - a.T) * ab.T + (p.X - a.X) * ab.X) / (ab.T ** 2 + ab.X ** 2)));
      return Math.hypot(p.T - a.T - s * ab.T, p.X - a.X - s * ab.X);
    }),
  );
}

describe.each(Object.entries(documents))("the diagram of %s", (_name, document) => {
  const scene = sceneOf(document);

  it("opens the light cone at 45° where the physics maps are asked, along the lab's worldline and across the grid", () => {
    // Within a few hundredths of an edge the squeeze is too flat for a finite-difference direction to mean much.
    const points = [...scene.labWorldline.filter((_, i) => i % 10 === 5), ...scene.grid.flatMap((g) => g.points.filter((_, i) => i % 20 === 10))].filter(
      (p) => distanceToEdges(scene.labRegion, p) > 0.03,
    );
    let checked = 0;
    for (const p of points) {
      const cone = lightConeAt(scene.chart.background, p, scene.chart.nullScaleMetres);
      if (!cone.coordinates) continue;
      checked++;
      expect(Math.abs(cone.outgoing.T - cone.outgoing.X)).toBeLessThan(1e-3);
      expect(Math.abs(cone.ingoing.T + cone.ingoing.X)).toBeLessThan(1e-3);
      expect(cone.outgoing.T).toBeGreaterThan(0);
    }
    expect(checked).toBeGreaterThan(10);
  });

  it("keeps the lab's worldline, the grid and the radiation inside the diagram", () => {
    const drawn = [...scene.labWorldline, ...scene.grid.flatMap((g) => g.points), ...(scene.protocol?.strips.flatMap((s) => s.polygon) ?? [])];
    for (const p of drawn) expect(insideConvex(scene.outline, p)).toBe(true);
  });

  it("labels the grid with distinct values and spreads the time lines along the lab's worldline", () => {
    const times = scene.grid.filter((g) => g.family === "time");
    expect(new Set(times.map((g) => g.label)).size).toBe(times.length);
    const heights = times.map((g) => g.labelAt.T).sort((a, b) => a - b);
    const gaps = heights.slice(1).map((h, i) => h - heights[i]);
    expect(Math.min(...gaps)).toBeGreaterThan(0.02);
  });

  it("shades radiation toward null infinity from both ramps", () => {
    expect(scene.protocol?.strips.filter((s) => s.kind === "far-field")).toHaveLength(2);
  });
});

describe("the diagram's radiation regions", () => {
  it("shade what the horizon takes only where there is a horizon", () => {
    expect(sceneOf(documents.Minkowski).protocol?.strips.some((s) => s.kind === "horizon")).toBe(false);
    expect(sceneOf(documents.Schwarzschild).protocol?.strips.some((s) => s.kind === "horizon")).toBe(true);
  });

  it("bound the far-field strips by outgoing light rays at 45°", () => {
    const strip = sceneOf(documents.Minkowski).protocol!.strips[0].polygon;
    const diagonalEdges = strip.slice(1).filter((p, i) => {
      const q = strip[i];
      const d = { T: p.T - q.T, X: p.X - q.X };
      return Math.hypot(d.T, d.X) > 0.05 && Math.abs(Math.abs(d.T) - Math.abs(d.X)) < 1e-9;
    });
    expect(diagonalEdges.length).toBeGreaterThanOrEqual(1);
  });
});

describe("the diagram's notes", () => {
  it("say when the protocol's time is rescaled near a horizon and when the separation is exaggerated", () => {
    const notes = sceneOf(documents.Schwarzschild).notes.join(" ");
    expect(notes).toMatch(/Protocol time compressed/);
    expect(notes).toMatch(/separation exaggerated/i);
  });

  it("refuse a lab inside the horizon with the path of the field", () => {
    const outcome = buildDiagramScene({ ...documents.Schwarzschild, lab: { placement: "areal-radius", arealRadiusMetres: 10 } });
    expect(outcome.ok).toBe(false);
    expect(!outcome.ok && outcome.issue.path).toBe("lab.arealRadiusMetres");
  });
});

describe("label layout", () => {
  const label = (id: string, x: number, priority: number): LabelCandidate => ({
    id, text: "ℐ⁺", x, y: 50, align: "left", verticalAlign: "middle", rotation: 0, fontSize: 14, priority, tone: "ink",
  });

  it("drops the lower-priority label of two that would overlap, and keeps labels that do not", () => {
    const placed = layoutLabels([label("grid", 100, 1), label("boundary", 104, 10), label("far", 300, 1)], { width: 400, height: 100 });
    expect(placed.map((l) => l.id).sort()).toEqual(["boundary", "far"]);
  });

  it("drops a label that would stick out of the stage", () => {
    expect(layoutLabels([label("edge", 395, 1)], { width: 400, height: 100 })).toEqual([]);
  });
});

describe("the diagram of a protocol that is not made of segments", () => {
  it("draws the branches apart while a sampled profile holds them apart, with a far-field strip per moving stretch", () => {
    const sampled: ScenarioDocument = {
      ...documents.Schwarzschild,
      protocol: {
        kind: "sampled",
        interpolation: "linear",
        samples: [
          { timeSeconds: 0, separationMetres: 0 },
          { timeSeconds: 0.02, separationMetres: 1e-6 },
          { timeSeconds: 0.1, separationMetres: 1e-6 },
          { timeSeconds: 0.12, separationMetres: 0 },
        ],
      },
    };
    const protocol = sceneOf(sampled).protocol!;
    expect(Math.max(...protocol.branches.map((b) => b.a))).toBeCloseTo(1, 6);
    expect(protocol.branches[0].a).toBe(0);
    expect(protocol.strips.filter((s) => s.kind === "far-field").length).toBeGreaterThanOrEqual(1);
    expect(protocol.strips.some((s) => s.kind === "horizon")).toBe(true);
  });
});
