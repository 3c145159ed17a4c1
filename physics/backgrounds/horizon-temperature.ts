import { hbar, kB } from "../constants";
import type { HorizonInfo, HorizonKind } from "./types";

/**
 * Temperature of a Killing horizon with surface gravity κ (s^-1): T = ħκ/(2π k_B).
 * With κ = c³/(4GM) this is Hawking's T_H = ħc³/(8πGMk_B) (Commun. Math. Phys. 43, 199 (1975)); with κ = a/c it
 * is Unruh's ħa/(2πck_B) (Phys. Rev. D 14, 870 (1976)); with κ = H it is Gibbons and Hawking's ħH/(2πk_B)
 * (Phys. Rev. D 15, 2738 (1977)). The temperature refers to the observer whose Killing vector normalises κ.
 */
export function horizonTemperatureKelvin(surfaceGravityPerSecond: number): number {
  return (hbar * surfaceGravityPerSecond) / (2 * Math.PI * kB);
}

/** The HorizonInfo of a Killing horizon of surface gravity κ (s^-1) at static radius radiusMetres. */
export function killingHorizon(kind: HorizonKind, surfaceGravityPerSecond: number, radiusMetres: number): HorizonInfo {
  return { kind, surfaceGravityPerSecond, temperatureKelvin: horizonTemperatureKelvin(surfaceGravityPerSecond), radiusMetres };
}
