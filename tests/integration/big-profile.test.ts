/**
 * A sequencer export at the row limit (200,000 rows) is stored compactly and round-trips: read, thinned
 * (physics/protocols/thin-profile.ts, Ramer–Douglas–Peucker within 1e-5 of d), saved with the original CSV kept as
 * an attachment, exported as a scenario file, imported again — and the Budget computed from what was stored agrees
 * with the Budget of all 200,000 samples to the tolerance stated in docs/formats.md.
 */
import { beforeAll, describe, expect, it } from "vitest";
import * as exportRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/export/route";
import * as sequencerRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/sequencer-profile/route";
import * as importRoute from "@/app/api/projects/[projectId]/scenarios/import/route";
import { SCENARIO_FILE_MAX_BYTES } from "@/contracts/requests";
import { computeScenario } from "@/physics/compute";
import { parseSequencerCsv, toSampledProtocol } from "@/canvas/import/sequencer-csv";
import { withSampledProtocol } from "@/canvas/kernels/document-edits";
import { MAX_STORED_SAMPLES, THIN_TOLERANCE_FRACTION } from "@/physics/protocols/thin-profile";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { projectFixture, type ProjectFixture } from "./fixtures";
import { call } from "./harness";

const ROWS = 200_000;
/** The Budget of the stored profile against the full one: relative difference of the total quanta per channel. */
const BUDGET_TOLERANCE = 1e-3;

/** An invented ramp–hold–ramp (minimum-jerk ramps of 20 ms, a 60 ms hold at 2.5 µm), sampled 200,000 times. */
function bigCsv(): string {
  const duration = 0.1;
  const ramp = 0.02;
  const peakMicrometres = 2.5;
  const minimumJerk = (u: number) => u ** 3 * (10 - 15 * u + 6 * u * u);
  const lines = ["t [ms],separation [um]"];
  for (let i = 0; i < ROWS; i++) {
    const t = (duration * i) / (ROWS - 1);
    const s = t < ramp ? minimumJerk(t / ramp) : t > duration - ramp ? minimumJerk((duration - t) / ramp) : 1;
    lines.push(`${(t * 1000).toFixed(6)},${(s * peakMicrometres).toPrecision(9)}`);
  }
  return lines.join("\n") + "\n";
}

let f: ProjectFixture;
beforeAll(async () => {
  f = await projectFixture();
});

describe("a 200,000-row sequencer profile", () => {
  it("saves thinned with its original kept, exports, re-imports, and computes as the full profile does", async () => {
    const csv = bigCsv();
    const S = { projectId: f.projectId, scenarioId: f.scenarioId };
    const saved = await call(sequencerRoute.POST, "POST", `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/sequencer-profile`, {
      as: f.users.editor,
      params: S,
      query: { version: "1", interpolation: "cubic-spline", name: "run-200k.csv" },
      headers: { "content-type": "text/csv" },
      rawBody: csv,
    });
    expect(saved.status, JSON.stringify(saved.body).slice(0, 500)).toBe(200);
    const { thinning } = saved.body.profile;
    expect(thinning.originalCount).toBe(ROWS);
    expect(thinning.storedCount).toBeLessThanOrEqual(MAX_STORED_SAMPLES);
    expect(thinning.largestErrorMetres).toBeLessThanOrEqual(THIN_TOLERANCE_FRACTION * 2.5e-6 * (1 + 1e-9));
    expect(saved.body.scenario.document.protocol.samples).toHaveLength(thinning.storedCount);
    expect(saved.body.originalAttachment).toMatchObject({ fileName: "run-200k.csv", mediaType: "text/csv", sizeBytes: Buffer.byteLength(csv) });
    console.log(`[big-profile] ${ROWS} rows stored as ${thinning.storedCount} samples, largest error ${thinning.largestErrorMetres.toExponential(2)} m`);

    const exported = await call<unknown>(exportRoute.GET, "GET", "/x", { as: f.users.viewer, params: S, query: { what: "scenario" } });
    expect(exported.status).toBe(200);
    const fileText = JSON.stringify(exported.body);
    expect(Buffer.byteLength(fileText)).toBeLessThan(SCENARIO_FILE_MAX_BYTES);

    const imported = await call(importRoute.POST, "POST", `/api/projects/${f.projectId}/scenarios/import`, {
      as: f.users.editor,
      params: { projectId: f.projectId },
      headers: { "content-type": "application/json" },
      rawBody: fileText,
    });
    expect(imported.status, JSON.stringify(imported.body).slice(0, 500)).toBe(201);
    expect(imported.body.scenario.document.protocol.samples).toEqual(saved.body.scenario.document.protocol.samples);

    // The reference: every one of the 200,000 samples, as parsed from the same file.
    const parsed = parseSequencerCsv(csv);
    if (!parsed.ok) throw new Error("the generated CSV should parse");
    const full = computeScenario(withSampledProtocol(defaultScenarioDocument(), toSampledProtocol(parsed.samples, "cubic-spline")));
    const stored = computeScenario(imported.body.scenario.document);
    for (const channel of ["electromagnetic", "gravitational"] as const) {
      const a = full[channel].totalQuanta.log10;
      const b = stored[channel].totalQuanta.log10;
      console.log(`[big-profile] ${channel}: full log10 N = ${a}, stored ${b}`);
      // null: no quanta at all in this channel (the invented source carries no mass term here), in both or neither.
      if (a === null || b === null) expect(b).toBe(a);
      else expect(Math.abs(10 ** (b - a) - 1)).toBeLessThan(BUDGET_TOLERANCE);
    }
  }, 180_000);
});
