/**
 * Branchline's physics, the public surface: compute a scenario, sweep it, read where each number comes from.
 * Pure TypeScript, no React, DOM, database or next/*: the same in Node, the browser and a web worker.
 */
export { computeScenario, computeScenarioFromJson, type ComputeOptions } from "./compute";
export type * from "./result";
export { RESULT_FORMAT_VERSION } from "./result";
export { sources, type SourceEntry, type SourceKey } from "./estimators/sources";
export { exactHorizonRateModel } from "./estimators/schwarzschild-exact-rate";
export {
  publishedEstimateRateModel,
  type SchwarzschildHorizonRateModel,
  type SchwarzschildHorizonRateInput,
  type SchwarzschildHorizonRate,
} from "./estimators/schwarzschild-horizon-rate";
export { decoherenceFromQuanta, visibilityFromQuanta, decoherenceTimeFromRate } from "./decoherence";
export * from "./sweeps";
export { separationHistory, sampleBranchPaths, branchPositions, peakBranchSpeed, fractionAt, type SeparationHistory, type BranchPathSample } from "./protocols";
export { ScenarioInputError } from "./scenario/input-error";
export {
  parseScenarioDocument,
  CURRENT_SCHEMA_VERSION,
  scenarioDocumentSchema,
  defaultScenarioDocument,
  type ScenarioDocument,
  type ScenarioDocumentInput,
  type SchemaIssue,
} from "./scenario/schema";
