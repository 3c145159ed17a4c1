import { describe, expect, it } from "vitest";
import { contourDecades, mapFigureDrawing, mapPlot, mapPointAt, optimumPath, type MapFigureData } from "@/canvas/export/map-figure";
import { FIGURE_PALETTES } from "@/canvas/theme";
import type { MapGrid } from "@/physics/maps";

const size = { width: 640, height: 420 };

/** A grid whose log10 is a plane: the column's index along x (so each whole decade lies on one column's centre). */
function planeGrid(columns: number, rows: number, f: (column: number, row: number) => number | null): MapGrid {
  return {
    quantity: "total-quanta",
    unit: "1",
    x: { parameter: "lab-distance", unit: "m", scale: "log", values: Array.from({ length: columns }, (_, i) => 10 ** (3 + i)) },
    y: { parameter: "recombination-time", unit: "s", scale: "log", values: Array.from({ length: rows }, (_, j) => 10 ** (-3 + j / 2)) },
    log10: Array.from({ length: rows }, (_, row) => Array.from({ length: columns }, (_, column) => f(column, row))),
    gaps: [],
  };
}

const data = (grid: MapGrid, now: MapFigureData["now"] = null): MapFigureData => ({ grid, xWords: "lab distance", yWords: "recombination time", quantityWords: "total ⟨N⟩", now });
const group = (drawing: ReturnType<typeof mapFigureDrawing>, id: string) => drawing.groups.find((g) => g.id === id)?.shapes ?? [];

describe("the map figure", () => {
  it("draws one cell per grid point and a contour line per decade, through the cells where the value is that decade", () => {
    const grid = planeGrid(6, 4, (column) => column - 5);
    const drawing = mapFigureDrawing(data(grid), size, FIGURE_PALETTES.light, true);
    expect(group(drawing, "cells")).toHaveLength(24);
    const plot = mapPlot(size);
    const cellWidth = (plot.right - plot.left) / 6;
    // Decades −4 … −1 lie inside (−5 and 0 sit on the grid's edge values); each line is vertical at its column's centre.
    expect(contourDecades({ low: -5, high: 0 })).toEqual([-5, -4, -3, -2, -1, 0]);
    const lines = group(drawing, "contours").filter((s): s is Extract<typeof s, { kind: "line" }> => s.kind === "line");
    for (const level of [-4, -3, -2, -1]) {
      const centre = plot.left + cellWidth * (level + 5 + 0.5);
      const near = lines.filter((l) => l.points.some((p, i) => i % 2 === 0 && Math.abs(p - centre) < 1e-6));
      expect(near.length, `level ${level}`).toBeGreaterThan(0);
    }
  });

  it("finds the grid point under a position, and nothing outside the plot", () => {
    const grid = planeGrid(6, 4, () => 0);
    const plot = mapPlot(size);
    const cell = { w: (plot.right - plot.left) / 6, h: (plot.bottom - plot.top) / 4 };
    expect(mapPointAt(grid, size, { x: plot.left + cell.w * 2.5, y: plot.bottom - cell.h * 0.5 })).toEqual({ column: 2, row: 0, x: 1e5, y: 1e-3 });
    expect(mapPointAt(grid, size, { x: plot.left + cell.w * 5.9, y: plot.top + 1 })).toMatchObject({ column: 5, row: 3 });
    expect(mapPointAt(grid, size, { x: plot.left - 2, y: plot.top + 5 })).toBeNull();
  });

  it("traces the optimum path: for each distance, the recombination time of the smallest value", () => {
    // Smallest at row = column % 4 in each column.
    const grid = planeGrid(5, 4, (column, row) => (row === column % 4 ? -10 : -5 + row));
    expect(optimumPath(grid)).toEqual(grid.x.values.map((x, column) => ({ x, y: grid.y.values[column % 4] })));
    const swapped: MapGrid = { ...grid, quantity: "decoherence-time", unit: "s" };
    // For a decoherence time the best is the largest: row 3 (−2) except where row 3 holds the −10.
    expect(optimumPath(swapped).map((p) => p.y)).toEqual([3, 3, 3, 2, 3].map((r) => grid.y.values[r]));
  });

  it("marks the scenario's point when it is inside the map, and leaves gaps in the ground's colour", () => {
    const grid = planeGrid(3, 3, (column, row) => (column === 1 && row === 1 ? null : -column));
    const drawing = mapFigureDrawing(data(grid, { x: 1e4, y: 10 ** -2.5 }), size, FIGURE_PALETTES.light, true);
    expect(group(drawing, "now")[0]).toMatchObject({ kind: "dot" });
    expect(group(drawing, "cells")[4]).toMatchObject({ fill: FIGURE_PALETTES.light.contextPaper });
    expect(group(mapFigureDrawing(data(grid, { x: 1, y: 1 }), size, FIGURE_PALETTES.light, true), "now")).toEqual([]);
    const texts = drawing.groups.flatMap((g) => g.shapes).filter((s) => s.kind === "text").map((s) => (s as { text: string }).text);
    expect(texts).toEqual(expect.arrayContaining(["lab distance (km)", "recombination time (ms)", "total ⟨N⟩"]));
  });
});

describe("the map's words", () => {
  it("put the scenario and both axes with ranges, points and spacing in the caption", async () => {
    const { mapCaption } = await import("@/components/export/map-export");
    const { defaultScenarioDocument } = await import("@/physics/scenario/schema");
    const caption = mapCaption(defaultScenarioDocument(), {
      x: { parameter: "recombination-time", from: 1e-3, to: 1, points: 50, scale: "log" },
      y: { parameter: "hold-time", from: 0.01, to: 0.1, points: 20, scale: "linear" },
      quantity: "decoherence",
    });
    expect(caption).toMatch(/^Minkowski/);
    expect(caption).toContain("map of decoherence 𝒟");
    expect(caption).toMatch(/x: recombination time 1(\.0+)? ms to 1(\.0+)? s, 50 points, log/);
    expect(caption).toMatch(/y: hold time 10(\.0+)? ms to 100(\.0+)? ms, 20 points, linear/);
  });
});
