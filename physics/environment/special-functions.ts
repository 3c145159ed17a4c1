/**
 * Special functions of the environmental channels, in closed form so that a decoherence function costs tens of
 * operations, not a quadrature: the Riemann ζ, Dawson's integral, and the Bose sums Σ_{n≥1}(n − ia)^{−m} that
 * turn the thermal integrals ∫ y^s e^{±iay}/(e^y − 1) dy into sums over the expansion 1/(e^y − 1) = Σ e^{−ny}.
 */

/** ζ(s) for s ≥ 2 by direct summation with the Euler–Maclaurin tail ∫_N^∞ + ½N^{−s} + (s/12)N^{−s−1} (common practice). */
export function riemannZeta(s: number): number {
  const N = 64;
  let sum = 0;
  for (let n = 1; n < N; n++) sum += n ** -s;
  return sum + N ** (1 - s) / (s - 1) + 0.5 * N ** -s + (s / 12) * N ** (-s - 1);
}

const RYBICKI_STEP = 0.2;
const RYBICKI_TERMS = 16; // (2·16 − 1)·0.2 = 6.2: e^{−6.2²} ≈ 2e-17
const rybickiWeights = Array.from({ length: RYBICKI_TERMS }, (_, i) => Math.exp(-(((2 * i + 1) * RYBICKI_STEP) ** 2)));

/**
 * 1 − D(x)/x for x ≥ 0, with D Dawson's integral e^{−x²}∫₀^x e^{t²}dt. Below 0.5 by its series
 * Σ_{n≥1} (−1)^{n+1} 2ⁿ x^{2n}/(2n+1)!! (no cancellation); above by Rybicki's sum D(x) ≈ π^{−1/2} Σ_{n odd}
 * e^{−(x−nh)²}/n, h = 0.2, error ~e^{−(π/2h)²} (G. B. Rybicki, Computers in Physics 3, 85 (1989); Numerical Recipes,
 * 3rd ed. §6.9.1).
 */
export function oneMinusDawsonOverX(x: number): number {
  if (x < 0.5) {
    let term = 1;
    let sum = 0;
    for (let n = 1; n < 60; n++) {
      term *= (-2 * x * x) / (2 * n + 1);
      sum -= term;
      if (Math.abs(term) < 1e-18 * Math.abs(sum)) break;
    }
    return sum;
  }
  const n0 = 2 * Math.round((0.5 * x) / RYBICKI_STEP);
  const xp = x - n0 * RYBICKI_STEP;
  let e1 = Math.exp(2 * xp * RYBICKI_STEP);
  const e2 = e1 * e1;
  let d1 = n0 + 1;
  let d2 = d1 - 2;
  let sum = 0;
  for (let i = 0; i < RYBICKI_TERMS; i++, d1 += 2, d2 -= 2, e1 *= e2) sum += rybickiWeights[i] * (e1 / d1 + 1 / (d2 * e1));
  const dawson = (Math.exp(-xp * xp) * sum) / Math.sqrt(Math.PI);
  return 1 - dawson / x;
}

export interface Complex {
  re: number;
  im: number;
}

/** (n − ia)^{−m} by its polar form. */
function inversePower(n: number, a: number, m: number): Complex {
  const modulus = Math.hypot(n, a) ** -m;
  const angle = -m * Math.atan2(-a, n);
  return { re: modulus * Math.cos(angle), im: modulus * Math.sin(angle) };
}

const DIRECT_TERMS = 16;

/**
 * B_m(a) = Σ_{n≥1} (n − ia)^{−m}, m ≥ 2: the first 15 terms directly, the rest by Euler–Maclaurin from N = 16,
 * ∫_N^∞ + f(N)/2 − f′(N)/12 + f‴(N)/720 − f⁽⁵⁾(N)/30240 + f⁽⁷⁾(N)/1209600 (Abramowitz & Stegun 23.1.30), error ≲ 1e-15.
 */
export function boseSum(m: number, a: number): Complex {
  let re = 0;
  let im = 0;
  for (let n = 1; n < DIRECT_TERMS; n++) {
    const t = inversePower(n, a, m);
    re += t.re;
    im += t.im;
  }
  const N = DIRECT_TERMS;
  const integral = inversePower(N, a, m - 1);
  const f = inversePower(N, a, m);
  const d1 = inversePower(N, a, m + 1);
  const d3 = inversePower(N, a, m + 3);
  const d5 = inversePower(N, a, m + 5);
  const d7 = inversePower(N, a, m + 7);
  const c1 = -m;
  const c3 = -m * (m + 1) * (m + 2);
  const c5 = c3 * (m + 3) * (m + 4);
  const c7 = c5 * (m + 5) * (m + 6);
  const tail = (part: "re" | "im") =>
    integral[part] / (m - 1) + f[part] / 2 - (c1 * d1[part]) / 12 + (c3 * d3[part]) / 720 - (c5 * d5[part]) / 30240 + (c7 * d7[part]) / 1209600;
  return { re: re + tail("re"), im: im + tail("im") };
}
