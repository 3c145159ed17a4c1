import { describe, expect, it } from "vitest";
import { staggerTimeLabels, timeAxisTitleSide } from "@/canvas/kernels/lab-view/axis-ticks";

describe("labels under the Lab view's time axis", () => {
  it("keep to one row while they stay clear of each other", () => {
    const rows = staggerTimeLabels([
      { px: 100, widthPx: 30 },
      { px: 200, widthPx: 50 },
      { px: 500, widthPx: 40 },
    ]).map((l) => l.row);
    expect(rows).toEqual([0, 0, 0]);
  });

  it("drop a label to the second row only when it would touch its neighbour on the first", () => {
    const rows = staggerTimeLabels([
      { px: 100, widthPx: 40 },
      { px: 130, widthPx: 50 },
      { px: 170, widthPx: 40 },
      { px: 190, widthPx: 40 },
    ]).map((l) => l.row);
    expect(rows).toEqual([0, 1, 0, 1]);
  });

  it("put the axis title at the right end unless a second-row label is there and the left end is free", () => {
    const title = { widthPx: 80, leftEndPx: 70, rightEndPx: 600 };
    const clearRight = staggerTimeLabels([{ px: 100, widthPx: 40 }, { px: 120, widthPx: 40 }]);
    expect(timeAxisTitleSide(clearRight, title)).toBe("right");
    const crowdedRight = staggerTimeLabels([{ px: 560, widthPx: 40 }, { px: 585, widthPx: 40 }]);
    expect(timeAxisTitleSide(crowdedRight, title)).toBe("left");
  });
});
