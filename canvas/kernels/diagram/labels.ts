/** Words and numbers printed on the diagram: SI quantities without trailing zeros, and grid-line labels. */
import { formatQuantity, type QuantityDimension } from "@/physics/units";

/** formatQuantity with three digits, trailing zeros of the mantissa dropped ("4.00 ms" → "4 ms", "2.50 µm" → "2.5 µm"). */
export function compactQuantity(valueSI: number, dimension: QuantityDimension): string {
  return formatQuantity(valueSI, dimension).replace(/^(-?\d+)\.0+(?=\D|$)/, "$1").replace(/^(-?\d+\.\d*?)0+(?=\D|$)/, "$1");
}

export type RadiusLabelStyle = "radius" | "distance-from-horizon" | "above-horizon" | "below-horizon";

/**
 * The label of a curve of constant radius. Near a horizon every radius prints alike ("29.5 km"), so there the label
 * gives the distance from the horizon instead (r_s + 3 m, r_H − 3 m).
 */
export function radiusLabel(rMetres: number, style: RadiusLabelStyle, horizonRadiusMetres: number | null): string {
  switch (style) {
    case "radius":
      return `r = ${compactQuantity(rMetres, "length")}`;
    case "distance-from-horizon":
      return `ξ = ${compactQuantity(rMetres, "length")}`;
    case "above-horizon":
      return `r_s + ${compactQuantity(rMetres - (horizonRadiusMetres ?? 0), "length")}`;
    case "below-horizon":
      return `r_H − ${compactQuantity((horizonRadiusMetres ?? 0) - rMetres, "length")}`;
  }
}

export function timeLabel(tSeconds: number): string {
  return `t = ${tSeconds === 0 ? "0" : compactQuantity(tSeconds, "time")}`;
}

const SUPERSCRIPT = "⁰¹²³⁴⁵⁶⁷⁸⁹";

/** A plain number with two significant digits, powers of ten written out ("6.8 × 10²"). */
export function compactNumber(value: number): string {
  if (value === 0) return "0";
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  if (exponent >= -2 && exponent <= 3) return String(Number(value.toPrecision(2)));
  const mantissa = Number((value / 10 ** exponent).toPrecision(2));
  const power = `${exponent < 0 ? "⁻" : ""}${[...String(Math.abs(exponent))].map((d) => SUPERSCRIPT[Number(d)]).join("")}`;
  return `${mantissa} × 10${power}`;
}
