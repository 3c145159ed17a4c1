import { arctanSqueeze } from "./compactify";
import { staticLabBackground } from "./static-lab";
import type { Background } from "./types";

/**
 * Flat spacetime with an inertial lab at rest at the origin. No horizon, no acceleration, zero temperature.
 *
 * The chart is the plane through the lab along the separation axis: its "radial" coordinate is the signed position
 * x along that axis (the lab at x = 0, r* = x), so both branches, on either side of the lab, have a place on it.
 * Diagram: P = (2/π) arctan((ct − x)/L), Q = (2/π) arctan((ct + x)/L), T = (P + Q)/2, X = (Q − P)/2 — the usual
 * arctan compactification of (1+1) Minkowski space (e.g. Hawking & Ellis, The Large Scale Structure of Space-Time
 * (1973), §5.1, up to the factor 2/π): the diamond |T| + |X| < 1 with i⁺ = (1, 0), i⁻ = (−1, 0), i⁰ = (0, ±1), the
 * lab on its vertical diagonal X = 0. L only sets where finite points sit; it is the caller's choice of drawing scale.
 */
export function makeMinkowski(diagramLengthScaleMetres: number): Background {
  const squeeze = arctanSqueeze(diagramLengthScaleMetres);
  return staticLabBackground({
    kind: "minkowski",
    horizon: null,
    position: { rMetres: 0, lapse: 1, lapseDeficit: 0, properDistanceToHorizonMetres: Number.POSITIVE_INFINITY },
    accelerationMetresPerSecondSquared: 0,
    chart: {
      tortoiseMetres: (xMetres) => xMetres,
      radiusFromTortoiseMetres: (tortoiseMetres) => tortoiseMetres,
    },
    squeezes: { p: squeeze, q: squeeze },
    flags: [],
  });
}
