import { all, create } from "mathjs";
import { describe, expect, it } from "vitest";
import * as k from "@/physics/constants";

/*
 * Independent values: mathjs 15.2.0's built-in physical constants (lib/esm/type/unit/physicalConstants.js, which
 * cites Wikipedia's "Physical constant" page). Its values are the CODATA 2018 set: ε0 = 8.8541878128e-12 F/m,
 * μ0 = 1.25663706212e-6 N/A², m_e = 9.1093837015e-31 kg, G = 6.67430e-11 (CODATA 2022 changed the first three to
 * 8.8541878188e-12, 1.25663706127e-6 and 9.1093837139e-31 — from memory), so agreement is expected to rounding.
 */
const math = create(all);
const si = (name: keyof typeof math) => (math[name] as unknown as { value: number }).value;

describe("physical constants against mathjs 15.2.0 (CODATA 2018 values)", () => {
  const pairs: [string, number, number][] = [
    ["speed of light (mathjs speedOfLight)", k.speedOfLight.value, si("speedOfLight")],
    ["Planck constant (planckConstant)", k.planckConstant.value, si("planckConstant")],
    ["reduced Planck constant (reducedPlanckConstant)", k.reducedPlanckConstant.value, si("reducedPlanckConstant")],
    ["elementary charge (elementaryCharge)", k.elementaryCharge.value, si("elementaryCharge")],
    ["Boltzmann constant (boltzmann)", k.boltzmannConstant.value, si("boltzmann")],
    ["vacuum permittivity (electricConstant)", k.vacuumPermittivity.value, si("electricConstant")],
    ["vacuum permeability (magneticConstant)", k.vacuumPermeability.value, si("magneticConstant")],
    ["Newtonian constant of gravitation (gravitationConstant)", k.gravitationalConstant.value, si("gravitationConstant")],
    ["electron mass (electronMass)", k.electronMass.value, si("electronMass")],
    ["atomic mass constant (atomicMass)", k.atomicMassConstant.value, si("atomicMass")],
  ];
  it.each(pairs)("%s agrees to 1e-12", (_name, ours, theirs) => {
    expect(Math.abs(ours / theirs - 1)).toBeLessThan(1e-12);
  });

  it("derived Planck units agree with mathjs's planckLength, planckMass, planckTime to their quoted digits (CODATA 2018)", () => {
    expect(Math.abs(k.planckLength / si("planckLength") - 1)).toBeLessThan(1e-6);
    expect(Math.abs(k.planckMass / si("planckMass") - 1)).toBeLessThan(1e-6);
    expect(Math.abs(k.planckTime / si("planckTime") - 1)).toBeLessThan(1e-6);
  });

  it("μ0 ε0 c² = 1 within the CODATA 2018 uncertainties (Maxwell; Rev. Mod. Phys. 93, 025010 (2021))", () => {
    expect(Math.abs(k.mu0 * k.epsilon0 * k.c ** 2 - 1)).toBeLessThan(1e-9);
  });

  it("the solar mass is GM☉/G with the IAU 2015 B3 nominal GM☉ = 1.3271244e20 m³/s² (Prša et al., AJ 152, 41 (2016))", () => {
    expect(Math.abs(k.solarMass.value / (1.327_124_4e20 / si("gravitationConstant")) - 1)).toBeLessThan(1e-12);
    // ≈ 1.9884e30 kg (from memory: the commonly quoted 1.989e30 kg).
    expect(k.solarMass.value).toBeGreaterThan(1.988e30);
    expect(k.solarMass.value).toBeLessThan(1.9890e30);
  });

  it("exact SI-defining constants carry zero uncertainty and the measured ones a positive one (CODATA 2018)", () => {
    for (const exact of [k.speedOfLight, k.planckConstant, k.elementaryCharge, k.boltzmannConstant]) expect(exact.uncertainty).toBe(0);
    for (const measured of [k.gravitationalConstant, k.vacuumPermittivity, k.electronMass]) expect(measured.uncertainty).toBeGreaterThan(0);
  });
});

/*
 * Every constant record, the way an astronomy library checks its constants module: a name, a unit mathjs can read
 * with the dimension of the same constant in mathjs's own table, a reference, exact values exact, and the list of
 * all constants complete.
 */
const records = Object.values(k).filter(
  (value): value is k.PhysicalConstant => typeof value === "object" && value !== null && "symbol" in value && "reference" in value,
);

const mathjsTwin: Partial<Record<string, keyof typeof math>> = {
  c: "speedOfLight", h: "planckConstant", "ħ": "reducedPlanckConstant", e: "elementaryCharge", k_B: "boltzmann",
  "ε0": "electricConstant", "μ0": "magneticConstant", G: "gravitationConstant", m_u: "atomicMass", m_e: "electronMass",
};

describe("every constant record", () => {
  it("is listed in allConstants, and allConstants lists nothing else", () => {
    expect(new Set(records)).toEqual(new Set(k.allConstants));
  });

  it.each(records.map((r) => [r.symbol, r] as const))("%s has a name, a reference and a unit mathjs reads", (_symbol, record) => {
    expect(record.name.length).toBeGreaterThan(3);
    expect(record.reference).toMatch(/CODATA 2018|IAU 2015/);
    expect(() => math.evaluate(`1 ${record.unit}`)).not.toThrow();
    expect(Number.isFinite(record.value) && record.value > 0).toBe(true);
    expect(record.uncertainty).toBeGreaterThanOrEqual(0);
    expect(record.uncertainty).toBeLessThan(record.value * 1e-3);
  });

  it.each(records.filter((r) => mathjsTwin[r.symbol]).map((r) => [r.symbol, r] as const))(
    "%s has the dimension of mathjs's constant of the same name",
    (symbol, record) => {
      const twin = math[mathjsTwin[symbol]!] as unknown as { equalBase(other: unknown): boolean };
      expect(twin.equalBase(math.evaluate(`1 ${record.unit}`))).toBe(true);
    },
  );

  it("a value marked exact has zero uncertainty, and a value with zero uncertainty is exact or derived from exact ones", () => {
    for (const record of records) {
      if (/\(exact/.test(record.reference)) expect(record.uncertainty).toBe(0);
      if (record.uncertainty === 0) expect(record.reference).toMatch(/exact|derived: h \/ 2π/);
    }
  });
});
