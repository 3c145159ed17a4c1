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

  it("answers 400 naming the field and the reason for a bad document", async () => {
    const bad = { ...defaultScenarioDocument(), protocol: { kind: "segments", separation: { durationSeconds: -1, shape: "smoothstep" }, hold: { durationSeconds: 1 }, recombination: { durationSeconds: 1, shape: "smoothstep" } } };
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
