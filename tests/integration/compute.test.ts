/** POST /api/compute through the real route handler: JSON in, result JSON out, field paths for bad documents. */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import * as computeRoute from "@/app/api/compute/route";
import { computeScenario } from "@/physics";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { call } from "./harness";

describe("POST /api/compute", () => {
  it("answers the same result as the physics library for the same document", async () => {
    const document = defaultScenarioDocument();
    const res = await call(computeRoute.POST, "POST", "/api/compute", { body: document });
    expect(res.status).toBe(200);
    expect(res.body.result).toEqual(JSON.parse(JSON.stringify(computeScenario(document))));
  });

  it("computes every example document in examples/", async () => {
    const dir = path.resolve(__dirname, "../../examples");
    const files = readdirSync(dir).filter((f) => f.endsWith(".json"));
    expect(files.length).toBeGreaterThanOrEqual(4);
    for (const file of files) {
      const res = await call(computeRoute.POST, "POST", "/api/compute", { body: JSON.parse(readFileSync(path.join(dir, file), "utf8")) });
      expect(res.status, `${file}: ${JSON.stringify(res.body)}`).toBe(200);
      expect(res.body.result.combined.totalQuanta.unit).toBeDefined();
    }
  });

  it("returns the lab's environment channels, total, dominant channel and margins for a version-2 document, and a version-1 document as an isolated body", async () => {
    const fixtures = path.resolve(__dirname, "../unit/physics/fixtures");
    const v2 = JSON.parse(readFileSync(path.join(fixtures, "scenario-v2.json"), "utf8"));
    const res = await call(computeRoute.POST, "POST", "/api/compute", { body: v2 });
    expect(res.status).toBe(200);
    expect(res.body.result.environment.channels.map((ch: { channel: string }) => ch.channel)).toEqual(["gas", "thermal-scattering", "thermal-absorption", "thermal-emission", "surface"]);
    expect(res.body.result.environment.margins).toHaveLength(5);
    const v1 = await call(computeRoute.POST, "POST", "/api/compute", { body: JSON.parse(readFileSync(path.join(fixtures, "scenario-v1.json"), "utf8")) });
    expect(v1.status).toBe(200);
    expect(v1.body.result.environment).toBeNull();
    const bad = await call(computeRoute.POST, "POST", "/api/compute", { body: { ...v2, environment: { ...v2.environment, gas: { pressurePascals: -1, temperatureKelvin: 4, species: "He" } } } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.map((f: { path: string }) => f.path)).toContain("environment.gas.pressurePascals");
  });

  it("answers 400 naming the field and the reason for a bad document", async () => {
    const bad = { ...defaultScenarioDocument(), protocol: { kind: "segments", separation: { durationSeconds: -1, shape: "cubic" }, hold: { durationSeconds: 1 }, recombination: { durationSeconds: 1, shape: "cubic" } } };
    const res = await call(computeRoute.POST, "POST", "/api/compute", { body: bad });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toContain("protocol.separation.durationSeconds");
  });

  it("answers 400 for a lab inside the horizon, with the lab's path", async () => {
    const doc = { ...defaultScenarioDocument(), background: { kind: "schwarzschild", massKg: 2e31 }, lab: { placement: "areal-radius", arealRadiusMetres: 10 } };
    const res = await call(computeRoute.POST, "POST", "/api/compute", { body: doc });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].path).toMatch(/^lab/);
  });

  it("answers 400 for a body that is not JSON", async () => {
    const res = await call(computeRoute.POST, "POST", "/api/compute", { rawBody: "nope", headers: { "content-type": "application/json" } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("bad_request");
  });
});
