import { c } from "../constants";
import { kruskalSqueezes } from "./compactify";
import { killingHorizon } from "./horizon-temperature";
import { staticLabBackground } from "./static-lab";
import type { Background } from "./types";

/**
 * The Rindler wedge of flat spacetime, seen by a lab of constant proper acceleration a.
 *
 * Chart: x = ξ cosh(at/c), ct_inertial = ξ sinh(at/c), ds² = −(aξ/c²)² c²dt² + dξ² (W. Rindler, Am. J. Phys. 34,
 * 1174 (1966)); r is ξ, the proper distance from the horizon, and t is normalised to the lab's proper time, so the
 * lab sits at ξ = c²/a with redshift factor 1. Tortoise r* = (c²/a) ln(aξ/c²) (zero at the lab). Horizon: the null
 * planes ct = ±x, surface gravity κ = a/c with respect to the lab's time, Unruh temperature ħa/(2πck_B).
 *
 * Diagram: the inertial null coordinates ct ∓ x = ∓(c²/a) e^{∓a(ct ∓ r*)/c²} go through the Minkowski arctan
 * compactification with scale c²/a, so the wedge is the right quarter U < 0 < V of the full (1+1) Minkowski diamond
 * |T| + |X| < 1, with the horizons H± on the 45° lines through the origin.
 */
export function makeRindler(accelerationMetresPerSecondSquared: number): Background {
  const labDistanceMetres = (c * c) / accelerationMetresPerSecondSquared;
  const surfaceGravityPerSecond = accelerationMetresPerSecondSquared / c;
  return staticLabBackground({
    kind: "rindler",
    horizon: killingHorizon("acceleration", surfaceGravityPerSecond, 0),
    position: { rMetres: labDistanceMetres, lapse: 1, lapseDeficit: 0, properDistanceToHorizonMetres: labDistanceMetres },
    accelerationMetresPerSecondSquared,
    chart: {
      tortoiseMetres: (rMetres) => labDistanceMetres * Math.log(rMetres / labDistanceMetres),
      radiusFromTortoiseMetres: (rStar) => labDistanceMetres * Math.exp(rStar / labDistanceMetres),
    },
    squeezes: kruskalSqueezes(surfaceGravityPerSecond),
    flags: [],
  });
}
