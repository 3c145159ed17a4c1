import { readFileSync } from "node:fs";
import path from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { assembleMap, axisValues, computeMapPoint, documentAt, MAP_PARAMETERS, mapRefusal, mapRowOf, type MapAxis, type MapRequest } from "@/physics/maps";
import { defaultScenarioDocument, parseScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";

const example = (name: string): ScenarioDocument => {
  const parsed = parseScenarioDocument(JSON.parse(readFileSync(path.resolve(__dirname, "../../../examples", name), "utf8")));
  if (!parsed.ok) throw new Error(`example ${name} does not parse`);
  return parsed.document;
};

const small = (): MapRequest => ({
  x: { parameter: "recombination-time", from: 1e-3, to: 1e-1, points: 3, scale: "log" },
  y: { parameter: "hold-time", from: 1e-2, to: 1, points: 2, scale: "linear" },
  quantity: "total-quanta",
});

describe("map axes", () => {
  it("space points evenly in the logarithm, x_i = from·(to/from)^(i/(n−1)), or evenly, from + (to − from)·i/(n−1)", () => {
    fc.assert(
      fc.property(fc.double({ min: -12, max: 12, noNaN: true }), fc.double({ min: -12, max: 12, noNaN: true }), fc.integer({ min: 2, max: 200 }), fc.boolean(), (a, b, points, log) => {
        fc.pre(Math.abs(a - b) > 1e-6);
        const axis: MapAxis = { parameter: "hold-time", from: 10 ** a, to: 10 ** b, points, scale: log ? "log" : "linear" };
        const values = axisValues(axis);
        expect(values).toHaveLength(points);
        values.forEach((v, i) => {
          const expected = log ? axis.from * (axis.to / axis.from) ** (i / (points - 1)) : axis.from + ((axis.to - axis.from) * i) / (points - 1);
          // Relative to the value on a log axis; to the axis's span on a linear one (where a point may be near zero).
          expect(Math.abs(v - expected) / (log ? expected : Math.max(axis.from, axis.to))).toBeLessThan(1e-9);
        });
        const steps = values.slice(1).map((v, i) => Math.sign(v - values[i]));
        expect(new Set(steps)).toEqual(new Set([Math.sign(axis.to - axis.from)]));
      }),
      { numRuns: 200 },
    );
  });
});

describe("refusing a map", () => {
  const doc = defaultScenarioDocument();
  it("accepts a map the document can make", () => {
    expect(mapRefusal(doc, small())).toBeNull();
    expect(MAP_PARAMETERS).toEqual(expect.arrayContaining(["recombination-time", "hold-time", "lab-distance"]));
  });
  it("names the axis field that is wrong", () => {
    expect(mapRefusal(doc, { ...small(), y: { ...small().x } })).toMatchObject({ kind: "invalid", path: "y.parameter" });
    expect(mapRefusal(doc, { ...small(), x: { ...small().x, points: 201 } })).toMatchObject({ kind: "invalid", path: "x.points" });
    expect(mapRefusal(doc, { ...small(), x: { ...small().x, from: 0 } })).toMatchObject({ kind: "invalid", path: "x.from" });
    expect(mapRefusal(doc, { ...small(), y: { ...small().y, from: 0 } })).toBeNull(); // a linear axis may start at zero
    expect(mapRefusal(doc, { ...small(), x: { ...small().x, to: 1e-3 } })).toMatchObject({ kind: "invalid", path: "x.to" });
  });
  it("names the document field a corner of the map puts outside the ranges a document may hold", () => {
    const refusal = mapRefusal(doc, { ...small(), x: { ...small().x, to: 1e300 } });
    expect(refusal).toMatchObject({ kind: "invalid", path: expect.stringMatching(/^protocol\.recombination/) });
    expect(refusal?.message).toMatch(/corner/);
  });
  it("names the document field when the document cannot vary a parameter (a Minkowski lab has no distance)", () => {
    const refusal = mapRefusal(doc, { ...small(), y: { parameter: "lab-distance", from: 1, to: 10, points: 2, scale: "log" } });
    expect(refusal).toMatchObject({ kind: "invalid", path: "background.kind" });
  });
  it("refuses as too costly a map with a corner over the cost ceiling, naming the numerics", () => {
    // Linear ramps are kinked: sampled at the kink resolution, 2^18 samples per window group (physics/compute-cost.ts).
    const kinked: ScenarioDocument = {
      ...doc,
      protocol: { kind: "segments", separation: { durationSeconds: 0.01, shape: "linear" }, hold: { durationSeconds: 0.1 }, recombination: { durationSeconds: 0.01, shape: "linear" } },
      numerics: { ...doc.numerics, kinkTimeResolutionSeconds: 1e-9 },
    };
    expect(mapRefusal(kinked, small())).toBeNull();
    const refusal = mapRefusal(kinked, small(), 100_000);
    expect(refusal?.kind).toBe("too-costly");
    expect(refusal?.path).toMatch(/^numerics\./);
    expect(refusal?.message).toMatch(/corner/);
  });
});

describe("map points", () => {
  it("are the computation of the document with both parameters set", () => {
    const doc = defaultScenarioDocument();
    const request = small();
    const x = axisValues(request.x)[2];
    const y = axisValues(request.y)[1];
    const direct = computeScenario({ ...doc, protocol: { ...(doc.protocol as any), hold: { durationSeconds: y }, recombination: { ...(doc.protocol as any).recombination, durationSeconds: x } } });
    expect(documentAt(doc, request, x, y).protocol).toMatchObject({ hold: { durationSeconds: y }, recombination: { durationSeconds: x } });
    expect(computeMapPoint(doc, request, 2, 1)).toEqual({ log10: direct.combined.totalQuanta.log10, gap: null });
  });

  it("leave a gap with its reason where the document cannot be computed (a lab inside the horizon), and compute the rest", () => {
    const doc = example("schwarzschild.json");
    const rs = 2 * 6.6743e-11 * (doc.background as { massKg: number }).massKg / 299792458 ** 2;
    const request: MapRequest = { x: { parameter: "lab-distance", from: 0.5 * rs, to: 4 * rs, points: 2, scale: "log" }, y: { parameter: "hold-time", from: 1, to: 10, points: 2, scale: "log" }, quantity: "decoherence" };
    const row = mapRowOf(0, [computeMapPoint(doc, request, 0, 0), computeMapPoint(doc, request, 1, 0)]);
    expect(row.log10[0]).toBeNull();
    expect(row.gaps).toEqual([{ column: 0, row: 0, path: "lab.arealRadiusMetres", message: expect.stringMatching(/horizon/) }]);
    expect(row.log10[1]).toEqual(expect.any(Number));
  });

  /**
   * Outside the project: far from a black hole the hold-driven count grows linearly with the hold time T, at a rate
   * falling as D⁻⁶ with the lab's distance D for electromagnetism and D⁻¹⁰ for gravity ("Black holes decohere
   * quantum superpositions", arXiv:2205.06279, IJMPD 31, 2241003 (2022): ⟨N⟩ ~ M³q²d²T/D⁶ and M⁵m²d⁴T/D¹⁰).
   * Read off a lab-distance × hold-time map: the rate is ΔN/ΔT between rows, its slope d log rate / d log D.
   */
  it("show the published far-zone scalings of a Schwarzschild map: ⟨N⟩ linear in T, rate ∝ D⁻⁶ (EM) and D⁻¹⁰ (gravity)", () => {
    const doc = example("schwarzschild.json");
    const rs = 2 * 6.6743e-11 * (doc.background as { massKg: number }).massKg / 299792458 ** 2;
    for (const [quantity, power] of [["electromagnetic-quanta", -6], ["gravitational-quanta", -10]] as const) {
      const request: MapRequest = { x: { parameter: "lab-distance", from: 80 * rs, to: 320 * rs, points: 2, scale: "log" }, y: { parameter: "hold-time", from: 1e6, to: 1e8, points: 3, scale: "log" }, quantity };
      const rows = [0, 1, 2].map((r) => mapRowOf(r, [0, 1].map((c) => computeMapPoint(doc, request, c, r))));
      const grid = assembleMap(request, [rows[2], rows[0], rows[1]]);
      const N = (c: number, r: number) => 10 ** grid.log10[r][c]!;
      const T = grid.y.values;
      const rate = (c: number) => (N(c, 2) - N(c, 1)) / (T[2] - T[1]);
      for (const c of [0, 1]) expect((N(c, 1) - N(c, 0)) / (T[1] - T[0]) / rate(c)).toBeCloseTo(1, 4);
      const slope = Math.log10(rate(1) / rate(0)) / Math.log10(grid.x.values[1] / grid.x.values[0]);
      expect(slope).toBeCloseTo(power, 1);
    }
  });
});

describe("assembling a map", () => {
  it("orders the rows and refuses a missing one", () => {
    const request = small();
    const rows = [mapRowOf(1, [{ log10: 1, gap: null }, { log10: 2, gap: null }, { log10: null, gap: null }]), mapRowOf(0, [{ log10: 0, gap: null }, { log10: 0, gap: null }, { log10: 0, gap: null }])];
    const grid = assembleMap(request, rows);
    expect(grid.log10).toEqual([[0, 0, 0], [1, 2, null]]);
    expect(grid).toMatchObject({ quantity: "total-quanta", unit: "1", x: { parameter: "recombination-time", unit: "s", scale: "log" }, y: { unit: "s", scale: "linear" } });
    expect(() => assembleMap(request, rows.slice(0, 1))).toThrow(/one row per y value/);
  });
});
