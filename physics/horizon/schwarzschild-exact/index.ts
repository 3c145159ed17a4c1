/** Exact Schwarzschild horizon decoherence rate of a superposed static charge (and the far-zone gravity analogue). */
export {
  schwarzschildHorizonRate,
  schwarzschildFarZoneEstimate,
  FAR_ZONE_COEFFICIENT,
  MULTIPOLE_AUTO_BUDGET,
  type SchwarzschildHorizonRateInput,
  type SchwarzschildHorizonRate,
  type SeparationAxis,
  type HorizonRateRegime,
  type SchwarzschildRateFlag,
  type SchwarzschildRateFlagCode,
} from "./horizon-rate";
export { copsonLinetPotential, horizonNormalField, horizonNormalFieldAt, type CopsonPotentialOptions } from "./copson-field";
export { radialMemoryNorm, tangentialMemoryNorm, radialMemoryIntegral } from "./horizon-memory";
export {
  horizonFieldMultipoles,
  memoryNormMultipoleSum,
  estimatedMultipolesNeeded,
  type MemoryAxis,
  type MultipoleSum,
  type MultipoleSumOptions,
} from "./multipoles";
export { legendreQ } from "./legendre-q";
export {
  schwarzschildGravityFarZoneRate,
  schwarzschildGravityPublishedEstimate,
  displacedBodyQuadrupoleDifference,
  tidalFieldOfQuadrupole,
  tidalDissipationCoefficient,
  GRAVITY_FAR_ZONE_CORRECTION_CAUTION,
  farZoneCorrectionSize,
  type GravityFarZoneInput,
  type GravityFarZoneRate,
  type GravityFlag,
  type Matrix3,
  type Vector3,
} from "./gravity-far-zone";
export { ratioCurve, type RatioPoint } from "./ratio-curve";
export { massLengthMetres, horizonRadiusMetres, surfaceGravityPerSecond } from "./geometrized-units";
