/**
 * Parameter maps: one result quantity over a grid of two parameters (each on log or linear spacing). The grid is
 * computed a row at a time (the second axis fixed, the first varied), so that a queue can hand rows to any number
 * of workers; each point is an ordinary computeScenario of the document with both parameters set (physics/sweeps/
 * vary.ts says what a parameter changes). Values are kept as log10, the natural scale of every quantity mapped here.
 */
import { BackgroundInputError } from "../backgrounds";
import { computeScenario, type ComputeOptions } from "../compute";
import { COMPUTE_COST_CEILING, computeCostRefusal } from "../compute-cost";
import type { Quantity, ScenarioResult } from "../result";
import { ScenarioInputError } from "../scenario/input-error";
import { rangeIssues } from "../scenario/ranges";
import type { ScenarioDocument } from "../scenario/schema";
import { logSpaced } from "../sweeps/sweep";
import { parameterUnit } from "../sweeps/vary";
import { documentAt } from "./point";
import { MAP_PARAMETERS, MAX_MAP_SIDE, QUANTITY_UNITS, type MapAxis, type MapGap, type MapGrid, type MapQuantity, type MapRequest, type MapRow } from "./axes";

export function axisValues(axis: MapAxis): number[] {
  if (axis.scale === "log") return logSpaced(axis.from, axis.to, axis.points);
  if (axis.points === 1) return [axis.from];
  return Array.from({ length: axis.points }, (_, i) => axis.from + ((axis.to - axis.from) * i) / (axis.points - 1));
}

export function quantityOf(result: ScenarioResult, quantity: MapQuantity): Quantity | null {
  switch (quantity) {
    case "total-quanta":
      return result.combined.totalQuanta;
    case "electromagnetic-quanta":
      return result.electromagnetic.totalQuanta;
    case "gravitational-quanta":
      return result.gravitational.totalQuanta;
    case "decoherence":
      return result.combined.decoherence;
    case "decoherence-time":
      return result.combined.decoherenceTime;
  }
}


/** Why a map cannot be made: `path` is "x.…"/"y.…" for an axis, else a path into the document. */
export type MapRefusal = { kind: "invalid" | "too-costly"; path: string; message: string };

function axisRefusal(axis: MapAxis, name: "x" | "y"): MapRefusal | null {
  const invalid = (field: string, message: string): MapRefusal => ({ kind: "invalid", path: `${name}.${field}`, message });
  if (!MAP_PARAMETERS.includes(axis.parameter)) return invalid("parameter", `a map varies one of ${MAP_PARAMETERS.join(", ")}`);
  const positive = axis.scale === "log";
  for (const end of ["from", "to"] as const) {
    const value = axis[end];
    if (!Number.isFinite(value) || (positive ? value <= 0 : value < 0)) {
      return invalid(end, positive ? "a log axis needs a positive, finite value" : "a linear axis needs a finite value, zero or more");
    }
  }
  if (!Number.isInteger(axis.points) || axis.points < 2 || axis.points > MAX_MAP_SIDE) return invalid("points", `an axis takes 2 to ${MAX_MAP_SIDE} points`);
  if (axis.from === axis.to) return invalid("to", "an axis needs two different ends");
  return null;
}

/**
 * Why a map cannot be made, or null: a bad axis, the same parameter twice, a parameter the document cannot vary,
 * a corner outside the ranges a document may hold (physics/scenario/ranges.ts), or a corner of the grid whose document costs more than one computation may (physics/compute-cost.ts: the cost
 * grows with the ratio of the protocol's longest to its shortest time, which is extreme at the grid's corners).
 */
export function mapRefusal(document: ScenarioDocument, request: MapRequest, ceiling = COMPUTE_COST_CEILING): MapRefusal | null {
  const axis = axisRefusal(request.x, "x") ?? axisRefusal(request.y, "y");
  if (axis) return axis;
  if (request.x.parameter === request.y.parameter) return { kind: "invalid", path: "y.parameter", message: "the two axes must vary different parameters" };
  for (const x of [request.x.from, request.x.to]) {
    for (const y of [request.y.from, request.y.to]) {
      let corner: ScenarioDocument;
      try {
        corner = documentAt(document, request, x, y);
      } catch (error) {
        if (error instanceof ScenarioInputError) return { kind: "invalid", path: error.path, message: error.message };
        throw error;
      }
      const outOfRange = rangeIssues(corner)[0];
      if (outOfRange) return { kind: "invalid", path: outOfRange.path, message: `at the corner (${x}, ${y}) of the map: ${outOfRange.message}` };
      const refusal = computeCostRefusal(corner, ceiling);
      if (refusal) return { kind: "too-costly", path: refusal[0].path, message: `at the corner (${x}, ${y}) of the map: ${refusal[0].message}` };
    }
  }
  return null;
}

export type MapPoint = { log10: number | null; gap: null } | { log10: null; gap: MapGap };

/** One point of the map: log10 of the quantity (null when exactly zero), or why it could not be computed. */
export function computeMapPoint(document: ScenarioDocument, request: MapRequest, column: number, row: number, options: ComputeOptions = {}): MapPoint {
  const x = axisValues(request.x)[column];
  const y = axisValues(request.y)[row];
  if (x === undefined || y === undefined) throw new RangeError(`the map has no point (${column}, ${row})`);
  try {
    const quantity = quantityOf(computeScenario(documentAt(document, request, x, y), options), request.quantity);
    return { log10: quantity?.log10 ?? null, gap: null };
  } catch (error) {
    if (!(error instanceof ScenarioInputError || error instanceof BackgroundInputError)) throw error;
    return { log10: null, gap: { column, row, path: error.path, message: error.message } };
  }
}

/** One row of the map from its points in column order. */
export function mapRowOf(row: number, points: MapPoint[]): MapRow {
  return { row, log10: points.map((p) => p.log10), gaps: points.flatMap((p) => (p.gap ? [p.gap] : [])) };
}

/** The whole map from its rows (in any order, one per row). */
export function assembleMap(request: MapRequest, rows: MapRow[]): MapGrid {
  const ordered = [...rows].sort((a, b) => a.row - b.row);
  if (ordered.length !== request.y.points || ordered.some((r, i) => r.row !== i)) throw new Error("assembleMap needs exactly one row per y value");
  const axis = (a: MapAxis) => ({ parameter: a.parameter, unit: parameterUnit(a.parameter), scale: a.scale, values: axisValues(a) });
  return {
    quantity: request.quantity,
    unit: QUANTITY_UNITS[request.quantity],
    x: axis(request.x),
    y: axis(request.y),
    log10: ordered.map((r) => r.log10),
    gaps: ordered.flatMap((r) => r.gaps),
  };
}
