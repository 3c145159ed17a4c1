/**
 * Edits of the scenario's environment block (physics/scenario/environment-schema.ts) as pure functions, for the
 * Parameters panel's Environment section: a preset, one part added, changed or removed. Each returns a new document
 * (untouched parts shared) that the store checks like any other edit; one call is one undo step.
 */
import { environmentPresets, type EnvironmentSpec } from "@/physics/scenario/environment-schema";
import type { ScenarioDocument } from "@/physics/scenario/schema";

export type EnvironmentPresetName = keyof typeof environmentPresets;

export const ENVIRONMENT_PRESET_WORDS: Record<EnvironmentPresetName, string> = {
  "room-temperature-lab-vacuum": "room-temperature lab vacuum",
  "cryogenic-ultra-high-vacuum": "cryogenic ultra-high vacuum",
  none: "none (an isolated body)",
};

type Body = NonNullable<EnvironmentSpec["body"]>;
type Gas = NonNullable<EnvironmentSpec["gas"]>;
type Radiation = NonNullable<EnvironmentSpec["radiation"]>;
type Surface = NonNullable<EnvironmentSpec["surface"]>;

const EMPTY: EnvironmentSpec = { body: null, gas: null, radiation: null, surface: null };

/** What a part starts as when it is added by hand: a micrometre silica sphere in a room-temperature lab. */
export const NEW_PART = {
  body: { radiusMetres: 1e-6, material: "fused-silica", permittivity: null, internalTemperatureKelvin: null } satisfies Body,
  gas: { pressurePascals: 1e-6, temperatureKelvin: 295, species: "N2" } satisfies Gas,
  radiation: { surroundingsTemperatureKelvin: 295 } satisfies Radiation,
  /** A gold film (ρ ≈ 2.2 × 10⁻⁸ Ω m at room temperature, CRC Handbook, from memory) 100 µm away. */
  surface: {
    distanceMetres: 1e-4,
    resistivityOhmMetres: 2.2e-8,
    permittivity: null,
    temperatureKelvin: 295,
    orientation: "parallel",
    backgroundPermittivity: 1,
    relaxationTimeSeconds: null,
  } satisfies Surface,
} as const;

/** The environment replaced by a preset's (a copy: the document never shares the preset table's objects). */
export function withEnvironmentPreset(document: ScenarioDocument, preset: EnvironmentPresetName): ScenarioDocument {
  const chosen = environmentPresets[preset];
  return { ...document, environment: chosen === null ? null : structuredClone(chosen as EnvironmentSpec) };
}

/**
 * The separation's orientation against a surface, where the separation axis says it unambiguously: a radial
 * separation points away from a floor-like plane (perpendicular), a tangential one runs along it (parallel).
 */
export function orientationFromAxis(axis: ScenarioDocument["separation"]["axis"]): Surface["orientation"] {
  return axis === "radial" ? "perpendicular" : "parallel";
}

type Part = keyof EnvironmentSpec;

/**
 * One part of the environment set (null removes it). Gas and radiation act on the body's size, so adding either to
 * an environment without a body adds the default body too; removing the body removes them with it.
 */
export function withEnvironmentPart<P extends Part>(document: ScenarioDocument, part: P, value: EnvironmentSpec[P]): ScenarioDocument {
  const current = document.environment ?? EMPTY;
  let next: EnvironmentSpec = { ...current, [part]: value };
  if ((part === "gas" || part === "radiation") && value !== null && next.body === null) next = { ...next, body: { ...NEW_PART.body } };
  if (part === "body" && value === null) next = { ...next, gas: null, radiation: null };
  const empty = next.body === null && next.gas === null && next.radiation === null && next.surface === null;
  return { ...document, environment: empty ? null : next };
}

/** A part added with its defaults (a surface oriented from the separation axis). */
export function withNewEnvironmentPart(document: ScenarioDocument, part: Part): ScenarioDocument {
  if (part === "surface") return withEnvironmentPart(document, "surface", { ...NEW_PART.surface, orientation: orientationFromAxis(document.separation.axis) });
  return withEnvironmentPart(document, part, { ...NEW_PART[part] } as EnvironmentSpec[typeof part]);
}

/** A change to one part that exists (a part that does not is left absent). */
export function withEnvironmentChange<P extends Part>(document: ScenarioDocument, part: P, change: Partial<NonNullable<EnvironmentSpec[P]>>): ScenarioDocument {
  const existing = document.environment?.[part];
  if (!existing) return document;
  return withEnvironmentPart(document, part, { ...existing, ...change } as EnvironmentSpec[P]);
}
