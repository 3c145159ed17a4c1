import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { c, elementaryCharge, epsilon0, hbar, kB, mu0 } from "@/physics/constants";
import { imageKernel, sheetHoldRate, sheetKernel, surfaceChannel, surfaceDecoherenceFunction, type SurfaceOrientation, type SurfaceParameters } from "@/physics/environment";
import { ScenarioInputError } from "@/physics/scenario/input-error";
import { integrateGaussLegendre } from "@/physics/spectra/gauss-legendre";
import { linearPaths, linearSquaredSeparationSeconds, numberOf } from "./paths";

const gold = (overrides: Partial<SurfaceParameters> = {}): SurfaceParameters => ({
  chargeCoulombs: 100 * elementaryCharge.value,
  bodyRadiusMetres: 1e-6,
  distanceMetres: 40e-6,
  resistivityOhmMetres: 2.2e-8,
  temperatureKelvin: 4,
  orientation: "parallel",
  backgroundPermittivity: 1,
  relaxationTimeSeconds: null,
  ...overrides,
});

/** Complex numbers for the Fresnel coefficient, written out in the test so that nothing is shared with the code. */
type Complex = [number, number];
const mul = (a: Complex, b: Complex): Complex => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const add = (a: Complex, b: Complex): Complex => [a[0] + b[0], a[1] + b[1]];
const sub = (a: Complex, b: Complex): Complex => [a[0] - b[0], a[1] - b[1]];
const div = (a: Complex, b: Complex): Complex => {
  const m = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / m, (a[1] * b[0] - a[0] * b[1]) / m];
};
const csqrt = (a: Complex): Complex => {
  const r = Math.hypot(a[0], a[1]);
  const re = Math.sqrt((r + a[0]) / 2);
  const im = Math.sign(a[1] || 1) * Math.sqrt((r - a[0]) / 2);
  return [re, im];
};

/** J₀(x) = (1/π)∫₀^π cos(x sin θ) dθ (Abramowitz & Stegun 9.1.18). */
function besselJ0(x: number): number {
  let sum = 0;
  for (let k = 0; k < 8; k++) sum += integrateGaussLegendre((t) => Math.cos(x * Math.sin(t)), (k * Math.PI) / 8, ((k + 1) * Math.PI) / 8, 24);
  return sum / Math.PI;
}

/**
 * The image kernel from the full Fresnel coefficient of p-polarised evanescent waves, at a low frequency ω:
 * r_p(k, ω) = (ε k_z0 − k_z1)/(ε k_z0 + k_z1), k_z = √(εω²/c² − k²) (Im k_z ≥ 0), ε = 1 + i/(ε₀ρω) (J. D. Jackson §7.3;
 * the Sommerfeld form of the reflected potential, e.g. L. Novotny & B. Hecht, Principles of Nano-Optics §10),
 * with 1/√(ρ² + Z²) = ∫₀^∞ J₀(kρ) e^{−kZ} dk, and K = ∫dk (Im r_p/(2ε₀ρω)) [e^{−2kz_A} + e^{−2kz_B} − 2J₀(kΔ∥)e^{−k(z_A+z_B)}].
 */
function fresnelKernel(p: SurfaceParameters, xA: number, xB: number, omega: number): number {
  const rho = p.resistivityOhmMetres;
  const eps: Complex = [1, 1 / (epsilon0 * rho * omega)];
  const k0sq = (omega / c) ** 2;
  const zA = p.orientation === "perpendicular" ? p.distanceMetres + xA : p.distanceMetres;
  const zB = p.orientation === "perpendicular" ? p.distanceMetres + xB : p.distanceMetres;
  const lateral = p.orientation === "parallel" ? xA - xB : 0;
  const imRp = (k: number) => {
    const kz0 = csqrt([k0sq - k * k, 0]);
    const kz1 = csqrt(sub(mul(eps, [k0sq, 0]), [k * k, 0]));
    const r = div(sub(mul(eps, kz0), kz1), add(mul(eps, kz0), kz1));
    return r[1];
  };
  const integrand = (k: number) =>
    (imRp(k) / (2 * epsilon0 * rho * omega)) * (Math.exp(-2 * k * zA) + Math.exp(-2 * k * zB) - 2 * besselJ0(k * lateral) * Math.exp(-k * (zA + zB)));
  const scale = 1 / (2 * Math.min(zA, zB));
  let sum = 0;
  for (let j = 0; j < 60; j++) sum += integrateGaussLegendre(integrand, j * scale * 0.5, (j + 1) * scale * 0.5, 24);
  return sum;
}

