import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { c, e, epsilon0, hbar } from "@/physics/constants";
import { scenario, segments, valueOf, withSource } from "./scenarios";

const K = 1 / (6 * Math.PI ** 2 * epsilon0 * hbar * c ** 3);

describe("far-field electromagnetic count (flat spacetime)", () => {
  it("matches the closed-form photon number of a Gaussian dipole pulse", () => {
    // Closed form, derived. Larmor (Jackson, Classical Electrodynamics, 3rd ed., eq. 14.22): P = |p̈|²/(6π ε0 c³).
    // With p̃(ω) = ∫p e^{iωt}dt, Parseval gives ∫|p̈|²dt = (1/π)∫₀^∞ ω⁴|p̃|² dω, and one quantum per ħω, so
    // ⟨N⟩ = (1/(6π² ε0 ħ c³)) ∫₀^∞ ω³|p̃|² dω. For p(t) = P e^{−(t−t0)²/(2s²)}, |p̃|² = 2π P² s² e^{−ω²s²} and
    // ∫₀^∞ ω³ e^{−ω²s²} dω = 1/(2s⁴), so ⟨N⟩ = P²/(6π ε0 ħ c³ s²).
    const s = 1;
    const d = 1e-6;
    const q = 1e3 * e;
    const doc = withSource(
      scenario({ protocol: { kind: "formula", expression: `exp(-(t - 6)^2 / (2 * ${s}^2))`, durationSeconds: 12 } }),
      { chargeCoulombs: q },
    );
    const closedForm = (q * d) ** 2 / (6 * Math.PI * epsilon0 * hbar * c ** 3 * s * s);
    const result = computeScenario({ ...doc, separation: { ...doc.separation, distanceMetres: d } });
    expect(valueOf(result.electromagnetic.totalQuanta) / closedForm).toBeCloseTo(1, 3);
    expect(result.electromagnetic.convergence.converged).toBe(true);
  });

  it("matches an independent quadrature of Larmor's spectrum for minimum-jerk ramps", () => {
    // Independent integration: ṽ(ω) = ∫ Δṗ e^{iωt} dt by 64-point Gauss–Legendre on 8 panels per ramp (no FFT),
    // then ⟨N⟩ = K ∫₀^∞ ω |ṽ|² dω by Simpson's rule to ωτ = 80π (|ṽ|² ∝ ω⁻⁶: the tail is below 1e-6 there).
    const tau = 0.01;
    const q = 1e3 * e;
    const d = 1e-6;
    const doc = withSource(scenario({ protocol: segments({ separationSeconds: tau, holdSeconds: 0, recombinationSeconds: tau }) }), { chargeCoulombs: q });
    const estimate = valueOf(computeScenario(doc).electromagnetic.totalQuanta);

    const velocity = (t: number) => {
      const u = t < tau ? t / tau : (t - tau) / tau;
      const rate = (30 * u * u * (1 - u) * (1 - u)) / tau;
      return q * d * (t < tau ? rate : -rate);
    };
    const gl = gaussLegendre64();
    const transform = (omega: number) => {
      let re = 0;
      let im = 0;
      for (let panel = 0; panel < 16; panel++) {
        const start = (panel * tau) / 8;
        const end = start + tau / 8;
        for (let i = 0; i < gl.x.length; i++) {
          const t = start + ((end - start) * (gl.x[i] + 1)) / 2;
          const w = (gl.w[i] * (end - start)) / 2;
          re += w * velocity(t) * Math.cos(omega * t);
          im += w * velocity(t) * Math.sin(omega * t);
        }
      }
      return re * re + im * im;
    };
    const top = (2 * Math.PI * 40) / tau;
    const steps = 4000;
    let sum = 0;
    for (let k = 0; k <= steps; k++) {
      const omega = (top * k) / steps;
      const weight = k === 0 || k === steps ? 1 : k % 2 ? 4 : 2;
      sum += weight * omega * transform(omega);
    }
    const independent = (K * sum * top) / (3 * steps);
    expect(estimate / independent).toBeCloseTo(1, 4);
  });

  it("falls as the inverse square of the ramp time for smooth ramps (common practice; arXiv:2112.10798)", () => {
    const count = (tau: number) => valueOf(computeScenario(scenario({ protocol: segments({ separationSeconds: tau, recombinationSeconds: tau, holdSeconds: 10 }) })).electromagnetic.totalQuanta);
    for (const tau of [1e-3, 1e-2, 1e-1]) expect(count(tau) / count(2 * tau)).toBeCloseTo(4, 2);
  });

  it("keeps coherence when the ramp time is much longer than q·d in natural units (arXiv:2112.10798; Belenchia et al., PRD 98, 126009 (2018))", () => {
    // Natural (Heaviside–Lorentz) units: q_HL = q/√(ε0 ħ c); the condition reads c·T ≫ q_HL·d.
    const q = 1e5 * e;
    const d = 1e-6;
    const naturalTime = (q / Math.sqrt(epsilon0 * hbar * c)) * d / c;
    const run = (tau: number) =>
      computeScenario(withSource(scenario({ protocol: segments({ separationSeconds: tau, recombinationSeconds: tau, holdSeconds: 100 * tau }) }), { chargeCoulombs: q }));
    const slow = run(1e3 * naturalTime);
    const fast = run(1e-2 * naturalTime);
    expect(valueOf(slow.electromagnetic.totalQuanta)).toBeLessThan(1e-4);
    expect(valueOf(slow.electromagnetic.decoherence)).toBeLessThan(1e-4);
    expect(valueOf(fast.electromagnetic.totalQuanta)).toBeGreaterThan(1);
    expect(fast.flags.find((f) => f.code === "slow-motion")?.status).not.toBe("invalid");
  });

  it("flags kinked (linear) ramps and reports the count at the stated resolution, which grows as it shrinks", () => {
    const at = (step: number) =>
      computeScenario({ ...scenario({ protocol: segments({ shape: "linear" }) }), numerics: { kinkTimeResolutionSeconds: step } });
    const coarse = at(1e-5);
    const fine = at(1e-6);
    expect(coarse.flags.find((f) => f.code === "kink")?.status).toBe("caution");
    expect(coarse.protocol.smoothness).toBe("kinked");
    const step = coarse.electromagnetic.convergence.timeStepSeconds;
    expect(step).toBeLessThanOrEqual(1e-5);
    expect(step).toBeGreaterThan(0.5e-5);
    expect(valueOf(fine.electromagnetic.totalQuanta)).toBeGreaterThan(valueOf(coarse.electromagnetic.totalQuanta));
  });

  it("gives no hold-driven part in flat spacetime: a held superposition does not decohere", () => {
    const result = computeScenario(scenario({ protocol: segments({ holdSeconds: 1e6 }) }));
    expect(result.electromagnetic.holdDrivenQuanta.value).toBe(0);
    expect(result.electromagnetic.decoherenceTime).toBeNull();
    expect(result.electromagnetic.farFieldQuanta).toEqual(result.electromagnetic.totalQuanta);
  });
});

function gaussLegendre64(): { x: number[]; w: number[] } {
  // Independent of physics/spectra: Golub–Welsch would do; Newton on P_64 from Chebyshev guesses suffices here.
  const n = 64;
  const x: number[] = [];
  const w: number[] = [];
  for (let i = 1; i <= n; i++) {
    let z = Math.cos((Math.PI * (i - 0.25)) / (n + 0.5));
    let dp = 0;
    for (let it = 0; it < 50; it++) {
      let p1 = 1;
      let p2 = 0;
      for (let j = 1; j <= n; j++) {
        const p3 = p2;
        p2 = p1;
        p1 = ((2 * j - 1) * z * p2 - (j - 1) * p3) / j;
      }
      dp = (n * (z * p1 - p2)) / (z * z - 1);
      const dz = p1 / dp;
      z -= dz;
      if (Math.abs(dz) < 1e-15) break;
    }
    x.push(z);
    w.push(2 / ((1 - z * z) * dp * dp));
  }
  return { x, w };
}
