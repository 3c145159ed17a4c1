/**
 * The exact hold rate by the horizon method, checked against the Rindler limit near the horizon and against the
 * far-zone limit (with its coefficient extracted and compared with the published order-of-magnitude estimate).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { G, c, elementaryCharge, epsilon0, hbar, solarMass } from "@/physics/constants";
import {
  memoryNormMultipoleSum,
  radialMemoryNorm,
  ratioCurve,
  schwarzschildFarZoneEstimate,
  schwarzschildHorizonRate,
  tangentialMemoryNorm,
  type SchwarzschildHorizonRateInput,
} from "@/physics/horizon/schwarzschild-exact";

const q = elementaryCharge.value;
const massKg = 10 * solarMass.value;
/** GM/c², written with the same floating-point operations as the module so that both see the same b − 2GM/c². */
const massLength = (kg: number) => (G * kg) / (c * c);
const m = massLength(massKg);

function input(bOverM: number, axis: SchwarzschildHorizonRateInput["axis"], extra = {}): SchwarzschildHorizonRateInput {
  return { massKg, labArealRadiusMetres: bOverM * m, chargeCoulombs: q, separationMetres: 1e-6, axis, ...extra };
}

/**
 * Rindler reference, written here from its sources: along a uniformly accelerated worldline in the Minkowski vacuum
 * the electric-field noise at zero frequency is S(0) = ħ a³/(6π² ε0 c⁶) per component (T. H. Boyer, PRD 21, 2137
 * (1980); S. Takagi, Prog. Theor. Phys. Suppl. 88, 1 (1986); arXiv:2301.00026), so a held dipole difference
 * Δp = q d decoheres at |Δp|² S(0)/ħ² = q² d² a³/(6π² ε0 ħ c⁶) per proper second. The static lab at b needs
 * a = GM/(b² √(1 − 2GM/(c² b))).
 */
function rindlerRate(kg: number, b: number, charge: number, d: number): number {
  const lapse = Math.sqrt((b - 2 * massLength(kg)) / b);
  const a = (G * kg) / (b * b * lapse);
  return (charge * charge * d * d * a ** 3) / (6 * Math.PI ** 2 * epsilon0 * hbar * c ** 6);
}

// Closed forms of the horizon method (docs/methods/schwarzschild-exact.md), Gaussian units, G = c = 1, x = b/M,
// ε = x − 2, f = 1 − 2/x:  Ṅ_rad = q²d² √f I(ε)/(2π ħ M³ x⁴) with I = 4/(3ε²) + 4/ε − 2 ln(1 + 2/ε), and
// Ṅ_tan = (2/(3π)) q²d²/(ħ M³ x⁶ f^{3/2}). The Rindler rate in the same units is (4π q²) d² a³/(6π²) =
// (2/(3π)) q²d² a³ with a = 1/(M x² √f). Dividing:
//   Ṅ_rad/Ṅ_Rindler = (3/4) ε² I(ε) = 1 + 3ε − (3/2) ε² ln(1 + 2/ε),     Ṅ_tan/Ṅ_Rindler = 1 at every radius.
describe("near the horizon: the Rindler limit", () => {
  it("tends to q²d²a³/(6π²ε0ħc⁶) with the lab's local acceleration, radial correction 3(b/M − 2)", () => {
    for (const delta of [1e-3, 1e-5, 1e-7, 1e-9]) {
      const b = (2 + delta) * m;
      const epsilon = (b - 2 * m) / m;
      const reference = rindlerRate(massKg, b, q, 1e-6);
      const radial = schwarzschildHorizonRate(input(2 + delta, "radial")).ratePerLabSecond / reference;
      const tangential = schwarzschildHorizonRate(input(2 + delta, "tangential")).ratePerLabSecond / reference;
      expect(radial - 1).toBeGreaterThan(2.9 * epsilon);
      expect(radial - 1).toBeLessThan(3 * epsilon + 1e-12);
      expect(Math.abs(tangential - 1)).toBeLessThan(1e-12);
    }
  });

  it("follows the derived ratio 1 + 3ε − (3/2)ε² ln(1 + 2/ε) (radial) and 1 (tangential) at intermediate radii", () => {
    for (const bOverM of [2.01, 2.3, 3, 6, 20]) {
      const b = bOverM * m;
      const eps = (b - 2 * m) / m;
      const reference = rindlerRate(massKg, b, q, 1e-6);
      const expected = 1 + 3 * eps - 1.5 * eps * eps * Math.log1p(2 / eps);
      expect(schwarzschildHorizonRate(input(bOverM, "radial")).ratePerLabSecond / reference).toBeCloseTo(expected, 11);
      expect(schwarzschildHorizonRate(input(bOverM, "tangential")).ratePerLabSecond / reference).toBeCloseTo(1, 12);
    }
  });

  it("stays finite and positive down to b/M = 2 + 1e-11, flagging the limited precision of b below 2 + 1e-10", () => {
    for (const delta of [1e-9, 1e-11]) {
      const result = schwarzschildHorizonRate(input(2 + delta, "radial"));
      expect(Number.isFinite(result.ratePerLabSecond) && result.ratePerLabSecond > 0).toBe(true);
      expect(result.regime).toBe("near-horizon");
      expect(result.flags.some((flag) => flag.code === "near-horizon-input-precision")).toBe(delta < 1e-10);
    }
  });
});

