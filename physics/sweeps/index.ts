export { sweepScenario, sweepPointOf, sweepResultOf, sweepDocuments, logSpaced, MAX_SWEEP_POINTS, type SweepRequest, type SweepPoint, type SweepResult, type SweepOptions } from "./sweep";
export { optimiseRecombinationTime, type RecombinationOptimum, type RecombinationOptimumRequest } from "./optimise";
export { withParameter, parameterUnit, type SweepParameter } from "./vary";
export { SWEEP_PARAMETERS } from "./parameters";
