/**
 * The recombination time that minimises the total ⟨N⟩ (both channels) for a fixed total duration, by
 * golden-section search on ln τ_rec (J. Kiefer, Proc. AMS 4, 502 (1953); Numerical Recipes §10.2), to a
 * relative tolerance of 1e-4 in τ_rec. The time is traded against either the hold (the separation ramp fixed,
 * hold = total − τ_sep − τ_rec) or the separation ramp (the hold fixed, τ_sep = total − hold − τ_rec).
 * Golden-section assumes one minimum in the bracket; a minimum at an end of the bracket is reported as such.
 * With the hold traded, slower recombination lowers both the ramp count and the time spent apart, so the
 * optimum is usually the longest recombination the budget allows (onBoundary: true).
 */
import { computeScenario, type ComputeOptions } from "../compute";
import type { Quantity } from "../result-basics";
import { ScenarioInputError } from "../scenario/input-error";
import type { ScenarioDocument } from "../scenario/schema";

export interface RecombinationOptimumRequest {
  totalDurationSeconds: number;
  tradeAgainst: "hold" | "separation";
}

export interface RecombinationOptimum {
  recombinationSeconds: number;
  /** The traded duration at the optimum (hold or separation ramp), seconds. */
  tradedSeconds: number;
  totalQuanta: Quantity;
  decoherence: Quantity;
  onBoundary: boolean;
  evaluations: number;
  method: "golden-section search on ln(recombination time)";
}

const GOLDEN = (Math.sqrt(5) - 1) / 2;
const RELATIVE_TOLERANCE = 1e-4;
const SMALLEST_FRACTION = 1e-6;

export function optimiseRecombinationTime(document: ScenarioDocument, request: RecombinationOptimumRequest, options: ComputeOptions = {}): RecombinationOptimum {
  const protocol = document.protocol;
  if (protocol.kind !== "segments") throw new ScenarioInputError("protocol.kind", "optimising the recombination time needs a segments protocol");
  const total = request.totalDurationSeconds;
  const fixed = request.tradeAgainst === "hold" ? protocol.separation.durationSeconds : protocol.hold.durationSeconds;
  const floor = SMALLEST_FRACTION * total;
  const upper = total - fixed - (request.tradeAgainst === "separation" ? floor : 0);
  if (!(upper > floor)) throw new ScenarioInputError("optimise.totalDurationSeconds", "the total duration leaves no room for a recombination ramp");

  const documentFor = (recombination: number): ScenarioDocument => {
    const traded = total - fixed - recombination;
    return {
      ...document,
      protocol: {
        ...protocol,
        recombination: { ...protocol.recombination, durationSeconds: recombination },
        ...(request.tradeAgainst === "hold"
          ? { hold: { durationSeconds: Math.max(0, traded) } }
          : { separation: { ...protocol.separation, durationSeconds: traded } }),
      },
    };
  };
  let evaluations = 0;
  const objective = (lnRecombination: number) => {
    evaluations++;
    const quanta = computeScenario(documentFor(Math.exp(lnRecombination)), options).combined.totalQuanta;
    return quanta.log10 ?? -Infinity;
  };

  let a = Math.log(floor);
  let b = Math.log(upper);
  let x1 = b - GOLDEN * (b - a);
  let x2 = a + GOLDEN * (b - a);
  let f1 = objective(x1);
  let f2 = objective(x2);
  while (b - a > RELATIVE_TOLERANCE) {
    if (f1 <= f2) {
      [b, x2, f2] = [x2, x1, f1];
      x1 = b - GOLDEN * (b - a);
      f1 = objective(x1);
    } else {
      [a, x1, f1] = [x1, x2, f2];
      x2 = a + GOLDEN * (b - a);
      f2 = objective(x2);
    }
  }
  const best = (a + b) / 2;
  const recombinationSeconds = Math.exp(best);
  const result = computeScenario(documentFor(recombinationSeconds), options);
  const edge = 10 * RELATIVE_TOLERANCE;
  return {
    recombinationSeconds,
    tradedSeconds: total - fixed - recombinationSeconds,
    totalQuanta: result.combined.totalQuanta,
    decoherence: result.combined.decoherence,
    onBoundary: best - Math.log(floor) < edge || Math.log(upper) - best < edge,
    evaluations: evaluations + 1,
    method: "golden-section search on ln(recombination time)",
  };
}