// Far-zone coefficient, derived independently of the closed forms. Far away the charge's field at the hole is
// uniform, E₀ = q/b². The ℓ = 1 static solution regular on the horizon is Φ = −E₀ (r − 2M) cos θ (check:
// ∂_r(r² ∂_r(r − 2M)) = 2r = 2(r − 2M)/f, the ℓ(ℓ+1)/f term), so E_r̂(2M) = E₀ cos θ (cf. R. M. Wald, PRD 10, 1680
// (1974) for the uniform field on a hole). A radial shift d changes E₀ by 2qd/b³ along the axis, a tangential one by
// qd/b³ across it. The constraint on the horizon (radius 2M) for ΔE cos θ is solved by χ = −(2M)² ΔE cos θ/2, with
// ∫|Dχ|² dS = (2π/3)(2M)⁴ ΔE² (Gaussian), i.e. (8/3) M⁴ ΔE² after the Heaviside–Lorentz factor 1/(4π). With κ = 1/(4M),
// Ṅ = (κ/(πħ)) (8/3) M⁴ ΔE² = (2/(3π)) M³ ΔE²/ħ, hence
//   Ṅ_rad → (8/(3π)) q²d²M³/(ħ b⁶),   Ṅ_tan → (2/(3π)) q²d²M³/(ħ b⁶)   (Gaussian; SI: q² → q²/(4πε0), M → GM/c²).
const FAR_RADIAL = 8 / (3 * Math.PI);
const FAR_TANGENTIAL = 2 / (3 * Math.PI);

/** Rate × 4πε0 ħ b⁶/(q² d² (GM/c²)³): the far-zone coefficient at b/M. */
function farCoefficient(bOverM: number, axis: "radial" | "tangential"): number {
  const b = bOverM * m;
  const rate = schwarzschildHorizonRate(input(bOverM, axis)).ratePerLabSecond;
  const d = 1e-6;
  return (rate * 4 * Math.PI * epsilon0 * hbar * (b / m) ** 6 * m ** 3) / (q * q * d * d);
}

describe("far from the hole: the M³q²d²/b⁶ law and its coefficient", () => {
  it("extracts the coefficient 8/(3π) (radial) and 2/(3π) (tangential) by Richardson extrapolation", () => {
    for (const [axis, expected] of [["radial", FAR_RADIAL], ["tangential", FAR_TANGENTIAL]] as const) {
      const coarse = farCoefficient(1e5, axis);
      const fine = farCoefficient(1e6, axis);
      const extrapolated = (10 * fine - coarse) / 9; // removes the 1/x correction
      expect(extrapolated / expected).toBeCloseTo(1, 8);
    }
  });

  // Ratio to the published estimate ⟨N⟩ ~ M³q²d²T/D⁶ in Planck units ("Black holes decohere quantum
  // superpositions", arXiv:2205.06279), written in SI as G³M³q²d²/(ε0 ħ c⁶ b⁶) with coefficient 1: the exact far-zone
  // rate is (8/(3π))/(4π) = 2/(3π²) ≈ 0.0675 of it (radial, 14.8× smaller) and 1/(6π²) ≈ 0.0169 (tangential, 59.2×
  // smaller). Were the Planck-unit q² read as Gaussian (q²/(4πε0)), the factors would be 8/(3π) ≈ 0.85 and 2/(3π) ≈ 0.21.
  it("is 2/(3π²) (radial) and 1/(6π²) (tangential) of the published estimate with coefficient 1", () => {
    const radial = schwarzschildHorizonRate(input(1e7, "radial"));
    const tangential = schwarzschildHorizonRate(input(1e7, "tangential"));
    expect(radial.ratioToFarZoneEstimate).toBeCloseTo(2 / (3 * Math.PI ** 2), 7);
    expect(tangential.ratioToFarZoneEstimate).toBeCloseTo(1 / (6 * Math.PI ** 2), 7);
    const estimate = (G ** 3 * massKg ** 3 * q * q * 1e-12) / (epsilon0 * hbar * c ** 6 * (1e7 * m) ** 6);
    expect(schwarzschildFarZoneEstimate(input(1e7, "radial")) / estimate).toBeCloseTo(1, 12);
    expect(radial.regime).toBe("far-zone");
  });

  // Next order, from the closed forms: with u = 2/ε, (3/4)ε² I = 1 + (3/2)ε² Σ_{k≥2} (−u)^k/k = 4 − 4/ε + 6/ε² − …,
  // and the coefficient is (2/(3π)) f^{−3/2} × that, f^{−3/2} = 1 + 3/x + 15/(2x²) + …, ε = x − 2: radial
  // C(x)/C∞ = 1 + 2/x + 4/x² + O(x⁻³); tangential f^{−3/2} = 1 + 3/x + O(x⁻²). A closed form that subtracted
  // 4/ε − 2 ln(1 + 2/ε) directly would be wrong here in the 8th digit.
  it("has no cancellation at b/M = 1e8: the 2e-8 correction is resolved", () => {
    const x = 1e8;
    expect(Math.abs(farCoefficient(x, "radial") / FAR_RADIAL - (1 + 2 / x))).toBeLessThan(2e-14);
    expect(Math.abs(farCoefficient(x, "tangential") / FAR_TANGENTIAL - (1 + 3 / x))).toBeLessThan(2e-14);
  });
});

