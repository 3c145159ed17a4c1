/**
 * The scenario file: a scenario as one JSON file to keep beside a paper, send to a colleague or import into another
 * project. An envelope of our own around the scenario document: what the file is, which envelope version, the
 * scenario's title and notes, when it was written, and the document itself (which carries its own schemaVersion and
 * is read by parseScenarioDocument, so older documents upgrade on import).
 *
 *   { "format": "branchline-scenario", "formatVersion": 1, "title": "...", "description": "...",
 *     "exportedAt": "2026-12-02T10:00:00.000Z", "document": { "schemaVersion": 1, ... } }
 */
import { z } from "zod";
import { rangeIssues } from "./ranges";
import { keptText } from "./text";
import { parseScenarioDocument, type ScenarioDocument, type SchemaIssue } from "./schema";

export const SCENARIO_FILE_FORMAT = "branchline-scenario" as const;
export const SCENARIO_FILE_VERSION = 1 as const;
/** The media type a scenario file is served with. */
export const SCENARIO_FILE_MEDIA_TYPE = "application/json";

const envelopeSchema = z.object({
  format: z.literal(SCENARIO_FILE_FORMAT, { error: `format must be "${SCENARIO_FILE_FORMAT}"` }),
  formatVersion: z
    .number({ error: "formatVersion must be a number" })
    .int("formatVersion must be a whole number")
    .min(1, "formatVersion must be at least 1")
    .max(SCENARIO_FILE_VERSION, `formatVersion is newer than this Branchline (${SCENARIO_FILE_VERSION}); update Branchline to read it`),
  title: keptText("title must be text").trim().min(1, "title must not be empty").max(200, "title may have at most 200 characters"),
  description: keptText("description must be text").max(5000, "description may have at most 5000 characters").optional(),
  exportedAt: z.string().optional(),
  document: z.unknown(),
});

export interface ScenarioFile {
  format: typeof SCENARIO_FILE_FORMAT;
  formatVersion: typeof SCENARIO_FILE_VERSION;
  title: string;
  description?: string;
  exportedAt: string;
  document: ScenarioDocument;
}

export type ScenarioFileParse = { ok: true; title: string; description?: string; document: ScenarioDocument } | { ok: false; issues: SchemaIssue[] };

export function toScenarioFile(scenario: { title: string; description?: string | null; document: ScenarioDocument }, now = new Date()): ScenarioFile {
  return {
    format: SCENARIO_FILE_FORMAT,
    formatVersion: SCENARIO_FILE_VERSION,
    title: scenario.title,
    ...(scenario.description ? { description: scenario.description } : {}),
    exportedAt: now.toISOString(),
    document: scenario.document,
  };
}

/** The file's text, as written to disk: two-space indented, with a final newline. */
export function scenarioFileText(file: ScenarioFile): string {
  return `${JSON.stringify(file, null, 2)}\n`;
}

/** A file name for a scenario's title: lower-case letters, digits and dashes, never empty. */
export function scenarioFileName(title: string, extension: string): string {
  const stem = title
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 80);
  return `${stem || "scenario"}.${extension}`;
}

/**
 * Reads a scenario file (already JSON-parsed) and answers either the scenario or every problem found, each with its
 * path in the file ("document.protocol.hold.durationSeconds"). Never throws.
 */
export function parseScenarioFile(input: unknown): ScenarioFileParse {
  if (typeof input !== "object" || input === null || Array.isArray(input)) {
    return { ok: false, issues: [{ path: "", message: "a scenario file must be a JSON object" }] };
  }
  const envelope = envelopeSchema.safeParse(input);
  const issues: SchemaIssue[] = envelope.success ? [] : envelope.error.issues
        // The document is read below, by its own schema.
        .filter((i) => i.path[0] !== "document")
        .map((i) => ({ path: i.path.join("."), message: i.message }));
  const raw = (input as Record<string, unknown>).document;
  if (raw === undefined) {
    issues.push({ path: "document", message: "the file has no scenario document" });
    return { ok: false, issues };
  }
  const document = parseScenarioDocument(raw);
  const documentIssues = document.ok ? rangeIssues(document.document) : document.issues;
  issues.push(...documentIssues.map((i) => ({ path: i.path ? `document.${i.path}` : "document", message: i.message })));
  if (issues.length > 0 || !envelope.success || !document.ok) return { ok: false, issues };
  return { ok: true, title: envelope.data.title, description: envelope.data.description, document: document.document };
}

/** Reads a scenario file from its text: bad JSON is one issue with where it broke. */
export function parseScenarioFileText(text: string): ScenarioFileParse {
  if (text.trim() === "") return { ok: false, issues: [{ path: "", message: "the file is empty" }] };
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return { ok: false, issues: [{ path: "", message: `the file is not valid JSON: ${error instanceof Error ? error.message : String(error)}` }] };
  }
  return parseScenarioFile(json);
}
