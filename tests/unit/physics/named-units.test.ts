/**
 * The field's own units at the edges (physics/units.ts): lengths in r_s = 2GM/c², GM/c² and c/H; values echoed in
 * the unit typed; one number formatter whose output reads back as the same number.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatInUnit, formatNumber, formatQuantity, namedLengthsText, parseQuantity, type LengthScales } from "@/physics/units";

// CODATA 2018: G = 6.67430e-11 m³ kg⁻¹ s⁻², c = 299792458 m/s (exact); IAU 2015 B3: GM☉ = 1.3271244e20 m³ s⁻².
const c = 299_792_458;
const solarGM = 1.327_124_4e20;
const tenSolarMasses: LengthScales = { schwarzschildRadiusMetres: (2 * 10 * solarGM) / c ** 2 }; // ≈ 29.5 km
const deSitter: LengthScales = { hubbleRadiusMetres: c / 2.2e-18 };

function metres(text: string, scales: LengthScales): number {
  const parsed = parseQuantity(text, "length", { lengthScales: scales });
  if (!parsed.ok) throw new Error(parsed.message);
  return parsed.valueSI;
}

describe("lengths in the field's own units", () => {
  it("reads '3 rs' (and r_s, rₛ) as three horizon radii of a 10 M☉ hole, 2GM/c² ≈ 29.5 km each", () => {
    for (const text of ["3 rs", "3 r_s", "3 rₛ", "3rs"]) expect(metres(text, tenSolarMasses) / (3 * 2 * 10 * solarGM / c ** 2)).toBeCloseTo(1, 14);
    expect(tenSolarMasses.schwarzschildRadiusMetres! / 1e3).toBeCloseTo(29.5, 1);
  });

  it("reads '6 GM/c^2', '6 GM/c²' and '6 M' as three horizon radii", () => {
    for (const text of ["6 GM/c^2", "6 GM/c²", "6 M"]) expect(metres(text, tenSolarMasses) / metres("3 rs", tenSolarMasses)).toBeCloseTo(1, 14);
  });

  it("reads '0.5 c/H' as half the de Sitter horizon radius", () => {
    expect(metres("0.5 c/H", deSitter) / (0.5 * c / 2.2e-18)).toBeCloseTo(1, 14);
  });

  it("refuses r_s without a black hole, saying why", () => {
    const parsed = parseQuantity("3 rs", "length", { lengthScales: deSitter });
    expect(parsed).toEqual({ ok: false, message: "'rs' is a length of a black-hole background; this one has none" });
  });

  it("says which named unit was typed, so the field can echo it", () => {
    expect(parseQuantity("3 rs", "length", { lengthScales: tenSolarMasses })).toMatchObject({ ok: true, unit: "r_s" });
    expect(parseQuantity("100 e", "charge")).toMatchObject({ ok: true, unit: "e" });
    expect(parseQuantity("10 M☉", "mass")).toMatchObject({ ok: true, unit: "M☉" });
    expect(parseQuantity("1.6e-17 C", "charge")).not.toHaveProperty("unit");
  });

  it("echoes a value in the unit typed: 100 e, 10 M☉, 3 r_s", () => {
    expect(formatInUnit(100 * 1.602_176_634e-19, "e")).toBe("100 e");
    expect(formatInUnit(metres("3 rs", tenSolarMasses), "r_s", tenSolarMasses)).toBe("3 r_s");
    expect(formatInUnit(3e5, "r_s", {})).toBeNull();
    expect(namedLengthsText(metres("3 rs", tenSolarMasses), tenSolarMasses)).toBe("= 3 r_s = 6 GM/c²");
    expect(namedLengthsText(1, {})).toBe("");
  });
});

describe("the one number formatter", () => {
  it.each([
    [1.75, "1.75"],
    [0.016, "0.016"],
    [0.0752, "0.0752"],
    [7.52e-5, "7.52 × 10⁻⁵"],
    [-7.52e-5, "−7.52 × 10⁻⁵"],
    [9999.6, "1 × 10⁴"],
    [6.8e20, "6.8 × 10²⁰"],
    [0, "0"],
  ])("prints %s as %s", (value, text) => {
    expect(formatNumber(value)).toBe(text);
  });

  it("prints what parseQuantity reads back, for any value (the field shows what it would accept)", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e30, max: 1e30, noNaN: true }).filter((x) => Math.abs(x) > 1e-30), (value) => {
        for (const [dimension, text] of [["time", formatQuantity(value, "time", { digits: 6 })], ["length", `${formatNumber(value, 6)} m`]] as const) {
          const parsed = parseQuantity(text, dimension);
          expect(parsed.ok, text).toBe(true);
          if (parsed.ok) expect(Math.abs(parsed.valueSI / value - 1)).toBeLessThan(1e-5);
        }
      }),
      { numRuns: 300 },
    );
  });

  it("reads '1.000 × 10¹² s', the way a long duration is shown", () => {
    expect(parseQuantity("1.000 × 10¹² s", "time")).toEqual({ ok: true, valueSI: 1e12 });
  });
});
