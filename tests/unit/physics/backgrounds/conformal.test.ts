import fc from "fast-check";
import { all, create } from "mathjs";
import { describe, expect, it } from "vitest";
import {
  blackHoleInteriorToDiagram,
  constantRadiusCurve,
  constantTimeCurve,
  diagramBoundaries,
  makeBackground,
  type Background,
  type DiagramPoint,
} from "@/physics/backgrounds";

const math = create(all);
const si = (name: keyof typeof math) => (math[name] as unknown as { value: number }).value;
const [c, G] = [si("speedOfLight"), si("gravitationConstant")];

const massKg = (10 * 1.327_124_4e20) / G; // ten solar masses (IAU 2015 B3 GM☉)
const rs = (2 * G * massKg) / c ** 2;
const acceleration = 9.81;
const H = 2.2e-18;

interface Case {
  name: string;
  background: Background;
  /** Natural time scale (s) and length scale (m) of the chart: where the diagram resolves coordinates. */
  timeScale: number;
  lengthScale: number;
  /** A radius of the static region from a number in [0, 1]. */
  radiusAt(fraction: number): number;
  /** dr* / dr from the metric, written out here (source beside each). */
  inverseLapseSquared(r: number): number;
  /** Coordinate distance from r to the chart's edge (horizon or centre), to size finite differences. */
  gap(r: number): number;
}

const cases: Case[] = [
  {
    name: "Minkowski",
    background: makeBackground({ kind: "minkowski" }, { placement: "inertial" }),
    timeScale: 1,
    lengthScale: c,
    radiusAt: (f) => f * 5 * c,
    inverseLapseSquared: () => 1, // ds² = −c²dt² + dr² + r²dΩ²
    gap: (r) => r,
  },
  {
    name: "Rindler",
    background: makeBackground({ kind: "rindler", accelerationMetresPerSecondSquared: acceleration }, { placement: "uniformly-accelerated" }),
    timeScale: c / acceleration,
    lengthScale: c ** 2 / acceleration,
    radiusAt: (f) => (c ** 2 / acceleration) * 10 ** (-4 + 5 * f),
    inverseLapseSquared: (xi) => c ** 2 / (acceleration * xi), // ds² = −(aξ/c²)²c²dt² + dξ² (Rindler, Am. J. Phys. 34, 1174 (1966))
    gap: (xi) => xi,
  },
  {
    name: "Schwarzschild",
    background: makeBackground({ kind: "schwarzschild", massKg }, { placement: "areal-radius", arealRadiusMetres: 10 * rs }),
    timeScale: (2 * rs) / c,
    lengthScale: 2 * rs,
    radiusAt: (f) => rs * (1 + 10 ** (-6 + 7 * f)),
    inverseLapseSquared: (r) => 1 / (1 - rs / r), // Schwarzschild metric (Misner, Thorne & Wheeler, Gravitation (1973), ch. 31)
    gap: (r) => r - rs,
  },
  {
    name: "de Sitter",
    background: makeBackground({ kind: "de-sitter", hubbleRatePerSecond: H }, { placement: "areal-radius", arealRadiusMetres: (0.5 * c) / H }),
    timeScale: 1 / H,
    lengthScale: c / H,
    radiusAt: (f) => (c / H) * (1 - 10 ** (-6 + 6 * f)),
    inverseLapseSquared: (r) => 1 / (1 - ((H * r) / c) ** 2), // static patch (Gibbons & Hawking, PRD 15, 2738 (1977))
    gap: (r) => c / H - r,
  },
];

function distanceToPolyline(point: DiagramPoint, polyline: DiagramPoint[]): number {
  if (polyline.length === 1) return Math.hypot(point.T - polyline[0].T, point.X - polyline[0].X);
  let best = Infinity;
  for (let i = 1; i < polyline.length; i++) {
    const [a, b] = [polyline[i - 1], polyline[i]];
    const [dT, dX] = [b.T - a.T, b.X - a.X];
    const s = Math.min(1, Math.max(0, ((point.T - a.T) * dT + (point.X - a.X) * dX) / (dT * dT + dX * dX)));
    best = Math.min(best, Math.hypot(point.T - a.T - s * dT, point.X - a.X - s * dX));
  }
  return best;
}

