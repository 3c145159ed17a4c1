/**
 * Bench: prints figures, asserts nothing on time. Figures: one full computeScenario of a scenario whose transform
 * is 2^14 samples long (cold spectrum cache and warm), one bare fft.js real transform of the same length, their
 * ratio, the same scenario with the lab's whole environment (five channels and their margins), the Budget's channel
 * table built from that result, the Sweep panel's 41-point gas-pressure sweep of it, and a 200-point sweep; then the
 * exact Schwarzschild horizon rate alone (one evaluation, a 200-point distance sweep). Targets: compute ≤ 3× the bare
 * transform and ≤ 5 ms median (cold), with the environment too; the channel table well inside a frame (≤ 1 ms);
 * sweeps ≤ 300 ms; exact rate < 1 ms per evaluation and < 100 ms per 200-point sweep.
 *
 * The bare transform and the computations are timed in turn within one loop, so that a load that comes and goes
 * (other builds on the machine) weighs on both sides of the ratio alike. Medians throughout.
 */
import { spawnSync } from "node:child_process";
import FFT from "fft.js";
import { computeScenario } from "../../physics/compute";
import { elementaryCharge } from "../../physics/constants";
import { massLengthMetres, schwarzschildHorizonRate } from "../../physics/horizon/schwarzschild-exact";
import { defaultScenarioDocument, type ScenarioDocument } from "../../physics/scenario/schema";
import { startingBackground } from "../../physics/scenario/starting";
import { clearSpectrumCache } from "../../physics/spectra/window-spectrum";
import { sweepScenario } from "../../physics/sweeps";
import { channelTable } from "../../canvas/kernels/budget/channel-table";

const RUNS = 201;
const SWEEP_RUNS = 5;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function elapsed(run: () => void): number {
  const start = performance.now();
  run();
  return performance.now() - start;
}

/** Ramps of 10 ms around a 30 ms hold: transformed as one window of 4096 samples, zero-padded to 2^14. */
function benchScenario(): ScenarioDocument {
  const doc = defaultScenarioDocument();
  return {
    ...doc,
    ...startingBackground("rindler"),
    protocol: {
      kind: "segments",
      separation: { durationSeconds: 0.01, shape: "minimum-jerk" },
      hold: { durationSeconds: 0.03 },
      recombination: { durationSeconds: 0.01, shape: "minimum-jerk" },
    },
  };
}

const scenario = benchScenario();
/** The bench scenario in a cryogenic chamber 40 µm above a gold film: every environmental channel and its margin. */
const withEnvironment: ScenarioDocument = {
  ...scenario,
  environment: {
    body: { radiusMetres: 1e-6, material: "fused-silica", permittivity: null, internalTemperatureKelvin: 6 },
    gas: { pressurePascals: 1e-10, temperatureKelvin: 4, species: "He" },
    radiation: { surroundingsTemperatureKelvin: 4 },
    surface: { distanceMetres: 4e-5, resistivityOhmMetres: 2.2e-8, permittivity: null, temperatureKelvin: 4, orientation: "parallel", backgroundPermittivity: 1, relaxationTimeSeconds: null },
  },
};
const probe = computeScenario(scenario).electromagnetic.convergence;
const length = probe.transformLength;

const fft = new FFT(length);
const input = new Float64Array(length).map((_, i) => Math.sin(i * 0.001) * Math.exp(-i / length));
const output = fft.createComplexArray();
for (let i = 0; i < 50; i++) fft.realTransform(output, input);
for (let i = 0; i < 20; i++) computeScenario(scenario);

const samples = { bare: [] as number[], cold: [] as number[], warm: [] as number[], environment: [] as number[] };
for (let i = 0; i < RUNS; i++) {
  samples.bare.push(elapsed(() => fft.realTransform(output, input)));
  clearSpectrumCache();
  samples.cold.push(elapsed(() => computeScenario(scenario)));
  samples.warm.push(elapsed(() => computeScenario(scenario)));
  clearSpectrumCache();
  samples.environment.push(elapsed(() => computeScenario(withEnvironment)));
}
const bare = median(samples.bare);
const cold = median(samples.cold);
const warm = median(samples.warm);
const environment = median(samples.environment);

// What the Budget panel does with each result: the channel table, its shares, dominant channel and margins' words.
const environmentResult = computeScenario(withEnvironment);
const tableMs = median(Array.from({ length: RUNS }, () => elapsed(() => channelTable(environmentResult))));
const environmentSweeps = Array.from({ length: SWEEP_RUNS }, () =>
  elapsed(() => sweepScenario(withEnvironment, { parameter: "gas-pressure", fromValue: 1e-14, toValue: 1e-8, points: 41 })),
);
const environmentSweepMs = median(environmentSweeps);

