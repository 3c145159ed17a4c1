/**
 * The interface every background (Minkowski, Schwarzschild, Rindler wedge, de Sitter static patch) implements.
 * SI units throughout; t is the background's static (Killing) time in seconds, r its static radial coordinate in
 * metres: areal radius for Schwarzschild and de Sitter, distance from the centre for Minkowski, and for the Rindler
 * wedge the proper distance ξ from the horizon (the lab sits at ξ = c²/a, and t is the lab's own proper time).
 */
import type { BackgroundKind } from "../scenario/schema";

export type HorizonKind = "event" | "acceleration" | "cosmological";

export interface HorizonInfo {
  kind: HorizonKind;
  /**
   * Surface gravity κ of the Killing horizon in s^-1 (κ/c in m^-1 would be the geometric value), normalised to the
   * Killing vector that is unit at infinity (Schwarzschild), at the lab (Rindler) or at the centre r = 0 (de Sitter).
   */
  surfaceGravityPerSecond: number;
  /**
   * Temperature ħκ/(2π k_B) of the horizon as seen by the Killing observer the normalisation refers to (Hawking,
   * Unruh, Gibbons–Hawking), in kelvin.
   */
  temperatureKelvin: number;
  /** Where the horizon sits in the static radial coordinate, metres. */
  radiusMetres: number;
}

export type BackgroundFlagCode =
  | "lab-inside-horizon"
  | "lab-inside-photon-sphere"
  | "lab-beyond-cosmological-horizon"
  | "lab-too-close-to-horizon-for-double";

export interface BackgroundFlag {
  code: BackgroundFlagCode;
  severity: "caution" | "invalid";
  message: string;
}

/**
 * A point of the conformal (Penrose) diagram: T up, X to the right, both dimensionless, null rays at ±45°.
 * Every background uses T = (P + Q)/2, X = (Q − P)/2 with P, Q ∈ [−1, 1] compactified null coordinates, so the
 * diagrams share one scale (see compactify.ts).
 */
export interface DiagramPoint {
  T: number;
  X: number;
}

/**
 * Precision: diagram coordinates are doubles of order 1. With the exponential squeezes (Schwarzschild, Rindler,
 * de Sitter) null coordinates beyond about 35c/κ (κ → H for de Sitter) crowd onto the diagram's edge and no longer
 * invert (fromDiagram gives null there): the drawing stays right, the coordinates are lost.
 */
export interface ConformalMap {
  /** Static coordinates (seconds, metres) → diagram point, for the region the lab lives in. */
  toDiagram(tSeconds: number, rMetres: number): DiagramPoint;
  /**
   * The same map from the tortoise coordinate r* instead of r (metres): defined for every finite r*, so a curve given
   * as r*(t) is mapped without inverting r*(r) (which rounds to the horizon a few tens of null scales in).
   */
  toDiagramAtTortoise(tSeconds: number, tortoiseMetres: number): DiagramPoint;
  /** Diagram point → static coordinates; null outside the region covered by the static chart. */
  fromDiagram(point: DiagramPoint): { tSeconds: number; rMetres: number } | null;
}

/** Where a static lab sits: radius, lapse √(−g_tt) and 1 − lapse, each computed the accurate way round for its input. */
export interface StaticLabPosition {
  rMetres: number;
  lapse: number;
  lapseDeficit: number;
  properDistanceToHorizonMetres: number;
}

export interface Background {
  kind: BackgroundKind;
  /** Proper acceleration the lab needs to stay static, m s^-2 (0 for an inertial lab). */
  labProperAccelerationMetresPerSecondSquared: number;
  /** dτ/dt at the lab: the lab's redshift (lapse) factor, dimensionless, in (0, 1]. */
  labRedshiftFactor: number;
  /** 1 − labRedshiftFactor, computed without cancellation (a weak-field lab's gravitational redshift). */
  labRedshiftDeficit: number;
  /** The lab's static radial coordinate, metres. */
  labRadiusMetres: number;
  /** Proper distance from the lab to the horizon along the static slice, metres; null without a horizon. */
  labProperDistanceToHorizonMetres: number | null;
  horizon: HorizonInfo | null;
  /** Local (Tolman) temperature at the lab, kelvin: the horizon temperature divided by the redshift factor. */
  labLocalTemperatureKelvin: number;
  /** Tortoise coordinate r*(r), metres, so that u = ct − r*, v = ct + r* are null; NaN outside the static region. */
  tortoiseMetres(rMetres: number): number;
  /** Inverse of tortoiseMetres; null where no radius of the static region has that r*. */
  radiusFromTortoiseMetres(tortoiseMetres: number): number | null;
  conformal: ConformalMap;
  /** Cautions only: impossible input throws a BackgroundInputError instead. */
  flags: BackgroundFlag[];
}
