export { sweepScenario, logSpaced, MAX_SWEEP_POINTS, type SweepRequest, type SweepPoint, type SweepResult, type SweepOptions } from "./sweep";
export { optimiseRecombinationTime, type RecombinationOptimum, type RecombinationOptimumRequest } from "./optimise";
export {
  withParameter,
  parameterUnit,
  parameterDimension,
  canVary,
  isEnvironmentParameter,
  ENVIRONMENT_SWEEP_PARAMETERS,
  type SweepParameter,
  type EnvironmentSweepParameter,
  type SweepUnit,
} from "./vary";
