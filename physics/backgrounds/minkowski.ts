import { arctanSqueeze } from "./compactify";
import { staticLabBackground } from "./static-lab";
import type { Background } from "./types";

/**
 * Flat spacetime with an inertial lab at the centre r = 0. No horizon, no acceleration, zero temperature; r* = r.
 *
 * Diagram: P = (2/π) arctan((ct − r)/L), Q = (2/π) arctan((ct + r)/L), T = (P + Q)/2, X = (Q − P)/2 — the usual
 * arctan compactification (e.g. Hawking & Ellis, The Large Scale Structure of Space-Time (1973), §5.1, up to the
 * factor 2/π). The half plane r ≥ 0 becomes the triangle with i⁺ = (1, 0), i⁰ = (0, 1), i⁻ = (−1, 0); r = 0 is
 * the segment X = 0. L only sets where finite points sit; it is the caller's choice of drawing scale.
 */
export function makeMinkowski(diagramLengthScaleMetres: number): Background {
  const squeeze = arctanSqueeze(diagramLengthScaleMetres);
  return staticLabBackground({
    kind: "minkowski",
    horizon: null,
    position: { rMetres: 0, lapse: 1, lapseDeficit: 0, properDistanceToHorizonMetres: Number.POSITIVE_INFINITY },
    accelerationMetresPerSecondSquared: 0,
    chart: {
      tortoiseMetres: (rMetres) => (rMetres >= 0 ? rMetres : Number.NaN),
      radiusFromTortoiseMetres: (tortoiseMetres) => (tortoiseMetres >= 0 ? tortoiseMetres : null),
    },
    squeezes: { p: squeeze, q: squeeze },
    flags: [],
  });
}
