import { c } from "../constants";
import { gudermannianSqueeze } from "./compactify";
import { killingHorizon } from "./horizon-temperature";
import { nearHorizonPrecisionFlag } from "./flags";
import { staticLabBackground } from "./static-lab";
import type { Background, StaticLabPosition } from "./types";

/** A lab at areal radius 0 ≤ r < c/H. Proper distance to the horizon ∫ dr/√(1 − x²) = (c/H) arccos x = (2c/H) asin√((1 − x)/2). */
export function deSitterPositionAtRadius(rMetres: number, hubbleRatePerSecond: number): StaticLabPosition {
  const x = (hubbleRatePerSecond * rMetres) / c;
  const lapse = Math.sqrt((1 - x) * (1 + x));
  return {
    rMetres,
    lapse,
    lapseDeficit: (x * x) / (1 + lapse),
    properDistanceToHorizonMetres: ((2 * c) / hubbleRatePerSecond) * Math.asin(Math.sqrt((1 - x) / 2)),
  };
}

/**
 * A lab at proper distance ℓ inward from the cosmological horizon (0 < ℓ ≤ πc/2H, the centre being at πc/2H):
 * with θ = Hℓ/c, r = (c/H) cos θ, lapse sin θ and 1 − lapse = 2 sin²(π/4 − θ/2), all exact near the horizon.
 */
export function deSitterPositionAtProperDistance(properDistanceMetres: number, hubbleRatePerSecond: number): StaticLabPosition {
  const theta = (hubbleRatePerSecond * properDistanceMetres) / c;
  return {
    rMetres: (c / hubbleRatePerSecond) * Math.cos(theta),
    lapse: Math.sin(theta),
    lapseDeficit: 2 * Math.sin(Math.PI / 4 - theta / 2) ** 2,
    properDistanceToHorizonMetres: properDistanceMetres,
  };
}

/** How the static patch is scaled on the diagram: the global conformal chart, or with the lab's worldline through its middle. */
export type DeSitterDiagramFrame = "global" | "lab-centred";

/**
 * The rate k (s⁻¹) of the diagram's squeeze (2/π) arctan sinh(k w/c) of both null coordinates. "global": k = H, the
 * global conformal chart. "lab-centred": k = c asinh(1)/r*_lab, so the lab's worldline crosses t = 0 at X = ½, the
 * middle of the static patch, instead of hugging the pole when the lab is near the centre or the horizons' crossing
 * when it is near the horizon. Any increasing squeeze of u and v alike keeps light at 45°, the pole r = 0 on X = 0
 * (u = v there) and the horizons on the diagonals (the squeeze's limits are ±1 whatever k is). A lab at the centre
 * keeps the global chart.
 */
export function deSitterDiagramRatePerSecond(hubbleRatePerSecond: number, labTortoiseMetres: number, frame: DeSitterDiagramFrame): number {
  if (frame === "global" || !(labTortoiseMetres > 0)) return hubbleRatePerSecond;
  return (c * Math.asinh(1)) / labTortoiseMetres;
}

/**
 * A static lab in the de Sitter static patch, ds² = −(1 − H²r²/c²) c²dt² + dr²/(1 − H²r²/c²) + r²dΩ²
 * (e.g. Gibbons & Hawking, Phys. Rev. D 15, 2738 (1977)), t normalised at the centre.
 *
 * - Proper acceleration a = H²r/√(1 − H²r²/c²) (magnitude; the lab is held against the outward drift).
 * - Horizon at r = c/H, surface gravity κ = H, Gibbons–Hawking temperature ħH/(2πk_B).
 * - Local temperature ħ√(a² + c²H²)/(2πck_B) (Narnhofer, Peter & Thirring, Int. J. Mod. Phys. B 10, 1507 (1996);
 *   Deser & Levin, Class. Quantum Grav. 14, L163 (1997)); since a²/c² + H² = H²/(1 − H²r²/c²) this equals the
 *   Tolman value T_GH/√(1 − H²r²/c²), which is how it is computed here.
 * - Tortoise r* = (c/H) artanh(Hr/c) (0 at the centre, +∞ at the horizon).
 * - Diagram: global conformal time η and polar angle χ (the lab's pole at χ = 0) in units of π/2, T = 2η/π,
 *   X = 2χ/π, so the Penrose square is |T| ≤ 1, 0 ≤ X ≤ 2 and the static patch its left quarter X < 1 − |T|, with
 *   H⁺ and H⁻ on the diagonals through (0, 1). From the hyperboloid embedding, η ± χ = 2 arctan e^{H(ct ± r*)/c} − π/2.
 */
export function makeDeSitter(hubbleRatePerSecond: number, position: StaticLabPosition, frame: DeSitterDiagramFrame = "global"): Background {
  const horizonRadiusMetres = c / hubbleRatePerSecond;
  const tortoiseMetres = (rMetres: number) =>
    rMetres >= 0 && rMetres < horizonRadiusMetres ? horizonRadiusMetres * Math.atanh(rMetres / horizonRadiusMetres) : Number.NaN;
  const squeezeRate = deSitterDiagramRatePerSecond(hubbleRatePerSecond, tortoiseMetres(position.rMetres), frame);
  const precision = nearHorizonPrecisionFlag(position.lapse, "1 − H²r²/c²");
  return staticLabBackground({
    kind: "de-sitter",
    horizon: killingHorizon("cosmological", hubbleRatePerSecond, horizonRadiusMetres),
    position,
    accelerationMetresPerSecondSquared: (hubbleRatePerSecond ** 2 * position.rMetres) / position.lapse,
    chart: {
      tortoiseMetres,
      radiusFromTortoiseMetres: (rStar) => (rStar >= 0 ? horizonRadiusMetres * Math.tanh(rStar / horizonRadiusMetres) : null),
    },
    squeezes: { p: gudermannianSqueeze(squeezeRate), q: gudermannianSqueeze(squeezeRate) },
    flags: precision ? [precision] : [],
  });
}