describe("structure of the result", () => {
  const heights = fc.double({ min: -12, max: 12, noNaN: true }).map((log10) => 10 ** log10);
  const masses = fc.double({ min: 0, max: 40, noNaN: true }).map((log10) => 10 ** log10);

  it("is finite and positive at every radius outside the horizon, for holes from 1 kg to 1e40 kg", () => {
    fc.assert(
      fc.property(heights, masses, fc.constantFrom("radial" as const, "tangential" as const), (eps, kg, axis) => {
        const mass = massLength(kg);
        const b = (2 + eps) * mass;
        fc.pre(b > 2 * mass);
        const result = schwarzschildHorizonRate({
          massKg: kg, labArealRadiusMetres: b, chargeCoulombs: q, separationMetres: 1e-3 * b, axis, multipoleCheck: "never",
        });
        expect(Number.isFinite(result.ratePerLabSecond)).toBe(true);
        expect(result.ratePerLabSecond).toBeGreaterThan(0);
      }),
    );
  });

  // Orientation: a radial shift changes only the m = 0 harmonics of E_r̂, a tangential one only m = ±1 (∝ cos φ), so
  // the cross term ∫ Dχ_rad · Dχ_tan dS = −∫ χ_rad ΔE_tan dS vanishes by the φ integral: Ṅ(α) = cos²α Ṅ_rad + sin²α Ṅ_tan.
  it("combines radial and tangential rates as cos²α and sin²α for a separation at angle α", () => {
    fc.assert(
      fc.property(fc.double({ min: 2.05, max: 1e3, noNaN: true }), fc.double({ min: 0, max: Math.PI, noNaN: true }), (x, alpha) => {
        const oblique = schwarzschildHorizonRate(input(x, { angleFromRadialRadians: alpha })).ratePerLabSecond;
        const radial = schwarzschildHorizonRate(input(x, "radial")).ratePerLabSecond;
        const tangential = schwarzschildHorizonRate(input(x, "tangential")).ratePerLabSecond;
        expect(oblique / (Math.cos(alpha) ** 2 * radial + Math.sin(alpha) ** 2 * tangential)).toBeCloseTo(1, 12);
      }),
      { numRuns: 50 },
    );
  });

  // Dimensional analysis: Ṅ = (q²/(4πε0 ħ)) (d²/M³) F(b/M), so at fixed b/M and d it scales as q² and as M⁻³.
  it("scales as q²d² and, at fixed b/M, as M⁻³", () => {
    const base = schwarzschildHorizonRate(input(3.7, "radial")).ratePerLabSecond;
    const scaled = schwarzschildHorizonRate({ ...input(3.7, "radial"), chargeCoulombs: 3 * q, separationMetres: 2e-6 });
    expect(scaled.ratePerLabSecond / base).toBeCloseTo(36, 10);
    const heavier = schwarzschildHorizonRate({ ...input(3.7, "radial"), massKg: 8 * massKg, labArealRadiusMetres: 3.7 * massLength(8 * massKg) });
    expect(heavier.ratePerLabSecond / base).toBeCloseTo(1 / 512, 12);
  });

  it("converts to Killing time with the lab's redshift factor", () => {
    const result = schwarzschildHorizonRate(input(2.5, "tangential"));
    expect(result.ratePerKillingSecond / result.ratePerLabSecond).toBeCloseTo(Math.sqrt(1 - 2 / 2.5), 12);
  });

  it("labels regimes and flags a separation that is not small against the distance to the horizon", () => {
    expect(schwarzschildHorizonRate(input(2.001, "radial")).regime).toBe("near-horizon");
    expect(schwarzschildHorizonRate(input(3, "radial")).regime).toBe("intermediate");
    expect(schwarzschildHorizonRate(input(1e3, "tangential")).regime).toBe("far-zone");
    const wide = schwarzschildHorizonRate({ ...input(2.001, "radial"), separationMetres: 0.1 * m });
    expect(wide.flags.map((flag) => flag.code)).toContain("separation-not-small");
  });

  it("rejects a lab at or inside the horizon and non-physical inputs", () => {
    expect(() => schwarzschildHorizonRate(input(2, "radial"))).toThrow(RangeError);
    expect(() => schwarzschildHorizonRate(input(1.5, "radial"))).toThrow(RangeError);
    expect(() => schwarzschildHorizonRate({ ...input(3, "radial"), separationMetres: 0 })).toThrow(RangeError);
    expect(() => schwarzschildHorizonRate({ ...input(3, "radial"), massKg: -1 })).toThrow(RangeError);
  });
});

