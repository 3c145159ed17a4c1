import { c } from "../constants";
import { kruskalSqueezes } from "./compactify";
import { nearHorizonPrecisionFlag } from "./flags";
import { killingHorizon } from "./horizon-temperature";
import {
  schwarzschildRadiusFromTortoiseMetres,
  schwarzschildTortoiseMetres,
} from "./schwarzschild-geometry";
import { staticLabBackground } from "./static-lab";
import type { Background, BackgroundFlag, StaticLabPosition } from "./types";

/** How the exterior is scaled on the diagram: the unit Kruskal chart, or with the lab's worldline through its middle. */
export type SchwarzschildDiagramFrame = "unit-kruskal" | "lab-centred";

/**
 * A static lab outside a Schwarzschild black hole of horizon radius r_s = 2GM/c².
 *
 * - Proper acceleration a = GM/(r²√(1 − r_s/r)) (from a = c²|∇ ln lapse| along the static slice; a standard result, e.g. Wald, General Relativity (1984), ch. 6),
 *   so a·√(1 − r_s/r) → κc = c⁴/(4GM) at the horizon.
 * - Surface gravity κ = c³/(4GM) per unit Killing time at infinity; Hawking temperature ħc³/(8πGMk_B)
 *   (Hawking, Commun. Math. Phys. 43, 199 (1975)); local temperature T_H/√(1 − r_s/r) (Tolman, Phys. Rev. 35, 904
 *   (1930)), the Unruh state's value near the horizon.
 * - Diagram: Kruskal–Szekeres U = −e^{−κu/c}, V = e^{κv/c}, then (2/π) arctan of each: the exterior is the diamond
 *   with bifurcation (0, 0), i⁻ = (−½, ½), i⁰ = (0, 1), i⁺ = (½, ½); H⁺ is T = X, H⁻ is T = −X.
 *   With frame "lab-centred" r* is measured from the lab's, which scales U and V alike by e^{−κ r*_lab/c} (the
 *   Kruskal chart's free scale): the lab's worldline then crosses t = 0 at (0, ½), the middle of the exterior,
 *   instead of hugging i⁰ when the lab is many r_s out or the horizon when it is close. Region II keeps the unit
 *   scale with Killing time shifted by r*_lab/c (U → U e^{κr*_lab/c}, V → V e^{−κr*_lab/c}, a boost), so the
 *   singularity stays the straight T = ½ and the two regions meet on H⁺ (U = 0) point for point; only the slope
 *   of P(U) changes there, which no drawn curve crosses.
 * Flags: inside the photon sphere r < 3GM/c², and 1 − r_s/r below NEAR_HORIZON_LAPSE_SQUARED_LIMIT (flags.ts).
 */
export function makeSchwarzschild(horizonRadiusMetres: number, position: StaticLabPosition, frame: SchwarzschildDiagramFrame = "unit-kruskal"): Background {
  const gravitationalParameter = (c * c * horizonRadiusMetres) / 2;
  const surfaceGravityPerSecond = c / (2 * horizonRadiusMetres);
  return staticLabBackground({
    kind: "schwarzschild",
    horizon: killingHorizon("event", surfaceGravityPerSecond, horizonRadiusMetres),
    position,
    accelerationMetresPerSecondSquared: gravitationalParameter / (position.rMetres ** 2 * position.lapse),
    chart: {
      tortoiseMetres: (rMetres) => schwarzschildTortoiseMetres(rMetres, horizonRadiusMetres),
      radiusFromTortoiseMetres: (rStar) => schwarzschildRadiusFromTortoiseMetres(rStar, horizonRadiusMetres),
    },
    squeezes: kruskalSqueezes(
      surfaceGravityPerSecond,
      frame === "lab-centred" ? schwarzschildTortoiseMetres(position.rMetres, horizonRadiusMetres) : 0,
    ),
    flags: schwarzschildFlags(horizonRadiusMetres, position),
  });
}

function schwarzschildFlags(horizonRadiusMetres: number, position: StaticLabPosition): BackgroundFlag[] {
  const flags: BackgroundFlag[] = [];
  if (position.rMetres < 1.5 * horizonRadiusMetres) {
    flags.push({
      code: "lab-inside-photon-sphere",
      severity: "caution",
      message:
        "the lab is inside the photon sphere (r < 3GM/c²): no static lab can be held there by ordinary means — " +
        "no orbit, not even of light, stays at that radius, so only thrust or an extreme support structure holds it",
    });
  }
  const precision = nearHorizonPrecisionFlag(position.lapse, "1 − 2GM/(c²r)");
  if (precision) flags.push(precision);
  return flags;
}
