/** A computed Quantity as text: counts as plain numbers, times with SI prefixes, huge or tiny ones by their logarithm. */
import { compactNumber, numberFromLog10 } from "@/canvas/kernels/diagram/labels";
import type { Quantity } from "@/physics/result";
import { formatQuantity } from "@/physics/units";
import { superscript } from "@/physics/superscript";

/** A result's unit string ("s^-1", "C m") as printed: powers as superscripts ("s⁻¹"). */
export function unitText(unit: string): string {
  return unit.replace(/\^(-?\d+)/g, (_, power: string) => superscript(Number(power)));
}

export function quantityText(q: Quantity | null): string {
  if (!q) return "—";
  if (q.value === null) return q.log10 === null ? "0" : `${numberFromLog10(q.log10)}${q.unit === "1" ? "" : ` ${unitText(q.unit)}`}`;
  if (q.unit === "s") return formatQuantity(q.value, "time");
  if (q.unit === "m") return formatQuantity(q.value, "length");
  return `${compactNumber(q.value, 3)}${q.unit === "1" ? "" : ` ${unitText(q.unit)}`}`;
}
