import { describe, expect, it } from "vitest";
import { G, c, solarMass } from "@/physics/constants";
import { publishedEstimateRateModel } from "@/physics/estimators/schwarzschild-horizon-rate";
import { ScenarioInputError } from "@/physics/scenario/input-error";
import { logSpaced, optimiseRecombinationTime, sweepScenario } from "@/physics/sweeps";
import { scenario, segments, valueOf } from "./scenarios";

describe("sweeps and the recombination optimum", () => {
  it("spaces points evenly in the logarithm and reports progress after each", () => {
    expect(logSpaced(1, 1000, 4).map((x) => Math.round(x))).toEqual([1, 10, 100, 1000]);
    const progress: [number, number][] = [];
    const sweep = sweepScenario(scenario(), { parameter: "recombination-time", fromValue: 1e-3, toValue: 1e-1, points: 5 }, { onProgress: (done, total) => progress.push([done, total]) });
    expect(progress).toEqual([[1, 5], [2, 5], [3, 5], [4, 5], [5, 5]]);
    expect(sweep.unit).toBe("s");
    expect(sweep.points.map((p) => p.x)).toEqual(logSpaced(1e-3, 1e-1, 5));
  });

  it("shows the recombination ramp's share falling as 1/τ² in flat spacetime (common practice)", () => {
    const doc = scenario({ protocol: segments({ separationSeconds: 1, holdSeconds: 100 }) });
    const [fast, slow] = sweepScenario(doc, { parameter: "recombination-time", fromValue: 1e-3, toValue: 2e-3, points: 2 }).points;
    // The 1 s separation ramp adds a constant 1e-6 of the fast ramp's count: negligible at this precision.
    expect(valueOf(fast.totalQuanta) / valueOf(slow.totalQuanta)).toBeCloseTo(4, 2);
  });

  it("shows the hold-driven count growing linearly with the hold in the Rindler wedge", () => {
    const doc = scenario({ background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e17 }, lab: { placement: "uniformly-accelerated" }, protocol: segments() });
    const points = sweepScenario(doc, { parameter: "hold-time", fromValue: 1e3, toValue: 1e5, points: 3 }).points;
    const increments = [valueOf(points[1].totalQuanta) - valueOf(points[0].totalQuanta), valueOf(points[2].totalQuanta) - valueOf(points[1].totalQuanta)];
    expect(increments[1] / increments[0]).toBeCloseTo((1e5 - 1e4) / (1e4 - 1e3), 6);
  });

  it("sweeps the lab's distance from a black hole as b⁻⁶ far away: the published estimate (arXiv:2205.06279) and the exact rate", () => {
    const M = 10 * solarMass.value;
    const rs = (2 * G * M) / (c * c);
    const doc = scenario({ background: { kind: "schwarzschild", massKg: M }, lab: { placement: "areal-radius", arealRadiusMetres: 1e3 * rs }, protocol: segments({ holdSeconds: 1e22 }) });
    const request = { parameter: "lab-distance", fromValue: 1e3 * rs, toValue: 2e3 * rs, points: 2 } as const;
    const [near, far] = sweepScenario(doc, request, { compute: { schwarzschildRateModel: publishedEstimateRateModel } }).points;
    expect(valueOf(near.totalQuanta) / valueOf(far.totalQuanta)).toBeCloseTo(64 * Math.sqrt((1 - 1 / 2e3) / (1 - 1 / 1e3)), 4);
    // The default document separates tangentially, where the exact rate is the Rindler rate q²d²a³/(6π²ε0ħc⁶) at the
    // lab's acceleration a = GM/(b²√(1 − r_s/b)) (Boyer, PRD 21, 2137 (1980)): b⁻⁶ times the cube of the lapse ratio.
    const [nearExact, farExact] = sweepScenario(doc, request).points;
    expect(valueOf(nearExact.totalQuanta) / valueOf(farExact.totalQuanta)).toBeCloseTo(64 * ((1 - 1 / 2e3) / (1 - 1 / 1e3)) ** 1.5, 4);
  });

  it("refuses what cannot be swept", () => {
    expect(() => sweepScenario(scenario(), { parameter: "lab-distance", fromValue: 1, toValue: 2, points: 2 })).toThrow(ScenarioInputError);
    expect(() => sweepScenario(scenario({ protocol: { kind: "formula", expression: "sin(pi*t)^2", durationSeconds: 1 } }), { parameter: "hold-time", fromValue: 1, toValue: 2, points: 2 })).toThrow(/segments/);
    expect(() => sweepScenario(scenario(), { parameter: "hold-time", fromValue: -1, toValue: 2, points: 2 })).toThrow(ScenarioInputError);
  });

  it("finds the best split of a fixed ramp budget between separation and recombination by golden-section search", () => {
    // Closed form, derived: with the hold long, N ≈ A/τ_s² + A/τ_r² for equal shapes, minimised at τ_r = τ_s = budget/2.
    const doc = scenario({ protocol: segments({ holdSeconds: 10 }) });
    const optimum = optimiseRecombinationTime(doc, { totalDurationSeconds: 10.1, tradeAgainst: "separation" });
    expect(optimum.recombinationSeconds / 0.05).toBeCloseTo(1, 2);
    expect(optimum.onBoundary).toBe(false);
    expect(optimum.method).toMatch(/golden-section/);
  });

  it("reports the boundary when trading against the hold, where slower recombination always helps", () => {
    const doc = scenario({ background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e17 }, lab: { placement: "uniformly-accelerated" }, protocol: segments({ separationSeconds: 0.01 }) });
    const optimum = optimiseRecombinationTime(doc, { totalDurationSeconds: 1, tradeAgainst: "hold" });
    expect(optimum.onBoundary).toBe(true);
    expect(optimum.tradedSeconds).toBeLessThan(1e-3);
  });
});