describe("the Legendre sum and its convergence report", () => {
  it("converges to the closed form from b/M = 2 + 1e-8 to 1e8", () => {
    for (const eps of [1e-8, 1e-6, 1e-4, 1e-2, 0.5, 3, 100, 1e4, 1e8]) {
      for (const axis of ["radial", "tangential"] as const) {
        const sum = memoryNormMultipoleSum(eps, axis, { tolerance: 1e-12 });
        const closed = axis === "radial" ? radialMemoryNorm(eps) : tangentialMemoryNorm(eps);
        expect(sum.converged).toBe(true);
        expect(Math.abs(sum.value / closed - 1)).toBeLessThan(3e-12);
      }
    }
  });

  // Terms fall as e^{−2ℓη}, cosh η = b/M − 1, so about ln(1/tol)/(2η) ≈ ln(1/tol)/(2√(2ε)) multipoles are needed.
  it("needs ~1/√(b/M − 2) multipoles near the horizon and reports lMax and the achieved tolerance", () => {
    const lMax = (eps: number) => memoryNormMultipoleSum(eps, "tangential", { tolerance: 1e-12 }).lMax;
    expect(lMax(1e-4) / lMax(1e-6)).toBeCloseTo(0.1, 1);
    const result = schwarzschildHorizonRate(input(3, "radial"));
    expect(result.multipoleStatus).toBe("converged");
    expect(result.lMax).toBeGreaterThan(3);
    expect(result.lMax).toBeLessThan(40);
    expect(result.relativeTolerance).toBeLessThan(2e-12);
  });

  it("skips the sum when it would be costly (auto), and runs it on request", () => {
    const skipped = schwarzschildHorizonRate(input(2 + 1e-9, "radial"));
    expect(skipped.multipoleStatus).toBe("skipped");
    expect(skipped.lMax).toBeNull();
    expect(skipped.flags.map((flag) => flag.code)).toContain("multipole-check-skipped");
    const forced = schwarzschildHorizonRate(input(2 + 1e-7, "tangential", { multipoleCheck: "always" }));
    expect(forced.multipoleStatus).toBe("converged");
    expect(forced.relativeTolerance).toBeLessThan(1e-11);
    expect(forced.lMax).toBeGreaterThan(10_000);
  });
});

describe("ratio curve for the methods page", () => {
  it("tends to 2/(3π²) and 1/(6π²) far away and grows as (b/M − 2)^(−3/2) near the horizon", () => {
    const [near, far] = ratioCurve([2 + 1e-6, 1e7]);
    expect(far.radial).toBeCloseTo(2 / (3 * Math.PI ** 2), 6);
    expect(far.tangential).toBeCloseTo(1 / (6 * Math.PI ** 2), 6);
    // Tangential: (1/(6π²)) f^{−3/2} with f = ε/(2 + ε) → (2/ε)^{3/2}/(6π²); the radial ratio approaches it.
    const limit = 2 ** 1.5 / (6 * Math.PI ** 2);
    expect(near.tangential * 1e-9 / limit).toBeCloseTo(1, 5);
    expect(near.radial * 1e-9 / limit).toBeCloseTo(1, 5);
  });
});