describe("a warm surface: the image response of an Ohmic half-space", () => {
  const cases: [SurfaceOrientation, number][] = [
    ["parallel", 0.05],
    ["parallel", 1],
    ["parallel", 3],
    ["perpendicular", 0.05],
    ["perpendicular", 1],
  ];
  it.each(cases)("the closed form matches the low-frequency Fresnel-coefficient integral, %s, Δx/z = %s (derived here; two routes)", (orientation, ratio) => {
    const p = gold({ orientation });
    const dx = ratio * p.distanceMetres;
    const skinDepthAt = (omega: number) => Math.sqrt((2 * p.resistivityOhmMetres) / (mu0 * omega));
    const omega = 1e3; // skin depth ≈ 6.6 mm ≫ z = 40 µm
    expect(p.distanceMetres / skinDepthAt(omega)).toBeLessThan(0.01);
    const closed = imageKernel(p.distanceMetres, orientation, dx / 2, -dx / 2);
    expect(fresnelKernel(p, dx / 2, -dx / 2, omega) / closed).toBeCloseTo(1, 4);
  });

  it("differs from the Fresnel integral once z approaches the skin depth, which the quasi-static flag reports", () => {
    const p = gold({ distanceMetres: 5e-3 });
    const omega = 1e3;
    const ratio = fresnelKernel(p, 2.5e-4, -2.5e-4, omega) / imageKernel(p.distanceMetres, "parallel", 2.5e-4, -2.5e-4);
    expect(Math.abs(ratio - 1)).toBeGreaterThan(0.05);
  });

  it("scales as q² T ρ Δx²/z³ for Δx ≪ z, twice as large for a perpendicular separation (Anglin, Paz & Zurek, PRA 55, 4041 (1997) for the scaling)", () => {
    const rate = (p: SurfaceParameters, dx: number) => 2 * surfaceDecoherenceFunction(p)(dx / 2, -dx / 2);
    const base = rate(gold(), 1e-9);
    const expected = (kB * 4 * (100 * elementaryCharge.value) ** 2 * 2.2e-8 * 1e-18) / (8 * Math.PI * hbar ** 2 * (40e-6) ** 3);
    expect(base / expected).toBeCloseTo(1, 6);
    expect(rate(gold({ chargeCoulombs: 300 * elementaryCharge.value }), 1e-9) / base).toBeCloseTo(9, 9);
    expect(rate(gold({ temperatureKelvin: 300 }), 1e-9) / base).toBeCloseTo(75, 9);
    expect(rate(gold({ resistivityOhmMetres: 4.4e-8 }), 1e-9) / base).toBeCloseTo(2, 9);
    expect(rate(gold(), 2e-9) / base).toBeCloseTo(4, 6);
    expect(rate(gold({ distanceMetres: 80e-6 }), 1e-9) / base).toBeCloseTo(1 / 8, 6);
    expect(rate(gold({ orientation: "perpendicular" }), 1e-9) / base).toBeCloseTo(2, 6);
  });

  it("saturates for the parallel separation at twice one branch's self-image noise as Δx ≫ z (the branches' images stop overlapping)", () => {
    const single = imageKernel(40e-6, "parallel", 1, -1); // Δx = 2 m ≫ z
    expect(single * 40e-6).toBeCloseTo(1, 4); // K → 1/(2z) + 1/(2z)
  });

  it("counts the ramps: ⟨N⟩ = (rate/d²)·d²(T_s/3 + T_h + T_r/3) at Δx ≪ z for linear ramps", () => {
    const timing = { separationSeconds: 0.01, holdSeconds: 0.1, recombinationSeconds: 0.03 };
    const d = 1e-9;
    const result = surfaceChannel(linearPaths(d, timing), gold());
    const ratePerSquare = numberOf(result.holdRate) / d ** 2;
    expect(numberOf(result.totalQuanta) / (ratePerSquare * d * d * linearSquaredSeparationSeconds(timing))).toBeCloseTo(1, 6);
    expect(result.regime).toBe("quasi-static-image");
  });

  it("places the branches of a one-branch-stays split at z and z + d, away from the surface", () => {
    const stays = surfaceChannel(linearPaths(10e-6, {}, "one-branch-stays"), gold({ orientation: "perpendicular" }));
    const z = 40e-6;
    const zA = z + 10e-6;
    const K = 1 / (2 * zA) + 1 / (2 * z) - 2 / (zA + z);
    const expected = (kB * 4 * (100 * elementaryCharge.value) ** 2 * 2.2e-8 * K) / (Math.PI * hbar ** 2);
    expect(numberOf(stays.holdRate) / expected).toBeCloseTo(1, 9);
  });

  it("flags the skin depth, the relaxation rate, the body's size and moving charges", () => {
    const slow = surfaceChannel(linearPaths(1e-6), gold());
    const flag = (r: typeof slow, code: string) => r.flags.find((f) => f.code === code)?.status;
    expect(flag(slow, "surface-skin-depth")).toBe("ok");
    expect(flag(slow, "surface-relaxation")).toBe("ok");
    expect(flag(slow, "surface-body-size")).toBe("caution");
    expect(flag(slow, "surface-moving-charge")).toBe("note");
    const fast = surfaceChannel(linearPaths(1e-6, { separationSeconds: 1e-9, recombinationSeconds: 1e-9 }), gold({ distanceMetres: 1e-3, bodyRadiusMetres: 1e-7 }));
    expect(flag(fast, "surface-skin-depth")).toBe("invalid");
    expect(flag(fast, "surface-body-size")).toBe("ok");
  });

  it("refuses a branch that would touch the surface, with the document path", () => {
    expect(() => surfaceChannel(linearPaths(60e-6), gold({ orientation: "perpendicular", distanceMetres: 30e-6 }))).toThrow(ScenarioInputError);
  });
});

