/**
 * Request bodies and queries of the JSON API, shared by the route handlers (which enforce them) and the forms
 * (which show the same messages inline). Pure zod: no server code, safe to import in the browser.
 */
import { z } from "zod";
import { MAP_PARAMETERS, MAP_QUANTITIES, MAX_MAP_SIDE } from "../physics/maps/axes";
import { rangeIssues } from "../physics/scenario/ranges";
import { parseScenarioDocument } from "../physics/scenario/schema";
import { keptText } from "../physics/scenario/text";
import { SWEEP_PARAMETERS } from "../physics/sweeps/parameters";
import type { SweepParameter } from "../physics/sweeps/vary";

// Every text a request carries goes through keptText: no NUL and no lone surrogate, refused with the field's path.
export const emailSchema = keptText().trim().toLowerCase().email("enter a valid e-mail address").max(320, "e-mail address is too long");
export const passwordSchema = keptText().min(10, "use at least 10 characters").max(200, "use at most 200 characters");
export const displayNameSchema = keptText().trim().min(1, "enter a name").max(200, "use at most 200 characters");
export const projectRoleSchema = z.enum(["owner", "editor", "viewer"], { error: "role must be owner, editor or viewer" });
export const siteRoleSchema = z.enum(["admin", "member"], { error: "site role must be admin or member" });

export const signUpSchema = z.object({ email: emailSchema, name: displayNameSchema, password: passwordSchema });
export const passwordResetRequestSchema = z.object({ email: emailSchema });
export const passwordResetConfirmSchema = z.object({ token: keptText().min(10, "the reset token is missing"), password: passwordSchema });
export const accountUpdateSchema = z.object({ name: displayNameSchema.optional() }).strict();
export const siteRoleUpdateSchema = z.object({ siteRole: siteRoleSchema }).strict();

export const projectNameSchema = keptText().trim().min(1, "enter a project name").max(200, "use at most 200 characters");
export const projectCreateSchema = z.object({ name: projectNameSchema, description: keptText().max(2000, "use at most 2000 characters").optional() }).strict();
export const projectUpdateSchema = z
  .object({ name: projectNameSchema.optional(), description: keptText().max(2000, "use at most 2000 characters").optional() })
  .strict()
  .refine((v) => v.name !== undefined || v.description !== undefined, { message: "nothing to change: give a name or a description" });

export const memberAddSchema = z.object({ email: emailSchema, role: projectRoleSchema }).strict();
export const memberUpdateSchema = z.object({ role: projectRoleSchema }).strict();

export const scenarioTitleSchema = keptText().trim().min(1, "enter a title").max(200, "use at most 200 characters");
/**
 * A scenario document from a client, validated once, here: the physics schema (older versions upgraded on the way)
 * and every parameter against the range where the computation is defined (physics/scenario/ranges.ts). Every
 * problem is reported with its path inside the document.
 */
export const scenarioDocumentInput = z.unknown().transform((value, ctx) => {
  const parsed = parseScenarioDocument(value);
  const issues = parsed.ok ? rangeIssues(parsed.document) : parsed.issues;
  for (const issue of issues) ctx.addIssue({ code: "custom", path: issue.path ? issue.path.split(".") : [], message: issue.message });
  return parsed.ok && issues.length === 0 ? parsed.document : z.NEVER;
});

export const scenarioCreateSchema = z.object({ title: scenarioTitleSchema, document: scenarioDocumentInput.optional() }).strict();
export const scenarioUpdateSchema = z
  .object({
    version: z.number({ error: "version is required (the version you edited)" }).int().positive(),
    title: scenarioTitleSchema.optional(),
    document: scenarioDocumentInput.optional(),
  })
  .strict();
export const scenarioDuplicateSchema = z.object({ title: scenarioTitleSchema.optional() }).strict();

export const scenarioListQuerySchema = z.object({
  page: z.coerce.number().int().min(1, "page starts at 1").default(1),
  pageSize: z.coerce.number().int().min(1).max(100, "at most 100 per page").default(25),
  sort: z.enum(["title", "updatedAt", "createdAt", "backgroundKind"]).default("updatedAt"),
  order: z.enum(["asc", "desc"]).default("desc"),
  q: keptText().max(200).optional(),
  background: z.enum(["minkowski", "schwarzschild", "rindler", "de-sitter"]).optional(),
});
export type ScenarioListQueryInput = z.input<typeof scenarioListQuerySchema>;

