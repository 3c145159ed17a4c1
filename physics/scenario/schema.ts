/**
 * The scenario document: what a user draws and sets, in SI numbers. Version 3: version 2 (version 1 plus the
 * optional `environment` block of environment-schema.ts; a version-1 document upgrades to an isolated body) with
 * names that say what things are (upgrade-v3.ts: ramp shape "cubic", placements "uniformly-accelerated" and
 * "proper-distance-from-horizon", a de Sitter lab at the centre as areal radius 0).
 *
 * Every reader goes through parseScenarioDocument, which accepts any known version and upgrades it to the
 * current one; an unknown or malformed document is answered with the list of what is wrong, never a crash.
 */
import { z } from "zod";
import { e } from "../constants";
import { environmentSchema, upgradeVersion1To2 } from "./environment-schema";
import { keptText } from "./text";
import { upgradeVersion2To3 } from "./upgrade-v3";

export const CURRENT_SCHEMA_VERSION = 3 as const;

const positive = (what: string) => z.number({ error: `${what} must be a number` }).finite().positive(`${what} must be positive`);
const nonNegative = (what: string) => z.number({ error: `${what} must be a number` }).finite().nonnegative(`${what} must not be negative`);

/** σ(u) of a ramp: "cubic" 3u² − 2u³, "cosine" (1 − cos πu)/2, "minimum-jerk" 10u³ − 15u⁴ + 6u⁵, "linear" u. */
export const rampShapeSchema = z.enum(["cubic", "cosine", "minimum-jerk", "linear"]);
export type RampShape = z.infer<typeof rampShapeSchema>;

export const backgroundSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("minkowski") }),
  z.object({ kind: z.literal("schwarzschild"), massKg: positive("black-hole mass") }),
  z.object({ kind: z.literal("rindler"), accelerationMetresPerSecondSquared: positive("lab acceleration") }),
  z.object({ kind: z.literal("de-sitter"), hubbleRatePerSecond: positive("Hubble rate") }),
]);
export type BackgroundSpec = z.infer<typeof backgroundSchema>;
export type BackgroundKind = BackgroundSpec["kind"];

/**
 * Where the lab sits. Minkowski: "inertial" (at rest). Rindler: "uniformly-accelerated" (set by the background's
 * acceleration, c²/a from the horizon). Schwarzschild and de Sitter: "areal-radius" (de Sitter takes 0, the static
 * geodesic observer at the centre) or "proper-distance-from-horizon" (above a black hole's horizon, inward from a
 * de Sitter one).
 */
export const labPlacementSchema = z.discriminatedUnion("placement", [
  z.object({ placement: z.literal("inertial") }),
  z.object({ placement: z.literal("uniformly-accelerated") }),
  z.object({ placement: z.literal("areal-radius"), arealRadiusMetres: nonNegative("lab areal radius") }),
  z.object({ placement: z.literal("proper-distance-from-horizon"), properDistanceMetres: positive("lab proper distance from the horizon") }),
]);
export type LabPlacement = z.infer<typeof labPlacementSchema>;

export const sourceSchema = z.object({
  chargeCoulombs: z.number({ error: "charge must be a number" }).finite(),
  massKg: nonNegative("source mass"),
  /** Mass of the lab apparatus that recoils against the source, when the document accounts for it. */
  labMassKg: nonNegative("lab mass").nullable().default(null),
});
export type SourceSpec = z.infer<typeof sourceSchema>;

export const separationSchema = z.object({
  axis: z.enum(["radial", "tangential"]),
  split: z.enum(["symmetric", "one-branch-stays"]),
  /** Full separation d of the two branches at the hold. */
  distanceMetres: nonNegative("separation"),
  /**
   * x₀: where the body sits before the split, along the axis, measured by the lab from the lab's own centre of
   * mass (the relative coordinate of body and lab, as d is). Absent means 0. Enters the quadrupole difference
   * ΔI = m_eff[(x₀ + x_A)² − (x₀ + x_B)²], m_eff = m M_lab/(m + M_lab) (physics/estimators/channel-source.ts).
   */
  bodyOffsetMetres: z.number({ error: "body offset must be a number" }).finite().optional(),
});
export type SeparationSpec = z.infer<typeof separationSchema>;

export const segmentsProtocolSchema = z.object({
  kind: z.literal("segments"),
  separation: z.object({ durationSeconds: positive("separation duration"), shape: rampShapeSchema }),
  hold: z.object({ durationSeconds: nonNegative("hold duration") }),
  recombination: z.object({ durationSeconds: positive("recombination duration"), shape: rampShapeSchema }),
});

/**
 * A separation profile σ(t) ∈ [0, 1] (the separation is d·σ(t)), as a profile formula in t (seconds) over
 * [0, durationSeconds]; the grammar is physics/protocols/formula.ts's (docs/formats.md lists it).
 */
