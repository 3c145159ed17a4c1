/**
 * Bench for the exact Schwarzschild horizon rate: prints timings and a few values; asserts nothing.
 * Run: npx tsx tests/bench/schwarzschild-exact.ts
 */
import { performance } from "node:perf_hooks";
import { elementaryCharge, solarMass } from "../../physics/constants";
import {
  massLengthMetres,
  ratioCurve,
  schwarzschildHorizonRate,
  type SchwarzschildHorizonRateInput,
} from "../../physics/horizon/schwarzschild-exact";

const massKg = 10 * solarMass.value;
const m = massLengthMetres(massKg);

function input(bOverM: number, check: SchwarzschildHorizonRateInput["multipoleCheck"]): SchwarzschildHorizonRateInput {
  return {
    massKg,
    labArealRadiusMetres: bOverM * m,
    chargeCoulombs: elementaryCharge.value,
    separationMetres: 1e-6,
    axis: { angleFromRadialRadians: 0.6 },
    multipoleCheck: check,
  };
}

function time(label: string, repetitions: number, run: (i: number) => void): void {
  const samples: number[] = [];
  for (let i = 0; i < repetitions; i++) {
    const start = performance.now();
    run(i);
    samples.push(performance.now() - start);
  }
  samples.sort((a, b) => a - b);
  const median = samples[Math.floor(samples.length / 2)];
  const worst = samples[samples.length - 1];
  console.log(`${label.padEnd(64)} median ${median.toFixed(4)} ms   max ${worst.toFixed(4)} ms   (n = ${repetitions})`);
}

const logSpaced = (from: number, to: number, count: number, jitter = 0) =>
  Array.from({ length: count }, (_, i) => 2 + 10 ** (from + ((to - from) * (i + jitter)) / (count - 1)));

// Warm the JIT on unrelated radii.
for (const x of logSpaced(-3, 3, 200, 0.37)) schwarzschildHorizonRate(input(x, "auto"));

console.log("Single evaluation (each radius new to the cache):");
for (const height of [1e-9, 1e-6, 1e-3, 1, 1e3, 1e8]) {
  time(`  b/M = 2 + ${height.toExponential(0)}, closed form only`, 200, (i) => {
    schwarzschildHorizonRate(input(2 + height * (1 + i * 1e-9), "never"));
  });
  time(`  b/M = 2 + ${height.toExponential(0)}, with auto Legendre check (cold)`, 20, (i) => {
    schwarzschildHorizonRate(input(2 + height * (1 + 1e-6 + i * 1e-9), "auto"));
  });
}
let forced = schwarzschildHorizonRate(input(2 + 2e-9, "never"));
time("  b/M = 2 + 1e-9, Legendre check forced (cold, lMax capped at 2e5)", 3, (i) => {
  forced = schwarzschildHorizonRate(input(2 + 1e-9 * (1 + 1e-3 * (i + 1)), "always"));
});
console.log(`    → status ${forced.multipoleStatus}, lMax ${forced.lMax}, |sum/closed − 1| ${forced.relativeTolerance?.toExponential(1)}`);

console.log("200-point sweep over distance, b/M − 2 from 1e-6 to 1e8 (log-spaced), oblique separation:");
const sweep = logSpaced(-6, 8, 200, 0.5);
time("  cold (auto Legendre check runs at each new radius)", 1, () => {
  for (const x of sweep) schwarzschildHorizonRate(input(x, "auto"));
});
time("  warm (Legendre sums cached per b/M)", 20, () => {
  for (const x of sweep) schwarzschildHorizonRate(input(x, "auto"));
});
time("  closed form only", 20, () => {
  for (const x of sweep) schwarzschildHorizonRate(input(x, "never"));
});

console.log("Convergence of the Legendre check (tolerance 1e-12):");
for (const x of [2 + 1e-6, 2.001, 2.1, 3, 10, 1e4, 1e8]) {
  const r = schwarzschildHorizonRate({ ...input(x, "always"), axis: "radial" });
  console.log(
    `  b/M = ${x.toPrecision(8).padEnd(12)} lMax ${String(r.lMax).padStart(6)}   |sum/closed − 1| ${r.relativeTolerance?.toExponential(1)}   regime ${r.regime}`,
  );
}

console.log("Exact rate / published estimate (coefficient 1), for the methods-page plot:");
for (const point of ratioCurve([2 + 1e-6, 2.01, 2.1, 2.5, 3, 4, 6, 10, 30, 100, 1e3, 1e6, 1e8])) {
  console.log(
    `  b/M = ${point.bOverM.toPrecision(7).padEnd(10)} radial ${point.radial.toExponential(4)}   tangential ${point.tangential.toExponential(4)}`,
  );
}
