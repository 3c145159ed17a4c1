/**
 * The closed-form field of a static charge outside a Schwarzschild hole (Copson 1928, Linet 1976) and the horizon
 * quantities built on it. Units: Gaussian, G = c = 1, lengths in M; the module returns Φ·M/q and E·M²/q.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { create, all } from "mathjs";
import {
  copsonLinetPotential,
  horizonFieldMultipoles,
  horizonNormalField,
  horizonNormalFieldAt,
  radialMemoryNorm,
  tangentialMemoryNorm,
} from "@/physics/horizon/schwarzschild-exact";

/** Gauss–Legendre nodes and weights on [−1, 1] (Newton on P_n; Golub–Welsch would do as well). */
function gaussLegendre(n: number): { nodes: number[]; weights: number[] } {
  const nodes: number[] = [];
  const weights: number[] = [];
  for (let i = 1; i <= n; i++) {
    let z = Math.cos((Math.PI * (i - 0.25)) / (n + 0.5));
    let derivative = 1;
    for (let iteration = 0; iteration < 100; iteration++) {
      let p1 = 1;
      let p0 = 0;
      for (let j = 1; j <= n; j++) {
        const pm = p0;
        p0 = p1;
        p1 = ((2 * j - 1) * z * p0 - (j - 1) * pm) / j;
      }
      derivative = (n * (z * p1 - p0)) / (z * z - 1);
      const step = p1 / derivative;
      z -= step;
      if (Math.abs(step) < 1e-16) break;
    }
    nodes.push(z);
    weights.push(2 / ((1 - z * z) * derivative * derivative));
  }
  return { nodes, weights };
}

const rule = gaussLegendre(400);
/** ∫_a^b f(μ) dμ by the 400-point rule. */
function integrate(f: (mu: number) => number, a = -1, b = 1): number {
  let sum = 0;
  for (let i = 0; i < rule.nodes.length; i++) sum += rule.weights[i] * f(((b - a) * rule.nodes[i] + (a + b)) / 2);
  return (sum * (b - a)) / 2;
}

function legendreP(l: number, mu: number): number {
  let p0 = 1;
  let p1 = mu;
  if (l === 0) return 1;
  for (let k = 1; k < l; k++) [p0, p1] = [p1, ((2 * k + 1) * mu * p1 - k * p0) / (k + 1)];
  return p1;
}

/** −∂Φ/∂r by a fourth-order central difference (step h in units of M). */
function radialField(r: number, theta: number, b: number, includeLinetMonopole = true, h = 1e-3): number {
  const phi = (rr: number) => copsonLinetPotential(rr, theta, b, { includeLinetMonopole });
  return -(phi(r - 2 * h) - 8 * phi(r - h) + 8 * phi(r + h) - phi(r + 2 * h)) / (12 * h);
}

/** Flux ∮ E_r̂ r² dΩ through the sphere of areal radius r (the charge enclosed times 4π, in Gaussian units). */
function flux(r: number, b: number, includeLinetMonopole = true): number {
  return 2 * Math.PI * r * r * integrate((mu) => radialField(r, Math.acos(mu), b, includeLinetMonopole));
}

