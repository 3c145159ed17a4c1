/**
 * Bench: prints figures, asserts nothing on time. Figures: one full computeScenario of a scenario whose transform
 * is 2^14 samples long (median of many runs, cold spectrum cache and warm), one bare fft.js real transform of the
 * same length, their ratio, and a 200-point sweep. Targets: compute ≤ 3× the bare transform and ≤ 5 ms median;
 * sweep ≤ 300 ms.
 */
import FFT from "fft.js";
import { computeScenario } from "../../physics/compute";
import { defaultScenarioDocument, type ScenarioDocument } from "../../physics/scenario/schema";
import { clearSpectrumCache } from "../../physics/spectra/window-spectrum";
import { sweepScenario } from "../../physics/sweeps";

const RUNS = 201;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function time(run: () => void, before: () => void = () => {}): number {
  const samples: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    before();
    const start = performance.now();
    run();
    samples.push(performance.now() - start);
  }
  return median(samples);
}

/** Ramps of 10 ms around a 30 ms hold: transformed as one window of 4096 samples, zero-padded to 2^14. */
function benchScenario(): ScenarioDocument {
  const doc = defaultScenarioDocument();
  return {
    ...doc,
    background: { kind: "rindler", accelerationMetresPerSecondSquared: 9.81 },
    protocol: {
      kind: "segments",
      separation: { durationSeconds: 0.01, shape: "minimum-jerk" },
      hold: { durationSeconds: 0.03 },
      recombination: { durationSeconds: 0.01, shape: "minimum-jerk" },
    },
  };
}

const scenario = benchScenario();
const probe = computeScenario(scenario).electromagnetic.convergence;
const length = probe.transformLength;

const fft = new FFT(length);
const input = new Float64Array(length).map((_, i) => Math.sin(i * 0.001) * Math.exp(-i / length));
const output = fft.createComplexArray();
for (let i = 0; i < 50; i++) fft.realTransform(output, input);
const bare = time(() => fft.realTransform(output, input));

for (let i = 0; i < 20; i++) computeScenario(scenario);
const cold = time(() => computeScenario(scenario), clearSpectrumCache);
const warm = time(() => computeScenario(scenario));

const sweepDocument: ScenarioDocument = { ...defaultScenarioDocument(), background: { kind: "schwarzschild", massKg: 1.988e31 }, lab: { placement: "areal-radius", arealRadiusMetres: 1e5 } };
const sweepStart = performance.now();
sweepScenario(sweepDocument, { parameter: "lab-distance", fromValue: 3e4, toValue: 3e8, points: 200 });
const sweepMs = performance.now() - sweepStart;

const verdict = (ok: boolean) => (ok ? "met" : "NOT met");
const lines = [
  `transform length of the bench scenario: ${length} (samples per window ${probe.samplesPerWindow}, mode ${probe.mode})`,
  `bare fft.js realTransform of ${length}: median ${(bare * 1000).toFixed(1)} µs`,
  `computeScenario, cold spectrum cache: median ${cold.toFixed(3)} ms (${(cold / bare).toFixed(1)}× the bare transform)`,
  `computeScenario, warm spectrum cache: median ${warm.toFixed(3)} ms (${(warm / bare).toFixed(1)}× the bare transform)`,
  `200-point lab-distance sweep (Schwarzschild): ${sweepMs.toFixed(1)} ms`,
  `target compute ≤ 3× bare transform (cold): ${verdict(cold <= 3 * bare)}`,
  `target compute ≤ 5 ms median (cold): ${verdict(cold <= 5)}`,
  `target sweep ≤ 300 ms: ${verdict(sweepMs <= 300)}`,
];
console.log(lines.join("\n"));
