/** The map bench's scenario (tests/bench/maps.ts, compute-loop.ts): the Rindler lab at g_n, 10 ms ramps around a 30 ms hold. */
import { defaultScenarioDocument, type ScenarioDocument } from "../../physics/scenario/schema";
import { startingBackground } from "../../physics/scenario/starting";

export const benchMapDocument: ScenarioDocument = {
  ...defaultScenarioDocument(),
  ...startingBackground("rindler"),
  protocol: { kind: "segments", separation: { durationSeconds: 0.01, shape: "minimum-jerk" }, hold: { durationSeconds: 0.03 }, recombination: { durationSeconds: 0.01, shape: "minimum-jerk" } },
};
