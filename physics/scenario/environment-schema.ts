/**
 * The optional `environment` block of a version-2 scenario document: the lab's residual gas, thermal radiation and a
 * nearby surface, and the body they act on (its radius, material, internal temperature; its charge and mass stay in
 * `source`). Absent or null: an isolated body, which computes exactly what a version-1 document computed.
 * Kept apart from schema.ts so that the block and its upgrade read in one place.
 */
import { z } from "zod";

const positive = (what: string) => z.number({ error: `${what} must be a number` }).finite().positive(`${what} must be positive`);
const nonNegative = (what: string) => z.number({ error: `${what} must be a number` }).finite().nonnegative(`${what} must not be negative`);

export const bodyMaterialSchema = z.enum(["fused-silica", "diamond", "silicon", "perfect-conductor"]);
export const gasSpeciesSchema = z.enum(["N2", "He", "H2", "Ar", "air"]);

/** Relative permittivity at the frequencies that matter (the thermal band for the body). */
const permittivitySchema = z.object({
  real: z.number({ error: "the real part of ε must be a number" }).finite(),
  imaginary: nonNegative("the imaginary part of ε (a passive material absorbs)"),
});

export const environmentBodySchema = z
  .object({
    radiusMetres: positive("body radius"),
    /** A material from the table (physics/environment/materials.ts), or ε given directly; neither: fused silica. */
    material: bodyMaterialSchema.nullable().default(null),
    permittivity: permittivitySchema.nullable().default(null),
    /** The body's own temperature, for thermal emission; null: that of the surroundings (equilibrium). */
    internalTemperatureKelvin: nonNegative("internal temperature").nullable().default(null),
  })
  .refine((body) => body.material === null || body.permittivity === null, { message: "give a material or a permittivity, not both", path: ["permittivity"] });

export const environmentGasSchema = z.object({
  pressurePascals: nonNegative("gas pressure"),
  temperatureKelvin: positive("gas temperature"),
  species: gasSpeciesSchema,
});

export const environmentRadiationSchema = z.object({
  /** The temperature of the walls or the radiation shield the body sees. */
  surroundingsTemperatureKelvin: nonNegative("surroundings temperature"),
});

export const environmentSurfaceSchema = z
  .object({
    /** Height of the body's rest position above the plane. */
    distanceMetres: positive("surface distance"),
    /** A conductor (metal, doped semiconductor): its DC resistivity. */
    resistivityOhmMetres: positive("surface resistivity").nullable().default(null),
    /** Or a lossy dielectric, by ε at one frequency: taken as Ohmic with ρ = 1/(ε₀ ε″ ω) (flagged). */
    permittivity: permittivitySchema.extend({ atFrequencyHertz: positive("frequency of the surface permittivity") }).nullable().default(null),
    temperatureKelvin: nonNegative("surface temperature"),
    /** The separation axis against the plane; positive offsets point away from it. */
    orientation: z.enum(["parallel", "perpendicular"]),
    /** The host's relative permittivity (1 for a metal, 11.7 for doped silicon), for the charge-relaxation check. */
    backgroundPermittivity: z.number().finite().min(1, "background permittivity must be at least 1").default(1),
    /** The Drude relaxation time; null: 1e-12 s assumed. */
    relaxationTimeSeconds: positive("relaxation time").nullable().default(null),
  })
  .refine((s) => (s.resistivityOhmMetres === null) !== (s.permittivity === null), { message: "give the surface's resistivity or its permittivity (one of the two)", path: ["resistivityOhmMetres"] })
  .refine((s) => s.permittivity === null || s.permittivity.imaginary > 0, { message: "a lossless surface does not absorb: give a positive imaginary part", path: ["permittivity", "imaginary"] });

export const environmentSchema = z
  .object({
    body: environmentBodySchema.nullable().default(null),
    gas: environmentGasSchema.nullable().default(null),
    radiation: environmentRadiationSchema.nullable().default(null),
    surface: environmentSurfaceSchema.nullable().default(null),
  })
  .refine((env) => env.body !== null || (env.gas === null && env.radiation === null), {
    message: "gas and thermal radiation act on the body's size: give environment.body with its radius",
    path: ["body"],
  });

export type EnvironmentSpec = z.infer<typeof environmentSchema>;

/** Version 1 → 2: the environment block appears, null (an isolated body). Nothing else changes. */
export function upgradeVersion1To2(doc: Record<string, unknown>): Record<string, unknown> {
  return { ...doc, schemaVersion: 2, environment: null };
}

/** Starting points a user can pick (the Parameters panel's presets, for a later session). */
export const environmentPresets = {
  "room-temperature-lab-vacuum": {
    body: { radiusMetres: 1e-6, material: "fused-silica", permittivity: null, internalTemperatureKelvin: null },
    gas: { pressurePascals: 1e-6, temperatureKelvin: 295, species: "N2" },
    radiation: { surroundingsTemperatureKelvin: 295 },
    surface: null,
  },
  "cryogenic-ultra-high-vacuum": {
    body: { radiusMetres: 1e-6, material: "fused-silica", permittivity: null, internalTemperatureKelvin: null },
    gas: { pressurePascals: 1e-13, temperatureKelvin: 4, species: "He" },
    radiation: { surroundingsTemperatureKelvin: 4 },
    surface: null,
  },
  none: null,
} satisfies Record<string, EnvironmentSpec | null>;
