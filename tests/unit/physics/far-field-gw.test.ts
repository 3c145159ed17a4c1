import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { G, c, hbar } from "@/physics/constants";
import { rampQuantaPerSquaredSource } from "@/physics/estimators/ramp-quanta";
import { separationHistory } from "@/physics/protocols";
import { gravitationalChannel, type ChannelDefinition } from "@/physics/spectra/channels";
import { scenario, segments, valueOf, withSeparation, withSource } from "./scenarios";

describe("far-field gravitational count (quadrupole formula in quanta)", () => {
  it("reproduces the Peters–Mathews luminosity of a circular binary, counted in gravitons", () => {
    // Peters & Mathews, Phys. Rev. 131, 435 (1963), eq. 16 at e = 0 (also Landau–Lifshitz §110, problem 1):
    // P = (32/5) G μ² a⁴ Ω⁶ / c⁵, radiated at 2Ω, so dN/dt = P/(2ħΩ). We switch the binary on and off with a
    // Gaussian envelope g(t) = exp(−(t − t0)²/(2s²)), whose energy is P∫g² dt = P s√π.
    // The rotating STF quadrupole is (μa²/2)[cos2Ωt (e_xx − e_yy) + sin2Ωt (e_xy + e_yx)] + const, each tensor
    // with Σ_ij of its square = 2. The estimator's gravitational weight carries Σ(nn − δ/3)² = 2/3, so for a
    // scalar profile X(t) it returns est_X = (2/3)(G/5πħc⁵)∫ω⁵|X̃|² dω, and the binary's count is
    // N = (G/5πħc⁵)(μa²/2)²·2·∫ω⁵(|C̃|² + |S̃|²) = (3/4)μ²a⁴ (est_C + est_S).
    // Closed form of the envelope's effect (derived): |C̃|² + |S̃|² ≈ ½·2πs² e^{−(ω−ω0)²s²}, ω0 = 2Ω, and
    // ∫ω⁵ e^{−(ω−ω0)²s²} dω = (√π/s) ω0⁵ (1 + 5/(ω0 s)² + 15/(4(ω0 s)⁴)); so N = N_PM × that bracket.
    const s = 1;
    const omega0 = 100; // 2Ω in s⁻¹, ω0·s = 100
    const t0 = 6;
    const scalarChannel: ChannelDefinition = { ...gravitationalChannel, profile: (x) => x, profileRate: (_x, rate) => rate };
    const estimate = (trig: "cos" | "sin") => {
      const history = separationHistory({
        separation: { axis: "tangential", split: "one-branch-stays", distanceMetres: 1 },
        protocol: { kind: "formula", expression: `${trig}(${omega0} * (t - ${t0})) * exp(-(t - ${t0})^2 / (2 * ${s}^2))`, durationSeconds: 2 * t0 },
      });
      return 10 ** rampQuantaPerSquaredSource(history, scalarChannel, 0, null).log10PerSquaredSource;
    };
    const mu = 1e30;
    const a = 1e6;
    const spectral = 0.75 * mu * mu * a ** 4 * (estimate("cos") + estimate("sin"));
    const Omega = omega0 / 2;
    const power = (32 / 5) * G * mu * mu * a ** 4 * Omega ** 6 / c ** 5;
    const bracket = 1 + 5 / (omega0 * s) ** 2 + 15 / (4 * (omega0 * s) ** 4);
    const petersMathews = (power * s * Math.sqrt(Math.PI)) / (hbar * omega0) * bracket;
    expect(spectral / petersMathews).toBeCloseTo(1, 3);
  });

  it("reports exactly zero for a symmetric split, with the reason", () => {
    const result = computeScenario(withSeparation(scenario(), { split: "symmetric" }));
    expect(result.gravitational.totalQuanta.value).toBe(0);
    expect(result.gravitational.totalQuanta.log10).toBeNull();
    expect(result.gravitational.exactZeroReason).toMatch(/symmetric split/);
    // x₀ = 0 is an idealisation, and the caution says so (issue 17, item 3)
    expect(result.flags.find((f) => f.code === "symmetric-split-quadrupole")).toMatchObject({ status: "caution", message: expect.stringMatching(/x₀ = 0.*idealisation/) });
  });

  it("scales as m² d⁴ for one branch staying, and includes the lab's recoil as m M/(m + M)", () => {
    const base = withSeparation(scenario(), { split: "one-branch-stays" });
    const count = (doc: typeof base) => valueOf(computeScenario(doc).gravitational.totalQuanta);
    const n0 = count(base);
    expect(count(withSeparation(base, { distanceMetres: 2 * base.separation.distanceMetres })) / n0).toBeCloseTo(16, 6);
    expect(count(withSource(base, { massKg: 3 * base.source.massKg })) / n0).toBeCloseTo(9, 6);
    // Two-body quadrupole about the common centre of mass, μx² with x measured by the lab and μ = mM/(m + M)
    // (Landau & Lifshitz, Mechanics §13, the reduced mass): M = m halves m_eff, ×1/4 in N.
    expect(count(withSource(base, { labMassKg: base.source.massKg })) / n0).toBeCloseTo(0.25, 6);
  });

  it("falls as the inverse fourth power of the ramp time for minimum-jerk ramps (quadrupole: ω⁵ weight)", () => {
    // Common practice: ⟨N⟩ ∝ ∫ω⁵|ΔĨ|², and ΔI(t/τ) gives ∝ τ⁻⁴.
    const count = (tau: number) =>
      valueOf(computeScenario(withSeparation(scenario({ protocol: segments({ separationSeconds: tau, recombinationSeconds: tau, holdSeconds: 10 }) }), { split: "one-branch-stays" })).gravitational.totalQuanta);
    expect(count(0.01) / count(0.02)).toBeCloseTo(16, 1);
  });

  it("flags ramps whose acceleration jumps, for which the quadrupole count depends on the resolution", () => {
    const result = computeScenario(withSeparation(scenario({ protocol: segments({ shape: "cosine" }) }), { split: "one-branch-stays" }));
    expect(result.flags.find((f) => f.code === "acceleration-jump")?.status).toBe("caution");
    expect(result.protocol.smoothness).toBe("acceleration-jumps");
    const em = computeScenario(scenario({ protocol: segments({ shape: "cosine" }) }));
    expect(em.electromagnetic.convergence.converged).toBe(true);
  });
});
