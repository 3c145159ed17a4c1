import { describe, expect, it } from "vitest";
import { compileProfileFormula, fractionAt, sampleBranchPaths, separationHistory } from "@/physics/protocols";
import { ScenarioInputError } from "@/physics/scenario/input-error";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { segments } from "./scenarios";

const separation = { axis: "tangential", split: "symmetric", distanceMetres: 1e-6 } as const;
const formula = (expression: string, durationSeconds = 1): Pick<ScenarioDocument, "protocol" | "separation"> => ({
  separation,
  protocol: { kind: "formula", expression, durationSeconds },
});

describe("protocol → branch paths", () => {
  it("puts symmetric branches at ±d/2 and a one-branch-stays split at d and 0", () => {
    const history = separationHistory({ separation, protocol: segments({ holdSeconds: 1 }) });
    const mid = sampleBranchPaths(history, "symmetric", 3)[1];
    expect(mid.branchAMetres).toBeCloseTo(0.5e-6, 15);
    expect(mid.branchBMetres).toBeCloseTo(-0.5e-6, 15);
    const stays = sampleBranchPaths(history, "one-branch-stays", 3)[1];
    expect([stays.branchAMetres, stays.branchBMetres]).toEqual([1e-6, 0]);
  });

  it("runs each ramp shape from 0 to 1 and back (minimum-jerk: Flash & Hogan, J. Neurosci. 5, 1688 (1985))", () => {
    for (const shape of ["cubic", "cosine", "minimum-jerk", "linear"] as const) {
      const history = separationHistory({ separation, protocol: segments({ shape, separationSeconds: 1, holdSeconds: 2, recombinationSeconds: 3 }) });
      expect(fractionAt(history, 0)).toBeCloseTo(0, 14);
      expect(fractionAt(history, 0.5)).toBeCloseTo(0.5, 14); // every shape is point-symmetric about its middle
      expect(fractionAt(history, 2)).toBe(1);
      expect(fractionAt(history, 6)).toBeCloseTo(0, 14);
    }
  });

  it("detects the kinks of linear ramps and none for smooth ones", () => {
    const linear = separationHistory({ separation, protocol: segments({ shape: "linear", separationSeconds: 1, holdSeconds: 2, recombinationSeconds: 1 }) });
    expect(linear.kinks.map((k) => k.timeSeconds)).toEqual([0, 1, 3, 4]);
    expect(separationHistory({ separation, protocol: segments({ shape: "minimum-jerk" }) }).kinks).toEqual([]);
  });

  it("finds kinks and jumps in formula profiles, and none in smooth ones", () => {
    expect(separationHistory(formula("sin(pi * t)^2")).kinks).toEqual([]);
    const triangle = separationHistory(formula("t < 0.5 ? 2 * t : 2 - 2 * t")).kinks;
    expect(triangle.map((k) => k.kind)).toEqual(["kink", "kink", "kink"]);
    expect(triangle.map((k) => k.timeSeconds)).toEqual([expect.closeTo(0, 3), expect.closeTo(0.5, 3), expect.closeTo(1, 3)]);
    const step = separationHistory(formula("t < 0.5 ? 0 : sin(pi * t)^2")).kinks;
    expect(step).toEqual([{ kind: "jump", timeSeconds: expect.closeTo(0.5, 3) }]);
    expect(separationHistory(formula("sin(pi * t / 2)^2")).kinks.map((k) => k.kind)).toContain("jump");
  });

  it("evaluates good formulas with mathjs functions, and refuses escapes from the restricted scope", () => {
    expect(compileProfileFormula("t < 0.5 ? sin(pi*t)^2 : exp(-t) * e").fractionAt(0.25)).toBeCloseTo(0.5, 14);
    for (const malicious of ['import({"a": 1}, {override: true})', 'evaluate("1 + 1")', 'parse("t")', "createUnit('x')", "simplify('t')", "derivative('t', 't')", "f(x) = x", "a = 1", "[1, 2]", "{a: 1}", "t.constructor", '"text"', "2 cm", "x + 1", "t to inch"]) {
      expect(() => compileProfileFormula(malicious), malicious).toThrow(ScenarioInputError);
    }
    expect(() => compileProfileFormula("(".repeat(5000) + "t" + ")".repeat(5000))).toThrow(/nest/);
    expect(() => compileProfileFormula(Array.from({ length: 500 }, () => "t").join(" + "))).toThrow(/at most/);
    expect(() => compileProfileFormula("sqrt(t - 2)").fractionAt(1)).toThrow(/no finite real number/);
  });

  it("interpolates sampled profiles linearly (kinks at the samples) or by a clamped cubic spline (C², none)", () => {
    const samples = [0, 0.25, 0.5, 0.75, 1].map((t) => ({ timeSeconds: 10 + t, separationMetres: 2e-6 * Math.sin(Math.PI * t) ** 2 }));
    const linear = separationHistory({ separation, protocol: { kind: "sampled", samples, interpolation: "linear" } });
    expect(linear.peakSeparationMetres).toBeCloseTo(2e-6, 20);
    expect(linear.windows[0].fraction(0.125 / 1)).toBeCloseTo(0.25, 12); // halfway between σ(0) = 0 and σ(0.25) = 0.5
    expect(linear.kinks.map((k) => k.timeSeconds)).toEqual([0, 0.5, 1]); // the slope is 2, 2, −2, −2 between samples
    expect(linear.interpolation).toBe("linear");

    const dense = Array.from({ length: 41 }, (_, i) => ({ timeSeconds: i / 40, separationMetres: Math.sin((Math.PI * i) / 40) ** 2 }));
    const spline = separationHistory({ separation, protocol: { kind: "sampled", samples: dense, interpolation: "cubic-spline" } });
    expect(spline.kinks).toEqual([]);
    for (const t of [0.0123, 0.31, 0.5, 0.77]) expect(spline.windows[0].fraction(t)).toBeCloseTo(Math.sin(Math.PI * t) ** 2, 5);
    expect(spline.windows[0].rate!(0.31)).toBeCloseTo(Math.PI * Math.sin(2 * Math.PI * 0.31), 3);
    expect(spline.windows[0].rate!(0)).toBeCloseTo(0, 12);
  });

  it("refuses sample times that do not increase, with the path of the bad sample", () => {
    const samples = [{ timeSeconds: 0, separationMetres: 0 }, { timeSeconds: 0, separationMetres: 1e-6 }];
    expect(() => separationHistory({ separation, protocol: { kind: "sampled", samples, interpolation: "linear" } })).toThrow(
      expect.objectContaining({ path: "protocol.samples.1.timeSeconds" }),
    );
  });
});
