import { describe, expect, it } from "vitest";
import { c, epsilon0, hbar } from "@/physics/constants";
import {
  electromagneticChannel,
  gravitationalChannel,
  log10HoldRateCoefficient,
  rampKernel,
  rampWeight,
  thermalCorrectionWeight,
} from "@/physics/spectra/channels";

const K = 10 ** electromagneticChannel.log10Coefficient;

/**
 * The code's weight W(ω) (⟨N⟩ = ∫₀^∞ W |ṽ|² dω, τ₀ = 1 s) is the symmetrised field spectrum divided by πħ²ω²:
 * S_sym(ω) = ½[S_W(ω) + S_W(−ω)] = πħ²ω² [K w̄(ω, α) + K α³/(π ω²)] (the second term is the zero-frequency part).
 */
function symmetrisedSpectrum(omega: number, alpha: number): number {
  const w = rampWeight(electromagneticChannel, alpha)(omega);
  return Math.PI * hbar * hbar * omega * omega * K * (w + (alpha > 0 ? alpha ** 3 / (Math.PI * omega * omega) : 0));
}

describe("electric-field spectra along the lab's worldline", () => {
  it("gives the spontaneous-emission rate of a dipole in the inertial vacuum", () => {
    // Textbook (R. Loudon, The Quantum Theory of Light, 3rd ed., §2.5; from memory):
    // A = ω³|d|²/(3π ε0 ħ c³). Fermi's golden rule for −d·E: Γ = |d|² S_W(ω)/ħ², with the Wightman spectrum
    // S_W = 2 S_sym for ω > 0 in the vacuum (S_W(−ω) = 0).
    const d = 1e-29;
    for (const omega of [1e14, 3e15]) {
      const golden = (d * d * 2 * symmetrisedSpectrum(omega, 0)) / (hbar * hbar);
      expect(golden / ((omega ** 3 * d * d) / (3 * Math.PI * epsilon0 * hbar * c ** 3))).toBeCloseTo(1, 12);
    }
  });

  it("matches a numerical Fourier transform of the accelerated-observer correlator ∝ 1/sinh⁴(a(τ − iε)/2c)", () => {
    // Correlator (Takagi, Prog. Theor. Phys. Suppl. 88, 1 (1986), §5; Boyer, PRD 21, 2137 (1980)):
    // ⟨E_i(τ)E_j(0)⟩ = δ_ij (ħ/(π² ε0 c³)) (α/2)⁴ / sinh⁴(α(τ − iε)/2), α = a/c; its α → 0 limit is the inertial
    // ħ/(π² ε0 c³ τ⁴), whose transform is the spontaneous-emission spectrum above (normalisation re-derived).
    // Shift the contour by −iπ/α: sinh(α(s − iπ/α)/2) = −i cosh(αs/2), so with f(s) = (α/2)⁴/cosh⁴(αs/2),
    // S_W(ω) = e^{πω/α} (ħ/(π² ε0 c³)) ∫ e^{iωs} f(s) ds and S_sym = cosh(πω/α) (ħ/(π² ε0 c³)) ∫ cos(ωs) f(s) ds.
    const alpha = 2;
    const numerical = (omega: number) => {
      const top = 40 / alpha;
      const steps = 40_000;
      let sum = 0;
      for (let k = 0; k <= steps; k++) {
        const s = (top * k) / steps;
        const f = (alpha / 2) ** 4 / Math.cosh((alpha * s) / 2) ** 4;
        sum += (k === 0 || k === steps ? 0.5 : 1) * Math.cos(omega * s) * f;
      }
      return Math.cosh((Math.PI * omega) / alpha) * (hbar / (Math.PI ** 2 * epsilon0 * c ** 3)) * 2 * sum * (top / steps);
    };
    for (const ratio of [0.01, 0.3, 1, 2.5]) {
      const omega = ratio * alpha;
      expect(symmetrisedSpectrum(omega, alpha) / numerical(omega)).toBeCloseTo(1, 7);
    }
  });

  it("has the zero-frequency value S(0) = ħa³/(6π² ε0 c⁶) and the matching hold rate", () => {
    // Boyer (1980), Takagi (1986): S(0) = ħ a³/(6π² ε0 c⁶); the hold rate per unit (qd)² is S(0)/ħ².
    const a = 3e12;
    const alpha = a / c;
    const s0 = (hbar * a ** 3) / (6 * Math.PI ** 2 * epsilon0 * c ** 6);
    expect(10 ** log10HoldRateCoefficient(electromagneticChannel, alpha) / (s0 / hbar ** 2)).toBeCloseTo(1, 12);
    expect(symmetrisedSpectrum(1e-9 * alpha, alpha) / s0).toBeCloseTo(1, 6);
  });

  it("switches between its two forms of the weight without a step", () => {
    for (const channel of [electromagneticChannel, gravitationalChannel]) {
      const alpha = 1.7;
      const w = rampWeight(channel, alpha);
      const switchAt = alpha / Math.PI; // x = πΩ/ᾱ = 1
      expect(w(switchAt * (1 - 1e-12)) / w(switchAt * (1 + 1e-12))).toBeCloseTo(1, 9);
      const correction = thermalCorrectionWeight(channel, alpha);
      for (const omega of [0.1, 1, 10, 100]) expect(correction(omega) + omega ** channel.power).toBeCloseTo(w(omega), 9);
    }
  });

  it("uses time-domain kernels whose second derivatives are the correlators csch⁴ (EM) and csch⁶ (gravity)", () => {
    // Closed forms, derived from the transform pair above: −k̄'' = ∫Ω²w̄ cos(Ωx) dΩ =
    // (3/8)ᾱ⁴ csch⁴(ᾱx/2) for EM and −(15/8)ᾱ⁶ csch⁶(ᾱx/2) for the spin-2 form; α → 0 gives 6/x⁴ and −120/x⁶.
    const alpha = 0.8;
    const h = 1e-4;
    for (const x of [0.5, 1.5, 4]) {
      const second = (k: (x: number) => number) => (k(x + h) - 2 * k(x) + k(x - h)) / (h * h);
      const em = rampKernel(electromagneticChannel, alpha);
      expect(-second(em) / ((3 / 8) * alpha ** 4 / Math.sinh((alpha * x) / 2) ** 4)).toBeCloseTo(1, 4);
      const gw = rampKernel(gravitationalChannel, alpha);
      expect(second(gw) / ((15 / 8) * alpha ** 6 / Math.sinh((alpha * x) / 2) ** 6)).toBeCloseTo(1, 4);
    }
    expect(rampKernel(electromagneticChannel, 1e-9)(2)).toBeCloseTo(-1 / 4, 9);
    expect(rampKernel(gravitationalChannel, 1e-7)(2) / (6 / 16)).toBeCloseTo(1, 6);
    expect(Math.abs(rampKernel(electromagneticChannel, alpha)(60))).toBeLessThan(1e-15);
  });
});
