/**
 * Request bodies and queries of the JSON API, shared by the route handlers (which enforce them) and the forms
 * (which show the same messages inline). Pure zod: no server code, safe to import in the browser.
 */
import { z } from "zod";
import { rangeIssues } from "../physics/scenario/ranges";
import { parseScenarioDocument } from "../physics/scenario/schema";
import { keptText } from "../physics/scenario/text";

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
