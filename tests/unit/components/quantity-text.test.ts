import { describe, expect, it } from "vitest";
import { quantityParts, quantityText } from "@/components/editor/quantity-text";
import type { Quantity } from "@/physics/result";

const q = (value: number | null, log10: number | null, unit: string): Quantity => ({ value, log10, unit, sourceKey: "environment-margin" });

describe("a computed quantity's number and unit, apart", () => {
  it.each([
    [q(4.2e-3, Math.log10(4.2e-3), "s"), "4.20", "ms"],
    [q(1.53e18, 18.18, "s"), "1.53 × 10¹⁸", "s"],
    [q(4e-5, -4.4, "m"), "40.0", "µm"],
    [q(0.0858, -1.07, "K"), "85.8", "mK"],
    [q(1e-10, -10, "Pa"), "1 × 10⁻¹⁰", "Pa"],
    [q(2.5e3, 3.4, "s^-1"), "2500", "s⁻¹"],
    [q(12.5, 1.1, "1"), "12.5", ""],
    [q(null, 400.5, "1"), "3.16 × 10⁴⁰⁰", ""],
    [q(0, null, "1"), "0", ""],
  ])("splits %o into %s and %s", (quantity, number, unit) => {
    expect(quantityParts(quantity)).toEqual({ number, unit });
    expect(quantityText(quantity)).toBe(unit ? `${number} ${unit}` : number);
  });
});