function labBoundary(background: Background, label: string): DiagramPoint[] {
  const found = diagramBoundaries(background).find((b) => b.label === label && b.bordersLabRegion);
  if (!found) throw new Error(`no ${label} on the ${background.kind} diagram`);
  return found.points;
}

describe.each(cases)("$name diagram", (k) => {
  const bg = k.background;

  it("the tortoise coordinate obeys dr* / dr = 1/(lapse²) of the metric (finite difference; null rays are t ± r*/c = const)", () => {
    for (const f of [0.1, 0.5, 0.9]) {
      const r = k.radiusAt(f);
      const h = 1e-2 * k.gap(r);
      const rStar = (n: number) => bg.tortoiseMetres(r + n * h);
      const derivative = (rStar(-2) - 8 * rStar(-1) + 8 * rStar(1) - rStar(2)) / (12 * h); // five-point stencil, error O(h⁴)
      expect(Math.abs(derivative / k.inverseLapseSquared(r) - 1)).toBeLessThan(1e-6);
    }
  });

  it("toDiagram and fromDiagram invert each other over the static region (property test)", () => {
    fc.assert(
      fc.property(fc.double({ min: -6, max: 6, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (tOverScale, f) => {
        const [t, r] = [tOverScale * k.timeScale, k.radiusAt(f)];
        const back = bg.conformal.fromDiagram(bg.conformal.toDiagram(t, r));
        expect(back).not.toBeNull();
        expect(Math.abs(back!.tSeconds - t)).toBeLessThan(1e-7 * k.timeScale);
        expect(Math.abs(bg.tortoiseMetres(back!.rMetres) - bg.tortoiseMetres(r))).toBeLessThan(1e-7 * k.lengthScale);
      }),
    );
  });

  it("radial light rays are straight lines at ±45°", () => {
    for (const [sign, label] of [[1, "outgoing"], [-1, "ingoing"]] as const) {
      const nullCoordinate = 0.3 * k.lengthScale; // u for outgoing rays, v for ingoing ones
      const points = [0.05, 0.3, 0.6, 0.95].map((f) => {
        const r = k.radiusAt(f);
        return bg.conformal.toDiagram((nullCoordinate + sign * bg.tortoiseMetres(r)) / c, r);
      });
      for (const p of points.slice(1)) {
        const slope = (p.T - points[0].T) / (p.X - points[0].X);
        expect(Math.abs(slope - sign), label).toBeLessThan(1e-9);
      }
    }
  });

  it("static worldlines are timelike (steeper than 45°) and constant-time slices spacelike", () => {
    const worldline = constantRadiusCurve(bg, k.radiusAt(0.5), { fromSeconds: -3 * k.timeScale, toSeconds: 3 * k.timeScale }, 20);
    const slice = constantTimeCurve(bg, 0.5 * k.timeScale, { fromMetres: k.radiusAt(0.05), toMetres: k.radiusAt(0.95) }, 20);
    expect(worldline).toHaveLength(20);
    expect(slice).toHaveLength(20);
    for (let i = 1; i < 20; i++) {
      expect(Math.abs(worldline[i].T - worldline[i - 1].T)).toBeGreaterThan(Math.abs(worldline[i].X - worldline[i - 1].X));
      expect(Math.abs(slice[i].X - slice[i - 1].X)).toBeGreaterThan(Math.abs(slice[i].T - slice[i - 1].T));
    }
  });

  it("late static times end at i⁺ (for the Rindler wedge: where H⁺ meets ℐ⁺, since accelerated worldlines become null)", () => {
    const late = bg.conformal.toDiagram(1e14 * k.timeScale, k.radiusAt(0.5));
    for (const label of k.name === "Rindler" ? ["H⁺", "ℐ⁺"] : ["i⁺"]) {
      expect(distanceToPolyline(late, labBoundary(bg, label)), label).toBeLessThan(1e-12);
    }
  });
});

describe("boundaries: horizons and null infinity", () => {
  const [minkowski, rindler, schwarzschild, deSitter] = cases;

  it.each([rindler, schwarzschild])("$name: ingoing rays cross H⁺, outgoing rays come out of H⁻, both diagonals through the bifurcation point", (k) => {
    const bg = k.background;
    const nearHorizon = k.name === "Rindler" ? 1e-12 * k.lengthScale : rs * (1 + 1e-12);
    for (const [sign, label] of [[-1, "H⁺"], [1, "H⁻"]] as const) {
      const point = bg.conformal.toDiagram((0.2 * k.lengthScale + sign * bg.tortoiseMetres(nearHorizon)) / c, nearHorizon);
      expect(distanceToPolyline(point, labBoundary(bg, label)), label).toBeLessThan(1e-9);
      expect(distanceToPolyline(bg.conformal.toDiagram(0, k.radiusAt(0.8)), labBoundary(bg, label))).toBeGreaterThan(1e-3);
    }
  });

  it.each([minkowski, rindler, schwarzschild])("$name: outgoing rays reach ℐ⁺ and ingoing rays come from ℐ⁻; the far end of t = 0 is i⁰", (k) => {
    const bg = k.background;
    const far = 1e30 * k.lengthScale; // the Rindler r* grows only like ln ξ
    for (const [sign, label] of [[1, "ℐ⁺"], [-1, "ℐ⁻"]] as const) {
      const point = bg.conformal.toDiagram((0.2 * k.lengthScale + sign * bg.tortoiseMetres(far)) / c, far);
      expect(distanceToPolyline(point, labBoundary(bg, label)), label).toBeLessThan(1e-9);
    }
    expect(distanceToPolyline(bg.conformal.toDiagram(0, far), labBoundary(bg, "i⁰"))).toBeLessThan(1e-12);
  });

  it("de Sitter: outgoing rays cross H⁺ and ingoing rays come out of H⁻ on the diagonals; the centre r = 0 is the edge X = 0", () => {
    const bg = deSitter.background;
    const nearHorizon = (c / H) * (1 - 1e-12);
    for (const [sign, label] of [[1, "H⁺"], [-1, "H⁻"]] as const) {
      const point = bg.conformal.toDiagram((0.2 * deSitter.lengthScale + sign * bg.tortoiseMetres(nearHorizon)) / c, nearHorizon);
      expect(distanceToPolyline(point, labBoundary(bg, label)), label).toBeLessThan(1e-9);
    }
    for (const t of [-2, 0, 3]) expect(distanceToPolyline(bg.conformal.toDiagram(t / H, 0), labBoundary(bg, "r = 0"))).toBeLessThan(1e-15);
  });

  it("Minkowski: the lab's x = 0 is the diamond's vertical diagonal X = 0, and x < 0 its left half, mirrored", () => {
    const bg = minkowski.background;
    for (const t of [-2, 0, 3]) {
      expect(bg.conformal.toDiagram(t, 0).X).toBe(0);
      const [right, left] = [bg.conformal.toDiagram(t, 2), bg.conformal.toDiagram(t, -2)];
      expect(left.X).toBeCloseTo(-right.X, 15);
      expect(left.T).toBeCloseTo(right.T, 15);
    }
  });
});

describe("diagram maps against the textbook coordinate transformations", () => {
  const arctanPair = (U: number, V: number): DiagramPoint => {
    const [P, Q] = [(2 / Math.PI) * Math.atan(U), (2 / Math.PI) * Math.atan(V)];
    return { T: (P + Q) / 2, X: (Q - P) / 2 };
  };

  it("Rindler: the wedge point is the inertial point x = ξ cosh(at/c), ct = ξ sinh(at/c) in the Minkowski arctan compactification of scale c²/a (Rindler 1966)", () => {
    const bg = cases[1].background;
    const L = c ** 2 / acceleration;
    for (const [tOverScale, xiOverL] of [[0, 1], [0.7, 0.2], [-1.5, 3]]) {
      const [t, xi] = [(tOverScale * c) / acceleration, xiOverL * L];
      const [x, ct] = [xi * Math.cosh((acceleration * t) / c), xi * Math.sinh((acceleration * t) / c)];
      const expected = arctanPair((ct - x) / L, (ct + x) / L);
      const got = bg.conformal.toDiagram(t, xi);
      expect(Math.abs(got.T - expected.T) + Math.abs(got.X - expected.X)).toBeLessThan(1e-14);
    }
  });

  // Kruskal–Szekeres (MTW, Gravitation (1973), §31.5, with G = c = 1 and M the mass length):
  // r > 2M: u = (r/2M − 1)^½ e^{r/4M} cosh(t/4M), v = (r/2M − 1)^½ e^{r/4M} sinh(t/4M);
  // r < 2M: u = (1 − r/2M)^½ e^{r/4M} sinh(t/4M), v = (1 − r/2M)^½ e^{r/4M} cosh(t/4M); null pair (v − u, v + u).
  function kruskal(tSeconds: number, r: number): DiagramPoint {
    const m = rs / 2;
    const t = c * tSeconds;
    const amplitude = Math.sqrt(Math.abs(r / (2 * m) - 1)) * Math.exp(r / (4 * m));
    const [u, v] = r > 2 * m
      ? [amplitude * Math.cosh(t / (4 * m)), amplitude * Math.sinh(t / (4 * m))]
      : [amplitude * Math.sinh(t / (4 * m)), amplitude * Math.cosh(t / (4 * m))];
    return arctanPair(v - u, v + u);
  }

  it("Schwarzschild exterior matches the Kruskal–Szekeres coordinates", () => {
    const bg = cases[2].background;
    for (const [tOverM, rOverRs] of [[0, 1.5], [3, 1.01], [-5, 4], [10, 2.2]]) {
      const t = (tOverM * rs) / (2 * c);
      const got = bg.conformal.toDiagram(t, rOverRs * rs);
      const expected = kruskal(t, rOverRs * rs);
      expect(Math.abs(got.T - expected.T) + Math.abs(got.X - expected.X)).toBeLessThan(1e-13);
    }
  });

  it("Schwarzschild interior matches Kruskal–Szekeres, and r = 0 lands on the singularity edge", () => {
    for (const [tOverM, rOverRs] of [[0, 0.5], [3, 0.99], [-5, 0.1], [2, 0]]) {
      const t = (tOverM * rs) / (2 * c);
      const got = blackHoleInteriorToDiagram(rs, t, rOverRs * rs)!;
      const expected = kruskal(t, rOverRs * rs);
      expect(Math.abs(got.T - expected.T) + Math.abs(got.X - expected.X)).toBeLessThan(1e-13);
    }
    const singularity = diagramBoundaries(cases[2].background).find((b) => b.kind === "singularity")!.points;
    for (const tOverM of [-8, -1, 0, 4]) {
      expect(distanceToPolyline(blackHoleInteriorToDiagram(rs, (tOverM * rs) / c, 0)!, singularity)).toBeLessThan(1e-15);
    }
    expect(blackHoleInteriorToDiagram(rs, 0, 1.5 * rs)).toBeNull();
  });

  it("Schwarzschild t = 0 is the Kruskal time-symmetric slice T = 0", () => {
    for (const p of constantTimeCurve(cases[2].background, 0, { fromMetres: 1.001 * rs, toMetres: 30 * rs }, 12)) expect(Math.abs(p.T)).toBeLessThan(1e-15);
  });

  // Global de Sitter (Hawking & Ellis (1973), §5.2): on the hyperboloid −X0² + X4² + |X|² = (c/H)², static
  // X0 = √((c/H)² − r²) sinh(Ht), X4 = √((c/H)² − r²) cosh(Ht); global X0 = (c/H) tan η, X4 = (c/H) cos χ / cos η,
  // r = (c/H) sin χ / cos η. Diagram T = 2η/π, X = 2χ/π.
  it("de Sitter static patch matches global conformal time and polar angle from the hyperboloid embedding", () => {
    const bg = cases[3].background;
    for (const [Ht, x] of [[0, 0.5], [1.2, 0.9], [-0.7, 0.1], [2.5, 0.999]]) {
      const lapse = Math.sqrt(1 - x * x);
      const eta = Math.atan(lapse * Math.sinh(Ht));
      const chi = Math.atan2(x, lapse * Math.cosh(Ht));
      const got = bg.conformal.toDiagram(Ht / H, (x * c) / H);
      expect(Math.abs(got.T - (2 * eta) / Math.PI) + Math.abs(got.X - (2 * chi) / Math.PI)).toBeLessThan(1e-13);
    }
  });
});
