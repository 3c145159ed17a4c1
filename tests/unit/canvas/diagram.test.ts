import { describe, expect, it } from "vitest";
import { lightConeAt } from "@/canvas/kernels/diagram/light-cone";
import { buildDiagramScene, type DiagramScene } from "@/canvas/kernels/diagram/scene";
import { clipToConvex } from "@/canvas/kernels/diagram/geometry";
import { layoutLabels, type LabelCandidate } from "@/canvas/kernels/diagram/label-layout";
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import { schwarzschildDocument } from "./harness";

const base = defaultScenarioDocument();
const documents: Record<string, ScenarioDocument> = {
  Minkowski: base,
  Schwarzschild: schwarzschildDocument(),
  "the Rindler wedge": { ...base, background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e18 }, lab: { placement: "uniformly-accelerated" } },
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

  it("labels the radius lines with distinct values, and draws the time slices at the protocol's events up the lab's worldline", () => {
    const radii = scene.grid.filter((g) => g.family === "radius" && g.label !== "");
    expect(radii.length).toBeGreaterThan(2);
    expect(new Set(radii.map((g) => g.label)).size).toBe(radii.length);
    expect(scene.grid.some((g) => g.family === "time")).toBe(false);
    const slices = scene.protocol!.slices;
    expect(slices.length).toBe(4);
    const heights = slices.map((s) => s.labPoint.T);
    heights.slice(1).forEach((h, i) => expect(h - heights[i]).toBeGreaterThan(0.02));
  });

  it("shades radiation toward null infinity from both ramps", () => {
    expect(scene.protocol?.strips.filter((s) => s.kind === "far-field")).toHaveLength(2);
  });
});

describe("the grid inside the black hole", () => {
  const scene = sceneOf(schwarzschildDocument());
  const rs = scene.chart.horizonRadiusMetres!;
  const interior = scene.grid.filter((g) => g.family === "radius" && g.valueSI < rs);

  /**
   * r of a region II point from its Kruskal coordinates: UV = (1 − r/r_s) e^{r/r_s} (Kruskal, Phys. Rev. 119, 1743
   * (1960); the form with U, V = e^{∓κu/c}, e^{κv/c} from memory), with U = tan(πP/2), V = tan(πQ/2), P = T − X,
   * Q = T + X, inverted by bisection (the left side falls from 1 to 0 as r goes from 0 to r_s).
   */
  function radiusFromKruskal(p: { T: number; X: number }): number {
    const uv = Math.tan((Math.PI / 2) * (p.T - p.X)) * Math.tan((Math.PI / 2) * (p.T + p.X));
    let low = 0;
    let high = rs;
    for (let i = 0; i < 100; i++) {
      const mid = (low + high) / 2;
      if ((1 - mid / rs) * Math.exp(mid / rs) > uv) low = mid;
      else high = mid;
    }
    return (low + high) / 2;
  }

  it("draws a few curves of constant r there, unlabelled, and none for backgrounds without a hole", () => {
    expect(interior.length).toBe(3);
    for (const g of interior) expect(g.label).toBe("");
    for (const other of [base, documents["the Rindler wedge"], documents["the de Sitter static patch"]]) {
      expect(sceneOf(other).grid.filter((g) => g.label === "")).toEqual([]);
    }
  });

  it("keeps every point between the horizon (T = |X|) and the singularity (T = ½), at the radius the line stands for", () => {
    for (const g of interior) {
      expect(g.points.length).toBeGreaterThan(20);
      for (const p of g.points) {
        expect(p.T).toBeGreaterThanOrEqual(Math.abs(p.X) - 1e-9);
        expect(p.T).toBeLessThanOrEqual(0.5 + 1e-9);
      }
      const middle = g.points.filter((p) => p.T - Math.abs(p.X) > 0.02 && 0.5 - p.T > 0.02);
      expect(middle.length).toBeGreaterThan(10);
      for (const p of middle) expect(radiusFromKruskal(p) / rs).toBeCloseTo(g.valueSI / rs, 6);
    }
  });

  it("runs each curve from one end of the singularity to the other, spacelike all the way (r is a time inside)", () => {
    for (const g of interior) {
      const first = g.points[0];
      const last = g.points[g.points.length - 1];
      expect(first.X).toBeCloseTo(-0.5, 2);
      expect(last.X).toBeCloseTo(0.5, 2);
      g.points.slice(1).forEach((p, i) => {
        const dX = Math.abs(p.X - g.points[i].X);
        const dT = Math.abs(p.T - g.points[i].T);
        if (dX + dT > 1e-9) expect(dX).toBeGreaterThan(dT);
      });
    }
  });

  it("spaces the curves evenly up the symmetry line, without bunching at the horizon or the singularity", () => {
    const heights = interior.map((g) => g.labelAt.T).sort((a, b) => a - b);
    expect(heights.map((h) => Math.round(h * 1e6) / 1e6)).toEqual([0.125, 0.25, 0.375]);
    for (const g of interior) expect(Math.abs(g.labelAt.X)).toBeLessThan(1e-12);
  });

  it("leaves an empty label out of the layout", () => {
    const empty: LabelCandidate = { id: "context", text: "", x: 10, y: 10, align: "left", verticalAlign: "top", rotation: 0, fontSize: 10, priority: 50, tone: "faint" };
    expect(layoutLabels([empty], { width: 100, height: 100 })).toEqual([]);
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
