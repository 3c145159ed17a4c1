/**
 * The same hold rate by a route that shares nothing with the module but the physical constants:
 *   field   — the ℓ-mode solutions of the static Maxwell equation on Schwarzschild (Legendre functions of the second
 *             kind in r/M − 1; R. Hanni & R. Ruffini, PRD 8, 3259 (1973); J. M. Cohen & R. M. Wald, J. Math. Phys. 12,
 *             1845 (1971)), assembled into the point-charge Green's function, with Q_ℓ from Heine's integral by
 *             quadrature — not the Copson–Linet closed form, not the module's recurrence;
 *   horizon — the membrane picture: a surface resistivity 1/(ε0 c) ≈ 377 Ω, charge conservation on the horizon and
 *             Joule heating (Znajek, MNRAS 179, 457 (1977); Damour, PRD 18, 3598 (1978); Thorne, Price & Macdonald,
 *             "Black Holes: The Membrane Paradigm" (1986) — all from memory);
 *   noise   — fluctuation–dissipation (Callen & Welton, Phys. Rev. 83, 34 (1951)) at the local Tolman temperature
 *             T_H/√(1 − 2GM/(c²b)), T_H = ħc³/(8πGMk_B) (Hawking 1975), instead of the horizon quantisation formula.
 */
import { describe, expect, it } from "vitest";
import { G, c, elementaryCharge, epsilon0, hbar, kB, solarMass } from "@/physics/constants";
import { horizonFieldMultipoles, legendreQ, schwarzschildHorizonRate } from "@/physics/horizon/schwarzschild-exact";

// ---- Legendre functions of the second kind from Heine's integral ----
// Q_ℓ(x) = ∫_0^∞ dt / (x + √(x²−1) cosh t)^{ℓ+1}, x > 1 (Heine; Whittaker & Watson §15.33, from memory), and, by
// differentiating under the integral, Q_ℓ'(x) = −(ℓ+1) ∫_0^∞ (1 + x cosh t/√(x²−1)) / (x + √(x²−1) cosh t)^{ℓ+2} dt.
// The integrands are even and analytic in a strip |Im t| < π, so the trapezoid rule converges exponentially.
function heine(l: number, x: number): { q: number; dq: number } {
  const s = Math.sqrt(x * x - 1);
  const tMax = Math.log((2 * (x + 1)) / s) + 45 / (l + 1) + 2;
  const h = 0.01;
  let q = 0;
  let dq = 0;
  for (let k = 0; k * h <= tMax; k++) {
    const t = k * h;
    const weight = k === 0 ? 0.5 : 1;
    const base = x + s * Math.cosh(t);
    q += weight * base ** -(l + 1);
    dq += weight * (1 + (x * Math.cosh(t)) / s) * base ** -(l + 2);
  }
  return { q: q * h, dq: -(l + 1) * dq * h };
}

function legendrePAndDerivative(l: number, x: number): { p: number; dp: number } {
  let p0 = 1;
  let p1 = x;
  if (l === 0) return { p: 1, dp: 0 };
  for (let k = 1; k < l; k++) [p0, p1] = [p1, ((2 * k + 1) * x * p1 - k * p0) / (k + 1)];
  return { p: p1, dp: (l * (x * p1 - p0)) / (x * x - 1) };
}

// ---- ℓ-modes of A_t on Schwarzschild (M = 1, r = x + 1) ----
// With Φ = R(r) P_ℓ(cos θ) the static equation ∂_r(r² ∂_rΦ) + (1/(f sin θ)) ∂_θ(sin θ ∂_θΦ) = 0 becomes
//   d/dr(r² R') = ℓ(ℓ+1) R / f,   f = (x − 1)/(x + 1),
// solved by R_in = (x − 1) P_ℓ'(x) (regular on the horizon) and R_out = (x − 1) Q_ℓ'(x) (decaying as r^{−ℓ−1}).
// Legendre's equation (1 − x²)Q'' = 2xQ' − ℓ(ℓ+1)Q gives dR_out/dx = [ℓ(ℓ+1)Q − (x − 1)Q'] / (x + 1).
// The same equation for P gives dR_in/dx = [ℓ(ℓ+1)P − (x − 1)P'] / (x + 1).
const rIn = (l: number, x: number) => (x - 1) * legendrePAndDerivative(l, x).dp;
function rInDerivative(l: number, x: number): number {
  const { p, dp } = legendrePAndDerivative(l, x);
  return (l * (l + 1) * p - (x - 1) * dp) / (x + 1);
}
const rOut = (l: number, x: number) => (x - 1) * heine(l, x).dq;
function rOutDerivative(l: number, x: number): number {
  const { q, dq } = heine(l, x);
  return (l * (l + 1) * q - (x - 1) * dq) / (x + 1);
}

