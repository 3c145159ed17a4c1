import { all, create } from "mathjs";
import { describe, expect, it } from "vitest";
import { makeBackground } from "@/physics/backgrounds";

/* Constants for the closed forms below come from mathjs 15.2.0 (CODATA 2018 values), not from physics/constants.ts. */
const math = create(all);
const si = (name: keyof typeof math) => (math[name] as unknown as { value: number }).value;
const [hbar, c, G, kB] = [si("reducedPlanckConstant"), si("speedOfLight"), si("gravitationConstant"), si("boltzmann")];
const solarMassKg = 1.327_124_4e20 / G; // IAU 2015 Resolution B3 nominal GM☉ over G
const relative = (a: number, b: number) => Math.abs(a / b - 1);

describe("horizon temperatures", () => {
  it("Hawking: T_H = ħc³/(8πGMk_B) (Hawking, Commun. Math. Phys. 43, 199 (1975)), ≈ 6.17e-8 K for one solar mass (from memory)", () => {
    const bg = makeBackground({ kind: "schwarzschild", massKg: solarMassKg }, { placement: "areal-radius", arealRadiusMetres: 1e9 });
    const closedForm = (hbar * c ** 3) / (8 * Math.PI * G * solarMassKg * kB);
    expect(relative(bg.horizon!.temperatureKelvin, closedForm)).toBeLessThan(1e-12);
    expect(relative(bg.horizon!.temperatureKelvin, 6.17e-8)).toBeLessThan(2e-3);
    expect(relative(bg.horizon!.surfaceGravityPerSecond, c ** 3 / (4 * G * solarMassKg))).toBeLessThan(1e-12);
  });

  it("Unruh: T_U = ħa/(2πck_B) (Unruh, Phys. Rev. D 14, 870 (1976)), ≈ 3.98e-20 K at a = 9.81 m/s² (from memory)", () => {
    const bg = makeBackground({ kind: "rindler", accelerationMetresPerSecondSquared: 9.81 }, { placement: "uniformly-accelerated" });
    const closedForm = (hbar * 9.81) / (2 * Math.PI * c * kB);
    expect(relative(bg.horizon!.temperatureKelvin, closedForm)).toBeLessThan(1e-12);
    expect(relative(bg.labLocalTemperatureKelvin, closedForm)).toBeLessThan(1e-12);
    expect(relative(bg.horizon!.temperatureKelvin, 3.98e-20)).toBeLessThan(2e-3);
  });

  it("Gibbons–Hawking: T = ħH/(2πk_B) (Gibbons & Hawking, Phys. Rev. D 15, 2738 (1977)), ≈ 2.7e-30 K for H = 2.2e-18 s⁻¹", () => {
    const bg = makeBackground({ kind: "de-sitter", hubbleRatePerSecond: 2.2e-18 }, { placement: "areal-radius", arealRadiusMetres: 0 });
    const closedForm = (hbar * 2.2e-18) / (2 * Math.PI * kB);
    expect(relative(bg.horizon!.temperatureKelvin, closedForm)).toBeLessThan(1e-12);
    expect(relative(bg.labLocalTemperatureKelvin, closedForm)).toBeLessThan(1e-12); // the centre: lapse 1
    expect(relative(bg.horizon!.temperatureKelvin, 2.7e-30)).toBeLessThan(0.02);
  });
});

describe("local temperatures", () => {
  const massKg = 10 * solarMassKg;
  const rs = (2 * G * massKg) / c ** 2;

  it("Tolman: T_local·√(1 − r_s/r) is the same at every radius (Tolman, Phys. Rev. 35, 904 (1930))", () => {
    const products = [1.01, 1.5, 3, 30, 3e4].map((x) => {
      const bg = makeBackground({ kind: "schwarzschild", massKg }, { placement: "areal-radius", arealRadiusMetres: x * rs });
      return bg.labLocalTemperatureKelvin * Math.sqrt(1 - 1 / x);
    });
    for (const p of products) expect(relative(p, products[0])).toBeLessThan(1e-12);
  });

  it("near a black hole's horizon the local temperature tends to the Unruh temperature of the lab's own acceleration (equivalence principle; Unruh 1976)", () => {
    for (const [properDistanceMetres, tolerance] of [[1e-2 * rs, 1e-4], [1e-4 * rs, 1e-8]]) {
      const bg = makeBackground({ kind: "schwarzschild", massKg }, { placement: "proper-distance-from-horizon", properDistanceMetres });
      const unruh = (hbar * bg.labProperAccelerationMetresPerSecondSquared) / (2 * Math.PI * c * kB);
      expect(relative(bg.labLocalTemperatureKelvin, unruh)).toBeLessThan(tolerance);
    }
  });

  it("de Sitter off centre: T = ħ√(a² + c²H²)/(2πck_B) (Narnhofer, Peter & Thirring 1996; Deser & Levin, CQG 14, L163 (1997)) equals T_GH/√(1 − H²r²/c²)", () => {
    const H = 2.2e-18;
    for (const x of [0.1, 0.5, 0.9, 0.999]) {
      const r = (x * c) / H;
      const bg = makeBackground({ kind: "de-sitter", hubbleRatePerSecond: H }, { placement: "areal-radius", arealRadiusMetres: r });
      const a = bg.labProperAccelerationMetresPerSecondSquared;
      const deserLevin = (hbar * Math.sqrt(a * a + c * c * H * H)) / (2 * Math.PI * c * kB);
      const tolman = (hbar * H) / (2 * Math.PI * kB) / Math.sqrt(1 - x * x);
      expect(relative(bg.labLocalTemperatureKelvin, deserLevin)).toBeLessThan(1e-12);
      expect(relative(bg.labLocalTemperatureKelvin, tolman)).toBeLessThan(1e-12);
    }
  });
});
