import { describe, expect, it } from "vitest";
import { quantityText, scientificText, unitText } from "@/components/sharing/resultText";
import type { Quantity } from "@/physics/result";

const q = (value: number | null, unit: string, log10: number | null = value === null ? null : Math.log10(Math.abs(value))): Quantity => ({
  value,
  log10,
  unit,
  sourceKey: "decoherence",
});

describe("quantityText", () => {
  it("prints a dimension physics/units.ts knows through it, with an SI prefix", () => {
    expect(quantityText(q(0.0025, "s"))).toBe("2.50 ms");
    expect(quantityText(q(3e-6, "m"))).toBe("3.00 µm");
    expect(quantityText(q(9.81, "m s^-2"))).toBe("9.81 m/s²");
  });

  it("prints any other unit in scientific notation with the unit's powers as superscripts", () => {
    expect(quantityText(q(2.5e-12, "m s^-1"))).toBe("2.50 × 10⁻¹² m s⁻¹");
    expect(quantityText(q(300, "K"))).toBe("300 K");
    expect(unitText("kg m^2")).toBe("kg m²");
  });

  it("prints a dimensionless count without a unit", () => {
    expect(quantityText(q(3.2e-5, "1"))).toBe("3.20 × 10⁻⁵");
    expect(quantityText(q(0.5, "1"))).toBe("0.5");
    expect(quantityText(q(0, "1", null))).toBe("0");
  });

  it("prints a value beyond a double from its log10, carrying a rounded mantissa into the exponent", () => {
    expect(quantityText(q(null, "1", 400.30103))).toBe("2.00 × 10⁴⁰⁰");
    expect(quantityText(q(null, "s", -350.0000001))).toBe("1.00 × 10⁻³⁵⁰ s");
    expect(quantityText(q(null, "1", 99.99999))).toBe("1.00 × 10¹⁰⁰");
  });

  it("answers a dash for a quantity that does not apply", () => {
    expect(quantityText(null)).toBe("—");
  });
});

describe("scientificText", () => {
  it("rounds to three significant digits without a mantissa of 10", () => {
    expect(scientificText(9.996e7, "")).toBe("1.00 × 10⁸");
    expect(scientificText(-4.2e-9, "C")).toBe("-4.20 × 10⁻⁹ C");
  });
});