// Green's function. For q at r = b on the axis (Gaussian units), ∇_μF^{μt} = −4π j^t with
// j^t = q δ(r − b) δ²(Ω)/r², and δ²(Ω) → Σ_ℓ (2ℓ+1) P_ℓ(cos θ)/(4π) on the axis, so each mode obeys
//   (r² Φ_ℓ')' − ℓ(ℓ+1) Φ_ℓ/f = −q (2ℓ+1) δ(r − b),   Φ_ℓ = A_ℓ R_in(r<) R_out(r>),   A_ℓ = −q(2ℓ+1)/(r²W),
// where r²W = r²(R_in R_out' − R_in' R_out) is constant (Abel) and equals ℓ(ℓ+1), from the large-r forms
// P_ℓ ~ p x^ℓ, Q_ℓ ~ s x^{−ℓ−1} with p s = 1/(2ℓ+1). On the horizon R_in'(x = 1) = P_ℓ'(1) = ℓ(ℓ+1)/2, so the
// normal field E_r̂ = −∂_rΦ has Legendre coefficients (units q/M²)
//   e_ℓ = −A_ℓ R_in'(1) R_out(x_b) = ((2ℓ+1)/2) R_out(x_b),   x_b = b/M − 1,   and e_0 = 0 (no charge on the hole).
const greenCoefficient = (l: number, bOverM: number) => ((2 * l + 1) / 2) * rOut(l, bOverM - 1);
const greenCoefficientSlope = (l: number, bOverM: number) => ((2 * l + 1) / 2) * rOutDerivative(l, bOverM - 1);

describe("ℓ-mode solutions (Hanni–Ruffini, Cohen–Wald)", () => {
  it("solve the radial equation and have the Wronskian r²W = ℓ(ℓ+1)", () => {
    for (const l of [1, 2, 5]) {
      for (const x of [1.3, 2, 6]) {
        const h = 1e-3;
        for (const radial of [(xx: number) => rIn(l, xx), (xx: number) => rOut(l, xx)]) {
          const flux = (xx: number) => ((xx + 1) ** 2 * (radial(xx + h / 2) - radial(xx - h / 2))) / h;
          const lhs = (flux(x + h / 2) - flux(x - h / 2)) / h;
          const rhs = (l * (l + 1) * radial(x) * (x + 1)) / (x - 1);
          expect(lhs / rhs).toBeCloseTo(1, 4); // nested second differences: O(h²) truncation
        }
        const wronskian = (x + 1) ** 2 * (rIn(l, x) * rOutDerivative(l, x) - rInDerivative(l, x) * rOut(l, x));
        expect(wronskian / (l * (l + 1))).toBeCloseTo(1, 11);
      }
    }
  });

  it("give the same horizon multipoles as the closed-form Copson–Linet field", () => {
    for (const bOverM of [2.05, 2.5, 4, 12]) {
      const fromClosedForm = horizonFieldMultipoles(bOverM - 2, 30);
      for (let l = 1; l <= 30; l++) {
        const green = greenCoefficient(l, bOverM);
        expect(Math.abs(fromClosedForm[l] - green)).toBeLessThan(1e-12 * Math.abs(greenCoefficient(1, bOverM)));
      }
    }
  });

  it("agree with the module's Legendre Q from backward recurrence", () => {
    for (const x of [1.01, 1.5, 3, 30]) {
      const q = legendreQ(x - 1, 25);
      for (let l = 0; l <= 25; l++) expect(q[l] / heine(l, x).q).toBeCloseTo(1, 12);
    }
  });
});

