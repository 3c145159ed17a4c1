import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { exportPalette } from "@/canvas/export/export-figure";
import { sweepChartDrawing } from "@/canvas/export/sweep-figure";
import { sweepChartData } from "@/components/export/sweep-export";
import { parseScenarioDocument } from "@/physics/scenario/schema";
import { sweepScenario } from "@/physics/sweeps";

describe("the exported figure of an environment sweep", () => {
  it("draws one curve per channel and the total, inside the plot, with the axes named and their units", () => {
    const parsed = parseScenarioDocument(JSON.parse(readFileSync("examples/environment-cryogenic-chip.json", "utf8")));
    if (!parsed.ok) throw new Error("example does not parse");
    const sweep = sweepScenario(parsed.document, { parameter: "gas-pressure", fromValue: 1e-12, toValue: 1e-8, points: 5 });
    const size = { width: 640, height: 400 };
    const drawing = sweepChartDrawing(sweepChartData(parsed.document, sweep), size, exportPalette("light"), true);
    const curves = drawing.groups.find((g) => g.id === "curves")!;
    expect(curves.shapes).toHaveLength(7);
    for (const shape of curves.shapes) {
      if (shape.kind !== "line") throw new Error("a curve is a line");
      for (let i = 0; i < shape.points.length; i += 2) {
        expect(shape.points[i]).toBeGreaterThanOrEqual(0);
        expect(shape.points[i]).toBeLessThanOrEqual(size.width);
        expect(shape.points[i + 1]).toBeGreaterThanOrEqual(0);
        expect(shape.points[i + 1]).toBeLessThanOrEqual(size.height);
      }
    }
    const words = drawing.groups.find((g) => g.id === "labels")!.shapes.flatMap((s) => (s.kind === "text" ? [s.text] : []));
    expect(words).toContain("gas pressure (Pa)");
    expect(words).toContain("quanta ⟨N⟩");
    expect(drawing.groups.some((g) => g.id === "smallest")).toBe(false);
  });
});
