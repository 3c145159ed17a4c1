import { all, create } from "mathjs";
import { describe, expect, it } from "vitest";
import { formatQuantity, geometrized, parseQuantity, type QuantityDimension } from "@/physics/units";

/* Reference values: mathjs 15.2.0 built-in constants (CODATA 2018 values) and the IAU 2015 B3 nominal GM☉. */
const math = create(all);
const si = (name: keyof typeof math) => (math[name] as unknown as { value: number }).value;
const [c, G, e, eps0] = [si("speedOfLight"), si("gravitationConstant"), si("elementaryCharge"), si("electricConstant")];
const solarMassKg = 1.327_124_4e20 / G;
const relative = (a: number, b: number) => Math.abs(a / b - 1);

function valueOf(text: string, dimension: QuantityDimension): number {
  const parsed = parseQuantity(text, dimension);
  if (!parsed.ok) throw new Error(parsed.message);
  return parsed.valueSI;
}

describe("parseQuantity", () => {
  it.each([
    ["2.5 um", "length", 2.5e-6],
    ["2.5 µm", "length", 2.5e-6],
    ["0.3 s", "time", 0.3],
    ["3 us", "time", 3e-6],
    ["250 ms", "time", 0.25],
    ["9.81 m/s^2", "acceleration", 9.81],
    ["9.81 m s⁻²", "acceleration", 9.81],
    ["1 C", "charge", 1],
    ["1e-14 kg", "mass", 1e-14],
    ["2.2e-18 1/s", "rate", 2.2e-18],
    ["2.2e-18 Hz", "rate", 2.2e-18],
    // 1 bar = 10⁵ Pa exactly (SI Brochure, 9th ed., Table 8); kelvin and ohm metre are SI units.
    ["1e-8 mbar", "pressure", 1e-6],
    ["1e-6 Pa", "pressure", 1e-6],
    ["4 K", "temperature", 4],
    ["40 mK", "temperature", 0.04],
    ["2.2e-8 ohm m", "resistivity", 2.2e-8],
    ["2.2e-8 Ω m", "resistivity", 2.2e-8],
    ["2.2 µΩ cm", "resistivity", 2.2e-8],
    // The form formatQuantity prints, read back.
    ["2.20 × 10⁻⁸ Ω m", "resistivity", 2.2e-8],
    ["2.20 × 10⁻¹⁸ s⁻¹", "rate", 2.2e-18],
  ] as const)("reads %s as %s in SI", (text, dimension, expected) => {
    expect(relative(valueOf(text, dimension), expected)).toBeLessThan(1e-15);
  });

  it("reads the trailing 'e' as the elementary charge (CODATA 2018, 1.602176634e-19 C), not Euler's number", () => {
    expect(relative(valueOf("1e-3 e", "charge"), 1e-3 * e)).toBeLessThan(1e-15);
    expect(relative(valueOf("100 e", "charge"), 100 * e)).toBeLessThan(1e-15);
    expect(relative(valueOf("-2 e", "charge"), -2 * e)).toBeLessThan(1e-15);
  });

  it("reads solar masses with M☉ = GM☉/G (IAU 2015 Resolution B3)", () => {
    expect(relative(valueOf("10 Msun", "mass"), 10 * solarMassKg)).toBeLessThan(1e-14);
    expect(relative(valueOf("10 M☉", "mass"), 10 * solarMassKg)).toBeLessThan(1e-14);
  });

  it("refuses a quantity of the wrong dimension, saying what it expected", () => {
    expect(parseQuantity("3 kg", "time")).toEqual({ ok: false, message: "expected a time such as '250 ms', got '3 kg'" });
    const charge = parseQuantity("2 m", "charge");
    expect(charge.ok).toBe(false);
    expect(!charge.ok && charge.message).toContain("expected a charge");
  });

  it("refuses a bare number unless the caller names a default unit", () => {
    const bare = parseQuantity("3", "length");
    expect(bare.ok).toBe(false);
    expect(!bare.ok && bare.message).toContain("has no unit");
    expect(parseQuantity("3", "length", { defaultUnit: "um" })).toEqual({ ok: true, valueSI: 3e-6 });
  });

  it.each(["", "abc", "3 foo", "m 3", "5 e-3", "1e400 m", "3 kg"])("refuses %j as a length with a message", (text) => {
    const parsed = parseQuantity(text, "length");
    expect(parsed.ok).toBe(false);
    expect(!parsed.ok && parsed.message.length).toBeGreaterThan(10);
  });
});

