import { describe, expect, it } from "vitest";
import { absorptionResolution, boseSum, oneMinusDawsonOverX, scatteringResolution } from "@/physics/environment";
import { integrateGaussLegendre } from "@/physics/spectra/gauss-legendre";

/** ∫_a^b f by many Gauss–Legendre panels: the independent reference for the closed forms. */
function quadrature(f: (x: number) => number, a: number, b: number, panels: number): number {
  let sum = 0;
  for (let k = 0; k < panels; k++) sum += integrateGaussLegendre(f, a + ((b - a) * k) / panels, a + ((b - a) * (k + 1)) / panels, 16);
  return sum;
}

const oneMinusSinc = (z: number) => (z === 0 ? 0 : 1 - Math.sin(z) / z);
const oneMinusSincSquared = (z: number) => (z === 0 ? 0 : 1 - (Math.sin(z) / z) ** 2);

describe("the closed forms behind the environmental decoherence functions", () => {
  it("Dawson's integral peaks at D(0.9241388730) = 0.5410442246 (Abramowitz & Stegun, Table 7.5 — from memory) and matches e^{−x²}∫₀^x e^{t²}dt", () => {
    const x0 = 0.924_138_873;
    expect(x0 * (1 - oneMinusDawsonOverX(x0))).toBeCloseTo(0.541_044_224_6, 9);
    for (const x of [0.01, 0.3, 0.49, 0.51, 2, 7.5, 40]) {
      const dawson = quadrature((t) => Math.exp((t - x) * (t + x)), 0, x, 256);
      const expected = 1 - dawson / x;
      expect(Math.abs(oneMinusDawsonOverX(x) / expected - 1)).toBeLessThan(1e-11);
    }
  });

  it("the gas's joined form γ(1 − D(κ)/κ) equals the Maxwell average 2∫u³e^{−u²}(1 − sinc²(κu))du (derived in gas.ts)", () => {
    for (const kappa of [1e-3, 0.2, 0.8, 3, 20]) {
      const maxwell = 2 * quadrature((u) => u ** 3 * Math.exp(-u * u) * oneMinusSincSquared(kappa * u), 0, 9, 400);
      expect(Math.abs(oneMinusDawsonOverX(kappa) / maxwell - 1)).toBeLessThan(1e-9);
    }
  });

  it("the thermal resolution functions equal their defining integrals ∫y⁶(1 − sinc²(xy))/(e^y−1) and ∫y³(1 − sinc(xy))/(e^y−1)", () => {
    for (const x of [1e-3, 0.04, 0.06, 0.09, 0.11, 0.5, 2, 30]) {
      const scattering = quadrature((y) => (y ** 6 / Math.expm1(y)) * oneMinusSincSquared(x * y), 0, 90, 4000);
      const absorption = quadrature((y) => (y ** 3 / Math.expm1(y)) * oneMinusSinc(x * y), 0, 90, 4000);
      expect(Math.abs(scatteringResolution(x) / scattering - 1)).toBeLessThan(1e-10);
      expect(Math.abs(absorptionResolution(x) / absorption - 1)).toBeLessThan(1e-10);
    }
  });

  it("the Bose sum Σ(n − ia)^{−m} at a = 0 is ζ(m) (ζ(3) = 1.2020569031595942, Apéry's constant — from memory)", () => {
    expect(boseSum(3, 0).re).toBeCloseTo(1.202_056_903_159_594_2, 13);
    expect(boseSum(3, 0).im).toBe(0);
    let direct = { re: 0, im: 0 };
    for (let n = 1; n < 200_000; n++) {
      const r = Math.hypot(n, 5) ** -5;
      const angle = -5 * Math.atan2(-5, n);
      direct = { re: direct.re + r * Math.cos(angle), im: direct.im + r * Math.sin(angle) };
    }
    expect(boseSum(5, 5).re).toBeCloseTo(direct.re, 12);
    expect(boseSum(5, 5).im).toBeCloseTo(direct.im, 12);
  });
});
