/**
 * A plain compute loop for the map bench's ceiling (tests/bench/maps.ts): computes the bench scenario over and over
 * for BENCH_LOOP_SECONDS (default 5) after a warm-up, and prints how many computations a second it managed. Run
 * alone and then two at once, it shows how much faster two busy processes go on this machine than one, with no
 * queue, database or worker in between: the most a second map worker can give here.
 */
import { computeScenario } from "../../physics/compute";
import { benchMapDocument } from "./map-bench-scenario";

const seconds = Number(process.env.BENCH_LOOP_SECONDS ?? 5);
for (let i = 0; i < 200; i++) computeScenario(benchMapDocument);
const start = performance.now();
let done = 0;
while (performance.now() - start < seconds * 1000) {
  computeScenario(benchMapDocument);
  done++;
}
console.log(JSON.stringify({ perSecond: (done * 1000) / (performance.now() - start) }));