describe("a resistive sheet, and a horizon as a warm absorber (the membrane picture)", () => {
  it("the sheet kernel matches ∫dk (1/k)[e^{−2kz_A} + e^{−2kz_B} − 2J₀(kΔ∥)e^{−k(z_A+z_B)}] (Im r/ω = 2ε₀R_s/k), exact in Δx/z", () => {
    const z = 1e-3;
    for (const [orientation, ratio] of [["parallel", 0.1], ["parallel", 2], ["perpendicular", 0.1], ["perpendicular", 1.5]] as const) {
      const dx = ratio * z;
      const zA = orientation === "perpendicular" ? z + dx / 2 : z;
      const zB = orientation === "perpendicular" ? z - dx / 2 : z;
      const lateral = orientation === "parallel" ? dx : 0;
      const integrand = (k: number) => (Math.exp(-2 * k * zA) + Math.exp(-2 * k * zB) - 2 * besselJ0(k * lateral) * Math.exp(-k * (zA + zB))) / k;
      const scale = 1 / (2 * Math.min(zA, zB));
      let numeric = 0;
      for (let j = 0; j < 80; j++) numeric += integrateGaussLegendre(integrand, j * scale * 0.5, (j + 1) * scale * 0.5, 24);
      expect(numeric / sheetKernel(z, orientation, dx / 2, -dx / 2)).toBeCloseTo(1, 5);
    }
  });

  it("a horizon as a 377 Ω sheet at the Unruh temperature, c²/a away, gives 3/8 (parallel) and 3/4 (perpendicular) of the exact Rindler rate q²d²a³/(6π²ε₀ħc⁶) (Boyer 1980)", () => {
    const a = 1e15;
    const q = 100 * elementaryCharge.value;
    const d = 1e-9;
    const unruhKelvin = (hbar * a) / (2 * Math.PI * c * kB);
    const rindler = (q * q * d * d * a ** 3) / (6 * Math.PI ** 2 * epsilon0 * hbar * c ** 6);
    const sheet = (orientation: SurfaceOrientation) =>
      sheetHoldRate({ chargeCoulombs: q, temperatureKelvin: unruhKelvin, sheetResistanceOhms: 1 / (epsilon0 * c), distanceMetres: (c * c) / a, orientation }, d / 2, -d / 2);
    expect(1 / (epsilon0 * c)).toBeCloseTo(376.73, 2); // the impedance of free space (CODATA 2018: 376.730313668 Ω)
    expect(sheet("parallel") / rindler).toBeCloseTo(3 / 8, 6);
    expect(sheet("perpendicular") / rindler).toBeCloseTo(3 / 4, 6);
  });
});

describe("the image kernels' cancellation-free forms (properties over random geometries)", () => {
  it("equal the direct image sums 1/2z_A + 1/2z_B − 2/D (resp. 2ln…), are non-negative and symmetric in the branches", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -6, max: 2, noNaN: true }),
        fc.double({ min: -0.9, max: 3, noNaN: true }),
        fc.double({ min: -0.9, max: 3, noNaN: true }),
        fc.constantFrom<SurfaceOrientation>("parallel", "perpendicular"),
        (log10z, a, b, orientation) => {
          const z = 10 ** log10z;
          const [xA, xB] = [a * z, b * z];
          const zA = orientation === "perpendicular" ? z + xA : z;
          const zB = orientation === "perpendicular" ? z + xB : z;
          const lateral = orientation === "parallel" ? xA - xB : 0;
          const direct = 1 / (2 * zA) + 1 / (2 * zB) - 2 / Math.hypot(lateral, zA + zB);
          const sheetDirect = orientation === "parallel" ? 2 * Math.log((2 * z + Math.hypot(lateral, 2 * z)) / (4 * z)) : Math.log((zA + zB) ** 2 / (4 * zA * zB));
          const K = imageKernel(z, orientation, xA, xB);
          const S = sheetKernel(z, orientation, xA, xB);
          expect(K).toBeGreaterThanOrEqual(0);
          expect(S).toBeGreaterThanOrEqual(0);
          expect(Math.abs(imageKernel(z, orientation, xB, xA) - K)).toBeLessThanOrEqual(1e-14 * K);
          expect(Math.abs(K - direct)).toBeLessThanOrEqual(1e-12 * (1 / zA + 1 / zB));
          expect(Math.abs(S - sheetDirect)).toBeLessThanOrEqual(1e-12 * (1 + Math.abs(sheetDirect)));
        },
      ),
      { numRuns: 300 },
    );
  });
});