// ---- the fluctuation–dissipation route, in SI ----
/**
 * Hold rate per lab second for a charge q displaced by proper length d (radial or tangential) at b:
 * 1. Horizon field (SI): E_r̂ = (q/(4πε0 M²)) Σ e_ℓ P_ℓ, M = GM/c². A radial proper displacement δ moves b by δ√f,
 *    ΔE_ℓ = (q/(4πε0 M³)) ∂e_ℓ/∂x_b · δ√f; a tangential one turns the pattern by δ/b, ΔE = Σ e_ℓ P_ℓ'(μ) sin θ cos φ · δ/b.
 * 2. Membrane: surface charge σ = ε0 E_r̂, conservation ∂_tσ + ∇·J = 0 (t Killing time), J = −∇ψ, ∇²ψ = ∂_tσ on the
 *    sphere R_H = 2M, and Joule heating P_K = (1/(ε0 c)) ∫ J² dA. With ∫|∇ψ|² dA = R_H⁴ Σ |σ̇_ℓm|²/(ℓ(ℓ+1)) and the
 *    norms ∫P_ℓ² dΩ = 4π/(2ℓ+1), ∫(P_ℓ' sin θ cos φ)² dΩ = 2πℓ(ℓ+1)/(2ℓ+1):
 *      𝒩_rad = Σ 4π R_H⁴ ΔE_ℓ²/((2ℓ+1)ℓ(ℓ+1)),   𝒩_tan = Σ 2π R_H⁴ ΔE_ℓ²/(2ℓ+1)   (per unit δ²),
 *    and for δ = δ₀ cos(ω_K t): P_K = (ε0/c) (ω_K² δ₀²/2) 𝒩.
 * 3. Lab frame: ω_K = √f ω and lab energy per lab time is P_K/f, so P_lab = (ε0/c)(ω² δ₀²/2) 𝒩. For a dipole p = qδ,
 *    P_lab = (ω/2) Im χ(ω) |p₀|², hence Im χ(ω)/ω = ε0 𝒩/(c q²).
 * 4. Fluctuation–dissipation: S(0) = 2 k_B T_loc Im χ(ω)/ω, T_loc = T_H/√f; rate = q² d² S(0)/ħ².
 */
function fluctuationDissipationRate(kg: number, bOverM: number, q: number, d: number, axis: "radial" | "tangential"): number {
  const mass = (G * kg) / (c * c);
  const lapse = Math.sqrt(1 - 2 / bOverM);
  const fieldScale = q / (4 * Math.PI * epsilon0 * mass * mass);
  const horizonRadius = 2 * mass;
  let norm = 0;
  for (let l = 1; l <= 80; l++) {
    if (axis === "radial") {
      const deltaE = ((fieldScale * greenCoefficientSlope(l, bOverM)) / mass) * lapse;
      norm += (4 * Math.PI * horizonRadius ** 4 * deltaE ** 2) / ((2 * l + 1) * l * (l + 1));
    } else {
      const deltaE = (fieldScale * greenCoefficient(l, bOverM)) / (bOverM * mass);
      norm += (2 * Math.PI * horizonRadius ** 4 * deltaE ** 2) / (2 * l + 1);
    }
  }
  const imChiOverOmega = (epsilon0 * norm) / (c * q * q);
  const hawkingTemperature = (hbar * c ** 3) / (8 * Math.PI * G * kg * kB);
  const noiseAtZero = 2 * kB * (hawkingTemperature / lapse) * imChiOverOmega;
  return (q * q * d * d * noiseAtZero) / (hbar * hbar);
}

describe("fluctuation–dissipation route", () => {
  it("reproduces the horizon-method rate at every radius, radial and tangential", () => {
    const kg = 4e6 * solarMass.value;
    const mass = (G * kg) / (c * c);
    for (const bOverM of [2.05, 2.3, 3, 5, 10, 40]) {
      for (const axis of ["radial", "tangential"] as const) {
        const independent = fluctuationDissipationRate(kg, bOverM, elementaryCharge.value, 1e-6, axis);
        const module = schwarzschildHorizonRate({
          massKg: kg,
          labArealRadiusMetres: bOverM * mass,
          chargeCoulombs: elementaryCharge.value,
          separationMetres: 1e-6,
          axis,
        }).ratePerLabSecond;
        expect(module / independent).toBeCloseTo(1, 10);
      }
    }
  });
});
