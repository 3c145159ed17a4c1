/**
 * A computed Quantity (physics/result.ts) as text with its unit: through physics/units.ts where the unit is one
 * of its dimensions, else in scientific notation with the unit as the result spells it ("m s^-1" as "m s⁻¹").
 * A value beyond the range of a double is printed from its log10; a dimensionless value ("1") has no unit.
 */
import type { Quantity } from "@/physics/result";
import { formatQuantity, type QuantityDimension } from "@/physics/units";

const dimensionOfUnit: Record<string, QuantityDimension> = {
  m: "length",
  s: "time",
  kg: "mass",
  C: "charge",
  "m s^-2": "acceleration",
  "s^-1": "rate",
};

const SUPERSCRIPT_DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
const superscript = (n: number) => `${n < 0 ? "⁻" : ""}${[...String(Math.abs(n))].map((d) => SUPERSCRIPT_DIGITS[Number(d)]).join("")}`;

export const unitText = (unit: string) => (unit === "1" ? "" : unit.replace(/\^(-?\d+)/g, (_, power: string) => superscript(Number(power))));

const withUnit = (number: string, unit: string) => (unit ? `${number} ${unit}` : number);

function powerOfTen(mantissa: string, exponent: number): string {
  return exponent === 0 ? mantissa : `${mantissa} × 10${superscript(exponent)}`;
}

/** 3 significant digits; plain between 0.001 and 10 000, else a power of ten. */
export function scientificText(value: number, unit: string): string {
  if (value === 0) return withUnit("0", unit);
  const [mantissa, exponent] = value.toExponential(2).split("e");
  const power = Number(exponent);
  const plain = Math.abs(value) >= 1e-3 && Math.abs(value) < 1e4;
  return withUnit(plain ? Number(value.toPrecision(3)).toString() : powerOfTen(mantissa, power), unit);
}

/** A value known only by its log10 (beyond a double): mantissa and exponent from the logarithm. */
function fromLog10(log10: number, unit: string): string {
  let exponent = Math.floor(log10);
  let mantissa = Number((10 ** (log10 - exponent)).toPrecision(3));
  if (mantissa >= 10) {
    mantissa = 1;
    exponent += 1;
  }
  return withUnit(powerOfTen(mantissa.toFixed(2), exponent), unit);
}

export function quantityText(quantity: Quantity | null): string {
  if (!quantity) return "—";
  const unit = unitText(quantity.unit);
  if (quantity.value === null) return quantity.log10 === null ? withUnit("0", unit) : fromLog10(quantity.log10, unit);
  const dimension = dimensionOfUnit[quantity.unit];
  return dimension ? formatQuantity(quantity.value, dimension) : scientificText(quantity.value, unit);
}
