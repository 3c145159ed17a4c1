/**
 * Points of the black-hole interior (region II, 0 ≤ r < r_s) on the Schwarzschild diagram, for drawing.
 *
 * Inside, the Kruskal coordinates are U = e^{−κu/c}, V = e^{κv/c} (both positive), u, v = ct ∓ r*, with
 * r* = r + r_s ln(1 − r/r_s), so UV = (1 − r/r_s) e^{r/r_s} and V/U = e^{ct/r_s}. The diagram uses
 * P = (2/π) arctan U, Q = (2/π) arctan V as outside, so region II is the triangle (0, 0), (½, −½), (½, ½).
 * The singularity r = 0 is UV = 1, and arctan U + arctan V = π/2 there: with this (unit) Kruskal scale it is the
 * straight segment T = ½, |X| ≤ ½. Rescaling U, V by any other constant before the arctan would bend it.
 */
import { c } from "../constants";
import { arctanExp, diagramPointFromNull } from "./compactify";
import type { DiagramPoint } from "./types";

/** Region II point (Killing time t in seconds, areal radius 0 ≤ r < r_s) → diagram point; null outside region II. */
export function blackHoleInteriorToDiagram(horizonRadiusMetres: number, tSeconds: number, rMetres: number): DiagramPoint | null {
  if (!(rMetres >= 0 && rMetres < horizonRadiusMetres)) return null;
  const k = 1 / (2 * horizonRadiusMetres);
  const rStar = rMetres + horizonRadiusMetres * Math.log1p(-rMetres / horizonRadiusMetres);
  const ct = c * tSeconds;
  return diagramPointFromNull(arctanExp(-k * (ct - rStar)), arctanExp(k * (ct + rStar)));
}

/** The singularity r = 0 as a polyline of `samples` points from (½, −½) to (½, ½). */
export function singularityCurve(samples: number): DiagramPoint[] {
  return Array.from({ length: samples }, (_, i) => diagramPointFromNull(1 - i / (samples - 1), i / (samples - 1)));
}
