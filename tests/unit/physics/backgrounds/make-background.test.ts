import fc from "fast-check";
import { all, create } from "mathjs";
import { describe, expect, it } from "vitest";
import { BackgroundInputError, makeBackground } from "@/physics/backgrounds";
import type { BackgroundSpec, LabPlacement } from "@/physics/scenario/schema";

const math = create(all);
const si = (name: keyof typeof math) => (math[name] as unknown as { value: number }).value;
const [c, G] = [si("speedOfLight"), si("gravitationConstant")];
const relative = (a: number, b: number) => Math.abs(a / b - 1);

const massKg = 1.327_124_4e20 / G; // one solar mass, IAU 2015 B3
const GM = G * massKg;
const M = GM / c ** 2; // GM/c², metres
const schwarzschild = { kind: "schwarzschild", massKg } as const;
const atRadius = (arealRadiusMetres: number): LabPlacement => ({ placement: "areal-radius", arealRadiusMetres });
const atProperDistance = (properDistanceMetres: number): LabPlacement => ({ placement: "proper-distance-from-horizon", properDistanceMetres });

function thrown(background: BackgroundSpec, lab: LabPlacement): BackgroundInputError {
  try {
    makeBackground(background, lab);
  } catch (error) {
    if (error instanceof BackgroundInputError) return error;
    throw error;
  }
  throw new Error("expected a BackgroundInputError");
}

describe("makeBackground refuses labs that cannot exist", () => {
  it("a lab on or inside the Schwarzschild radius 2GM/c²", () => {
    for (const r of [2 * M, 1.9 * M]) {
      const error = thrown(schwarzschild, atRadius(r));
      expect(error.code).toBe("lab-inside-horizon");
      expect(error.path).toBe("lab.arealRadiusMetres");
    }
  });

  it("a de Sitter lab at or beyond c/H, or farther inward from the horizon than the centre (πc/2H, a quarter great circle of the static slice's 3-sphere)", () => {
    const H = 2.2e-18;
    expect(thrown({ kind: "de-sitter", hubbleRatePerSecond: H }, atRadius(c / H)).code).toBe("lab-beyond-cosmological-horizon");
    const tooFar = thrown({ kind: "de-sitter", hubbleRatePerSecond: H }, atProperDistance(1.01 * (Math.PI / 2) * (c / H)));
    expect(tooFar.path).toBe("lab.properDistanceMetres");
  });

  it("placements that do not fit the background", () => {
    expect(thrown({ kind: "rindler", accelerationMetresPerSecondSquared: 9.81 }, atRadius(1)).code).toBe("placement-does-not-fit-background");
    expect(thrown({ kind: "minkowski" }, atProperDistance(1)).path).toBe("lab.placement");
    expect(thrown(schwarzschild, { placement: "inertial" }).code).toBe("placement-does-not-fit-background");
  });

  it("invalid numbers, with the document path of the bad field", () => {
    const error = thrown({ kind: "schwarzschild", massKg: -1 }, atRadius(1));
    expect(error.code).toBe("invalid-input");
    expect(error.path).toBe("background.massKg");
    expect(thrown(schwarzschild, atRadius(Number.NaN)).path).toBe("lab.arealRadiusMetres");
  });
});