export const invitedRoleSchema = z.enum(["editor", "viewer"], { error: "invite as editor or viewer; make someone an owner once they have joined" });
export const invitationCreateSchema = z.object({ email: emailSchema, role: invitedRoleSchema }).strict();
export const ownershipTransferSchema = z.object({ userId: keptText("choose the member who becomes owner").min(1, "choose the member who becomes owner") }).strict();

export const SHARE_LINK_MAX_DAYS = 365;
export const shareLinkLabelSchema = keptText().trim().min(1, "say who the link is for, e.g. “for the referee”").max(200, "use at most 200 characters");
export const shareLinkCreateSchema = z
  .object({
    label: shareLinkLabelSchema,
    /** Days until the link stops working; null or absent: until it is revoked. */
    expiresInDays: z
      .number({ error: "expiry must be a number of days" })
      .int("expiry must be a whole number of days")
      .min(1, "a link must work for at least a day")
      .max(SHARE_LINK_MAX_DAYS, `a link may work for at most ${SHARE_LINK_MAX_DAYS} days`)
      .nullable()
      .optional(),
  })
  .strict();

/** Points one POST /api/sweeps may ask for (it is answered directly; larger grids are maps, computed by workers). */
export const API_SWEEP_MAX_POINTS = 100;
const sweepEnd = (which: string) =>
  z.number({ error: `${which} must be a number, in SI units (s, m)` }).positive(`${which} must be positive (the points are spaced evenly in its logarithm)`).finite();
/**
 * One parameter of a scenario varied over points spaced evenly in the logarithm between fromValue and toValue, of
 * a document sent with the request or of a saved scenario (projectId and scenarioId; the caller must be able to
 * read it). Answered as JSON or, with format "csv", as a CSV file with the inputs in its header.
 */
export const sweepRequestSchema = z
  .object({
    document: z.unknown().optional(),
    projectId: z.uuid("projectId must be a project's id").optional(),
    scenarioId: z.uuid("scenarioId must be a scenario's id").optional(),
    parameter: z.enum(SWEEP_PARAMETERS, { error: `parameter must be one of ${SWEEP_PARAMETERS.join(", ")}` }),
    fromValue: sweepEnd("fromValue"),
    toValue: sweepEnd("toValue"),
    points: z
      .number({ error: "points must be a whole number" })
      .int("points must be a whole number")
      .min(2, "a sweep takes at least 2 points")
      .max(API_SWEEP_MAX_POINTS, `a sweep through the API takes at most ${API_SWEEP_MAX_POINTS} points (a larger grid is a map)`),
    format: z.enum(["json", "csv"], { error: "format must be json or csv" }).default("json"),
  })
  .strict()
  .superRefine((v, ctx) => {
    const saved = v.projectId !== undefined || v.scenarioId !== undefined;
    if (saved && v.document !== undefined) ctx.addIssue({ code: "custom", path: ["document"], message: "send a document or name a saved scenario (projectId and scenarioId), not both" });
    else if (!saved && v.document === undefined) ctx.addIssue({ code: "custom", path: ["document"], message: "send the scenario document to sweep, or name a saved scenario with projectId and scenarioId" });
    else if (saved && (v.projectId === undefined || v.scenarioId === undefined)) ctx.addIssue({ code: "custom", path: [v.projectId === undefined ? "projectId" : "scenarioId"], message: "a saved scenario is named by both projectId and scenarioId" });
  });
export type SweepRequestInput = z.input<typeof sweepRequestSchema>;

export const API_TOKEN_MAX_DAYS = 365;
export const apiTokenCreateSchema = z
  .object({
    name: keptText().trim().min(1, "name the token after what uses it, e.g. “analysis notebook”").max(100, "use at most 100 characters"),
    scope: z.enum(["read", "read-write"], { error: "scope must be read or read-write" }),
    /** The one project the token may act in; null or absent: every project of the account. */
    projectId: z.uuid("choose a project from the list").nullable().optional(),
    /** Days until the token stops working; null: until it is revoked. */
    expiresInDays: z
      .number({ error: "expiry must be a number of days" })
      .int("expiry must be a whole number of days")
      .min(1, "a token must work for at least a day")
      .max(API_TOKEN_MAX_DAYS, `a token may work for at most ${API_TOKEN_MAX_DAYS} days`)
      .nullable(),
  })
  .strict();