// The sweep crosses the exact rate's multipole-check cache, which only the first run finds empty.
const sweepDocument: ScenarioDocument = { ...defaultScenarioDocument(), background: { kind: "schwarzschild", massKg: 1.988e31 }, lab: { placement: "areal-radius", arealRadiusMetres: 1e5 } };
const sweepRuns = Array.from({ length: SWEEP_RUNS }, () =>
  elapsed(() => sweepScenario(sweepDocument, { parameter: "lab-distance", fromValue: 3e4, toValue: 3e8, points: 200 })),
);

// The exact rate alone, at radii new to its multipole-check cache: b/M − 2 log-spaced from 1e-6 to 1e8, shifted per run.
const holeKg = sweepDocument.background.kind === "schwarzschild" ? sweepDocument.background.massKg : 0;
const holeLength = massLengthMetres(holeKg);
const exactAt = (heightOverM: number) =>
  schwarzschildHorizonRate({ massKg: holeKg, labArealRadiusMetres: (2 + heightOverM) * holeLength, chargeCoulombs: elementaryCharge.value, separationMetres: 1e-6, axis: "radial" });
const heights = (shift: number) => Array.from({ length: 200 }, (_, i) => 10 ** (-6 + (14 * (i + shift)) / 199));
for (const h of heights(0.5)) exactAt(h);
const exactSingles = heights(0.25).map((h) => elapsed(() => exactAt(h)));
const exactSweeps = Array.from({ length: SWEEP_RUNS }, (_, run) => elapsed(() => heights(0.1 * (run + 1) + 0.01).forEach(exactAt)));

const verdict = (ok: boolean) => (ok ? "met" : "NOT met");
const sweepMs = median(sweepRuns);
const exactSingle = median(exactSingles);
const exactSweep = median(exactSweeps);
const lines = [
  `transform length of the bench scenario: ${length} (samples per window ${probe.samplesPerWindow}, mode ${probe.mode})`,
  `bare fft.js realTransform of ${length}: median ${(bare * 1000).toFixed(1)} µs`,
  `computeScenario, cold spectrum cache: median ${cold.toFixed(3)} ms (${(cold / bare).toFixed(1)}× the bare transform)`,
  `computeScenario, warm spectrum cache: median ${warm.toFixed(3)} ms (${(warm / bare).toFixed(1)}× the bare transform)`,
  `computeScenario with the whole environment (5 channels and margins), cold: median ${environment.toFixed(3)} ms (${(environment - cold).toFixed(3)} ms for the environment)`,
  `Budget channel table from that result: median ${(tableMs * 1000).toFixed(1)} µs`,
  `41-point gas-pressure sweep with the whole environment (the Sweep panel's): median ${environmentSweepMs.toFixed(1)} ms of ${SWEEP_RUNS}`,
  `200-point lab-distance sweep (Schwarzschild): median ${sweepMs.toFixed(1)} ms of ${SWEEP_RUNS} (first run ${sweepRuns[0].toFixed(1)} ms)`,
  `exact Schwarzschild rate, one evaluation (new radius, automatic multipole check): median ${(exactSingle * 1000).toFixed(1)} µs, max ${(Math.max(...exactSingles) * 1000).toFixed(1)} µs`,
  `exact Schwarzschild rate, 200-point distance sweep (new radii): median ${exactSweep.toFixed(1)} ms of ${SWEEP_RUNS}`,
  `target compute ≤ 3× bare transform (cold): ${verdict(cold <= 3 * bare)}`,
  `target compute ≤ 5 ms median (cold): ${verdict(cold <= 5)}`,
  `target compute ≤ 5 ms median with the environment (cold): ${verdict(environment <= 5)}`,
  `target channel table ≤ 1 ms: ${verdict(tableMs <= 1)}`,
  `target sweep ≤ 300 ms: ${verdict(sweepMs <= 300)}`,
  `target environment sweep ≤ 300 ms: ${verdict(environmentSweepMs <= 300)}`,
  `target exact rate < 1 ms per evaluation: ${verdict(exactSingle < 1)}`,
  `target exact rate < 100 ms per 200-point sweep: ${verdict(exactSweep < 100)}`,
];
console.log(lines.join("\n"));

// The map bench needs PostgreSQL and the react-server condition (db/): its own process, after these figures.
if (process.env.BENCH_MAPS !== "0") {
  spawnSync(process.execPath, ["--conditions", "react-server", "--import", "tsx", "tests/bench/maps.ts"], { stdio: "inherit" });
} else console.log("parameter maps through the queue: skipped (BENCH_MAPS=0)");

// The browser bench needs a running Branchline with the demo data, so it runs only when BRANCH_URL names one.
if (process.env.BRANCH_URL) void import("./editor-browser");
else console.log("editor in the browser: skipped (set BRANCH_URL to a running Branchline with the demo data)");