describe("formatQuantity", () => {
  it.each([
    [2.5e-6, "length", {}, "2.50 µm"],
    [0.316, "time", {}, "316 ms"],
    [3e-6, "time", {}, "3.00 µs"],
    [10 * solarMassKg, "mass", { solarMasses: true }, "10.0 M☉"],
    [1e-14, "mass", {}, "10.0 pg"],
    [9.81, "acceleration", {}, "9.81 m/s²"],
    [2.2e-18, "rate", {}, "2.20 × 10⁻¹⁸ s⁻¹"],
    [1, "charge", {}, "1.00 C"],
    [0.9999999, "time", {}, "1.00 s"],
    [999.96e-9, "length", {}, "1.00 µm"],
    [1.5e26, "length", { digits: 2 }, "1.5 × 10²⁶ m"],
    [2e30, "mass", {}, "2.00 × 10³⁰ kg"],
    [1e-3 * solarMassKg, "mass", { solarMasses: true }, "1.99 × 10²⁷ kg"],
    [0, "length", {}, "0 m"],
    [1e-13, "pressure", {}, "1.00 × 10⁻¹³ Pa"],
    [295, "temperature", {}, "295 K"],
    [0.04, "temperature", {}, "40.0 mK"],
    [2.2e-8, "resistivity", {}, "2.20 × 10⁻⁸ Ω m"],
  ] as const)("prints %d (%s, %o) as %s", (value, dimension, options, expected) => {
    expect(formatQuantity(value, dimension, options)).toBe(expected);
  });

  it("prints what parses back to the same value at the digits shown (round trip of the examples)", () => {
    for (const [text, dimension] of [["2.5 um", "length"], ["250 ms", "time"], ["1e-14 kg", "mass"], ["1 C", "charge"]] as const) {
      const value = valueOf(text, dimension);
      const printed = formatQuantity(value, dimension, { digits: 6 }).replace("µ", "u");
      expect(relative(valueOf(printed, dimension), value)).toBeLessThan(1e-6);
    }
  });
});

describe("geometrized readouts", () => {
  it("one solar mass is GM/c² ≈ 1.477 km and GM/c³ ≈ 4.93 µs (from memory; IAU 2015 GM☉)", () => {
    const sun = geometrized(solarMassKg, "mass");
    expect(relative(sun.metres, 1.327_124_4e20 / c ** 2)).toBeLessThan(1e-12);
    expect(relative(sun.metres, 1476.6)).toBeLessThan(1e-4);
    expect(relative(sun.seconds, 4.9255e-6)).toBeLessThan(1e-4);
  });

  it("one coulomb is √(G/(4πε0))/c² ≈ 8.62e-18 m (geometrized charge in SI, as in the Reissner–Nordström length; the figure from memory)", () => {
    const coulomb = geometrized(1, "charge");
    expect(relative(coulomb.metres, Math.sqrt(G / (4 * Math.PI * eps0)) / c ** 2)).toBeLessThan(1e-12);
    expect(relative(coulomb.metres, 8.62e-18)).toBeLessThan(1e-3);
  });

  it("Planck units agree with mathjs's planckMass, planckLength, planckTime, planckCharge (CODATA 2018 values)", () => {
    expect(relative(geometrized(si("planckMass"), "mass").planckUnits, 1)).toBeLessThan(1e-6);
    expect(relative(geometrized(si("planckLength"), "length").planckUnits, 1)).toBeLessThan(1e-6);
    expect(relative(geometrized(si("planckTime"), "time").planckUnits, 1)).toBeLessThan(1e-6);
    expect(relative(geometrized(si("planckCharge"), "charge").planckUnits, 1)).toBeLessThan(1e-9);
    // e/q_P = √α, α ≈ 1/137.036 (CODATA 2018)
    expect(relative(geometrized(e, "charge").planckUnits ** 2, 1 / 137.035_999_084)).toBeLessThan(1e-9);
  });
});