describe("Copson–Linet potential", () => {
  // Operator. Schwarzschild, ds² = −f dt² + dr²/f + r² dΩ², f = 1 − 2M/r, √−g = r² sin θ. A static potential
  // A_t = −Φ has F_rt = ∂_r A_t, F_θt = ∂_θ A_t, and F^{rt} = g^{rr} g^{tt} F_rt = −∂_r A_t = ∂_rΦ,
  // F^{θt} = g^{θθ} g^{tt} F_θt = ∂_θΦ/(r² f). The vacuum equation ∇_μ F^{μt} = (1/√−g) ∂_μ(√−g F^{μt}) = 0 reads
  //   (1/r²) [∂_r(r² ∂_rΦ) + (1/(f sin θ)) ∂_θ(sin θ ∂_θΦ)] = 0.
  /** Both terms of the operator by nested central differences (step h), for the Schwarzschild or flat operator. */
  function operatorTerms(r: number, theta: number, b: number, h: number, lapseSquared: number) {
    const phi = (rr: number, tt: number) => copsonLinetPotential(rr, tt, b);
    const dr = (rr: number) => (phi(rr + h / 2, theta) - phi(rr - h / 2, theta)) / h;
    const radial = ((r + h / 2) ** 2 * dr(r + h / 2) - (r - h / 2) ** 2 * dr(r - h / 2)) / h;
    const dth = (tt: number) => (phi(r, tt + h / 2) - phi(r, tt - h / 2)) / h;
    const angular =
      (Math.sin(theta + h / 2) * dth(theta + h / 2) - Math.sin(theta - h / 2) * dth(theta - h / 2)) /
      (h * Math.sin(theta) * lapseSquared);
    return { residual: Math.abs(radial + angular), scale: Math.abs(radial) + Math.abs(angular) };
  }
  const points = fc.tuple(
    fc.double({ min: 2.2, max: 40, noNaN: true }),
    fc.double({ min: 0.2, max: Math.PI - 0.2, noNaN: true }),
    fc.double({ min: 2.5, max: 20, noNaN: true }),
  ).filter(([r, theta, b]) => Math.hypot(r - b * Math.cos(theta), b * Math.sin(theta)) > 0.5);

  /** Natural size of each operator term near (r, θ): |Φ| (r² + 1/f) / (distance to the charge)². */
  function termSize(r: number, theta: number, b: number): number {
    const distance = Math.hypot(r - b * Math.cos(theta), b * Math.sin(theta));
    return (Math.abs(copsonLinetPotential(r, theta, b)) * (r * r + r / (r - 2))) / distance ** 2;
  }

  it("solves the static Maxwell equation on Schwarzschild away from the charge", () => {
    fc.assert(
      fc.property(points, ([r, theta, b]) => {
        // Second-order differences: the residual must be small and must be truncation error, O(h²), so halving h
        // cuts it by ~4 — wherever it stands above the rounding floor ~ ulp × |Φ| (r² + 1/f)/h².
        const h = 2e-3;
        const coarse = operatorTerms(r, theta, b, 2 * h, 1 - 2 / r);
        const fine = operatorTerms(r, theta, b, h, 1 - 2 / r);
        const floor = (1e-13 * Math.abs(copsonLinetPotential(r, theta, b)) * (r * r + r / (r - 2))) / (h * h);
        expect(fine.residual).toBeLessThan(2e-3 * termSize(r, theta, b));
        if (coarse.residual > 10 * floor) expect(fine.residual).toBeLessThan(0.35 * coarse.residual);
      }),
      { numRuns: 300 },
    );
  });

  it("does not solve the flat-space Laplace equation (the check can fail)", () => {
    const h = 2e-3;
    const flatCoarse = operatorTerms(3, 1.1, 4, 2 * h, 1);
    const flatFine = operatorTerms(3, 1.1, 4, h, 1);
    const curved = operatorTerms(3, 1.1, 4, h, 1 - 2 / 3);
    expect(flatFine.residual).toBeGreaterThan(0.9 * flatCoarse.residual);
    expect(flatFine.residual).toBeGreaterThan(1e3 * curved.residual);
  });

  // Gauss: Q_enclosed = (1/4π) ∮ F^{rt} √−g dθ dφ = (1/4π) ∮ (−∂_rΦ) r² dΩ, since g^{tt} g^{rr} = −1 exactly.
  // Without Linet's term the potential lacks qM/(r b), whose field qM/(r² b) has flux 4π qM/b through every sphere:
  // Copson's potential alone therefore puts charge −qM/b on the hole (Linet, J. Phys. A 9, 1081 (1976)).
  it("puts no net charge on the hole with Linet's term, and −qM/b without it", () => {
    for (const b of [2.3, 3, 7, 25]) {
      expect(Math.abs(flux(2, b))).toBeLessThan(1e-9);
      expect(flux(2, b, false) / (4 * Math.PI)).toBeCloseTo(-1 / b, 9);
    }
  });

  it("encloses exactly the charge q on a sphere outside the charge, and none inside it", () => {
    for (const b of [3, 7]) {
      expect(flux(2 * b, b) / (4 * Math.PI)).toBeCloseTo(1, 9);
      expect(Math.abs(flux((2 + b) / 2, b))).toBeLessThan(1e-8);
    }
  });

  // Flat limit: with M = 0 the potential is q[r b]/(r b √(r² + b² − 2rb cos θ)) = Coulomb's q/|x − x_q| exactly,
  // so for a hole of mass length M at fixed r, b the deviation is O(M/r).
  it("tends to Coulomb's law as M → 0", () => {
    const r = 3;
    const b = 5;
    const theta = 0.7;
    const coulomb = 1 / Math.sqrt(r * r + b * b - 2 * r * b * Math.cos(theta));
    const deviation = (m: number) => Math.abs(copsonLinetPotential(r / m, theta, b / m) / m / coulomb - 1);
    for (const m of [1e-2, 1e-4, 1e-6]) expect(deviation(m)).toBeLessThan((3 * m) / r);
    expect(deviation(1e-4) / deviation(1e-2)).toBeCloseTo(1e-2, 2);
  });

  it("makes the horizon an equipotential at Φ = q/b", () => {
    for (const b of [2.01, 3, 50]) {
      for (const theta of [0, 0.4, 1.9, Math.PI]) expect(copsonLinetPotential(2, theta, b) * b).toBeCloseTo(1, 12);
    }
  });
});

