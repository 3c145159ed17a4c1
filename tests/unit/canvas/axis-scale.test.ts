import { describe, expect, it } from "vitest";
import { axisTickLabels, axisTitle, axisUnit, linearTicks, logTicks, tickLabel } from "@/canvas/kernels/diagram/axis-scale";

const isOneTwoFive = (step: number) => {
  const mantissa = Number((step / 10 ** Math.floor(Math.log10(step))).toPrecision(6));
  return [1, 2, 5].includes(mantissa);
};

describe("ticks on a linear axis", () => {
  it("fall on multiples of one 1–2–5 step (common practice for readable axes), never on odd values", () => {
    for (const [from, to] of [[0, 3.29e-3], [827e-6, 3.29e-3], [788e3, 1.39e6], [-2.5, 7.1], [0.1, 0.13]]) {
      const { major } = linearTicks(from, to, 5);
      expect(major.length).toBeGreaterThanOrEqual(2);
      const step = Number((major[1] - major[0]).toPrecision(9));
      expect(isOneTwoFive(step), `${from}..${to}: step ${step}`).toBe(true);
      for (const v of major) {
        expect(v).toBeGreaterThanOrEqual(from - 1e-12);
        expect(v).toBeLessThanOrEqual(to * (1 + 1e-12));
        expect(Math.abs(v / step - Math.round(v / step))).toBeLessThan(1e-6);
      }
    }
  });
});

describe("ticks on a log axis", () => {
  it("label the decades and put minor ticks at 2…9 × 10ⁿ", () => {
    const { major, minor } = logTicks(3e-6, 2e-1);
    expect(major).toEqual([1e-5, 1e-4, 1e-3, 1e-2, 1e-1]);
    expect(minor).toContain(3e-6);
    expect(minor).toContain(2e-1);
    expect(minor).toContain(9e-3);
    expect(minor).not.toContain(1e-3);
    // 3…9 × 10⁻⁶, then 2…9 × 10ⁿ for n = −5…−2, then 2 × 10⁻¹.
    expect(minor.length).toBe(7 + 8 * 4 + 1);
  });

  it("also label 2 × and 5 × 10ⁿ on an axis shorter than two decades", () => {
    expect(logTicks(827e-6, 3.29e-3).major).toEqual([1e-3, 2e-3]);
    expect(logTicks(1.5, 60).major).toEqual([2, 5, 10, 20, 50]);
  });

  it("fall back to 1–2–5 linear ticks inside one step", () => {
    const { major } = logTicks(1.1, 1.4);
    expect(major.length).toBeGreaterThanOrEqual(2);
    expect(major.every((v) => v >= 1.1 && v <= 1.4)).toBe(true);
  });
});

describe("one unit per axis", () => {
  it("is chosen for the largest value, so 788 km and 1390 km read in km on one axis", () => {
    const unit = axisUnit(1.39e6, "length");
    expect(unit.symbol).toBe("km");
    expect(linearTicks(788e3, 1.39e6).major.map((v) => tickLabel(v, unit))).toEqual(["800", "1000", "1200"]);
    expect(axisTitle("lab distance", unit)).toBe("lab distance (km)");
  });

  it("reads times in the prefix that puts the largest between 1 and 1000", () => {
    expect(axisUnit(3.29e-3, "time").symbol).toBe("ms");
    expect(axisUnit(0.2, "time").symbol).toBe("ms");
    expect(axisUnit(20, "time").symbol).toBe("s");
    expect(axisUnit(5e-13, "time").symbol).toBe("ps");
    expect(axisUnit(5e-3, "number").symbol).toBe("");
  });

  it("writes every label of a many-decade log axis as a power of ten, and short axes in plain digits", () => {
    const unit = axisUnit(0.1, "time");
    expect(axisTickLabels(logTicks(1e-6, 1e-1).major, unit)).toEqual(["10⁻³", "10⁻²", "10⁻¹", "10⁰", "10¹", "10²"]);
    expect(axisTickLabels(logTicks(827e-6, 3.29e-3).major, axisUnit(3.29e-3, "time"))).toEqual(["1", "2"]);
    expect(axisTickLabels([1e-30, 1e-20, 1e-10], axisUnit(1, "number"))).toEqual(["10⁻³⁰", "10⁻²⁰", "10⁻¹⁰"]);
    expect(tickLabel(2.5e7, axisUnit(1, "number"))).toBe("2.5 × 10⁷");
  });
});
