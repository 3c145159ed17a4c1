import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { publishedEstimateRateModel } from "@/physics/estimators/schwarzschild-horizon-rate";
import { G, c, epsilon0, hbar, solarMass } from "@/physics/constants";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { scenario, segments, valueOf, withSeparation, withSource } from "./scenarios";

const M = 10 * solarMass.value;
const rs = (2 * G * M) / (c * c);

function hovering(b: number, mass = M, split: ScenarioDocument["separation"]["split"] = "symmetric"): ScenarioDocument {
  return withSeparation(
    scenario({ background: { kind: "schwarzschild", massKg: mass }, lab: { placement: "areal-radius", arealRadiusMetres: b }, protocol: segments({ holdSeconds: 10 }) }),
    { split },
  );
}

/** The published estimate, read from the comparison block beside the computed hold rate. */
const estimate = (doc: ScenarioDocument, channel: "electromagnetic" | "gravitational" = "electromagnetic") => {
  const comparison = computeScenario(doc)[channel].comparison;
  if (comparison === null) throw new Error(`no comparison block in the ${channel} channel`);
  return comparison;
};
const rate = (doc: ScenarioDocument, channel: "electromagnetic" | "gravitational" = "electromagnetic") => valueOf(estimate(doc, channel).estimateHoldRate);

describe("Schwarzschild horizon estimate (arXiv:2205.06279) and its near-horizon Rindler limit, reported beside the computed rate", () => {
  it("far away equals the published estimate in SI, G³M³q²d²/(ε0 ħ c⁶ b⁶), per lab proper second", () => {
    const b = 100 * rs;
    const doc = hovering(b);
    const qd = doc.source.chargeCoulombs * doc.separation.distanceMetres;
    const lapse = Math.sqrt(1 - rs / b);
    const expected = (G ** 3 * M ** 3 * qd * qd) / (epsilon0 * hbar * c ** 6 * b ** 6) / lapse;
    const comparison = estimate(doc);
    expect(valueOf(comparison.estimateHoldRate) / expected).toBeCloseTo(1, 9);
    expect(comparison.estimateRegime).toBe("far");
    expect(comparison.estimateHoldRate.sourceKey).toBe("schwarzschild-far-em");
    const alone = computeScenario(doc, { schwarzschildRateModel: publishedEstimateRateModel });
    expect(valueOf(alone.electromagnetic.holdRate) / expected).toBeCloseTo(1, 9);
    expect(alone.electromagnetic.regime).toBe("far");
    expect(alone.electromagnetic.comparison).toBeNull();
    expect(alone.flags.find((f) => f.code === "schwarzschild-regime")?.status).toBe("note");
  });

  it("scales as M³ q² d² / D⁶ far away (published estimate; common practice)", () => {
    const b = 1e3 * rs;
    const base = rate(hovering(b));
    // At fixed b/r_s the lapse is fixed: M → 2M, b → 2b gives 8/64.
    expect(rate(hovering(2 * b, 2 * M)) / base).toBeCloseTo(8 / 64, 9);
    expect(rate(withSource(hovering(b), { chargeCoulombs: 3 * hovering(b).source.chargeCoulombs })) / base).toBeCloseTo(9, 9);
    expect(rate(withSeparation(hovering(b), { distanceMetres: 2e-6 })) / base).toBeCloseTo(4, 9);
    const lapseRatio = Math.sqrt(1 - rs / b) / Math.sqrt(1 - rs / (2 * b));
    expect(rate(hovering(2 * b)) / base).toBeCloseTo(lapseRatio / 64, 9);
  });

  it("scales as M⁵ m² d⁴ / D¹⁰ for gravity far away (published estimate)", () => {
    const b = 1e3 * rs;
    const base = rate(hovering(b, M, "one-branch-stays"), "gravitational");
    expect(rate(hovering(2 * b, 2 * M, "one-branch-stays"), "gravitational") / base).toBeCloseTo(32 / 1024, 9);
    expect(rate(withSeparation(hovering(b, M, "one-branch-stays"), { distanceMetres: 2e-6 }), "gravitational") / base).toBeCloseTo(16, 9);
  });

  it("near the horizon equals the Rindler rate at the lab's local acceleration GM/(b²√(1 − r_s/b))", () => {
    const b = rs * (1 + 1e-4);
    const doc = hovering(b);
    const a = (G * M) / (b * b * Math.sqrt(1 - rs / b));
    const qd = doc.source.chargeCoulombs * doc.separation.distanceMetres;
    const comparison = estimate(doc);
    expect(valueOf(comparison.estimateHoldRate) / ((qd * qd * a ** 3) / (6 * Math.PI ** 2 * epsilon0 * hbar * c ** 6))).toBeCloseTo(1, 6);
    expect(comparison.estimateRegime).toBe("near-horizon");
  });

  it("between near and far interpolates in the logarithm and says so", () => {
    const comparison = estimate(hovering(3 * rs));
    expect(comparison.estimateRegime).toBe("interpolated");
    expect(comparison.estimateHoldRate.sourceKey).toBe("schwarzschild-interpolated-em");
    const alone = computeScenario(hovering(3 * rs), { schwarzschildRateModel: publishedEstimateRateModel });
    expect(alone.electromagnetic.regime).toBe("interpolated");
    expect(alone.electromagnetic.holdRate.sourceKey).toBe("schwarzschild-interpolated-em");
    expect(alone.flags.find((f) => f.code === "schwarzschild-regime")?.status).toBe("caution");
  });

  it("adds the ramps' quanta and the hold's quanta into the horizon (the ramps' count is no far-field count: tests/unit/physics/schwarzschild-ramps.test.ts)", () => {
    const doc = hovering(100 * rs);
    const result = computeScenario(doc);
    const em = result.electromagnetic;
    expect(valueOf(em.totalQuanta) / (valueOf(em.rampDrivenQuanta) + valueOf(em.horizonQuanta))).toBeCloseTo(1, 12);
    expect(em.horizonQuanta).toEqual(em.holdDrivenQuanta);
    expect(em.farFieldQuanta).toBeNull();
    expect(result.flags.find((f) => f.code === "schwarzschild-ramp-model")?.status).not.toBe("not-applicable");
  });

  it("reports counts beyond the range of a double by their log10 only, and says so", () => {
    const doc = hovering(rs * (1 + 1e-6));
    const huge = { ...doc, protocol: segments({ holdSeconds: 1e300 }), source: { ...doc.source, chargeCoulombs: 1 } };
    const result = computeScenario(huge);
    expect(result.electromagnetic.holdDrivenQuanta.value).toBeNull();
    expect(result.electromagnetic.holdDrivenQuanta.log10).toBeGreaterThan(308);
    expect(result.electromagnetic.decoherence.value).toBe(1);
    expect(result.flags.find((f) => f.code === "double-range")?.status).toBe("note");
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });
});
