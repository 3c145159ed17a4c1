import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { G, c, epsilon0, hbar } from "@/physics/constants";
import { scenario, segments, valueOf, withSeparation } from "./scenarios";

const rindler = (a: number, holdSeconds = 0.1) => scenario({ background: { kind: "rindler", accelerationMetresPerSecondSquared: a }, lab: { placement: "uniformly-accelerated" }, protocol: segments({ holdSeconds }) });

describe("horizon counts for thermal fields (Rindler, de Sitter)", () => {
  it("holds at the rate S(0)|Δp|²/ħ² = q²d²a³/(6π² ε0 ħ c⁶) in the Rindler wedge (Boyer 1980; Takagi 1986)", () => {
    const a = 1e15;
    const doc = rindler(a);
    const qd = doc.source.chargeCoulombs * doc.separation.distanceMetres;
    const expected = (qd * qd * a ** 3) / (6 * Math.PI ** 2 * epsilon0 * hbar * c ** 6);
    const result = computeScenario(doc);
    expect(valueOf(result.electromagnetic.holdRate) / expected).toBeCloseTo(1, 10);
    expect(valueOf(result.electromagnetic.decoherenceTime) * expected).toBeCloseTo(1, 10);
  });

  it("grows linearly with the hold time, while the ramp-driven part stays put (common practice; arXiv:2301.00026)", () => {
    const a = 1e15;
    const short = computeScenario(rindler(a, 1));
    const long = computeScenario(rindler(a, 11));
    const rate = valueOf(short.electromagnetic.holdRate);
    expect((valueOf(long.electromagnetic.holdDrivenQuanta) - valueOf(short.electromagnetic.holdDrivenQuanta)) / (10 * rate)).toBeCloseTo(1, 9);
    expect(valueOf(long.electromagnetic.rampDrivenQuanta) / valueOf(short.electromagnetic.rampDrivenQuanta)).toBeCloseTo(1, 6);
  });

  it("counts each quantum once: one spectral total, split into ramp- and hold-driven parts, no separate far-field count", () => {
    const result = computeScenario(rindler(1e15));
    const em = result.electromagnetic;
    expect(em.farFieldQuanta).toBeNull();
    expect(em.horizonQuanta).toBeNull();
    expect(valueOf(em.totalQuanta) / (valueOf(em.rampDrivenQuanta) + valueOf(em.holdDrivenQuanta))).toBeCloseTo(1, 12);
  });

  it("reduces to the flat-spacetime count for fast ramps at small acceleration", () => {
    const flat = computeScenario(scenario({ protocol: segments() }));
    const accelerated = computeScenario(rindler(9.81));
    expect(valueOf(accelerated.electromagnetic.rampDrivenQuanta) / valueOf(flat.electromagnetic.totalQuanta)).toBeCloseTo(1, 9);
  });

  it("at the de Sitter centre holds at the Rindler rate with a → cH (Gibbons–Hawking temperature, conformal invariance)", () => {
    const H = 1e3;
    const doc = scenario({ background: { kind: "de-sitter", hubbleRatePerSecond: H }, lab: { placement: "areal-radius", arealRadiusMetres: 0 } });
    const qd = doc.source.chargeCoulombs * doc.separation.distanceMetres;
    const expected = (qd * qd * H ** 3) / (6 * Math.PI ** 2 * epsilon0 * hbar * c ** 3);
    expect(valueOf(computeScenario(doc).electromagnetic.holdRate) / expected).toBeCloseTo(1, 9);
  });

  it("off the de Sitter centre uses √(a² + c²H²) (Narnhofer–Peter–Thirring 1996; Deser–Levin, CQG 14, L163 (1997))", () => {
    const H = 1e3;
    const r = 0.6 * (c / H);
    const doc = scenario({ background: { kind: "de-sitter", hubbleRatePerSecond: H }, lab: { placement: "areal-radius", arealRadiusMetres: r } });
    // Static observer in the static patch: lapse √(1 − H²r²/c²), acceleration a = H²r/lapse.
    const lapse = Math.sqrt(1 - (H * r / c) ** 2);
    const a = (H * H * r) / lapse;
    const effective = Math.sqrt(a * a + c * c * H * H);
    const qd = doc.source.chargeCoulombs * doc.separation.distanceMetres;
    const expected = (qd * qd * effective ** 3) / (6 * Math.PI ** 2 * epsilon0 * hbar * c ** 6);
    const result = computeScenario(doc);
    expect(valueOf(result.electromagnetic.holdRate) / expected).toBeCloseTo(1, 9);
    // exact off the centre too (issue 17, item 4): no assumed-form note for electromagnetism
    expect(result.flags.find((f) => f.code === "thermal-form-assumed")?.status).toBe("not-applicable");
  });

  it("scales the gravitational hold rate as a⁵ (arXiv:2301.00026), with the derived spin-2 coefficient (no assumed-form note in Rindler)", () => {
    // The coefficient as coded (closed form of the assumed thermal spin-2 form): Γ = (8G/(15π ħ c⁵))(a/c)⁵ (m d²)².
    const a = 1e15;
    const doc = withSeparation(rindler(a), { split: "one-branch-stays" });
    const md2 = doc.source.massKg * doc.separation.distanceMetres ** 2;
    const result = computeScenario(doc);
    const rate = valueOf(result.gravitational.holdRate);
    expect(rate / ((8 * G) / (15 * Math.PI * hbar * c ** 5) * (a / c) ** 5 * md2 * md2)).toBeCloseTo(1, 9);
    const doubled = valueOf(computeScenario(withSeparation(rindler(2 * a), { split: "one-branch-stays" })).gravitational.holdRate);
    expect(doubled / rate).toBeCloseTo(32, 8);
    expect(result.flags.find((f) => f.code === "thermal-form-assumed")?.status).toBe("not-applicable");
  });

  it("flags a separation that is not small against the distance to the horizon", () => {
    const a = 0.2 * c * c; // horizon at 5 m
    const doc = withSeparation(rindler(a), { distanceMetres: 1 });
    expect(computeScenario(doc).flags.find((f) => f.code === "separation-vs-horizon")?.status).toBe("invalid");
  });
});