describe("Schwarzschild static lab", () => {
  it("a = GM/(r²√(1 − 2GM/(c²r))), checked as c²·d(ln lapse)/d(proper distance) by a finite difference (static observer; e.g. Wald, General Relativity (1984))", () => {
    const lnLapse = (r: number) => Math.log1p((-2 * M) / r) / 2;
    for (const r of [2.5 * M, 10 * M, 1e4 * M]) {
      const h = 1e-5 * (r - 2 * M);
      const dLnLapseDr = (lnLapse(r + h) - lnLapse(r - h)) / (2 * h);
      const expected = c ** 2 * dLnLapseDr * Math.exp(lnLapse(r)); // dℓ = dr/lapse
      const bg = makeBackground(schwarzschild, atRadius(r));
      expect(relative(bg.labProperAccelerationMetresPerSecondSquared, expected)).toBeLessThan(1e-7);
      expect(relative(bg.labRedshiftFactor, Math.exp(lnLapse(r)))).toBeLessThan(1e-14);
    }
  });

  it("a·√(1 − 2GM/(c²r)) tends to κc = c⁴/(4GM) at the horizon (surface gravity as the redshifted acceleration at the horizon; Wald, General Relativity (1984), ch. 12)", () => {
    for (const [fraction, tolerance] of [[1e-3, 1e-6], [1e-6, 1e-12]]) {
      const bg = makeBackground(schwarzschild, atProperDistance(fraction * 2 * M));
      const product = bg.labProperAccelerationMetresPerSecondSquared * bg.labRedshiftFactor;
      expect(relative(product, c ** 4 / (4 * GM))).toBeLessThan(tolerance);
    }
  });

  it("flags a lab inside the photon sphere r = 3GM/c² (Misner, Thorne & Wheeler, Gravitation (1973), ch. 25), not one just outside", () => {
    const codes = (r: number) => makeBackground(schwarzschild, atRadius(r)).flags.map((f) => f.code);
    expect(codes(2.9 * M)).toContain("lab-inside-photon-sphere");
    expect(codes(3.1 * M)).not.toContain("lab-inside-photon-sphere");
  });

  it("flags a lab whose 1 − 2GM/(c²r) is below 1e-12 (double resolution is 2.2e-16; common practice to warn well before)", () => {
    // ℓ ≈ 2√(r_s(r − r_s)) near the horizon, so 1 − r_s/r ≈ ℓ²/(4 r_s²): ℓ = 1e-7 r_s gives 2.5e-15.
    const close = makeBackground(schwarzschild, atProperDistance(1e-7 * 2 * M));
    expect(close.flags.map((f) => f.code)).toContain("lab-too-close-to-horizon-for-double");
    expect(relative(close.labRedshiftFactor ** 2, 2.5e-15)).toBeLessThan(1e-6);
    const fine = makeBackground(schwarzschild, atProperDistance(1e-5 * 2 * M));
    expect(fine.flags.map((f) => f.code)).not.toContain("lab-too-close-to-horizon-for-double");
  });

  it("proper distance above the horizon matches a direct quadrature of ∫ dr/√(1 − r_s/r) (substituting r = r_s + s²)", () => {
    const rs = 2 * M;
    for (const r of [1.001 * rs, 2 * rs, 50 * rs]) {
      const sMax = Math.sqrt(r - rs);
      const n = 2000;
      let simpson = 0;
      for (let i = 0; i <= n; i++) {
        const weight = i === 0 || i === n ? 1 : i % 2 ? 4 : 2;
        simpson += weight * 2 * Math.sqrt(rs + ((i * sMax) / n) ** 2);
      }
      simpson *= sMax / (3 * n);
      expect(relative(makeBackground(schwarzschild, atRadius(r)).labProperDistanceToHorizonMetres!, simpson)).toBeLessThan(1e-10);
    }
  });

  it("placing by proper distance and by areal radius agree both ways (property test)", () => {
    fc.assert(
      fc.property(fc.double({ min: -6, max: 10, noNaN: true }), (log10Distance) => {
        const distance = 10 ** log10Distance * M;
        const byDistance = makeBackground(schwarzschild, atProperDistance(distance));
        const byRadius = makeBackground(schwarzschild, atRadius(byDistance.labRadiusMetres));
        // r carries absolute rounding ~ε·r_s, so the check is on r and on what r resolves (below ℓ ~ 1e-7 GM/c²,
        // r rounds to r_s itself: that is what the near-horizon caution is for).
        expect(relative(byRadius.labRadiusMetres, byDistance.labRadiusMetres)).toBeLessThan(1e-15);
        const resolvable = Math.max(1e-12, (4 * Number.EPSILON * 2 * M) / (byDistance.labRadiusMetres - 2 * M));
        expect(relative(byRadius.labProperDistanceToHorizonMetres!, distance)).toBeLessThan(resolvable);
      }),
    );
  });

  describe.each([1e8, 1e12])("far from the hole, r = %d GM/c²", (rOverM) => {
    const r = rOverM * M;
    const eps = (2 * M) / r;
    const bg = makeBackground(schwarzschild, atRadius(r));

    it("redshift deficit 1 − √(1 − ε) = ε/2 + ε²/8 + ε³/16 with ε = 2GM/(c²r) (Taylor series)", () => {
      expect(relative(bg.labRedshiftDeficit, eps / 2 + eps ** 2 / 8 + eps ** 3 / 16)).toBeLessThan(1e-14);
    });

    it("acceleration GM/r² · (1 + ε/2 + 3ε²/8) (Taylor series of (1 − ε)^(−1/2))", () => {
      expect(relative(bg.labProperAccelerationMetresPerSecondSquared, (GM / r ** 2) * (1 + eps / 2 + (3 * eps ** 2) / 8))).toBeLessThan(1e-14);
    });

    it("proper distance r − r_s/2 + (r_s/2) ln(4r/r_s) + O(r_s²/r), tortoise r + r_s(ln(r/r_s) − r_s/r) (asymptotic expansions of the closed forms)", () => {
      const rs = 2 * M;
      const distanceExcess = bg.labProperDistanceToHorizonMetres! - r;
      expect(relative(distanceExcess, -rs / 2 + (rs / 2) * Math.log((4 * r) / rs))).toBeLessThan(64 * Number.EPSILON * rOverM);
      const tortoiseExcess = bg.tortoiseMetres(r) - r;
      expect(relative(tortoiseExcess, rs * (Math.log(r / rs) - rs / r))).toBeLessThan(64 * Number.EPSILON * rOverM);
      expect(relative(bg.radiusFromTortoiseMetres(bg.tortoiseMetres(r))!, r)).toBeLessThan(4 * Number.EPSILON);
    });
  });
});

