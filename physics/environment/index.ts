/**
 * The lab's environment as decoherence channels beside the body's own fields: residual gas, thermal radiation
 * (scattering, absorption, emission) and a warm surface, each ⟨N⟩ = 2∫F dt over the protocol's branch paths, and
 * the margin of each against the field channels.
 */
export type { BranchPaths, EnvironmentChannel, EnvironmentChannelResult, EnvironmentRegime } from "./types";
export { environmentChannels, type EnvironmentInputs } from "./budget";
export { environmentMargins, findMargin, MARGIN_LIMITS, type ChannelMargin, type MarginOutcome, type MarginParameter } from "./margin";
export { gasChannel, gasRates, gasDecoherenceFunction, type GasParameters, type GasRates } from "./gas";
export { thermalChannel, thermalChannels, thermalRates, thermalDecoherenceFunction, scatteringResolution, absorptionResolution, type ThermalParameters, type ThermalRates } from "./thermal";
export { surfaceChannel, imageKernel, sheetKernel, sheetHoldRate, surfaceZeroFrequencyNoise, surfaceDecoherenceFunction, type SurfaceParameters, type SurfaceOrientation } from "./surface";
export { gasSpecies, molecularMassKg, type GasSpecies, type GasSpeciesEntry } from "./species";
export { bodyMaterials, clausiusMossotti, type BodyMaterial, type Permittivity, type MaterialEntry } from "./materials";
export { riemannZeta, oneMinusDawsonOverX, boseSum } from "./special-functions";
export { brentRoot, RootNotBracketedError } from "./root-finding";
