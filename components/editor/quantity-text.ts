/** A computed Quantity as text: counts as plain numbers, times with SI prefixes, huge or tiny ones by their logarithm. */
import { compactNumber, numberFromLog10 } from "@/canvas/kernels/diagram/labels";
import type { Quantity } from "@/physics/result";
import { formatQuantity, type QuantityDimension } from "@/physics/units";
import { superscript } from "@/physics/superscript";

/** A result's unit string ("s^-1", "C m") as printed: powers as superscripts ("s⁻¹"). */
export function unitText(unit: string): string {
  return unit.replace(/\^(-?\d+)/g, (_, power: string) => superscript(Number(power)));
}

/** Units printed with an SI prefix chosen for the value ("2.50 µm", "316 ms", "40.0 mK"). */
const PREFIXED: Record<string, QuantityDimension> = { s: "time", m: "length", K: "temperature" };

/** The number and its unit apart (the unit "" for a count), so a narrow column can shrink the unit and keep the number whole. */
export function quantityParts(q: Quantity): { number: string; unit: string } {
  const unit = q.unit === "1" ? "" : unitText(q.unit);
  if (q.value === null) return q.log10 === null ? { number: "0", unit } : { number: numberFromLog10(q.log10), unit };
  const dimension = PREFIXED[q.unit];
  if (dimension) {
    const printed = formatQuantity(q.value, dimension);
    const space = printed.lastIndexOf(" ");
    return { number: printed.slice(0, space), unit: printed.slice(space + 1) };
  }
  return { number: compactNumber(q.value, 3), unit };
}

export function quantityText(q: Quantity | null): string {
  if (!q) return "—";
  const { number, unit } = quantityParts(q);
  return unit ? `${number} ${unit}` : number;
}
