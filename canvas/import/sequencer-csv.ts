/**
 * A separation profile from a lab sequencer's CSV export: a time column and a separation column, turned into the
 * samples of a "sampled" protocol (seconds, metres of full separation).
 *
 * Units come from the header ("t [ms]", "time (s)", "separation [um]", "Δx / nm") or, where the header has none
 * (or there is no header), from the caller's choice; a chosen unit overrides the header's. Rows are counted as a
 * spreadsheet shows them (the header is row 1), so "row 7" is the row a user finds under 7. The answer is either
 * every sample, or the list of what is wrong with the rows; never a throw.
 *
 * The delimiter is guessed from the first line (semicolon, tab, else comma); with semicolons a decimal comma ("1,5") is read as 1.5, as
 * spreadsheets in many locales write it. A leading byte-order mark is ignored.
 *
 * File reading, not physics: shared by the browser's preview and the server's import route. The document edit
 * that applies the profile is canvas/kernels/document-edits.ts's withSampledProtocol.
 */
import Papa from "papaparse";
import type { ProtocolSpec } from "@/physics/scenario/schema";
import { formatQuantity, parseQuantity } from "@/physics/units";

export const SEQUENCER_CSV_LIMITS = {
  /** Largest file read, in bytes. */
  maxBytes: 5 * 1024 * 1024,
  /** Most rows of samples (not counting the header). */
  maxRows: 200_000,
  /** Fewest rows of samples: a profile needs a start and an end. */
  minRows: 2,
  /** Most row problems listed; the rest are counted. */
  maxErrorsListed: 50,
} as const;

/** Units a form offers when the header names none. */
export const TIME_UNIT_CHOICES = ["s", "ms", "us", "ns"] as const;
export const SEPARATION_UNIT_CHOICES = ["m", "mm", "um", "nm", "pm"] as const;

export interface SequencerCsvOptions {
  /** Unit of the time column ("ms"); overrides the header's. */
  timeUnit?: string;
  /** Unit of the separation column ("um"); overrides the header's. */
  separationUnit?: string;
}

export interface SequencerSample {
  timeSeconds: number;
  separationMetres: number;
}

export interface RowProblem {
  /** Spreadsheet row number (1 is the first line of the file); null for a problem with the file as a whole. */
  row: number | null;
  message: string;
}

export interface ColumnReading {
  /** The header cell as written, or null without a header. */
  header: string | null;
  /** The unit used, as written ("ms"), and where it came from. */
  unit: string;
  unitSource: "header" | "chosen";
}

export interface ProfileFlag {
  code: "starts-apart" | "ends-apart";
  message: string;
}

export interface SequencerProfile {
  ok: true;
  samples: SequencerSample[];
  time: ColumnReading;
  separation: ColumnReading;
  /** Last sample time minus the first. */
  durationSeconds: number;
  maxSeparationMetres: number;
  /** A profile that does not start or end at zero separation (the branches would have to start or end apart). */
  flags: ProfileFlag[];
  delimiter: string;
}

export interface SequencerFailure {
  ok: false;
  problems: RowProblem[];
  /** How many problems there were in all (more than listed when there were many). */
  problemCount: number;
  /** Columns whose unit must be chosen because the header names none. */
  missingUnits: ("time" | "separation")[];
}

export type SequencerCsvResult = SequencerProfile | SequencerFailure;

const UNIT_IN_HEADER = /^(.*?)\s*(?:\[\s*([^\]]+?)\s*\]|\(\s*([^)]+?)\s*\)|\/\s*(\S.*?))\s*$/;
const TIME_NAME = /^(t|time|times|timestamp|lab\s*time|t_?lab)$/i;
const SEPARATION_NAME = /^(separation|sep|distance|d|dx|δx|Δx|delta\s*x|x|split|arm\s*separation)$/i;

function splitHeader(cell: string): { name: string; unit: string | null } {
  const m = UNIT_IN_HEADER.exec(cell.trim());
  if (!m) return { name: cell.trim(), unit: null };
  return { name: m[1].trim(), unit: (m[2] ?? m[3] ?? m[4]).trim() };
}

/** SI value of one unit, or null when it is not a unit of the dimension. */
function unitFactor(unit: string, dimension: "time" | "length"): number | null {
  const parsed = parseQuantity(`1 ${unit}`, dimension);
  return parsed.ok ? parsed.valueSI : null;
}

