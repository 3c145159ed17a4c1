/**
 * The written assumptions of the hold rates are computed flags (issue 17, item 6): the Schwarzschild rates need the
 * time spent apart long against GM/c³ and b/c (Killing time; sources.ts "schwarzschild-exact-em" and
 * "schwarzschild-exact-gw-far-zone"), the thermal rates long against the thermal time c/a (Rindler) and
 * c/√(a² + c²H²) (de Sitter; Narnhofer, Peter & Thirring 1996 for the local temperature).
 */
import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { G, c } from "@/physics/constants";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { scenario, segments } from "./scenarios";

const solarMassKg = 1.3271244e20 / G; // IAU 2015 nominal GM☉
const flag = (doc: ScenarioDocument) => computeScenario(doc).flags.find((f) => f.code === "hold-timescale")!;

describe("the hold-timescale flag", () => {
  const aroundHole = (protocol: ScenarioDocument["protocol"], bOverM = 6) =>
    scenario({ background: { kind: "schwarzschild", massKg: solarMassKg }, lab: { placement: "areal-radius", arealRadiusMetres: (bOverM * G * solarMassKg) / c ** 2 }, protocol });

  it("is invalid for 1 µs ramps with no hold at a solar-mass hole (GM/c³ ≈ 4.9 µs, b/c ≈ 30 µs at b = 6 GM/c²)", () => {
    const raised = flag(aroundHole(segments({ separationSeconds: 1e-6, recombinationSeconds: 1e-6, holdSeconds: 0, shape: "cosine" })));
    expect(raised.status).toBe("invalid");
    // Time apart: ∫σ² over two cosine ramps of 1 µs is 2 × 3/8 µs (∫₀¹ ((1 − cos πu)/2)² du = 3/8); response: the
    // lapse √(1 − 1/3) times b/c = 6GM/c³.
    const expected = (Math.sqrt(2 / 3) * (6 * G * solarMassKg) / c ** 3) / (0.75e-6);
    expect(raised.measure! / expected).toBeCloseTo(1, 6);
  });

  it("is ok for a one-second hold at the same hole", () => {
    expect(flag(aroundHole(segments({ holdSeconds: 1 }))).status).toBe("ok");
  });

  it("compares the time apart with c/a in the Rindler wedge, and stops at a caution (the spectral count stays exact)", () => {
    const a = 3e8 / 1e-6; // c/a = 1 µs
    const doc = (holdSeconds: number) => scenario({ background: { kind: "rindler", accelerationMetresPerSecondSquared: a }, lab: { placement: "uniformly-accelerated" }, protocol: segments({ separationSeconds: 1e-6, recombinationSeconds: 1e-6, holdSeconds }) });
    const short = flag(doc(0));
    expect(short.status).toBe("caution");
    expect(short.message).toMatch(/total count is exact/);
    expect(flag(doc(1e-3)).status).toBe("ok");
    expect(flag(doc(1e-3)).measure! * (1e-3 + 1e-6) / (c / a)).toBeCloseTo(1, 2);
  });

  it("uses c/√(a² + c²H²) off the de Sitter centre", () => {
    const H = 1e3;
    const r = (0.6 * c) / H;
    const doc = scenario({ background: { kind: "de-sitter", hubbleRatePerSecond: H }, lab: { placement: "areal-radius", arealRadiusMetres: r }, protocol: segments({ holdSeconds: 0.1 }) });
    const result = computeScenario(doc);
    const a = result.background.labProperAcceleration.value!;
    const apart = 0.1 + 2 * 0.01 * 0.5; // minimum-jerk ramps: ∫σ² over a ramp pair is close to one ramp; checked loosely below
    const raised = result.flags.find((f) => f.code === "hold-timescale")!;
    expect(raised.measure! * apart / (c / Math.sqrt(a * a + c * c * H * H))).toBeCloseTo(1, 1);
    // a static lab at r in de Sitter: a = H²r/√(1 − H²r²) (from the static metric), so a² + c²H² = c²H²/(1 − H²r²).
    expect(Math.sqrt(a * a + c * c * H * H) / ((c * H) / Math.sqrt(1 - 0.36))).toBeCloseTo(1, 9);
  });

  it("is not applicable in flat spacetime", () => {
    expect(flag(scenario()).status).toBe("not-applicable");
  });
});
