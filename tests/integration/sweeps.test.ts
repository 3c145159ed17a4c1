/**
 * POST /api/sweeps through the real route handler and compute pool: a document's or a saved scenario's sweep, as
 * JSON or CSV, with the access check, the ceilings and field paths for bad requests.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import * as sweepsRoute from "@/app/api/sweeps/route";
import { API_SWEEP_MAX_POINTS } from "@/contracts/requests";
import { computeScenario, withParameter } from "@/physics";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { call } from "./harness";
import { projectFixture } from "./fixtures";

const example = (name: string) => JSON.parse(readFileSync(path.resolve(__dirname, "../../examples", name), "utf8"));

describe("POST /api/sweeps", () => {
  it("answers at each point what one computation of the varied document answers", async () => {
    const document = defaultScenarioDocument();
    const request = { parameter: "recombination-time", fromValue: 1e-3, toValue: 1e-1, points: 5 };
    const res = await call(sweepsRoute.POST, "POST", "/api/sweeps", { body: { ...request, document } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.sweep).toMatchObject({ parameter: "recombination-time", unit: "s", spacing: "log" });
    expect(res.body.sweep.points).toHaveLength(5);
    const xs = res.body.sweep.points.map((p: { x: number }) => p.x);
    expect(xs[0]).toBeCloseTo(1e-3, 15);
    expect(xs[4]).toBeCloseTo(1e-1, 13);
    // Evenly spaced in the logarithm: each step multiplies by the same ratio, 10^(2/4).
    for (let i = 1; i < 5; i++) expect(xs[i] / xs[i - 1]).toBeCloseTo(Math.sqrt(10), 10);
    for (const point of res.body.sweep.points) {
      const single = computeScenario(withParameter(document, "recombination-time", point.x));
      expect(point.totalQuanta).toEqual(JSON.parse(JSON.stringify(single.combined.totalQuanta)));
      expect(point.decoherence).toEqual(JSON.parse(JSON.stringify(single.combined.decoherence)));
    }
  });

  it("grows the hold-driven quanta linearly with the hold time near a horizon", async () => {
    // A long hold at constant separation in front of a horizon radiates into it at a steady rate, so ⟨N⟩ grows
    // linearly in the hold time: ⟨N⟩ ≈ |Δp|² S(0) τ_hold / ħ² (Wilson-Gerow, Dugad & Chen, "Decoherence by warm
    // horizons", arXiv:2405.00804, PRD 110 (2024)); the ramps add a constant. Equal steps of τ must add equal ⟨N⟩.
    const document = example("schwarzschild.json");
    const res = await call(sweepsRoute.POST, "POST", "/api/sweeps", { body: { document, parameter: "hold-time", fromValue: 10, toValue: 40, points: 3 } });
    expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(200);
    const [a, b, c] = res.body.sweep.points as { x: number; totalQuanta: { value: number } }[];
    const slope1 = (b.totalQuanta.value - a.totalQuanta.value) / (b.x - a.x);
    const slope2 = (c.totalQuanta.value - b.totalQuanta.value) / (c.x - b.x);
    expect(slope1).toBeGreaterThan(0);
    expect(Math.abs(slope2 / slope1 - 1)).toBeLessThan(0.02);
  });

  it("answers CSV with the inputs in its header and one row per point", async () => {
    const document = defaultScenarioDocument();
    const res = await call(sweepsRoute.POST, "POST", "/api/sweeps", { body: { document, parameter: "hold-time", fromValue: 1e-3, toValue: 1e-2, points: 3, format: "csv" } });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    const text = res.body as string;
    expect(text).toContain("# sweep.parameter: hold-time\r\n");
    expect(text).toContain("# separation.distanceMetres: ");
    const table = Papa.parse<string[]>(text.split("\r\n").filter((line) => !line.startsWith("#")).join("\r\n").trim()).data;
    expect(table[0][0]).toBe("hold-time [s]");
    expect(table).toHaveLength(4);
    expect(Number(table[3][0])).toBeCloseTo(1e-2, 14);
  });

  it("sweeps a saved scenario for its readers only", async () => {
    const f = await projectFixture();
    const body = { projectId: f.projectId, scenarioId: f.scenarioId, parameter: "recombination-time", fromValue: 1e-3, toValue: 1e-2, points: 2 };
    expect((await call(sweepsRoute.POST, "POST", "/api/sweeps", { body, as: f.users.viewer })).status).toBe(200);
    expect((await call(sweepsRoute.POST, "POST", "/api/sweeps", { body, as: f.users.stranger })).status).toBe(404);
    expect((await call(sweepsRoute.POST, "POST", "/api/sweeps", { body })).status).toBe(401);
  });

  it("refuses bad requests with the field and the reason, before computing", async () => {
    const document = defaultScenarioDocument();
    const tooMany = await call(sweepsRoute.POST, "POST", "/api/sweeps", { body: { document, parameter: "hold-time", fromValue: 1e-3, toValue: 1, points: API_SWEEP_MAX_POINTS + 1 } });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.fields).toEqual([expect.objectContaining({ path: "points" })]);
    const unknown = await call(sweepsRoute.POST, "POST", "/api/sweeps", { body: { document, parameter: "charge", fromValue: 1, toValue: 2, points: 2 } });
    expect(unknown.body.error.fields[0].path).toBe("parameter");
    const negative = await call(sweepsRoute.POST, "POST", "/api/sweeps", { body: { document, parameter: "hold-time", fromValue: -1, toValue: 2, points: 2 } });
    expect(negative.body.error.fields[0].path).toBe("fromValue");
    const neither = await call(sweepsRoute.POST, "POST", "/api/sweeps", { body: { parameter: "hold-time", fromValue: 1, toValue: 2, points: 2 } });
    expect(neither.body.error.fields[0].path).toBe("document");
    // Minkowski has no horizon, so no lab distance to vary: the document's path says why.
    const flat = await call(sweepsRoute.POST, "POST", "/api/sweeps", { body: { document: example("minkowski.json"), parameter: "lab-distance", fromValue: 1, toValue: 2, points: 2 } });
    expect(flat.status).toBe(400);
    expect(flat.body.error.fields[0].path).toBe("document.background.kind");
    const broken = await call(sweepsRoute.POST, "POST", "/api/sweeps", { body: { document: { ...document, separation: { ...document.separation, distanceMetres: -1 } }, parameter: "hold-time", fromValue: 1, toValue: 2, points: 2 } });
    expect(broken.status).toBe(400);
    expect(broken.body.error.fields[0].path).toMatch(/^document\.separation/);
  });

  it("refuses a sweep over its cost ceiling at once, naming how many points fit", async () => {
    // Linear ramps have kinks; a fine kink resolution samples each point at the most the engine takes (2^18 per
    // channel), within one computation's ceiling but far past a sweep's at this many points.
    const base = example("minkowski.json");
    const document = {
      ...base,
      protocol: { ...base.protocol, separation: { durationSeconds: 0.01, shape: "linear" }, recombination: { durationSeconds: 0.01, shape: "linear" } },
      numerics: { ...base.numerics, kinkTimeResolutionSeconds: 1e-9 },
    };
    const started = Date.now();
    const res = await call(sweepsRoute.POST, "POST", "/api/sweeps", { body: { document, parameter: "hold-time", fromValue: 1e-3, toValue: 1e-2, points: API_SWEEP_MAX_POINTS } });
    expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(422);
    expect(res.body.error.code).toBe("compute_too_costly");
    expect(res.body.error.fields[0].path).toBe("points");
    expect(res.body.error.fields[0].message).toMatch(/at most about \d+ points/);
    // Refused from the estimate, not after computing: far quicker than one such computation.
    expect(Date.now() - started).toBeLessThan(5000);
  });
});