function readNumber(text: string, decimalComma: boolean): number | null {
  let t = text.trim().replace(/−/g, "-");
  if (decimalComma && /^[+-]?\d*,\d+(?:[eE][+-]?\d+)?$/.test(t)) t = t.replace(",", ".");
  if (!/^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/.test(t)) return null;
  const value = Number(t);
  return Number.isFinite(value) ? value : null;
}

/**
 * The first line with content decides: a semicolon or a tab there is the delimiter (a decimal comma may follow in
 * the rows, so commas cannot be counted), else a comma.
 */
function guessDelimiter(content: string): string {
  const firstLine = content.split(/\r?\n/).find((line) => line.trim() !== "") ?? "";
  if (firstLine.includes(";")) return ";";
  if (firstLine.includes("\t")) return "\t";
  return ",";
}

const blank = (row: string[]) => row.every((cell) => cell.trim() === "");

const fail = (problems: RowProblem[], missingUnits: SequencerFailure["missingUnits"] = []): SequencerFailure => ({
  ok: false,
  problems: problems.slice(0, SEQUENCER_CSV_LIMITS.maxErrorsListed),
  problemCount: problems.length,
  missingUnits,
});

/** Which two columns hold time and separation: by name where the header names them, else the first two. */
function pickColumns(names: string[]): { time: number; separation: number } {
  const time = names.findIndex((n) => TIME_NAME.test(n));
  const separation = names.findIndex((n, i) => i !== time && SEPARATION_NAME.test(n));
  const t = time >= 0 ? time : separation === 0 ? 1 : 0;
  const s = separation >= 0 ? separation : t === 0 ? 1 : 0;
  return { time: t, separation: s };
}