export const formulaProtocolSchema = z.object({
  kind: z.literal("formula"),
  expression: keptText("formula must be text").min(1, "formula must not be empty").max(2000, "formula is too long"),
  durationSeconds: positive("formula duration"),
});

/** A measured separation profile (seconds, metres of full separation), e.g. from a lab sequencer's CSV. */
export const sampledProtocolSchema = z.object({
  kind: z.literal("sampled"),
  samples: z
    .array(z.object({ timeSeconds: z.number().finite(), separationMetres: z.number().finite() }))
    .min(2, "a sampled profile needs at least two samples")
    .max(1_000_000, "a sampled profile may have at most 1,000,000 samples"),
  interpolation: z.enum(["linear", "cubic-spline"]),
});

export const protocolSchema = z.discriminatedUnion("kind", [segmentsProtocolSchema, formulaProtocolSchema, sampledProtocolSchema]);
export type ProtocolSpec = z.infer<typeof protocolSchema>;

export const displaySchema = z
  .object({ theme: z.enum(["light", "dark"]).default("light"), showGrid: z.boolean().default(true) })
  .default({ theme: "light", showGrid: true });

/**
 * Numerical settings. Optional: a document without them gets the defaults. `kinkTimeResolutionSeconds` is the
 * time step at which a kinked profile (whose far-field photon number grows without bound as the step shrinks) is
 * evaluated; null means the shortest moving segment divided by 1024.
 */
export const numericsSchema = z
  .object({ kinkTimeResolutionSeconds: positive("kink time resolution").nullable().default(null) })
  .default({ kinkTimeResolutionSeconds: null });
export type NumericsSpec = z.infer<typeof numericsSchema>;

export const scenarioDocumentSchema = z.object({
  schemaVersion: z.literal(3),
  background: backgroundSchema,
  lab: labPlacementSchema,
  source: sourceSchema,
  separation: separationSchema,
  protocol: protocolSchema,
  display: displaySchema,
  numerics: numericsSchema,
  /** The lab's gas, thermal radiation and a nearby surface; null: an isolated body (what version 1 computed). */
  environment: environmentSchema.nullable().default(null),
});
export type ScenarioDocument = z.infer<typeof scenarioDocumentSchema>;
export type ScenarioDocumentInput = z.input<typeof scenarioDocumentSchema>;

export interface SchemaIssue {
  /** Dotted path into the document, e.g. "protocol.hold.durationSeconds". */
  path: string;
  message: string;
}

export type ParseResult = { ok: true; document: ScenarioDocument } | { ok: false; issues: SchemaIssue[] };

/** Upgraders from version n to n + 1, applied in order. */
const upgraders: Record<number, (doc: Record<string, unknown>) => Record<string, unknown>> = { 1: upgradeVersion1To2, 2: upgradeVersion2To3 };

export function parseScenarioDocument(input: unknown): ParseResult {
  if (typeof input !== "object" || input === null || Array.isArray(input)) {
    return { ok: false, issues: [{ path: "", message: "a scenario document must be a JSON object" }] };
  }
  let doc = input as Record<string, unknown>;
  const version = doc.schemaVersion;
  if (typeof version !== "number" || !Number.isInteger(version) || version < 1) {
    return { ok: false, issues: [{ path: "schemaVersion", message: "schemaVersion must be a positive integer" }] };
  }
  if (version > CURRENT_SCHEMA_VERSION) {
    return {
      ok: false,
      issues: [{ path: "schemaVersion", message: `schema version ${version} is newer than this Branchline (${CURRENT_SCHEMA_VERSION}); update Branchline to read it` }],
    };
  }
  for (let v = version; v < CURRENT_SCHEMA_VERSION; v++) doc = upgraders[v](doc);
  const parsed = scenarioDocumentSchema.safeParse(doc);
  if (parsed.success) return { ok: true, document: parsed.data };
  return { ok: false, issues: parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message })) };
}

/** A sensible new scenario: a charged microparticle split by 1 µm in flat spacetime. */
export function defaultScenarioDocument(): ScenarioDocument {
  return {
    schemaVersion: 3,
    background: { kind: "minkowski" },
    lab: { placement: "inertial" },
    source: { chargeCoulombs: 100 * e, massKg: 1e-14, labMassKg: null },
    separation: { axis: "tangential", split: "symmetric", distanceMetres: 1e-6 },
    protocol: {
      kind: "segments",
      separation: { durationSeconds: 0.01, shape: "minimum-jerk" },
      hold: { durationSeconds: 0.1 },
      recombination: { durationSeconds: 0.01, shape: "minimum-jerk" },
    },
    display: { theme: "light", showGrid: true },
    numerics: { kinkTimeResolutionSeconds: null },
    environment: null,
  };
}
