/**
 * Radial functions of the Schwarzschild exterior r > r_s = 2GM/c², in metres, written so that none subtracts
 * nearly equal numbers: they stay accurate from r − r_s ≪ r_s out to r/r_s ~ 1e12 and beyond.
 * Metric: ds² = −(1 − r_s/r) c²dt² + dr²/(1 − r_s/r) + r² dΩ² (e.g. Misner, Thorne & Wheeler, Gravitation (1973), §31).
 */
import { c, G } from "../constants";
import type { StaticLabPosition } from "./types";

/** Schwarzschild radius r_s = 2GM/c² of a mass in kg (Schwarzschild 1916; MTW ch. 31). */
export function schwarzschildRadiusMetres(massKg: number): number {
  return (2 * G * massKg) / (c * c);
}

/** Newton's method for an increasing convex function, started above the root, so it descends onto it monotonically. */
function descendToRoot(f: (x: number) => number, slope: (x: number) => number, start: number): number {
  let x = start;
  for (let i = 0; i < 200; i++) {
    const step = f(x) / slope(x);
    x -= step;
    if (!(Math.abs(step) > 4 * Number.EPSILON * Math.abs(x))) break;
  }
  return x;
}

/** Tortoise coordinate r* = r + r_s ln((r − r_s)/r_s) (Misner, Thorne & Wheeler, ch. 25; the additive constant is a convention); NaN for r ≤ r_s. */
export function schwarzschildTortoiseMetres(rMetres: number, horizonRadiusMetres: number): number {
  if (!(rMetres > horizonRadiusMetres)) return Number.NaN;
  return rMetres + horizonRadiusMetres * Math.log((rMetres - horizonRadiusMetres) / horizonRadiusMetres);
}

/**
 * Inverse of the tortoise coordinate: with y = r/r_s − 1, r* / r_s = 1 + y + ln y, i.e. y = W(e^{r* / r_s − 1}) with W
 * Lambert's function. Solved for ℓ = ln y from e^ℓ + ℓ = r* / r_s − 1, which is increasing and convex, starting above
 * the root (at s for s < 1, at ln s otherwise), so it works where e^{r* / r_s} would overflow or underflow.
 */
export function schwarzschildRadiusFromTortoiseMetres(tortoiseMetres: number, horizonRadiusMetres: number): number {
  const s = tortoiseMetres / horizonRadiusMetres - 1;
  const logY = descendToRoot((l) => Math.exp(l) + l - s, (l) => Math.exp(l) + 1, s < 1 ? s : Math.log(s));
  // e^ℓ amplifies ℓ's rounding by |ℓ|; one Newton step on y + ln y = s itself restores full relative precision.
  const y = Math.exp(logY);
  return horizonRadiusMetres * (1 + y - (y + logY - s) / (1 + 1 / y));
}

/**
 * Proper radial distance from the horizon to r on a static slice:
 * ℓ(r) = ∫ dr/√(1 − r_s/r) = √(r(r − r_s)) + r_s asinh(√((r − r_s)/r_s)) (differentiate to check).
 */
export function schwarzschildProperDistanceAboveHorizonMetres(rMetres: number, horizonRadiusMetres: number): number {
  const above = rMetres - horizonRadiusMetres;
  return Math.sqrt(rMetres * above) + horizonRadiusMetres * Math.asinh(Math.sqrt(above / horizonRadiusMetres));
}

/** A lab at areal radius r > r_s: lapse √((r − r_s)/r), 1 − lapse = (r_s/r)/(1 + lapse), proper distance ℓ(r). */
export function schwarzschildPositionAtRadius(rMetres: number, horizonRadiusMetres: number): StaticLabPosition {
  const lapse = Math.sqrt((rMetres - horizonRadiusMetres) / rMetres);
  return {
    rMetres,
    lapse,
    lapseDeficit: horizonRadiusMetres / rMetres / (1 + lapse),
    properDistanceToHorizonMetres: schwarzschildProperDistanceAboveHorizonMetres(rMetres, horizonRadiusMetres),
  };
}

/**
 * Inverse of the proper distance. With r = r_s cosh²w (w ≥ 0): ℓ/r_s = sinh(2w)/2 + w and the lapse is exactly
 * tanh w, so a lab placed by proper distance keeps a precise lapse even where r − r_s is below double resolution.
 * Both w = ℓ/2r_s and w = ln(1 + 4ℓ/r_s)/2 lie above the root (substitute to check); Newton starts at the smaller.
 */
export function schwarzschildPositionAtProperDistance(properDistanceMetres: number, horizonRadiusMetres: number): StaticLabPosition {
  const L = properDistanceMetres / horizonRadiusMetres;
  const w = descendToRoot((x) => Math.sinh(2 * x) / 2 + x - L, (x) => Math.cosh(2 * x) + 1, Math.min(L / 2, Math.log1p(4 * L) / 2));
  return {
    rMetres: horizonRadiusMetres * Math.cosh(w) ** 2,
    lapse: Math.tanh(w),
    lapseDeficit: 2 / (1 + Math.exp(2 * w)),
    properDistanceToHorizonMetres: properDistanceMetres,
  };
}
