/**
 * The lab's environment as a whole: every channel the inputs switch on, computed over the protocol's branch paths,
 * in a fixed order (gas, thermal scattering, absorption, emission, surface).
 */
import { gasChannel } from "./gas";
import type { GasSpecies } from "./species";
import type { Permittivity } from "./materials";
import { surfaceChannel, type SurfaceParameters } from "./surface";
import { thermalChannel, thermalChannels, type ThermalChannel, type ThermalParameters } from "./thermal";
import type { BranchPaths, EnvironmentChannelResult } from "./types";

export interface EnvironmentInputs {
  body: {
    chargeCoulombs: number;
    radiusMetres: number;
    /** null: a perfect conductor. */
    permittivity: Permittivity | null;
    permittivitySource: string;
    internalTemperatureKelvin: number;
  };
  gas: { pressurePascals: number; temperatureKelvin: number; species: GasSpecies } | null;
  radiation: { surroundingsTemperatureKelvin: number } | null;
  /** The surface as surface.ts takes it, less what the body supplies. */
  surface: Omit<SurfaceParameters, "chargeCoulombs" | "bodyRadiusMetres"> | null;
}

export function gasChannelOf(paths: BranchPaths, inputs: EnvironmentInputs): EnvironmentChannelResult | null {
  return inputs.gas ? gasChannel(paths, { ...inputs.gas, bodyRadiusMetres: inputs.body.radiusMetres }) : null;
}

function thermalParameters(inputs: EnvironmentInputs, surroundingsTemperatureKelvin: number): ThermalParameters {
  const { body } = inputs;
  return {
    bodyRadiusMetres: body.radiusMetres,
    permittivity: body.permittivity,
    permittivitySource: body.permittivitySource,
    surroundingsTemperatureKelvin,
    internalTemperatureKelvin: body.internalTemperatureKelvin,
  };
}

export function thermalChannelOf(paths: BranchPaths, inputs: EnvironmentInputs, channel: ThermalChannel): EnvironmentChannelResult | null {
  return inputs.radiation ? thermalChannel(paths, thermalParameters(inputs, inputs.radiation.surroundingsTemperatureKelvin), channel) : null;
}

export function thermalChannelsOf(paths: BranchPaths, inputs: EnvironmentInputs): EnvironmentChannelResult[] {
  return inputs.radiation ? thermalChannels(paths, thermalParameters(inputs, inputs.radiation.surroundingsTemperatureKelvin)) : [];
}

export function surfaceChannelOf(paths: BranchPaths, inputs: EnvironmentInputs): EnvironmentChannelResult | null {
  return inputs.surface ? surfaceChannel(paths, { ...inputs.surface, chargeCoulombs: inputs.body.chargeCoulombs, bodyRadiusMetres: inputs.body.radiusMetres }) : null;
}

export function environmentChannels(paths: BranchPaths, inputs: EnvironmentInputs): EnvironmentChannelResult[] {
  return [gasChannelOf(paths, inputs), ...thermalChannelsOf(paths, inputs), surfaceChannelOf(paths, inputs)].filter((ch): ch is EnvironmentChannelResult => ch !== null);
}
