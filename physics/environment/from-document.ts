/**
 * The environment block of a scenario document (physics/scenario/environment-schema.ts) turned into the channels,
 * the whole budget beside the body's own field channels, and the margins. A document without the block (an
 * isolated body, every version-1 document) gets null and computes exactly as before.
 */
import { decoherenceFromQuanta, decoherenceTimeFromRate, visibilityFromQuanta } from "../decoherence";
import { epsilon0 } from "../constants";
import { log10Sum, quantityFromLog10 } from "../estimators/quantity";
import type { ChannelResult, Quantity, ValidityFlag } from "../result";
import type { EnvironmentSpec } from "../scenario/environment-schema";
import type { ScenarioDocument } from "../scenario/schema";
import { environmentChannels, type EnvironmentInputs } from "./budget";
import { environmentMargins } from "./margin";
import { bodyMaterials } from "./materials";
import type { BranchPaths, EnvironmentBudget } from "./types";
import { formatNumber } from "../units";

export type { EnvironmentBudget };

const DEFAULT_MATERIAL = "fused-silica" as const;

function inputsOf(document: ScenarioDocument, environment: EnvironmentSpec): EnvironmentInputs {
  const body = environment.body;
  const material = bodyMaterials[body?.material ?? DEFAULT_MATERIAL];
  const permittivity = body?.permittivity ?? material.permittivity; // null: a perfect conductor
  const surroundings = environment.radiation?.surroundingsTemperatureKelvin ?? 0;
  const surface = environment.surface;
  return {
    body: {
      chargeCoulombs: document.source.chargeCoulombs,
      radiusMetres: body?.radiusMetres ?? 0,
      permittivity,
      permittivitySource: body?.permittivity ? "given in the document" : `${material.name}: ${material.reference}`,
      internalTemperatureKelvin: body?.internalTemperatureKelvin ?? surroundings,
    },
    gas: environment.gas,
    radiation: environment.radiation,
    surface: surface && {
      distanceMetres: surface.distanceMetres,
      resistivityOhmMetres: surface.resistivityOhmMetres ?? 1 / (epsilon0 * surface.permittivity!.imaginary * 2 * Math.PI * surface.permittivity!.atFrequencyHertz),
      temperatureKelvin: surface.temperatureKelvin,
      orientation: surface.orientation,
      backgroundPermittivity: surface.permittivity ? Math.max(1, surface.permittivity.real) : surface.backgroundPermittivity,
      relaxationTimeSeconds: surface.relaxationTimeSeconds,
    },
  };
}

/** Densities of solids lie between about 100 kg/m³ (aerogels aside, foams) and 22 600 kg/m³ (osmium) (common practice). */
const SOLID_DENSITY_RANGE = [100, 25_000] as const;

function blockFlags(document: ScenarioDocument, environment: EnvironmentSpec): ValidityFlag[] {
  const flags: ValidityFlag[] = [];
  const body = environment.body;
  if (body && document.source.massKg > 0) {
    const density = document.source.massKg / ((4 / 3) * Math.PI * body.radiusMetres ** 3);
    const solid = density >= SOLID_DENSITY_RANGE[0] && density <= SOLID_DENSITY_RANGE[1];
    flags.push({
      code: "environment:body-density",
      status: solid ? "ok" : "caution",
      message: `the source's mass and the body's radius give a density of ${formatNumber(density)} kg/m³` + (solid ? "" : ", far from any solid: check the mass or the radius"),
      measure: density,
    });
  }
  if (environment.surface?.permittivity) {
    flags.push({
      code: "environment:surface-effective-resistivity",
      status: "caution",
      message: "the surface is given by its permittivity at one frequency and taken as Ohmic, ρ = 1/(ε₀ε″ω): a dielectric's loss varies with frequency, so the zero-frequency noise is an extrapolation",
    });
  }
  return flags;
}

/** log10 of a reported count or rate: a missing one or an exact zero is −Infinity. */
function log10Of(q: Quantity | null): number {
  if (q === null || q.value === 0) return -Infinity;
  return q.log10 ?? Infinity;
}

export function environmentBudget(document: ScenarioDocument, paths: BranchPaths, field: ChannelResult[]): EnvironmentBudget | null {
  const environment = document.environment;
  if (!environment) return null;
  const inputs = inputsOf(document, environment);
  const channels = environmentChannels(paths, inputs);
  const fieldLog10 = field.reduce((sum, ch) => log10Sum(sum, log10Of(ch.totalQuanta)), -Infinity);
  const everyCount = [...field.map((ch) => ({ name: ch.channel as string, log10: log10Of(ch.totalQuanta) })), ...channels.map((ch) => ({ name: ch.channel as string, log10: log10Of(ch.totalQuanta) }))];
  const total = everyCount.reduce((sum, ch) => log10Sum(sum, ch.log10), -Infinity);
  const rate = [...field.map((ch) => ch.holdRate), ...channels.map((ch) => ch.holdRate)].reduce((sum, q) => log10Sum(sum, log10Of(q)), -Infinity);
  const dominant = everyCount.reduce((best, ch) => (ch.log10 > best.log10 ? ch : best), { name: "", log10: -Infinity });
  return {
    channels,
    total: {
      totalQuanta: quantityFromLog10(total, "1", "environment-budget-total"),
      decoherence: decoherenceFromQuanta(total),
      visibility: visibilityFromQuanta(total),
      decoherenceTime: decoherenceTimeFromRate(rate),
    },
    dominantChannel: dominant.log10 === -Infinity ? null : dominant.name,
    margins: environmentMargins(paths, inputs, fieldLog10),
    flags: blockFlags(document, environment),
  };
}
