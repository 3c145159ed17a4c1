import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { diagramViewport } from "@/canvas/export/diagram-figure";
import { labelBox } from "@/canvas/kernels/diagram/decorations";
import { buildDiagramScene } from "@/canvas/kernels/diagram/scene";
import { toPx } from "@/canvas/kernels/diagram/viewport";
import { diagramLabelCandidates } from "@/canvas/layers/diagram-labels";
import { parseScenarioDocument } from "@/physics/scenario/schema";

const example = (name: string) => {
  const parsed = parseScenarioDocument(JSON.parse(readFileSync(path.resolve(__dirname, `../../../examples/${name}.json`), "utf8")));
  if (!parsed.ok) throw new Error(`examples/${name}.json does not parse`);
  return parsed.document;
};

/** Sampled points along the lab region's horizons, in stage pixels. */
function horizonPixels(name: string, size: { width: number; height: number }) {
  const outcome = buildDiagramScene(example(name));
  if (!outcome.ok) throw new Error(outcome.issue.message);
  const scene = outcome.scene;
  const viewport = diagramViewport(scene, size);
  const points = scene.boundaries
    .filter((b) => b.kind === "horizon" && b.bordersLabRegion)
    .flatMap((b) =>
      b.points.slice(1).flatMap((q, i) => {
        const p = b.points[i];
        return Array.from({ length: 41 }, (_, k) => toPx(viewport, { T: p.T + ((q.T - p.T) * k) / 40, X: p.X + ((q.X - p.X) * k) / 40 }));
      }),
    );
  return { scene, viewport, points };
}

describe("radius labels and the horizon", () => {
  for (const name of ["de-sitter", "schwarzschild"]) {
    it(`keeps every radius label of the ${name} example clear of the lab region's horizons`, () => {
      const size = { width: 450, height: 450 };
      const { scene, viewport, points } = horizonPixels(name, size);
      const radius = diagramLabelCandidates(scene, viewport).filter((l) => l.id.startsWith("grid-") && l.rotation !== 0);
      expect(radius.length).toBeGreaterThan(0);
      for (const label of radius) {
        const box = labelBox(label);
        const inside = points.filter((p) => p.x > box.left && p.x < box.left + box.width && p.y > box.top && p.y < box.top + box.height);
        expect(inside, `${label.text} crosses the horizon`).toEqual([]);
      }
    });
  }
});