export function parseSequencerCsv(text: string, options: SequencerCsvOptions = {}): SequencerCsvResult {
  const content = text.replace(/^\uFEFF/, "");
  const bytes = new TextEncoder().encode(content).length;
  if (bytes > SEQUENCER_CSV_LIMITS.maxBytes) {
    return fail([{ row: null, message: `the file is ${(bytes / 1024 / 1024).toFixed(1)} MB; the limit is ${SEQUENCER_CSV_LIMITS.maxBytes / 1024 / 1024} MB` }]);
  }
  if (content.trim() === "") return fail([{ row: null, message: "the file is empty" }]);

  const delimiter = guessDelimiter(content);
  const parsed = Papa.parse<string[]>(content, { delimiter, skipEmptyLines: false });
  const decimalComma = delimiter === ";" || delimiter === "\t";
  const rows = parsed.data;
  const quoting = parsed.errors.filter((e) => e.type === "Quotes");
  if (quoting.length > 0) {
    return fail(quoting.map((e) => ({ row: (e.row ?? 0) + 1, message: `row ${(e.row ?? 0) + 1}: ${e.message.toLowerCase()}` })));
  }

  const firstIndex = rows.findIndex((r) => !blank(r));
  const first = rows[firstIndex];
  const hasHeader = first.some((cell, i) => i < 2 && readNumber(cell, decimalComma) === null);
  const headerCells = hasHeader ? first.map(splitHeader) : [];
  if (first.length < 2) {
    return fail([{ row: firstIndex + 1, message: `row ${firstIndex + 1}: a sequencer file needs two columns, time and separation; this row has one (delimiter "${delimiter}")` }]);
  }
  const columns = hasHeader ? pickColumns(headerCells.map((h) => h.name)) : { time: 0, separation: 1 };

  const problems: RowProblem[] = [];
  const missingUnits: SequencerFailure["missingUnits"] = [];
  const column = (which: "time" | "separation", dimension: "time" | "length"): (ColumnReading & { factor: number }) | null => {
    const index = columns[which];
    const header = hasHeader ? first[index].trim() : null;
    const chosen = which === "time" ? options.timeUnit : options.separationUnit;
    const written = hasHeader ? headerCells[index].unit : null;
    const unit = chosen?.trim() || written;
    const unitSource = chosen?.trim() ? "chosen" : "header";
    const where = header ? `the ${which} column '${header}'` : `the ${which} column (column ${index + 1})`;
    if (!unit) {
      missingUnits.push(which);
      problems.push({ row: hasHeader ? firstIndex + 1 : null, message: `${where} has no unit: write it in the header, e.g. '${which === "time" ? "t [ms]" : "separation [um]"}', or choose one` });
      return null;
    }
    const factor = unitFactor(unit, dimension);
    if (factor === null) {
      if (unitSource === "header") missingUnits.push(which);
      problems.push({ row: unitSource === "header" ? firstIndex + 1 : null, message: `${where}: '${unit}' is not a unit of ${dimension}` });
      return null;
    }
    return { header, unit, unitSource, factor };
  };
  const time = column("time", "time");
  const separation = column("separation", "length");
  if (!time || !separation) return fail(problems, missingUnits);

  const dataStart = hasHeader ? firstIndex + 1 : firstIndex;
  const dataRows: { row: number; cells: string[] }[] = [];
  for (let i = dataStart; i < rows.length; i++) if (!blank(rows[i])) dataRows.push({ row: i + 1, cells: rows[i] });
  if (dataRows.length === 0) return fail([{ row: null, message: "the file has a header but no rows of samples" }]);
  if (dataRows.length > SEQUENCER_CSV_LIMITS.maxRows) {
    return fail([{ row: null, message: `the file has ${dataRows.length.toLocaleString("en")} rows of samples; the limit is ${SEQUENCER_CSV_LIMITS.maxRows.toLocaleString("en")}` }]);
  }
  if (dataRows.length < SEQUENCER_CSV_LIMITS.minRows) {
    return fail([{ row: null, message: `a profile needs at least ${SEQUENCER_CSV_LIMITS.minRows} rows of samples (a start and an end); the file has ${dataRows.length}` }]);
  }

  const samples: SequencerSample[] = [];
  let previous: { row: number; timeSeconds: number } | null = null;
  for (const { row, cells } of dataRows) {
    const timeText = cells[columns.time];
    const separationText = cells[columns.separation];
    const t = timeText === undefined || timeText.trim() === "" ? undefined : readNumber(timeText, decimalComma);
    const x = separationText === undefined || separationText.trim() === "" ? undefined : readNumber(separationText, decimalComma);
    let rowOk = true;
    const problem = (message: string) => {
      problems.push({ row, message: `row ${row}: ${message}` });
      rowOk = false;
    };
    if (t === undefined) problem("time is missing");
    else if (t === null) problem(`time '${timeText.trim()}' is not a number`);
    if (x === undefined) problem("separation is missing");
    else if (x === null) problem(`separation '${separationText.trim()}' is not a number`);
    if (!rowOk) continue;
    const timeSeconds = t! * time.factor;
    const separationMetres = x! * separation.factor;
    if (separationMetres < 0) problem(`separation ${separationText.trim()} ${separation.unit} is negative; a separation is 0 or more`);
    if (previous && !(timeSeconds > previous.timeSeconds)) {
      problem(`time ${timeText.trim()} ${time.unit} is not after row ${previous.row}'s; times must increase strictly`);
    }
    previous = { row, timeSeconds };
    if (rowOk) samples.push({ timeSeconds, separationMetres });
  }
  if (problems.length > 0) return fail(problems);

  const maxSeparationMetres = samples.reduce((m, s) => Math.max(m, s.separationMetres), 0);
  const tolerance = 1e-6 * maxSeparationMetres;
  const flags: ProfileFlag[] = [];
  const start = samples[0].separationMetres;
  const end = samples[samples.length - 1].separationMetres;
  if (start > tolerance) {
    flags.push({ code: "starts-apart", message: `the profile starts at ${formatQuantity(start, "length")}, not 0: the branches would have to start apart` });
  }
  if (end > tolerance) {
    flags.push({ code: "ends-apart", message: `the profile ends at ${formatQuantity(end, "length")}, not 0: the branches would not recombine` });
  }
  if (maxSeparationMetres === 0) flags.length = 0;
  return {
    ok: true,
    samples,
    time: { header: time.header, unit: time.unit, unitSource: time.unitSource },
    separation: { header: separation.header, unit: separation.unit, unitSource: separation.unitSource },
    durationSeconds: samples[samples.length - 1].timeSeconds - samples[0].timeSeconds,
    maxSeparationMetres,
    flags,
    delimiter,
  };
}

export type SampledProtocol = Extract<ProtocolSpec, { kind: "sampled" }>;
export type SampledInterpolation = SampledProtocol["interpolation"];

export function toSampledProtocol(samples: SequencerSample[], interpolation: SampledInterpolation = "linear"): SampledProtocol {
  return { kind: "sampled", samples: samples.map((s) => ({ timeSeconds: s.timeSeconds, separationMetres: s.separationMetres })), interpolation };
}
