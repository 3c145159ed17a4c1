/**
 * Shared machinery of the conformal (Penrose) diagrams.
 *
 * Every background is drawn through its null coordinates u = ct − r*, v = ct + r* (metres). Each is squeezed into
 * [−1, 1] by a monotone function, P = p(u), Q = q(v), and the diagram point is T = (P + Q)/2, X = (Q − P)/2. Lines
 * of constant u (outgoing light) are then T − X = const (45° up to the right), lines of constant v (ingoing light)
 * T + X = const (45° up to the left), whatever the squeezing functions are: that is what makes the diagram conformal
 * in the t–r plane. The functions are written to stay finite and accurate for any double argument.
 */
import { c } from "../constants";
import type { ConformalMap, DiagramPoint } from "./types";

/** A monotone squeeze of one null coordinate (metres) into an interval of [−1, 1], with its inverse. */
export interface NullSqueeze {
  squeeze(nullMetres: number): number;
  /** Inverse of squeeze; null outside the squeezed interval. */
  unsqueeze(value: number): number | null;
}

/** tan(π y/2) for |y| < 1, computed from 1 − |y| when |y| > 1/2 so that values near ±1 keep their precision. */
function tanHalfPi(y: number): number {
  const m = Math.abs(y);
  const t = m <= 0.5 ? Math.tan((Math.PI * m) / 2) : 1 / Math.tan((Math.PI * (1 - m)) / 2);
  return Math.sign(y) * t;
}

const inOpenUnitInterval = (y: number, low: number) => y > low && y < 1;

/** (2/π) arctan(x): ℝ → (−1, 1). The Minkowski squeeze, with x = null coordinate / length scale. */
export function arctanSqueeze(lengthScaleMetres: number): NullSqueeze {
  return {
    squeeze: (w) => (2 / Math.PI) * Math.atan(w / lengthScaleMetres),
    unsqueeze: (y) => (inOpenUnitInterval(y, -1) ? lengthScaleMetres * tanHalfPi(y) : null),
  };
}

/** (2/π) arctan(e^x): ℝ → (0, 1), evaluated as 1 − (2/π) arctan(e^−x) for x > 0 so it never overflows. */
export function arctanExp(x: number): number {
  return x <= 0 ? (2 / Math.PI) * Math.atan(Math.exp(x)) : 1 - (2 / Math.PI) * Math.atan(Math.exp(-x));
}

/** Inverse of arctanExp on (0, 1): ln tan(πy/2). */
function inverseArctanExp(y: number): number {
  return y <= 0.5 ? Math.log(Math.tan((Math.PI * y) / 2)) : -Math.log(Math.tan((Math.PI * (1 - y)) / 2));
}

/**
 * The Kruskal–Szekeres squeeze of a horizon with surface gravity κ (s^-1): Kruskal U = −e^{−κu/c}, V = e^{κv/c}, then
 * P = (2/π) arctan U ∈ (−1, 0), Q = (2/π) arctan V ∈ (0, 1). Used for the Schwarzschild exterior (κ = c³/4GM) and,
 * with κ = a/c, for the Rindler wedge, where U, V are the inertial null coordinates (ct ∓ x)·a/c² themselves.
 */
export function kruskalSqueezes(surfaceGravityPerSecond: number, tortoiseOriginMetres = 0): { p: NullSqueeze; q: NullSqueeze } {
  const k = surfaceGravityPerSecond / c;
  // Measuring r* from tortoiseOriginMetres scales U and V alike by e^{−κ r*₀/c}: the free scale of the Kruskal chart.
  const o = tortoiseOriginMetres;
  return {
    p: {
      squeeze: (u) => -arctanExp(-k * (u + o)),
      unsqueeze: (y) => (inOpenUnitInterval(-y, 0) ? -inverseArctanExp(-y) / k - o : null),
    },
    q: {
      squeeze: (v) => arctanExp(k * (v - o)),
      unsqueeze: (y) => (inOpenUnitInterval(y, 0) ? inverseArctanExp(y) / k + o : null),
    },
  };
}

/**
 * The global de Sitter squeeze for Hubble rate H: (2/π) arctan(sinh(Hw/c)) (the Gudermannian, normalised), ℝ → (−1, 1).
 * It is what the static null coordinates become in global conformal time η and polar angle χ:
 * η ± χ = 2 arctan(e^{Hv/c or Hu/c}) − π/2 (derived from the hyperboloid embedding; see de-sitter.ts).
 */
export function gudermannianSqueeze(hubbleRatePerSecond: number): NullSqueeze {
  const k = hubbleRatePerSecond / c;
  return {
    squeeze: (w) => (2 / Math.PI) * Math.atan(Math.sinh(k * w)),
    unsqueeze: (y) => (inOpenUnitInterval(y, -1) ? Math.asinh(tanHalfPi(y)) / k : null),
  };
}

/** (P, Q) → (T, X) = ((P + Q)/2, (Q − P)/2). */
export function diagramPointFromNull(P: number, Q: number): DiagramPoint {
  return { T: (P + Q) / 2, X: (Q - P) / 2 };
}

/** (T, X) → (P, Q) = (T − X, T + X), the inverse of diagramPointFromNull. */
export function nullFromDiagramPoint(point: DiagramPoint): { P: number; Q: number } {
  return { P: point.T - point.X, Q: point.T + point.X };
}

/** The radial part of a static chart: the tortoise coordinate and its inverse. */
export interface StaticChart {
  tortoiseMetres(rMetres: number): number;
  radiusFromTortoiseMetres(tortoiseMetres: number): number | null;
}

/**
 * The conformal map of a static chart: (t, r) → (u, v) → (P, Q) → (T, X), and back. fromDiagram returns null off
 * the chart, including points that rounding has put on its boundary.
 */
export function staticConformalMap(chart: StaticChart, p: NullSqueeze, q: NullSqueeze): ConformalMap {
  const atTortoise = (tSeconds: number, rStar: number) => diagramPointFromNull(p.squeeze(c * tSeconds - rStar), q.squeeze(c * tSeconds + rStar));
  return {
    toDiagram: (tSeconds, rMetres) => atTortoise(tSeconds, chart.tortoiseMetres(rMetres)),
    toDiagramAtTortoise: atTortoise,
    fromDiagram(point) {
      const { P, Q } = nullFromDiagramPoint(point);
      const u = p.unsqueeze(P);
      const v = q.unsqueeze(Q);
      if (u === null || v === null) return null;
      const rMetres = chart.radiusFromTortoiseMetres((v - u) / 2);
      return rMetres === null ? null : { tSeconds: (u + v) / (2 * c), rMetres };
    },
  };
}
