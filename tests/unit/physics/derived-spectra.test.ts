/**
 * Issue 17, items 4 and 5: what the Methods page now says is derived, checked.
 * - de Sitter off the centre is exact: the hold rate is q²d²H³/(6π²ε0ħc³(1 − H²r²/c²)^{3/2}) (conformal invariance of
 *   Maxwell theory; the static lab is a uniformly accelerated line of the conformally flat slicing; Narnhofer, Peter &
 *   Thirring, Int. J. Mod. Phys. B 10, 1507 (1996); Deser & Levin, CQG 14, L163 (1997)), here against the closed form.
 * - The Rindler graviton spectrum is the Fourier transform of the csch⁶ correlator of a spin-2 field strength: checked
 *   numerically (contour shifted by −iπ/α as for the electric field, Takagi 1986 §5).
 * - Smooth ramps of duration T: the flat-space count falls as T⁻² for photons (Larmor: ∫ω³|Δp̃|² with Δp̃ ∝ T) and as
 *   T⁻⁴ for gravitons (quadrupole formula: ∫ω⁵|ΔĨ|² with ΔĨ ∝ T) — dimensional analysis of the two published formulas.
 */
import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { c, epsilon0, hbar } from "@/physics/constants";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { scenario, segments, valueOf, withSeparation, withSource } from "./scenarios";

describe("de Sitter off the centre", () => {
  it("has the closed-form hold rate q²d²H³/(6π²ε0ħc³(1 − H²r²/c²)^{3/2}) at every static radius", () => {
    const H = 2.5e3;
    for (const x of [0.05, 0.3, 0.7, 0.95, 0.999]) {
      const doc = scenario({ background: { kind: "de-sitter", hubbleRatePerSecond: H }, lab: { placement: "areal-radius", arealRadiusMetres: (x * c) / H } });
      const em = computeScenario(doc).electromagnetic;
      const qd = doc.source.chargeCoulombs * doc.separation.distanceMetres;
      const closed = (qd * qd * H ** 3) / (6 * Math.PI ** 2 * epsilon0 * hbar * c ** 3 * (1 - x * x) ** 1.5);
      expect(valueOf(em.holdRate) / closed, `H r/c = ${x}`).toBeCloseTo(1, 9);
      expect(em.regime).toBe("thermal-spectrum");
    }
  });

  it("no longer calls the off-centre electromagnetic spectrum an estimate", () => {
    const doc = withSource(scenario({ background: { kind: "de-sitter", hubbleRatePerSecond: 1e3 }, lab: { placement: "areal-radius", arealRadiusMetres: 0.5 * c / 1e3 } }), { massKg: 0 });
    const flag = computeScenario(doc).flags.find((f) => f.code === "thermal-form-assumed")!;
    expect(flag.status).toBe("not-applicable");
    expect(flag.message).not.toMatch(/estimate/);
  });

  it("says what is assumed about the graviton state when gravity is active", () => {
    const doc = withSeparation(scenario({ background: { kind: "de-sitter", hubbleRatePerSecond: 1e3 }, lab: { placement: "areal-radius", arealRadiusMetres: 0 } }), { split: "one-branch-stays" });
    expect(computeScenario(doc).flags.find((f) => f.code === "thermal-form-assumed")).toMatchObject({ status: "note", message: expect.stringMatching(/Bunch–Davies graviton state/) });
  });
});

describe("the Rindler graviton spectrum", () => {
  it("is the Fourier transform of the csch⁶ correlator: ∝ ω(ω² + α²)(ω² + 4α²)/(1 − e^{−2πω/α})", () => {
    // ∫ e^{iωs} sinh⁻⁶(α(s − iε)/2) ds: shift s → s − iπ/α, sinh → −i cosh: e^{πω/α}·(−1)∫cos(ωs) sech⁶(αs/2) ds.
    // The ratio to the spin-2 density of states must not depend on ω.
    const alpha = 2;
    const transform = (omega: number) => {
      const top = 40 / alpha;
      const steps = 40_000;
      let sum = 0;
      for (let k = 0; k <= steps; k++) {
        const s = (top * k) / steps;
        sum += (k === 0 || k === steps ? 0.5 : 1) * Math.cos(omega * s) / Math.cosh((alpha * s) / 2) ** 6;
      }
      return Math.exp((Math.PI * omega) / alpha) * 2 * sum * (top / steps);
    };
    const densityOfStates = (omega: number) => (omega * (omega ** 2 + alpha ** 2) * (omega ** 2 + 4 * alpha ** 2)) / -Math.expm1((-2 * Math.PI * omega) / alpha);
    const ratios = [0.01, 0.3, 1, 2.5].map((r) => transform(r * alpha) / densityOfStates(r * alpha));
    for (const ratio of ratios) expect(ratio / ratios[0]).toBeCloseTo(1, 7);
    // and the constant itself: ∫ sech⁶(αs/2) ds = (2/α)(16/15), against the limit ω → 0 of the density of states, 2α⁴·α/(2π)
    expect(ratios[0] / ((2 / alpha) * (16 / 15) / ((4 * alpha ** 5) / (2 * Math.PI)))).toBeCloseTo(1, 3);
  });
});

describe("smooth ramps in flat spacetime", () => {
  const count = (rampSeconds: number, channel: "electromagnetic" | "gravitational") => {
    const doc = withSeparation(scenario({ protocol: segments({ separationSeconds: rampSeconds, recombinationSeconds: rampSeconds, holdSeconds: 1e3 * rampSeconds, shape: "minimum-jerk" }) }), { split: "one-branch-stays" });
    return valueOf(computeScenario(doc as ScenarioDocument)[channel].totalQuanta);
  };

  it("give a photon count falling as T⁻² and a graviton count falling as T⁻⁴", () => {
    for (const factor of [2, 10]) {
      expect((count(1e-2 * factor, "electromagnetic") / count(1e-2, "electromagnetic")) * factor ** 2).toBeCloseTo(1, 3);
      expect((count(1e-2 * factor, "gravitational") / count(1e-2, "gravitational")) * factor ** 4).toBeCloseTo(1, 3);
    }
  });
});