export const revisionDiffQuerySchema = z.object({
  against: z.coerce
    .number({ error: "against must be a revision number" })
    .int("against must be a whole revision number")
    .min(1, "revisions start at 1")
    .max(2_147_483_647, "no revision has so large a number"),
});

/** A file's size as people read it: bytes below a kilobyte, then kB and MB (powers of 1024, as file managers show). */
export function fileSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(bytes < 10 * 1024 ? 1 : 0)} kB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

/** Largest scenario file imported, in bytes. */
export const SCENARIO_FILE_MAX_BYTES = 2 * 1024 * 1024;
/** Largest file kept with a scenario, in bytes. */
export const ATTACHMENT_MAX_BYTES = 10 * 1024 * 1024;
/** The endings of the files a scenario keeps (what they are is decided from their content). */
export const ATTACHMENT_EXTENSIONS = [".pdf", ".png", ".svg", ".csv", ".json"] as const;

const yes = z
  .enum(["1", "0", "true", "false"], { error: "dryRun is 1 (preview, store nothing) or 0" })
  .transform((v) => v === "1" || v === "true");

/** The settings of a sequencer profile upload, from the query, the multipart fields or the JSON body. */
export const sequencerProfileOptionsSchema = z.object({
  timeUnit: keptText().trim().max(20, "a unit is at most 20 characters").optional(),
  separationUnit: keptText().trim().max(20, "a unit is at most 20 characters").optional(),
  interpolation: z.enum(["linear", "cubic-spline"], { error: "interpolation is linear or cubic-spline" }).default("linear"),
  dryRun: z.union([z.boolean(), yes]).default(false),
  /** The scenario version the caller edited; required unless dryRun. */
  version: z.coerce.number({ error: "version must be the scenario version you edited" }).int().positive().optional(),
});
/** A sequencer profile as JSON: the CSV text beside the same settings. */
export const sequencerProfileJsonSchema = sequencerProfileOptionsSchema.extend({
  csv: keptText("csv must be the file's text").min(1, "the file is empty"),
});

/** ?what= of the export routes: the scenario file or the Budget as CSV. */
export const exportQuerySchema = z.object({
  what: z.enum(["scenario", "budget"], { error: 'what must be "scenario" (the scenario file) or "budget" (the Budget as CSV)' }),
});

/** One axis of a parameter map: SI values (s or m, as the parameter says), log or linear spacing. */
export const mapAxisSchema = z
  .object({
    parameter: z.enum(MAP_PARAMETERS as [SweepParameter, ...SweepParameter[]], { error: `parameter must be one of ${MAP_PARAMETERS.join(", ")}` }),
    from: z.number({ error: "from must be a number (SI: s or m)" }).finite(),
    to: z.number({ error: "to must be a number (SI: s or m)" }).finite(),
    points: z.number({ error: "points must be a whole number" }).int("points must be a whole number").min(2, "an axis takes at least 2 points").max(MAX_MAP_SIDE, `an axis takes at most ${MAX_MAP_SIDE} points`),
    scale: z.enum(["log", "linear"], { error: "scale must be log or linear" }).default("log"),
  })
  .strict();

/**
 * POST /api/maps: a map of a saved scenario (kept with it) or of a document sent along (the caller's alone).
 * The saved scenario's current version is mapped; a document sent along is checked here (scenarioDocumentInput).
 */
export const mapCreateSchema = z
  .object({
    scenario: z.object({ projectId: keptText().min(1).max(100), scenarioId: keptText().min(1).max(100) }).strict().optional(),
    document: scenarioDocumentInput.optional(),
    x: mapAxisSchema,
    y: mapAxisSchema,
    quantity: z.enum(MAP_QUANTITIES, { error: `quantity must be one of ${MAP_QUANTITIES.join(", ")}` }).default("total-quanta"),
  })
  .strict()
  .refine((v) => (v.scenario === undefined) !== (v.document === undefined), { message: "give either scenario (a saved one) or document (an unsaved one), not both", path: ["scenario"] });

export const mapResultQuerySchema = z.object({ format: z.enum(["json", "csv"], { error: "format must be json or csv" }).default("json") }).strict();
