/**
 * What a parameter map is made of: the parameters it may vary, the quantities it may show, the axes and the grid.
 * Types and constants only (safe for lib/contracts.ts and the browser); physics/maps/grid.ts computes.
 */
import { SWEEP_PARAMETERS } from "../sweeps/parameters";
import type { SweepParameter, SweepUnit } from "../sweeps/vary";

/** Every parameter a map may vary: every parameter a sweep may (physics/sweeps/parameters.ts). */
export const MAP_PARAMETERS: SweepParameter[] = [...SWEEP_PARAMETERS];

/** What a map shows at each point: ⟨N⟩ (both channels, or one), the decoherence 𝒟, or the decoherence time. */
export const MAP_QUANTITIES = ["total-quanta", "electromagnetic-quanta", "gravitational-quanta", "decoherence", "decoherence-time"] as const;
export type MapQuantity = (typeof MAP_QUANTITIES)[number];

/** Points along one axis at most: a map is at most 200 × 200 = 40,000 computations. */
export const MAX_MAP_SIDE = 200;

export type AxisScale = "log" | "linear";

export interface MapAxis {
  parameter: SweepParameter;
  /** SI (s, m, Pa or K), as parameterUnit says. */
  from: number;
  to: number;
  points: number;
  scale: AxisScale;
}

export interface MapRequest {
  /** Varied along each row. */
  x: MapAxis;
  /** One value per row. */
  y: MapAxis;
  quantity: MapQuantity;
}

/** A point that could not be computed, and why (the other points of the map still are). */
export interface MapGap {
  column: number;
  row: number;
  path: string;
  message: string;
}

export interface MapRow {
  row: number;
  /** log10 of the quantity at each column; null where it is exactly zero or could not be computed (see gaps). */
  log10: (number | null)[];
  gaps: MapGap[];
}

export interface MapGrid {
  quantity: MapQuantity;
  unit: string;
  x: { parameter: SweepParameter; unit: SweepUnit; scale: AxisScale; values: number[] };
  y: { parameter: SweepParameter; unit: SweepUnit; scale: AxisScale; values: number[] };
  /** log10[row][column]: row j is y.values[j], column i is x.values[i]. */
  log10: (number | null)[][];
  gaps: MapGap[];
}

/** The unit of each quantity, as the result reports it. */
export const QUANTITY_UNITS: Record<MapQuantity, string> = {
  "total-quanta": "1",
  "electromagnetic-quanta": "1",
  "gravitational-quanta": "1",
  decoherence: "1",
  "decoherence-time": "s",
};
