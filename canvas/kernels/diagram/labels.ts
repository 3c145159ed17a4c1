/** Words and numbers printed on the diagram: SI quantities without trailing zeros, and grid-line labels. */
import { superscript } from "@/physics/superscript";
import { formatNumber, formatQuantity, type QuantityDimension } from "@/physics/units";

/** formatQuantity with three digits, trailing zeros of the mantissa dropped ("4.00 ms" → "4 ms", "2.50 µm" → "2.5 µm"). */
export function compactQuantity(valueSI: number, dimension: QuantityDimension, digits?: number): string {
  return formatQuantity(valueSI, dimension, digits === undefined ? {} : { digits }).replace(/^(-?\d+)\.0+(?=\D|$)/, "$1").replace(/^(-?\d+\.\d*?)0+(?=\D|$)/, "$1");
}

export type RadiusLabelStyle = "radius" | "position" | "distance-from-horizon" | "above-horizon" | "below-horizon";

/**
 * The label of a curve of constant radius. Near a horizon every radius prints alike ("29.5 km"), so there the label
 * gives the distance from the horizon instead (rₛ + 3 m, c/H − 3 m).
 */
export function radiusLabel(rMetres: number, style: RadiusLabelStyle, horizonRadiusMetres: number | null): string {
  switch (style) {
    case "radius":
      return `r = ${compactQuantity(rMetres, "length")}`;
    case "position":
      return `x = ${compactQuantity(rMetres, "length")}`;
    case "distance-from-horizon":
      return `ξ = ${compactQuantity(rMetres, "length")}`;
    case "above-horizon":
      return `r = rₛ + ${compactQuantity(rMetres - (horizonRadiusMetres ?? 0), "length")}`;
    case "below-horizon":
      return `r = c/H − ${compactQuantity((horizonRadiusMetres ?? 0) - rMetres, "length")}`;
  }
}

/**
 * The label of the lab's worldline: its radius in the unit the background makes natural — km and r/rₛ near a black
 * hole, the horizon radius c/H in de Sitter, c²/a (the lab's distance from its horizon) for the Rindler wedge.
 */
export function labRadiusLabel(kind: "minkowski" | "schwarzschild" | "rindler" | "de-sitter", rMetres: number, horizonRadiusMetres: number | null): string {
  switch (kind) {
    case "minkowski":
      return "lab, x = 0";
    case "schwarzschild":
      return `lab, r = ${compactQuantity(rMetres, "length")} = ${compactNumber(rMetres / (horizonRadiusMetres ?? rMetres), 3)} rₛ`;
    case "de-sitter":
      return rMetres === 0 ? "lab, r = 0" : `lab, r = ${compactNumber(rMetres / (horizonRadiusMetres ?? rMetres), 3)} c/H`;
    case "rindler":
      return `lab, ξ = c²/a = ${compactQuantity(rMetres, "length")}`;
  }
}

/**
 * Labels of the protocol's events: the lab's proper time from the start of the separation, as the Offsets panel counts
 * it, with as many digits as it takes to tell neighbours apart (10 s and 10.01 s, not "10 s" twice).
 */
export function labTimeLabels(tauSeconds: number[]): string[] {
  let labels: string[] = [];
  for (let digits = 3; digits <= 8; digits++) {
    labels = tauSeconds.map((tau) => `τ = ${tau === 0 ? "0" : compactQuantity(tau, "time", digits)}`);
    if (new Set(labels).size === labels.length) break;
  }
  return labels;
}


/** A plain number with `digits` significant digits (default 2), through the one number formatter (physics/units.ts). */
export function compactNumber(value: number, digits = 2): string {
  return formatNumber(value, digits);
}

/** A number known only by its base-10 logarithm (beyond a double's range), as "m × 10ⁿ". */
export function numberFromLog10(log10: number, digits = 3): string {
  const exponent = Math.floor(log10);
  const mantissa = Number((10 ** (log10 - exponent)).toPrecision(digits));
  return mantissa >= 10 ? `${mantissa / 10} × 10${superscript(exponent + 1)}` : `${mantissa} × 10${superscript(exponent)}`;
}
