/** The exported sweep chart takes its ticks, unit and tick labels from the shared axis kernel, as the chart on screen. */
import { describe, expect, it } from "vitest";
import { sweepChartDrawing } from "@/canvas/export/sweep-figure";
import { axisTickLabels, logTicks } from "@/canvas/kernels/diagram/axis-scale";
import { FIGURE_PALETTES } from "@/canvas/theme";

describe("the exported sweep chart's axes", () => {
  // A made-up sweep over 20 µs … 50 ms of recombination time (decoherence falling as 1/t²: any positive curve will do).
  const points = [2e-5, 1e-4, 1e-3, 1e-2, 5e-2].map((x) => ({ x, decoherence: 1e-12 / (x * x) }));
  const drawing = sweepChartDrawing({ points, parameterWords: "recombination time", dimension: "time", now: 1e-3 }, { width: 640, height: 400 }, FIGURE_PALETTES.light, true);
  const texts = drawing.groups.find((g) => g.id === "labels")!.shapes.flatMap((s) => (s.kind === "text" ? [s.text] : []));

  it("labels the time axis at the kernel's ticks, all in one unit named once in the title", () => {
    const major = logTicks(2e-5, 5e-2).major;
    expect(major).toEqual([1e-4, 1e-3, 1e-2]);
    const expected = axisTickLabels(major, { symbol: "ms", siPerUnit: 1e-3 });
    expect(expected).toEqual(["0.1", "1", "10"]);
    for (const label of expected) expect(texts).toContain(label);
    expect(texts).toContain("recombination time (ms)");
    expect(texts.filter((t) => /\b(s|µs|ms)\b/.test(t))).toEqual(["recombination time (ms)"]);
  });

  it("ticks the decoherence axis at decades with minor ticks between", () => {
    const axes = drawing.groups.find((g) => g.id === "axes")!.shapes;
    // The frame, then the x axis' major and minor ticks, then the y axis': more minor than major ticks in all.
    expect(axes.length).toBeGreaterThan(10);
    expect(texts.some((t) => /^10[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+$/.test(t))).toBe(true);
  });
});
