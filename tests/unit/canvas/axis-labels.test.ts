import { describe, expect, it } from "vitest";
import { boxesOverlap } from "@/canvas/kernels/diagram/label-layout";
import { TIME_LABEL_ROWS_PX, timeAxisLabels } from "@/canvas/kernels/offsets/axis-ticks";

const layout = (ticks: { px: number; text: string }[], width = 640) =>
  timeAxisLabels({
    ticks,
    title: "lab proper time",
    plot: { left: 72, width: width - 92, bottom: 200 },
    stage: { width, height: 246 },
    fontSize: 11,
    monoEm: 0.61,
    sansEm: 0.51,
  });
const rowOf = (label: { box: { top: number; height: number } }) => (label.box.top + label.box.height / 2 < 200 + (TIME_LABEL_ROWS_PX[0] + TIME_LABEL_ROWS_PX[1]) / 2 + 6.6 ? 0 : 1);

describe("labels under the Offsets panel's time axis (the Diagram's label layout)", () => {
  it("keep to one row while they stay clear of each other, the title at the right end of the second", () => {
    const placed = layout([{ px: 100, text: "0 s" }, { px: 200, text: "10 ms" }, { px: 500, text: "1.01 s" }]);
    expect(placed.filter((l) => l.id.startsWith("time-") && l.id !== "time-title").map(rowOf)).toEqual([0, 0, 0]);
    const title = placed.find((l) => l.id === "time-title")!;
    expect(title.align).toBe("right");
  });

  it("drop a label to the second row only when it would touch its neighbour on the first, and never overlap", () => {
    const placed = layout([{ px: 100, text: "0 s" }, { px: 122, text: "10.0 ms" }, { px: 160, text: "20.0 ms" }, { px: 178, text: "30.0 ms" }]);
    const instants = placed.filter((l) => l.id !== "time-title");
    expect(instants.map(rowOf)).toEqual([0, 1, 0, 1]);
    for (let i = 0; i < placed.length; i++) for (let j = i + 1; j < placed.length; j++) expect(boxesOverlap(placed[i].box, placed[j].box)).toBe(false);
  });

  it("move the axis title to the left end when second-row labels crowd the right, and drop it when both ends are taken", () => {
    const crowdedRight = layout([{ px: 520, text: "1.000 s" }, { px: 545, text: "1.010 s" }, { px: 600, text: "2.000 s" }, { px: 615, text: "2.010 s" }]);
    expect(crowdedRight.find((l) => l.id === "time-title")?.align).toBe("left");
    const crowdedBoth = layout([
      { px: 80, text: "0.000 s" }, { px: 100, text: "0.001 s" }, { px: 120, text: "0.002 s" }, { px: 140, text: "0.003 s" },
      { px: 520, text: "1.000 s" }, { px: 545, text: "1.010 s" }, { px: 600, text: "2.000 s" }, { px: 615, text: "2.010 s" },
    ]);
    expect(crowdedBoth.find((l) => l.id === "time-title")).toBeUndefined();
  });
});