describe("normal field on the horizon", () => {
  // Differentiating Φ at r = 2M (u = 1, where D = B − cos θ) gives E_r̂ = (1 + μ² − 2Bμ)/(2x(B − μ)²), x = b/M,
  // B = x − 1, μ = cos θ; the module evaluates it as (t² − 2ε(1−t))/(2x(ε+t)²), t = 1 − μ, ε = x − 2.
  it("equals −∂Φ/∂r of the closed-form potential at r = 2M", () => {
    for (const b of [2.2, 3, 9]) {
      for (const theta of [0.1, 0.8, 2, 3]) {
        expect(horizonNormalField(theta, b - 2)).toBeCloseTo(radialField(2, theta, b), 7);
      }
    }
  });

  // Reference values in 60-digit arithmetic (mathjs BigNumber) of the unrearranged expression, where B − μ and
  // 1 + μ² − 2Bμ are exact: near the horizon double precision would lose ~9 digits in B − μ, far away none.
  it("keeps full precision at b/M = 2 + 1e-9 and at b/M = 1e8", () => {
    const big = create(all, { number: "BigNumber", precision: 60 });
    const reference = (eps: string, t: string): number => {
      const x = big.add(big.bignumber(2), big.bignumber(eps));
      const bigB = big.subtract(x, 1);
      const mu = big.subtract(1, big.bignumber(t));
      const numerator = big.subtract(big.add(1, big.multiply(mu, mu)), big.multiply(2, big.multiply(bigB, mu)));
      const gap = big.subtract(bigB, mu);
      return Number(big.divide(numerator, big.multiply(big.multiply(2, x), big.multiply(gap, gap))));
    };
    for (const [eps, t] of [["1e-9", "0"], ["1e-9", "3e-10"], ["1e-9", "1e-6"], ["1e8", "1e-3"], ["1e8", "1.5"]]) {
      const value = horizonNormalFieldAt(Number(t), Number(eps));
      expect(Math.abs(value / reference(eps, t) - 1)).toBeLessThan(1e-14);
    }
  });

  // Legendre projection e_ℓ = ((2ℓ+1)/2) ∫ E(μ) P_ℓ(μ) dμ by quadrature, against the module's coefficients from
  // Heine's expansion 1/(B − μ) = Σ (2ℓ+1) Q_ℓ(B) P_ℓ(μ).
  it("has Legendre coefficients matching a direct quadrature projection, with no monopole", () => {
    for (const b of [2.5, 4, 10]) {
      const coefficients = horizonFieldMultipoles(b - 2, 20);
      const field = (mu: number) => horizonNormalFieldAt(1 - mu, b - 2);
      expect(Math.abs(coefficients[0])).toBe(0);
      expect(Math.abs(integrate(field))).toBeLessThan(1e-14);
      for (let l = 1; l <= 20; l++) {
        const projected = ((2 * l + 1) / 2) * integrate((mu) => field(mu) * legendreP(l, mu));
        expect(coefficients[l]).toBeCloseTo(projected, 12);
      }
    }
  });
});

describe("horizon memory norm in closed form", () => {
  // Tangential: ∫|Dχ|² dΩ = (Δθ₀²/2) ∫ E² dΩ (Parseval, see horizon-memory.ts); by quadrature.
  it("tangential: equals half the horizon integral of E_r̂², by quadrature", () => {
    for (const b of [2.3, 3, 8, 40]) {
      const field = (mu: number) => horizonNormalFieldAt(1 - mu, b - 2);
      const byQuadrature = 0.5 * 2 * Math.PI * integrate((mu) => field(mu) ** 2);
      expect(tangentialMemoryNorm(b - 2) / byQuadrature).toBeCloseTo(1, 11);
    }
  });

  // Radial: axisymmetric constraint on the unit sphere, d/dμ[(1−μ²) χ'] = ΔE, so (1 − μ²)χ' = F(μ) = ∫_{−1}^{μ} ΔE,
  // and ∫|Dχ|² dΩ = 2π ∫ (1−μ²) χ'² dμ = 2π ∫ F²/(1 − μ²) dμ. Here F is integrated numerically and ∂_B taken by
  // a central difference in B — nothing of the module but the field itself.
  it("radial: equals 2π∫(∂_B F)²/(1−μ²) with F the integrated field, by nested quadrature", () => {
    for (const b of [2.4, 3, 8, 40]) {
      const h = 1e-4;
      const cumulative = (bb: number, mu: number) => integrate((m) => horizonNormalFieldAt(1 - m, bb - 2), -1, mu);
      const dF = (mu: number) => (cumulative(b + h, mu) - cumulative(b - h, mu)) / (2 * h);
      const byQuadrature = 2 * Math.PI * integrate((mu) => dF(mu) ** 2 / (1 - mu * mu));
      expect(radialMemoryNorm(b - 2) / byQuadrature).toBeCloseTo(1, 7);
    }
  });
});