describe("de Sitter static lab", () => {
  const H = 2.2e-18;
  const deSitter = { kind: "de-sitter", hubbleRatePerSecond: H } as const;

  it("a = H²r/√(1 − H²r²/c²), checked as c²·d(ln lapse)/d(proper distance) by a finite difference", () => {
    const lnLapse = (r: number) => Math.log1p(-(((H * r) / c) ** 2)) / 2;
    for (const x of [0.01, 0.5, 0.99]) {
      const r = (x * c) / H;
      const h = 1e-5 * r * (1 - x);
      const expected = -(c ** 2) * ((lnLapse(r + h) - lnLapse(r - h)) / (2 * h)) * Math.exp(lnLapse(r));
      expect(relative(makeBackground(deSitter, atRadius(r)).labProperAccelerationMetresPerSecondSquared, expected)).toBeLessThan(1e-7);
    }
  });

  it("placing by proper distance from the horizon and by areal radius agree (property test)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.999, noNaN: true }), (x) => {
        const byRadius = makeBackground(deSitter, atRadius((x * c) / H));
        const byDistance = makeBackground(deSitter, atProperDistance(byRadius.labProperDistanceToHorizonMetres!));
        expect(relative(byDistance.labRadiusMetres, byRadius.labRadiusMetres)).toBeLessThan(1e-12);
        expect(relative(byDistance.labRedshiftFactor, byRadius.labRedshiftFactor)).toBeLessThan(1e-12);
      }),
    );
  });

  it("flags a lab whose 1 − H²r²/c² is below 1e-12 (common practice, as for Schwarzschild); lapse = sin(Hℓ/c) at proper distance ℓ", () => {
    const close = makeBackground(deSitter, atProperDistance(1e-7 * (c / H)));
    expect(close.flags.map((f) => f.code)).toContain("lab-too-close-to-horizon-for-double");
    expect(relative(close.labRedshiftFactor, Math.sin(1e-7))).toBeLessThan(1e-15);
    expect(makeBackground(deSitter, atProperDistance(1e-5 * (c / H))).flags).toHaveLength(0);
  });

  it("the inertial lab sits at the centre, unaccelerated, πc/2H from the horizon", () => {
    const centre = makeBackground(deSitter, { placement: "areal-radius", arealRadiusMetres: 0 });
    expect(centre.labProperAccelerationMetresPerSecondSquared).toBe(0);
    expect(relative(centre.labProperDistanceToHorizonMetres!, (Math.PI / 2) * (c / H))).toBeLessThan(1e-15);
  });
});

describe("Rindler and Minkowski labs", () => {
  it("the Rindler lab is c²/a from its horizon, with surface gravity a/c per unit of its own proper time (Rindler, Am. J. Phys. 34, 1174 (1966))", () => {
    const bg = makeBackground({ kind: "rindler", accelerationMetresPerSecondSquared: 9.81 }, { placement: "uniformly-accelerated" });
    expect(relative(bg.labProperDistanceToHorizonMetres!, c ** 2 / 9.81)).toBeLessThan(1e-15);
    expect(relative(bg.horizon!.surfaceGravityPerSecond, 9.81 / c)).toBeLessThan(1e-15);
    expect(bg.labRedshiftFactor).toBe(1);
  });

  it("the Minkowski lab has no horizon and a zero temperature", () => {
    const bg = makeBackground({ kind: "minkowski" }, { placement: "inertial" });
    expect(bg.horizon).toBeNull();
    expect(bg.labLocalTemperatureKelvin).toBe(0);
    expect(bg.labProperDistanceToHorizonMetres).toBeNull();
  });
});
