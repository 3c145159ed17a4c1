import { getDb } from "@/db";
import { assertMayWriteScenarios, uploadAttachment } from "@/db/attachments";
import { AppError } from "@/db/errors";
import { getScenario, updateScenario } from "@/db/scenarios";
import { sequencerProfileJsonSchema, sequencerProfileOptionsSchema } from "@/contracts/requests";
import { json, requireActor, route } from "@/lib/http";
import { objectStore } from "@/lib/storage";
import { readUpload, utf8 } from "@/lib/upload-body";
import { parseSequencerCsv, SEQUENCER_CSV_LIMITS, toSampledProtocol } from "@/canvas/import/sequencer-csv";
import { withSampledProtocol } from "@/canvas/kernels/document-edits";
import { MAX_STORED_SAMPLES, THIN_TOLERANCE_FRACTION, thinProfile } from "@/physics/protocols/thin-profile";
import type { z } from "zod";

type Params = { projectId: string; scenarioId: string };

/** The original's file name: the upload's, ending in .csv. */
const csvName = (name: string | null) => (name && /\.csv$/i.test(name) ? name : `${name ?? "sequencer-profile"}.csv`);

/** How many samples the answer shows as a preview table. */
const PREVIEW_ROWS = 20;

function options<T extends z.ZodType>(schema: T, input: unknown): z.infer<T> {
  const parsed = schema.safeParse(input);
  if (!parsed.success) {
    throw new AppError("validation_failed", "the settings are not valid", parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message })));
  }
  return parsed.data;
}

/**
 * Reads a sequencer's CSV into a sampled protocol (editors and owners). The CSV comes as text/csv (settings in the
 * query), as multipart with a `file` field (settings as fields), or as JSON { csv, ...settings }. Settings:
 * timeUnit, separationUnit (when the header has none, or to override it), interpolation (linear, cubic-spline),
 * dryRun=1 to preview and store nothing, else version (the scenario version edited) to save a new revision.
 * A profile longer than 10,000 rows is stored thinned (physics/protocols/thin-profile.ts) with the file kept as an
 * attachment; one that cannot be thinned below 20,000 samples is 422.
 */
export const POST = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  const db = getDb();
  await assertMayWriteScenarios(db, actor, projectId, scenarioId);
  const upload = await readUpload(req, {
    maxBytes: SEQUENCER_CSV_LIMITS.maxBytes,
    what: "the sequencer file",
    accept: ["text/csv", "text/plain", "application/csv", "application/vnd.ms-excel", "application/json"],
  });
  const isJson = (req.headers.get("content-type") ?? "").startsWith("application/json");
  let text: string;
  let settings: z.infer<typeof sequencerProfileOptionsSchema>;
  if (isJson) {
    let body: unknown;
    try {
      body = JSON.parse(utf8(upload.bytes, "the request body"));
    } catch {
      throw new AppError("bad_request", "the request body is not valid JSON");
    }
    const input = options(sequencerProfileJsonSchema, { ...upload.fields, ...(typeof body === "object" && body ? body : {}) });
    ({ csv: text, ...settings } = input);
  } else {
    text = utf8(upload.bytes, "the sequencer file");
    settings = options(sequencerProfileOptionsSchema, upload.fields);
  }

  const parsed = parseSequencerCsv(text, { timeUnit: settings.timeUnit, separationUnit: settings.separationUnit });
  if (!parsed.ok) {
    const listed = parsed.problems.length < parsed.problemCount ? ` (the first ${parsed.problems.length} are listed)` : "";
    throw new AppError(
      "unprocessable",
      `the sequencer file cannot be used: ${parsed.problemCount === 1 ? "1 problem" : `${parsed.problemCount} problems`}${listed}`,
      parsed.problems.map((p) => ({ path: p.row === null ? "file" : `row ${p.row}`, message: p.message })),
      { rows: parsed.problems, problemCount: parsed.problemCount, missingUnits: parsed.missingUnits },
    );
  }
  const thinned = thinProfile(parsed.samples);
  if (thinned.samples.length > MAX_STORED_SAMPLES) {
    throw new AppError(
      "unprocessable",
      `the profile keeps ${thinned.samples.length.toLocaleString("en")} samples even when thinned to within ${THIN_TOLERANCE_FRACTION} of its largest separation; a stored profile has at most ${MAX_STORED_SAMPLES.toLocaleString("en")} (smooth or average the export first)`,
      [{ path: "file", message: "too irregular to store compactly" }],
    );
  }
  const protocol = toSampledProtocol(thinned.samples, settings.interpolation);
  const thinning =
    thinned.originalCount === thinned.samples.length
      ? null
      : { originalCount: thinned.originalCount, storedCount: thinned.samples.length, toleranceMetres: thinned.toleranceMetres, largestErrorMetres: thinned.largestErrorMetres };
  const profile = {
    rowCount: parsed.samples.length,
    durationSeconds: parsed.durationSeconds,
    maxSeparationMetres: parsed.maxSeparationMetres,
    time: parsed.time,
    separation: parsed.separation,
    flags: parsed.flags,
    preview: parsed.samples.slice(0, PREVIEW_ROWS),
    thinning,
  };
  if (settings.dryRun) return json({ dryRun: true, profile, protocol });

  if (settings.version === undefined) {
    throw new AppError("validation_failed", "send the scenario version you edited (or dryRun=1 to preview)", [{ path: "version", message: "version is required" }]);
  }
  const current = await getScenario(db, actor, projectId, scenarioId);
  if (!current.document) throw new AppError("unprocessable", "this scenario's stored document cannot be read, so a profile cannot be added to it", current.documentIssues ?? []);
  // A stale version is refused by updateScenario (409) before anything is stored.
  const scenario = await updateScenario(db, actor, projectId, scenarioId, { version: settings.version, document: withSampledProtocol(current.document, protocol) });
  // A thinned profile keeps its original beside the scenario, as the file that was read.
  const original = thinning
    ? await uploadAttachment(db, objectStore(), actor, projectId, scenarioId, { fileName: csvName(upload.name), mediaType: "text/csv", bytes: new TextEncoder().encode(text) })
    : null;
  return json({ dryRun: false, profile, scenario, originalAttachment: original });
});
